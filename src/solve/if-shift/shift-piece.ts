import type { Band, Guard } from '../../math/band.js';
import type { Interval } from '../../math/interval-set.js';
import type { RateLimits } from '../../windows/rate-window.js';
import { imageOffsets } from '../fold-images.js';
import type { Interferer } from '../../interferers/interferer.js';
import { driftFactors } from '../drift.js';
import { hz, type Hz, type Ppm } from '../../units/quantities.js';
import { slackAt, type PlaneBox, type PlaneSlack } from './plane-lp.js';

/**
 * One piece of the (rate, IF shift) plane: a zone, a box of nominal rates and
 * shifts, and every slack that bounds the worst margin there, each linear in
 * (r, δ) because every image of the wanted band is held on the side of each
 * blocking extent where it lies at the seed.
 */
export interface ShiftPiece {
  readonly zone: number;
  readonly box: PlaneBox;
  /** Bounds on the worst slack t: zone edges and every nearby image of every blocking extent, Hz. */
  readonly bounds: readonly PlaneSlack[];
  /** The zone-edge slacks, held ≥ 0 so that the band stays whole in the zone. */
  readonly held: readonly PlaneSlack[];
  /** Identifies the piece: zone, shift range and the side of every image; seeds with equal keys share a piece. */
  readonly key: string;
}

/** What a piece is built from: the plan at δ = 0 (its interferers carry shiftMultiple) and the drift. */
export interface PieceInputs {
  readonly band: Band;
  readonly guard: Guard;
  readonly limits: RateLimits;
  readonly interferers: readonly Interferer[];
  /** Per interferer: whether it blocks at some shift of the range (the LP's constraint set). */
  readonly blocking: readonly boolean[];
  /** The whole shift range, Hz. */
  readonly shifts: Interval;
  /** ± drift of the rate, ppm. */
  readonly tolerancePpm: Ppm;
}

/**
 * The pieces that hold a seed (a shift δ0 and a nominal rate r0 with the
 * guarded band whole in zone n): one, or two when the lower guard reaches
 * DC inside the shift range (the zone-1 edge below the band is
 * max(0, fL + δ − gL), linear on each side of the shift where it meets DC;
 * both sides are returned, keyed apart).
 *
 * Every margin is linear in (r, δ) once sides are fixed: an extent moves as
 * a·r + b·δ + [l, h] and the wanted images as j·r + s·(band + δ), so an image
 * sits at (j − a)·r + (s − b)·δ + s·band from the extent's origin, and its gap
 * above the extent is (j − a)·r + (s − b)·δ + imageLow − h (below: the
 * negative of that, from l − imageHigh). A side's gap is never more than the
 * true margin to that image (the signed margin is the larger of the two side
 * gaps, see imageMargin), so the LP's worst slack is a lower bound that
 * is exact wherever no image changes side. Each is taken at both drift ends
 * r·(1 ± ε). The zone edges give (fL + δ − gL) − (n − 1)·r/2 (0 − … where the
 * lower guard reaches below DC, as in guardedBand) and n·r/2 − (fH + δ + gH).
 *
 * The box: shifts are the range (or one side of the DC shift); rates are the
 * zone's window swept over those shifts, with the drift kept inside it and
 * inside the converter's range. Images are those that can come within reach
 * anywhere in the box, plus one more each way (the next image on each side is
 * the nearest one outside the reach), as nearbyImages does on a line; bounds
 * that exceed a quarter of the fastest rate everywhere in the box can never
 * be the least (no zone-edge slack is larger) and are dropped.
 *
 * @param inputs the plan at δ = 0 and the blocking flags
 * @param zone n ≥ 1
 * @param seed δ0 and r0, Hz: where each image's side is read
 * @returns the pieces whose box leaves a rate in the zone (possibly none)
 * @example shiftPieces({ band: heronNarrow.wanted, guard: heronNarrow.guard, limits: { minRate: hz(40e6), maxRate: hz(250e6) }, interferers: [], blocking: [], shifts: { low: -2e6, high: 2e6 }, tolerancePpm: ppm(0) }, 2, { shift: hz(0), rate: hz(200e6) }).length // 1
 */
