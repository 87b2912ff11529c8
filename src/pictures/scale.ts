/** Maps a value of the data to a pixel position and back. */
export interface Scale {
  readonly kind: 'linear' | 'log';
  /** Data range [low, high]; for 'log', 0 < low. */
  readonly domain: readonly [number, number];
  /** Pixel positions of domain low and high (high may be less than low, e.g. for y). */
  readonly range: readonly [number, number];
  readonly at: (value: number) => number;
}

/**
 * A linear scale from [d0, d1] to [r0, r1].
 *
 * @param domain data range, d0 ≠ d1
 * @param range pixel range
 * @example linearScale([0, 10], [50, 150]).at(5) // 100
 */
export function linearScale(domain: readonly [number, number], range: readonly [number, number]): Scale {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  const span = d1 - d0 || 1;
  return { kind: 'linear', domain, range, at: (v) => r0 + ((v - d0) / span) * (r1 - r0) };
}

/**
 * A log scale from [d0, d1] (both positive) to [r0, r1]; values at or below
 * 0 map to r0.
 *
 * @param domain data range, 0 < d0 < d1
 * @param range pixel range
 * @example logScale([1, 100], [0, 200]).at(10) // 100
 */
export function logScale(domain: readonly [number, number], range: readonly [number, number]): Scale {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  const span = Math.log(d1 / d0) || 1;
  return { kind: 'log', domain, range, at: (v) => (v > 0 ? r0 + (Math.log(v / d0) / span) * (r1 - r0) : r0) };
}
