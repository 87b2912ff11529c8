/**
 * An independent brute-force evaluator of a band-pass sampling plan, written
 * for the solver tests from the definition of aliasing (common practice, no
 * source): a real frequency f sampled at rate r shows at |f − r·round(f/r)|
 * in [0, r/2]. It imports nothing from src/solve or src/math and shares no
 * algebra with them: the solver works in the rate domain over band images;
 * this evaluator folds input frequencies one point at a time at one rate.
 *
 * Why the sampled points suffice (derived here, used by the tests):
 * - alias(f) is piecewise linear in f with slope ±1, its corners at the
 *   multiples of r/2; so d(f) = distance from alias(f) to the wanted alias
 *   interval A is 1-Lipschitz, and its corners are the multiples of r/2 and
 *   the points where alias(f) crosses an edge of A (where d = 0).
 * - Points: both ends of the extent, every multiple of r/2 strictly inside
 *   it, and a uniform grid of spacing at most δ. The least d over those
 *   points never undershoots the true least distance (it is a minimum over a
 *   subset), and overshoots it by at most δ/2 (every frequency of the extent
 *   lies within δ/2 of a grid point). When the true least distance is
 *   positive it is reached at an end or a corner, both sampled: exact.
 * - The verdict "every point at least m away" is therefore exact whenever
 *   δ < 2m: a true minimum at an end or corner is sampled; a true minimum of
 *   0 (the alias meets A) is seen as at most δ/2 < m.
 */

/** The part of an interferer the brute force reads: extent(r) = rateMultiple·r + [low, high], Hz. */
export interface BruteExtent {
  readonly rateMultiple: number;
  readonly low: number;
  readonly high: number;
  readonly requiredMargin: number;
  readonly blocking: boolean;
}

/** The part of a plan the brute force reads, Hz. */
export interface BrutePlan {
  readonly band: { readonly low: number; readonly high: number };
  readonly guard: { readonly low: number; readonly high: number };
  readonly interferers: readonly BruteExtent[];
}

/** The alias of one real frequency (any sign) at rate r: |f − r·round(f/r)|, Hz. */
export function bruteAlias(f: number, rate: number): number {
  return Math.abs(f - rate * Math.round(f / rate));
}

/**
 * Whether no multiple of r/2 lies strictly inside [low, high]: the band is
 * whole in one Nyquist zone. The smallest multiple of r/2 above `low` is
 * (⌊2·low/r⌋ + 1)·r/2; the band is whole when that is not below `high`.
 */
export function wholeInOneZone(low: number, high: number, rate: number): boolean {
  const next = ((Math.floor((2 * low) / rate) + 1) * rate) / 2;
  return next >= high;
}

/** The guarded band; a guard reaching below DC stops at DC (the project's rule, see guardedBand), Hz. */
export function bruteGuarded(plan: BrutePlan): { low: number; high: number } {
  return { low: Math.max(0, plan.band.low - plan.guard.low), high: plan.band.high + plan.guard.high };
}

/** The wanted band's alias interval from the aliases of its two ends, or null when the band straddles a zone edge, Hz. */
export function wantedAlias(plan: BrutePlan, rate: number): { low: number; high: number } | null {
  if (!wholeInOneZone(plan.band.low, plan.band.high, rate)) return null;
  const a = bruteAlias(plan.band.low, rate);
  const b = bruteAlias(plan.band.high, rate);
  return { low: Math.min(a, b), high: Math.max(a, b) };
}

/** The extent's input frequencies at rate r, Hz. */
export function extentAt(extent: BruteExtent, rate: number): { low: number; high: number } {
  return { low: extent.rateMultiple * rate + extent.low, high: extent.rateMultiple * rate + extent.high };
}

/**
 * The points of [low, high] the brute force folds: both ends, a uniform grid
 * of spacing at most `spacing` and, when `withCorners`, every multiple of r/2
 * strictly inside (the corners of the alias function), ascending.
 */
export function samplePoints(low: number, high: number, rate: number, spacing: number, withCorners: boolean): number[] {
  const points = [low, high];
  const steps = Math.ceil((high - low) / spacing);
  for (let i = 1; i < steps; i++) points.push(low + ((high - low) * i) / steps);
  if (withCorners) {
    for (let k = Math.floor((2 * low) / rate) + 1; (k * rate) / 2 < high; k++) points.push((k * rate) / 2);
  }
  return points.sort((x, y) => x - y);
}

/** Distance from a point to a closed interval, Hz (0 inside). */
function distanceTo(x: number, interval: { low: number; high: number }): number {
  return x < interval.low ? interval.low - x : x > interval.high ? x - interval.high : 0;
}