export function shiftPieces(inputs: PieceInputs, zone: number, seed: { readonly shift: Hz; readonly rate: Hz }): ShiftPiece[] {
  const range = inputs.shifts;
  const dcShift = inputs.guard.low - inputs.band.low; // the shift at which the lower guard reaches DC
  const parts =
    range.low < dcShift && dcShift < range.high
      ? [
          { low: range.low, high: dcShift },
          { low: dcShift, high: range.high },
        ]
      : [range];
  return parts.flatMap((shifts) => {
    const piece = pieceOver(inputs, zone, seed, shifts, shifts.high <= dcShift);
    return piece ? [piece] : [];
  });
}

function pieceOver(
  inputs: PieceInputs,
  zone: number,
  seed: { readonly shift: Hz; readonly rate: Hz },
  shifts: Interval,
  atDc: boolean,
): ShiftPiece | null {
  const { band, guard, limits, tolerancePpm } = inputs;
  const lowerGuardEdge = band.low - guard.low; // fL − gL: the guarded band's lower edge at δ = 0
  const { down, up } = driftFactors(tolerancePpm);
  const guardedLow = (shift: number) => Math.max(0, lowerGuardEdge + shift);
  const guardedHigh = (shift: number) => band.high + guard.high + shift;
  const rate: Interval = {
    low: Math.max(limits.minRate / down, (2 * guardedHigh(shifts.low)) / (zone * down)),
    high: Math.min(limits.maxRate / up, zone === 1 ? Infinity : (2 * guardedLow(shifts.high)) / ((zone - 1) * up)),
  };
  if (!(rate.low <= rate.high)) return null;
  const box: PlaneBox = { rate, shift: shifts };

  const held: PlaneSlack[] = [];
  for (const k of [down, up]) {
    held.push(
      atDc ? { rate: (-(zone - 1) * k) / 2, shift: 0, offset: 0 } : { rate: (-(zone - 1) * k) / 2, shift: 1, offset: lowerGuardEdge },
    );
    held.push({ rate: (zone * k) / 2, shift: -1, offset: -(band.high + guard.high) });
  }
  const bounds: PlaneSlack[] = [...held];
  const sides: string[] = [];
  const ceiling = (rate.high * up) / 4;
  const least = (s: PlaneSlack) =>
    Math.min(
      slackAt(s, hz(rate.low), hz(shifts.low)),
      slackAt(s, hz(rate.low), hz(shifts.high)),
      slackAt(s, hz(rate.high), hz(shifts.low)),
      slackAt(s, hz(rate.high), hz(shifts.high)),
    );
  inputs.interferers.forEach((interferer, index) => {
    if (!inputs.blocking[index]) return;
    const flip = interferer.rateMultiple < 0; // fold −(…) instead: aliases are unchanged
    const a = flip ? -interferer.rateMultiple : interferer.rateMultiple;
    const b = flip ? -interferer.shiftMultiple : interferer.shiftMultiple;
    const l = flip ? -interferer.high : interferer.low;
    const h = flip ? -interferer.low : interferer.high;
    const reach = interferer.requiredMargin;
    for (const s of [1, -1] as const) {
      const image = imageOffsets(band, s);
      const e = s - b; // the image's motion against the extent per Hz of shift
      const moves = [e * shifts.low, e * shifts.high];
      const lowest = l - image.high - reach - Math.max(...moves);
      const highest = h - image.low + reach - Math.min(...moves);
      const slow = rate.low * down;
      const fast = rate.high * up;
      const jFirst = Math.ceil(a + Math.min(lowest / slow, lowest / fast)) - 1;
      const jLast = Math.floor(a + Math.max(highest / slow, highest / fast)) + 1;
      for (let j = jFirst; j <= jLast; j++) {
        const c = j - a;
        const origin = c * seed.rate + e * seed.shift;
        const above = origin + image.low - h >= l - (origin + image.high);
        sides.push(above ? '+' : '-');
        for (const k of [down, up]) {
          const slack = above
            ? { rate: c * k, shift: e, offset: image.low - h - reach }
            : { rate: -c * k, shift: -e, offset: l - image.high - reach };
          if (least(slack) <= ceiling) bounds.push(slack);
        }
      }
    }
  });
  return { zone, box, bounds, held, key: `${zone}|${shifts.low}|${sides.join('')}` };
}
