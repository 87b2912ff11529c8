/**
 * Relative tolerance under which two derived frequencies count as the same
 * edge. Each window edge or fold boundary is computed from the inputs in one
 * or two floating-point operations, so honest results differ from the exact
 * rational value by a few units in the last place (~1e-16 relative); 1e-12 is
 * far above that noise and far below anything a clock can resolve
 * (1e-12 of 10 GHz is 10 mHz).
 */
export const EDGE_TOLERANCE = 1e-12;

/** Whether a and b are the same edge within EDGE_TOLERANCE of the larger; an infinite edge equals only itself. */
export function sameEdge(a: number, b: number): boolean {
  if (!Number.isFinite(a) || !Number.isFinite(b)) return a === b;
  return Math.abs(a - b) <= EDGE_TOLERANCE * Math.max(Math.abs(a), Math.abs(b));
}

/** ⌊q⌋, taking a q within tolerance below an integer as that integer. */
export function floorTolerant(q: number): number {
  const nearest = Math.round(q);
  return sameEdge(q, nearest) ? nearest : Math.floor(q);
}

/** ⌈q⌉, taking a q within tolerance above an integer as that integer. */
export function ceilTolerant(q: number): number {
  const nearest = Math.round(q);
  return sameEdge(q, nearest) ? nearest : Math.ceil(q);
}
