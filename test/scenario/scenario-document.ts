import type { ClockPart, IntegerRange, Scenario } from '../../src/scenario/scenario.js';

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
      intercepts: Object.fromEntries([...(converter.intercepts ?? [])].map(([order, level]) => [String(order), level])),
      rateSpurs: {
        ...converter.rateSpurs,
        ...(converter.rateSpurs.fractions
          ? { fractions: converter.rateSpurs.fractions.map((f) => ({ fraction: `${f.numerator}/${f.denominator}`, level: f.level })) }
          : {}),
      },
      interleave: converter.interleave && { ...converter.interleave },
      clockDividers: [...converter.clockDividers],
    },
    harmonicOrder: scenario.harmonicOrder,
    maxOrder: scenario.maxOrder,
    boardSpurs: scenario.boardSpurs.map((spur) => ({ ...spur })),
    neighbours: scenario.neighbours.map((neighbour) => ({ ...neighbour })),
    filter:
      filter === null
        ? null
        : filter.kind === 'butterworth'
          ? { ...filter }
          : { kind: 'table', points: filter.points.map((p) => [p.frequency, p.attenuation]) },
    requirements: {
      ...scenario.requirements,
      ...(scenario.requirements.kindMargins
        ? { kindMargins: Object.fromEntries(Object.entries(scenario.requirements.kindMargins).filter(([, margin]) => margin !== null)) }
        : {}),
    },
    clocks: scenario.clocks.map(clockDocument),
    goal: { ...scenario.goal },
    ifShift: scenario.ifShift && { ...scenario.ifShift },
    filterMask: { outOfBandLevel: scenario.afterRate.outOfBandLevel, passbandRipple: scenario.afterRate.passbandRipple },
    driverNoiseDensity: scenario.afterRate.driverNoiseDensity,
    downConverter: { ...scenario.afterRate.downConverter },
  };
}

/** One clock part in the file format: the breakdown when one was listed, else the total; the derivation as an object. */
export function clockDocument(part: ClockPart): Record<string, unknown> {
  const { derivation } = part;
  return {
    label: part.label,
    frequency: part.frequency,
    tolerance: part.toleranceBreakdown ? { ...part.toleranceBreakdown } : part.tolerancePpm,
    jitter: part.jitter,
    note: part.note,
    derive:
      derivation.kind === 'synthesiser'
        ? {
            kind: 'synthesiser',
            n: pair(derivation.n),
            m: pair(derivation.m),
            d: pair(derivation.d),
            vco: derivation.vco && { ...derivation.vco },
          }
        : { kind: derivation.kind },
  };
}

const pair = (range: IntegerRange): [number, number] => [range.min, range.max];
