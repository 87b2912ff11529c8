import type { ReportedCandidate, ReportedCheck } from '../plan/plan-report.js';
import { quantityText, type Medium } from '../text/quantity-text.js';

/**
 * The checks of a candidate in the order every writer lists them: blocking
 * checks first, tightest (least margin beyond the requirement) first.
 *
 * @param checks a candidate's checks
 * @returns a new array
 * @example orderedChecks(candidate.checks)[0].blocking // true (blocking checks come first)
 */
export function orderedChecks(checks: readonly ReportedCheck[]): ReportedCheck[] {
  return [...checks].sort((a, b) => Number(b.blocking) - Number(a.blocking) || a.margin - a.requiredMargin - (b.margin - b.requiredMargin));
}

/**
 * Sentences naming each run of listed candidates that tie on the worst
 * margin (same verdict, same limiting check, same margin as written) and the
 * criterion that ranked them: the next-tightest check's margin.
 *
 * @param candidates ranked candidates, as listed
 * @param medium the medium the sentence is written for
 * @returns one sentence per run of two or more
 * @example tiedGroups(report.candidates)[0] // 'Candidates 1–4 tie on worst margin (5 MHz, Lower adjacent channel); ranked by the next-tightest check...'
 */
export function tiedGroups(candidates: readonly ReportedCandidate[], medium: Medium = 'terminal'): string[] {
  const t = quantityText(medium);
  const key = (c: ReportedCandidate) => `${c.pass}|${c.limitedBy}|${t.frequency(c.worstMargin)}`;
  const sentences: string[] = [];
  for (let start = 0; start < candidates.length;) {
    let end = start + 1;
    while (end < candidates.length && key(candidates[end]!) === key(candidates[start]!)) end++;
    if (end - start > 1) {
      const run = candidates.slice(start, end);
      const first = run[0]!;
      const next = rankRuns(
        run.map((c) => (c.next ? `${t.frequency(c.next.margin)} (${c.next.limitedBy})` : 'none')),
        start + 1,
      );
      sentences.push(
        `Candidates ${start + 1}–${end} tie on worst margin (${t.frequency(first.worstMargin)}, ${first.limitedBy}); ranked by the next-tightest check's margin beyond its requirement: ${next}.`,
      );
    }
    start = end;
  }
  return sentences;
}

/**
 * Ranks with the same text written once as a range ("1–12. 11.97 MHz (…)"),
 * so a long tie that the next check cannot break reads as one clause.
 *
 * @param texts one text per rank, in rank order
 * @param first the rank of the first text
 * @returns the clauses joined by '; '
 * @example rankRuns(['5 MHz', '5 MHz', '2 MHz'], 1) // '1–2. 5 MHz; 3. 2 MHz'
 */
export function rankRuns(texts: readonly string[], first: number): string {
  const clauses: string[] = [];
  for (let i = 0; i < texts.length;) {
    let j = i + 1;
    while (j < texts.length && texts[j] === texts[i]) j++;
    clauses.push(`${j - i > 1 ? `${first + i}–${first + j - 1}` : `${first + i}`}. ${texts[i]}`);
    i = j;
  }
  return clauses.join('; ');
}
