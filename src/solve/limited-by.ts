/**
 * What limits a rate: the check with the least slack, or what ends a feasible
 * interval. A tagged value, so that an interferer whose label happens to read
 * "zone edge" is never taken for the zone edge itself.
 */
export type Limit =
  /** A blocking interferer, by its label. */
  | { readonly kind: 'interferer'; readonly label: string }
  /** The guarded band reaches a fold edge (0 or rate/2 of its zone). */
  | { readonly kind: 'zone edge' }
  /** A feasible interval ends at the converter's slowest or fastest rate. */
  | { readonly kind: 'rate limit' }
  /** Under the decimation goal, a clock part none of whose rates is a whole multiple of the output rate. */
  | { readonly kind: 'no whole multiple of the output rate' };

/** The kinds of limit, as the JSON's `…Kind` fields write them. */
export type LimitKind = Limit['kind'];

export const ZONE_EDGE: Limit = { kind: 'zone edge' };
export const RATE_LIMIT: Limit = { kind: 'rate limit' };
export const NO_WHOLE_MULTIPLE: Limit = { kind: 'no whole multiple of the output rate' };

/**
 * The limit set by one interferer.
 *
 * @param label the interferer's label
 * @returns the tagged limit
 * @example interfererLimit('H3 wanted') // { kind: 'interferer', label: 'H3 wanted' }
 */
export function interfererLimit(label: string): Limit {
  return { kind: 'interferer', label };
}

/**
 * A limit in words, as the tables and the JSON's `limitedBy` text write it:
 * the interferer's label, or the kind.
 *
 * @param limit the tagged limit
 * @returns the text
 * @example limitText({ kind: 'zone edge' }) // 'zone edge'
 */
export function limitText(limit: Limit): string {
  return limit.kind === 'interferer' ? limit.label : limit.kind;
}
