import type { Scenario } from '../scenario/scenario.js';
import { deriveInterfererList } from '../interferers/derive-interferers.js';
import { levelThreshold } from '../interferers/level-threshold.js';
import type { ChannelContext, PlanContext } from './plan-context.js';
import { channelView } from '../scenario/channel-view.js';

/**
 * The solver's view of a scenario: the wanted band, guards, the converter's
 * rate range, every derived interferer (and how they were derived), the clock parts with the converter's
 * clocking (dividers, bits, aperture jitter) and the goal. With several
 * channels, each channel's side (its band, guards, threshold and the
 * interferers derived against it) in `channels`, the first also at the top.
 *
 * @param scenario the validated scenario
 * @param listing the scenario that decides which interferers are listed (see deriveInterfererList; default: the scenario)
 * @example contextFromScenario(s) // { band: { low: 65e6, high: 75e6 }, limits: { minRate: 20e6, maxRate: 250e6 }, levelThreshold: -100 }
 */
export function contextFromScenario(scenario: Scenario, listing: Scenario = scenario): PlanContext {
  const channels = scenario.channels.length > 1 ? scenario.channels.map((_, i) => channelContext(scenario, listing, i)) : null;
  const first = channels?.[0] ?? channelContext(scenario, listing, 0);
  return {
    band: first.band,
    guard: first.guard,
    limits: { minRate: scenario.converter.minRate, maxRate: scenario.converter.maxRate },
    interferers: first.interferers,
    derivation: first.derivation!,
    levelThreshold: first.levelThreshold,
    weakestLevel: first.weakestLevel!,
    strongestLevel: first.strongestLevel!,
    channels: channels ?? [first],
    clocks: scenario.clocks,
    clocking: {
      clockDividers: scenario.converter.clockDividers,
      bits: scenario.converter.bits,
      apertureJitter: scenario.converter.apertureJitter,
    },
    goal: scenario.goal,
    tolerancePpm: scenario.requirements.tolerancePpm,
    ifShift: scenario.ifShift,
  };
}

/** One channel's side of the plan: its band, guards, threshold and the interferers derived against it. */
function channelContext(scenario: Scenario, listing: Scenario, index: number): ChannelContext {
  const view = channelView(scenario, index);
  const derived = deriveInterfererList(scenario, listing, index);
  return {
    label: scenario.channels[index]?.label ?? 'wanted',
    band: { low: view.wanted.low, high: view.wanted.high },
    guard: view.guard,
    interferers: derived.interferers,
    derivation: derived.summary,
    levelThreshold: levelThreshold(view),
    weakestLevel: view.wanted.weakestLevel,
    strongestLevel: view.wanted.strongestLevel,
  };
}
