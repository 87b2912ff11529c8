import type { AntiAliasFilter } from '../scenario/scenario.js';
import type { Hz } from '../units/quantities.js';
import { filterAttenuation } from '../filter/filter-attenuation.js';

/** A filter's power response |H(f)|² with the frequencies where it may have a kink. */
export interface PowerResponse {
  /** |H(f)|² = 10^(−attenuation/10), in [0, 1]. */
  readonly power: (frequency: number) => number;
  /** Passband edges and centre (Butterworth), table points (table), none (no filter), Hz. */
  readonly cuts: readonly number[];
}

/**
 * The scenario filter's power response for integration.
 *
 * @param filter the scenario's filter, or null (1 everywhere)
 * @returns the response and its kink frequencies
 * @example filterPowerResponse(null).power(1e6) // 1
 */
export function filterPowerResponse(filter: AntiAliasFilter | null): PowerResponse {
  const power = (frequency: number) => 10 ** (-filterAttenuation(filter, frequency as Hz) / 10);
  if (filter === null) return { power, cuts: [] };
  if (filter.kind === 'butterworth') return { power, cuts: [filter.passLow, Math.sqrt(filter.passLow * filter.passHigh), filter.passHigh] };
  return { power, cuts: filter.points.map((p) => p.frequency) };
}
