/** What ends a margin or a feasible interval when it is not an interferer. */

/** The guarded band reaches a fold edge (0 or rate/2 of its zone). */
export const ZONE_EDGE = 'zone edge';
/** A feasible interval ends at the converter's slowest or fastest rate. */
export const RATE_LIMIT = 'rate limit';
