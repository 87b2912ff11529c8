/**
 * What limits a rate: the check with the least slack, or what ends a feasible
 * interval. A tagged value, so that an interferer whose label happens to read
 * "zone edge" is never taken for the zone edge itself.
 */
export type Limit =
  /** A blocking interferer, by its label. */
  | { readonly kind: 'interferer'; readonly label: string }
  /** The guarded band reaches a fold edge (0 or rate/2 of its zone); with several channels, the channel's label. */
  | { readonly kind: 'zone edge'; readonly channel?: string }
  /** A feasible interval ends at the converter's slowest or fastest rate. */
  | { readonly kind: 'rate limit' }
  /** Under the decimation goal, a clock part none of whose rates is a whole multiple of the output rate. */
  | { readonly kind: 'no whole multiple of the output rate' }
  /**
   * Every frequency check passes but the anti-alias filter falls short of the
   * mask over an alias band (a stated out-of-band level); set after the rate
   * (src/after-rate/), never by the solver. With several channels, the channel's label.
   */
  | { readonly kind: 'anti-alias mask'; readonly channel?: string };

/** The kinds of limit, as the JSON's `…Kind` fields write them. */
export type LimitKind = Limit['kind'];

export const ZONE_EDGE: Limit = { kind: 'zone edge' };
export const RATE_LIMIT: Limit = { kind: 'rate limit' };
export const NO_WHOLE_MULTIPLE: Limit = { kind: 'no whole multiple of the output rate' };
export const ANTI_ALIAS_MASK: Limit = { kind: 'anti-alias mask' };

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
 * the interferer's label, or the kind (after its channel's label, when it has one).
 *
 * @param limit the tagged limit
 * @returns the text
 * @example limitText({ kind: 'zone edge' }) // 'zone edge'
 * @example limitText({ kind: 'zone edge', channel: 'L5' }) // 'L5: zone edge'
 * @example limitText({ kind: 'anti-alias mask', channel: 'L5' }) // 'L5: anti-alias mask'
 */
export function limitText(limit: Limit): string {
  if (limit.kind === 'interferer') return limit.label;
  return hasChannel(limit) && limit.channel !== undefined ? channelCheckLabel(limit.channel, limit.kind) : limit.kind;
}

/** The kinds of limit that belong to one channel of several. */
function hasChannel(limit: Limit): limit is Extract<Limit, { channel?: string }> {
  return limit.kind === 'zone edge' || limit.kind === 'anti-alias mask';
}

/**
 * A check's label within a plan of several channels: the channel's label,
 * a colon, the check's own label. One expression, so that a check, a blocked
 * range and a limit name the same thing the same way.
 *
 * @param channel the channel's label
 * @param label the check's label (an interferer's, or a kind)
 * @returns the label
 * @example channelCheckLabel('L5', 'L1 H3') // 'L5: L1 H3'
 */
export function channelCheckLabel(channel: string, label: string): string {
  return `${channel}: ${label}`;
}

/**
 * A channel's limit as the plan of several channels names it: an
 * interferer's label after the channel's, the zone edge or the anti-alias
 * mask with its channel.
 *
 * @param limit the limit within the channel
 * @param channel the channel's label
 * @returns the limit within the whole plan
 * @example limitText(limitInChannel(interfererLimit('L1 H3'), 'L5')) // 'L5: L1 H3'
 */
export function limitInChannel(limit: Limit, channel: string): Limit {
  if (limit.kind === 'interferer') return interfererLimit(channelCheckLabel(channel, limit.label));
  return hasChannel(limit) ? { kind: limit.kind, channel } : limit;
}
