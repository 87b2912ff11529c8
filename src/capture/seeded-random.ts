/**
 * A seeded uniform generator on [0, 1) (the "mulberry32" 32-bit mixer; common
 * practice, no source). The capture draws its tone phases and dither from it,
 * so one scenario and rate always give the same spectrum.
 *
 * @param seed any 32-bit integer
 * @returns a function giving the next number in [0, 1)
 * @example const next = seededUniform(1); next() // 0.6270739405881613 (on every run)
 */
export function seededUniform(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
