/**
 * An independent brute-force judge of several bands sampled together,
 * written for the tests from the definition of aliasing (common practice,
 * no source): a real frequency f sampled at rate r shows at
 * |f − r·round(f/r)|. It imports nothing from src/ and shares no algebra with
 * the solver, which works in the rate domain over band images j·r ± band;
 * this judge folds each band point by point at one rate.
 *
 * A band whole in one Nyquist zone folds onto one interval whose ends are the
 * aliases of its ends (the alias is linear with slope ±1 inside a zone), so
 * the hull of the folded points is its alias exactly, whatever the number of
 * points; the interior points show the band does not fold onto itself.
 */
import { bruteAlias, samplePoints, wholeInOneZone } from './brute-force-plan.js';

/** A band, Hz. */
export interface BruteBand {
  readonly low: number;
  readonly high: number;
}

/** Points folded per band. */
const POINTS_PER_BAND = 64;

/**
 * The alias of a band at rate r from its folded points, or null when a
 * multiple of r/2 lies strictly inside it (it straddles two zones), Hz.
 * Throws if the folded points are not monotone in the input frequency: a
 * whole band cannot fold onto itself, so that would be a fault of this judge.
 */
export function bruteBandAlias(band: BruteBand, rate: number): BruteBand | null {
  if (!wholeInOneZone(band.low, band.high, rate)) return null;
  const folded = samplePoints(band.low, band.high, rate, (band.high - band.low) / POINTS_PER_BAND, false).map((f) => bruteAlias(f, rate));
  const rising = folded[folded.length - 1]! >= folded[0]!;
  for (let i = 1; i < folded.length; i++) {
    const step = folded[i]! - folded[i - 1]!;
    if (rising ? step < -1e-9 * rate : step > 1e-9 * rate) throw new Error(`brute force: a whole band folded onto itself at ${rate} Hz`);
  }
  return { low: Math.min(...folded), high: Math.max(...folded) };
}

/** Signed distance between two intervals: the gap when apart, minus the overlap when they overlap, Hz. */
export function signedGap(a: BruteBand, b: BruteBand): number {
  return Math.max(b.low - a.high, a.low - b.high);
}

/**
 * The verdict at one rate: every band whole in one zone and every two bands'
 * aliases at least `spacing` apart (touching allowed when the spacing is 0).
 */
export function bruteBandsValid(bands: readonly BruteBand[], spacing: number, rate: number): boolean {
  const aliases: BruteBand[] = [];
  for (const band of bands) {
    const alias = bruteBandAlias(band, rate);
    if (alias === null) return false;
    aliases.push(alias);
  }
  for (let i = 0; i < aliases.length; i++) {
    for (let k = i + 1; k < aliases.length; k++) if (signedGap(aliases[i]!, aliases[k]!) < spacing) return false;
  }
  return true;
}

/**
 * The verdict at a rate the exact set reports as a single point, where the
 * aliases touch a zone edge or each other exactly and rounding may tip the
 * plain verdict either way: each band narrowed by `slack` at both ends and the
 * spacing by 2·slack, so an exact touch passes and a real overlap (deeper
 * than the slack) still fails.
 */
export function bruteBandsValidWithin(bands: readonly BruteBand[], spacing: number, rate: number, slack: number): boolean {
  const narrowed = bands.map((b) => ({ low: b.low + slack, high: b.high - slack }));
  return bruteBandsValid(narrowed, Math.max(0, spacing - 2 * slack), rate);
}
