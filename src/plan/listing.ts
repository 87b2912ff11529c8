import type { CheckResult } from '../solve/evaluate-rate.js';
import type { Interferer } from '../interferers/interferer.js';
import type { Limit } from '../solve/limited-by.js';

/**
 * How many checks per candidate, and interferers per plan, a report lists by
 * default: past it a plan with hundreds of neighbours (tens of thousands of
 * intermodulation products) would write tens of megabytes of JSON per
 * candidate. Every interferer is still derived and every blocking one judged.
 */
export const MOST_LISTED = 1000;

/** A report lists what it must (bounded) or everything it judged (all). */
export type Listing = 'bounded' | 'all';

/**
 * What a candidate's `checks` holds: every interferer's check ("all"); the
 * blocking checks, tightest first, then the non-blocking ones nearest to
 * blocking (least level margin), MOST_LISTED in all ("nearest"); or, for a
 * candidate judged on the blocking interferers only, the check that limits
 * it ("limiting"; none when the zone edge does).
 */
export type ChecksListed = 'all' | 'nearest' | 'limiting';

/**
 * The checks a report lists for one candidate, in the plan's order.
 *
 * @param checks the candidate's checks (every interferer's, or the blocking ones')
 * @param judgedAll whether every interferer was judged
 * @param limitedBy what limits the candidate (an interferer, or the zone edge)
 * @param listing bounded (default) or all
 * @returns the listed checks and what they are
 * @example listedChecks([], true, { kind: 'zone edge' }, 'bounded') // { checks: [], listed: 'all' }
 */
export function listedChecks(
  checks: readonly CheckResult[],
  judgedAll: boolean,
  limitedBy: Limit,
  listing: Listing,
): { checks: readonly CheckResult[]; listed: ChecksListed } {
  if (!judgedAll)
    return { checks: checks.filter((c) => limitedBy.kind === 'interferer' && c.label === limitedBy.label), listed: 'limiting' };
  if (listing === 'all' || checks.length <= MOST_LISTED) return { checks, listed: 'all' };
  const slack = (c: CheckResult) => c.margin - c.requiredMargin;
  const order = checks
    .map((_, i) => i)
    .sort((a, b) => {
      const x = checks[a]!;
      const y = checks[b]!;
      return Number(y.blocking) - Number(x.blocking) || (x.blocking ? slack(x) - slack(y) : x.levelMargin - y.levelMargin) || a - b;
    });
  return { checks: keptInOrder(checks, order), listed: 'nearest' };
}

/**
 * The interferers a report lists: all of them, or past MOST_LISTED (bounded)
 * the blocking ones, then the strongest of the others.
 *
 * @param interferers the plan's interferers
 * @param listing bounded (default) or all
 * @returns the listed interferers in the plan's order, and whether that is all
 * @example listedInterferers([], 'bounded') // { interferers: [], listed: 'all' }
 */
export function listedInterferers(
  interferers: readonly Interferer[],
  listing: Listing,
): { interferers: readonly Interferer[]; listed: 'all' | 'nearest' } {
  if (listing === 'all' || interferers.length <= MOST_LISTED) return { interferers, listed: 'all' };
  const order = interferers
    .map((_, i) => i)
    .sort((a, b) => {
      const x = interferers[a]!;
      const y = interferers[b]!;
      return Number(y.blocking) - Number(x.blocking) || y.level - x.level || a - b;
    });
  return { interferers: keptInOrder(interferers, order), listed: 'nearest' };
}

/** The first MOST_LISTED items by the ranking `order` (indices), back in their original order. */
function keptInOrder<T>(items: readonly T[], order: readonly number[]): T[] {
  const kept = order.slice(0, MOST_LISTED).sort((a, b) => a - b);
  return kept.map((i) => items[i]!);
}
