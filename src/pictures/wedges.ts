/** A point of the band-position chart: (fH/B, fs/B), both dimensionless. */
export type ChartPoint = readonly [number, number];

/** The allowed region of one Nyquist zone, clipped to the chart. */
export interface Wedge {
  readonly zone: number;
  readonly inverted: boolean;
  /** Polygon vertices in chart units, in order around the region. */
  readonly points: readonly ChartPoint[];
}

/**
 * The allowed regions of uniform band-pass sampling as exact polygons
 * (Vaughan, Scott & White, "The theory of bandpass sampling", IEEE Trans.
 * Signal Processing 39(9), 1991): with x = fH/B and y = fs/B, zone n allows
 * 2x/n ≤ y ≤ 2(x − 1)/(n − 1) (no upper bound for n = 1), a wedge with its
 * tip at (n, 2). Each region is cut to the chart x ≤ xMax, y ≤ yMax; every
 * vertex is the tip, a line's end at x = xMax, a line's crossing of y = yMax
 * (x = n·yMax/2 below, x = 1 + (n − 1)·yMax/2 above) or a corner, each from
 * one expression.
 *
 * @param xMax right edge of the chart, fH/B, ≥ 1
 * @param yMax top edge of the chart, fs/B, > 2
 * @returns wedges for every n < xMax (zone xMax would be the single point
 *   (xMax, 2)), ascending n
 * @example allowedWedges(3, 8)[1] // { zone: 2, inverted: true, points: [[2, 2], [3, 3], [3, 4]] }
 */
export function allowedWedges(xMax: number, yMax: number): Wedge[] {
  const wedges: Wedge[] = [];
  for (let n = 1; n < xMax; n++) wedges.push({ zone: n, inverted: n % 2 === 0, points: wedgePoints(n, xMax, yMax) });
  return wedges;
}

function wedgePoints(n: number, xMax: number, yMax: number): ChartPoint[] {
  const points: ChartPoint[] = [[n, 2]];
  // Lower edge fs = 2·fH/n: it leaves the chart at the right edge or at the top.
  const lowerTop = (n * yMax) / 2;
  const lowerEndsRight = lowerTop >= xMax;
  points.push(lowerEndsRight ? [xMax, (2 * xMax) / n] : [lowerTop, yMax]);
  if (n === 1) {
    // No upper edge: the region runs up to the top, its left side at fH/B = 1.
    if (lowerEndsRight) points.push([xMax, yMax]);
    points.push([1, yMax]);
    return points;
  }
  // Upper edge fs = 2·(fH − B)/(n − 1): it meets the top at or left of where the lower edge does.
  const upperTop = 1 + ((n - 1) * yMax) / 2;
  if (upperTop >= xMax) points.push([xMax, (2 * (xMax - 1)) / (n - 1)]);
  else {
    if (lowerEndsRight) points.push([xMax, yMax]);
    points.push([upperTop, yMax]);
  }
  return points;
}

/**
 * The allowed rates of zone n for a band at x = fH/B, in units of B: the
 * vertical section of the zone's wedge, [2x/n, 2(x − 1)/(n − 1)].
 *
 * @param zone n ≥ 1
 * @param x fH/B ≥ n
 * @returns [low, high] in fs/B (high Infinity for n = 1)
 * @example wedgeSection(2, 3.5) // [3.5, 5]
 */
export function wedgeSection(zone: number, x: number): readonly [number, number] {
  return [(2 * x) / zone, zone === 1 ? Infinity : (2 * (x - 1)) / (zone - 1)];
}
