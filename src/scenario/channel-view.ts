import type { Scenario } from './scenario.js';

/**
 * The scenario seen from one of its channels: `wanted`, `guard` and
 * `requirements` are that channel's, everything else (the other channels
 * included, in `channels`) as it was. Every stage that plans one wanted band
 * plans a channel through its view. A scenario of one channel is its own
 * view: it is read from `wanted` (which the IF-shift search moves), not from
 * `channels`.
 *
 * @param scenario the validated scenario
 * @param index the channel's place in `channels`, 0 ≤ index < channels.length
 * @returns the view (the scenario itself for one channel)
 * @throws RangeError for an index outside the channels
 * @example channelView(heronBase, 0) === heronBase // true (one channel)
 */
export function channelView(scenario: Scenario, index: number): Scenario {
  if (scenario.channels.length <= 1 && index === 0) return scenario;
  const channel = scenario.channels[index];
  if (!channel) throw new RangeError(`no channel ${index} among ${scenario.channels.length}`);
  const { label: _label, guard, requirements, ...band } = channel;
  return { ...scenario, wanted: band, guard, requirements };
}