/**
 * The least distance from the alias of any sampled point of the extent to
 * the wanted alias interval, Hz, never negative (see the module comment for
 * its error: none with corners when positive, at most spacing/2 otherwise).
 */
export function bruteLeastDistance(
  extent: BruteExtent,
  alias: { low: number; high: number },
  rate: number,
  spacing: number,
  withCorners = true,
): number {
  const { low, high } = extentAt(extent, rate);
  let least = Infinity;
  for (const f of samplePoints(low, high, rate, spacing, withCorners)) least = Math.min(least, distanceTo(bruteAlias(f, rate), alias));
  return least;
}

/** The grid spacing the verdict uses for an extent: below twice its margin (see the module comment), Hz. */
export function verdictSpacing(extent: BruteExtent): number {
  return extent.requiredMargin;
}

/**
 * The brute-force verdict at one exact rate: the guarded band whole in one
 * zone, and every sampled point of every blocking extent aliasing at least
 * its required margin away from the wanted alias. Needs every blocking
 * margin positive (a zero margin makes "at least 0 away" vacuous).
 */
export function brutePasses(plan: BrutePlan, rate: number): boolean {
  const guarded = bruteGuarded(plan);
  if (!wholeInOneZone(guarded.low, guarded.high, rate)) return false;
  const alias = wantedAlias(plan, rate);
  if (!alias) return false;
  for (const extent of plan.interferers) {
    if (!extent.blocking) continue;
    if (!(extent.requiredMargin > 0)) throw new Error('the brute force needs a positive required margin');
    if (bruteLeastDistance(extent, alias, rate, verdictSpacing(extent)) < extent.requiredMargin) return false;
  }
  return true;
}

/**
 * The extent folded piece by piece: it is cut at every multiple of r/2, and
 * each piece, on which the alias is linear, maps onto the interval between
 * the aliases of its ends. Pieces are returned unmerged, in input order, Hz.
 */
export function foldedPieces(extent: BruteExtent, rate: number): { low: number; high: number }[] {
  const { low, high } = extentAt(extent, rate);
  const cuts = samplePoints(low, high, rate, Infinity, true);
  if (low === high) return [{ low: bruteAlias(low, rate), high: bruteAlias(low, rate) }];
  const pieces: { low: number; high: number }[] = [];
  for (let i = 0; i + 1 < cuts.length; i++) {
    const a = bruteAlias(cuts[i]!, rate);
    const b = bruteAlias(cuts[i + 1]!, rate);
    pieces.push({ low: Math.min(a, b), high: Math.max(a, b) });
  }
  return pieces;
}

/** Sorted union of intervals, Hz. */
export function unionOf(intervals: readonly { low: number; high: number }[]): { low: number; high: number }[] {
  const sorted = [...intervals].sort((x, y) => x.low - y.low);
  const out: { low: number; high: number }[] = [];
  for (const next of sorted) {
    const last = out[out.length - 1];
    if (last && next.low <= last.high) out[out.length - 1] = { low: last.low, high: Math.max(last.high, next.high) };
    else out.push({ ...next });
  }
  return out;
}

/**
 * How far the extent's input frequencies would have to move to clear the
 * wanted alias, Hz, or 0 when no part of it lands strictly inside: written
 * from the definition of aliasing alone. The input frequencies that show
 * inside the alias interval A at rate r are its preimages k·r + A and
 * k·r − A (every integer k), since alias(f) = |f − r·round(f/r)|. The extent
 * [low, high] clears one preimage [p, q] by moving up q − low or down
 * high − p; it must clear every preimage it overlaps, and the depth of an
 * intrusion is the worst of those smaller shifts (a tone inside: its
 * distance to the nearer edge of the alias).
 */
export function bruteClearingShift(extent: BruteExtent, alias: { low: number; high: number }, rate: number): number {
  const { low, high } = extentAt(extent, rate);
  let worst = 0;
  const first = Math.floor((low - alias.high) / rate) - 1;
  const last = Math.ceil((high + alias.high) / rate) + 1;
  for (let k = first; k <= last; k++) {
    for (const [p, q] of [
      [k * rate + alias.low, k * rate + alias.high],
      [k * rate - alias.high, k * rate - alias.low],
    ] as const) {
      if (Math.min(high, q) - Math.max(low, p) > 0 || (p < low && high < q)) worst = Math.max(worst, Math.min(q - low, high - p));
    }
  }
  return worst;
}

/** Length of the overlap of two closed intervals, Hz (0 when apart or touching). */
export function overlapWidth(a: { low: number; high: number }, b: { low: number; high: number }): number {
  return Math.max(0, Math.min(a.high, b.high) - Math.max(a.low, b.low));
}
