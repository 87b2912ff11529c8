import type { Db, Hz } from '../units/quantities.js';
import type { Scenario } from '../scenario/scenario.js';
import { level, type InterfererDraft } from './interferer-draft.js';
import { dbText } from './words.js';

const ZERO = 0 as Hz;

/**
 * The converter's spurs tied to its sample rate r (kind `converter`):
 * DC, r/2 and r/4 where their levels are stated; with M-way interleaving, the
 * offset spurs at k·r/M (k = 1..M−1) and the images of the wanted band at
 * k·r/M ± f: `k/M·r − [low, high]` (rateMultiple k/M, extent [−high, −low])
 * and `k/M·r + [low, high]`, at strongestLevel + imageLevel.
 *
 * @param scenario the validated scenario
 * @returns drafts labelled `DC`, `rate/2`, `rate/4`, `IL offset k/M`, `IL image k/M−`, `IL image k/M+`
 * @example converterSpurDrafts(s) // [DC, IL offset 1/2, IL image 1/2−, IL image 1/2+] for a 2-way converter stating only a DC spur
 */
export function converterSpurDrafts(scenario: Scenario): InterfererDraft[] {
  const { converter, wanted } = scenario;
  const drafts: InterfererDraft[] = [];
  const tone = (label: string, rateMultiple: number, spurLevel: Db, source: string): InterfererDraft => ({
    label,
    kind: 'converter',
    order: null,
    source: `${source}, ${dbText(spurLevel, 'dBFS')}`,
    rateMultiple,
    shiftMultiple: 0, // tied to the clock, not to the LO
    low: ZERO,
    high: ZERO,
    level: spurLevel,
  });
  const { dc, halfRate, quarterRate } = converter.rateSpurs;
  if (dc !== null) drafts.push(tone('DC', 0, dc, 'converter spur at DC'));
  if (halfRate !== null) drafts.push(tone('rate/2', 0.5, halfRate, 'converter spur at half the sample rate'));
  if (quarterRate !== null) drafts.push(tone('rate/4', 0.25, quarterRate, 'converter spur at a quarter of the sample rate'));
  const interleave = converter.interleave;
  if (interleave === null) return drafts;
  const m = interleave.ways;
  for (let k = 1; k < m; k++) {
    drafts.push(tone(`IL offset ${k}/${m}`, k / m, interleave.offsetSpur, `interleaving offset spur at ${k}/${m} of the sample rate (${m} cores)`));
  }
  const imageLevel = level(wanted.strongestLevel + interleave.imageLevel);
  for (let k = 1; k < m; k++) {
    for (const side of ['−', '+'] as const) {
      drafts.push({
        label: `IL image ${k}/${m}${side}`,
        kind: 'converter',
        order: null,
        source: `interleaving image of the wanted band at ${k}/${m} of the sample rate ${side} f (${dbText(interleave.imageLevel, 'dBc')})`,
        rateMultiple: k / m,
        shiftMultiple: side === '−' ? -1 : 1, // k/M·r ∓ (band + δ)
        low: side === '−' ? ((-wanted.high) as Hz) : wanted.low,
        high: side === '−' ? ((-wanted.low) as Hz) : wanted.high,
        level: imageLevel,
      });
    }
  }
  return drafts;
}
