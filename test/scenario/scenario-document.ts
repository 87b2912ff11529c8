import type { Scenario } from '../../src/scenario/scenario.js';

/**
 * Writes a validated Scenario back in the file format, every frequency as a
 * plain number of hertz and every default spelled out: the inverse the
 * round-trip tests check the loader against.
 */
export function scenarioDocument(scenario: Scenario): Record<string, unknown> {
  const { converter, filter } = scenario;
  return {
    name: scenario.name,
    description: scenario.description,
    wanted: { ...scenario.wanted },
    guard: { ...scenario.guard },
    converter: {
      ...converter,
      harmonics: Object.fromEntries([...converter.harmonics].map(([order, level]) => [String(order), level])),
      rateSpurs: { ...converter.rateSpurs },
      interleave: converter.interleave && { ...converter.interleave },
    },
    harmonicOrder: scenario.harmonicOrder,
    boardSpurs: scenario.boardSpurs.map((spur) => ({ ...spur })),
    neighbours: scenario.neighbours.map((neighbour) => ({ ...neighbour })),
    filter: filter === null ? null : filter.kind === 'butterworth' ? { ...filter } : { kind: 'table', points: filter.points.map((p) => [p.frequency, p.attenuation]) },
    requirements: { ...scenario.requirements },
    clocks: scenario.clocks.map((clock) => ({ ...clock })),
    goal: { ...scenario.goal },
  };
}
