import type { Db, Hz } from '../units/quantities.js';
import type { Scenario } from '../scenario/scenario.js';
import { leastAttenuation } from '../filter/filter-attenuation.js';
import type { SignalRef } from './interferer.js';
import { spurHarmonicLevel } from './board-spurs.js';
import { neighbourLevel } from './neighbours.js';

/** One signal present at the converter's input, after the filter: what the converter's nonlinearity mixes. */
export interface InputSignal {
  readonly ref: SignalRef;
  readonly label: string;
  /** Its band (a tone: low = high), Hz. */
  readonly low: Hz;
  readonly high: Hz;
  /** Level at the converter, dBFS: its strongest part after the filter. */
  readonly level: Db;
  /** How far it moves per hertz of IF shift: 1 for the wanted band and neighbours, 0 for board spurs. */
  readonly shiftMultiple: number;
}

/**
 * Every signal at the converter input, in scenario order: the wanted band
 * (or each channel of a list, labelled by its own label) at its strongest
 * level, each neighbour at its level after the filter's
 * least attenuation over its band, and each board spur with its own
 * harmonics (1/h roll-off, less the filter where coupled before it).
 *
 * @param scenario the validated scenario
 * @returns the signals; labels are the scenario's (`wanted`, a neighbour's, `REF`, `REF H2`)
 * @example inputSignals(s)[0] // { label: 'wanted', low: 65e6, high: 75e6, level: -1 }
 */
export function inputSignals(scenario: Scenario): InputSignal[] {
  // One channel is read from `wanted` itself: the IF-shift search moves it there.
  const channels = scenario.channels.length > 1 ? scenario.channels : [{ ...scenario.wanted, label: 'wanted' }];
  const signals: InputSignal[] = channels.map((channel, index) => ({
    ref: { signal: 'wanted', index, harmonic: 1 },
    label: channel.label,
    low: channel.low,
    high: channel.high,
    level: channel.strongestLevel,
    shiftMultiple: 1,
  }));
  scenario.neighbours.forEach((n, index) => {
    signals.push({
      ref: { signal: 'neighbour', index, harmonic: 1 },
      label: n.label,
      low: n.low,
      high: n.high,
      level: neighbourLevel(n, scenario),
      shiftMultiple: 1,
    });
  });
  scenario.boardSpurs.forEach((spur, index) => {
    for (let h = 1; h <= Math.max(1, spur.harmonics); h++) {
      const low = (h * spur.low) as Hz;
      const high = (h * spur.high) as Hz;
      const loss = spur.coupling === 'before-filter' ? leastAttenuation(scenario.filter, low, high) : 0;
      signals.push({
        ref: { signal: 'board spur', index, harmonic: h },
        label: h === 1 ? spur.label : `${spur.label} H${h}`,
        low,
        high,
        level: (spurHarmonicLevel(spur, h) - loss) as Db,
        shiftMultiple: 0,
      });
    }
  });
  return signals;
}
