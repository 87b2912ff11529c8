import { describe, expect, it } from 'vitest';
import { db, hz, ppm, seconds } from '../../src/units/quantities.js';
import type { Scenario } from '../../src/scenario/scenario.js';
import { deriveInterferers } from '../../src/interferers/derive-interferers.js';
import { isBlocking, levelThreshold } from '../../src/interferers/level-threshold.js';
import { converterFixture, scenarioFixture } from '../helpers/scenario-fixture.js';

const MHz = 1e6;

/**
 * Hand-worked scenario (invented: a Heron variant). Worked on paper:
 *
 * Filter: 5th-order Butterworth 30–80 MHz: f0² = 2400 MHz², BW = 50 MHz,
 * Ω(f) = (f² − 2400)/(50·f) with f in MHz. Ω(120) = 12000/6000 = 2,
 * Ω(20) = −2000/1000 = −2, Ω(10) = −2300/500 = −4.6.
 * A(Ω) = 10·log10(1 + Ω^10): A(±2) = 10·log10(1025) = 30.1072 dB;
 * A(−4.6): 4.6^10 = 4 242 075 → 66.2758 dB.
 *
 * Threshold: weakest −60 dBFS − rejection 40 dB = −100 dBFS.
 *
 * Wanted harmonics (strongest −1 dBFS, HD2 −70, HD3 −75 dBc, order 4):
 *   H2 [80, 100] MHz, −71; H3 [120, 150], −76; H4 [160, 200], no figure:
 *   lowest stated −75 dBc → −76. All blocking.
 * Board spurs:
 *   REF 10M, 10 MHz tone, −30 dBFS before the filter, 2 harmonics:
 *     fundamental −30 − 66.2758 = −96.2758 (blocking: above −100);
 *     H2 at 20 MHz: −30 − 20·log10(2) − 30.1072 = −30 − 6.0206 − 30.1072 = −66.1278.
 *   CLK 125M, 125 MHz tone, −70 dBFS after the filter: −70, blocking.
 * Neighbours (levels at the filter input):
 *   ADJ-UP [120, 130] MHz, +10: above f0 (48.99), least at 120 (Ω = 2): −20.1072.
 *   ADJ-LO [15, 20] MHz, −20: below f0, least at 20 (Ω = −2): −50.1072.
 *   Harmonics L + HDk + (k−1)(L − (−1)):
 *     ADJ-UP H2 [240, 260]: −20.1072 − 70 − 19.1072 = −109.2145;
 *     ADJ-UP H3 [360, 390]: −20.1072 − 75 − 2·19.1072 = −133.3217;
 *     ADJ-LO H2 [30, 40]: −50.1072 − 70 − 49.1072 = −169.2145;
 *     ADJ-LO H3 [45, 60]: −50.1072 − 75 − 2·49.1072 = −223.3217. None blocking.
 * IM3, no intercept: 20·log10(3) + HD3 − 2·Lref = 9.5424 − 75 + 2 = −63.4576, plus 2·L1 + L2:
 *   2·ADJ-UP−ADJ-LO: [240 − 20, 260 − 15] = [220, 245], −63.4576 − 40.2145 − 50.1072 = −153.7793;
 *   2·ADJ-LO−ADJ-UP: [30 − 130, 40 − 120] = [−100, −80], −63.4576 − 100.2145 − 20.1072 = −183.7793;
 *   2·wanted−ADJ-UP: [80 − 130, 100 − 120] = [−50, −20], −63.4576 − 2 − 20.1072 = −85.5648 (blocking);
 *   2·ADJ-UP−wanted: [240 − 50, 260 − 40] = [190, 220], −63.4576 − 40.2145 − 1 = −104.6721;
 *   2·wanted−ADJ-LO: [80 − 20, 100 − 15] = [60, 85], −63.4576 − 2 − 50.1072 = −115.5648;
 *   2·ADJ-LO−wanted: [30 − 50, 40 − 40] = [−20, 0], −63.4576 − 100.2145 − 1 = −164.6721.
 * IM2 (second order) from HD2: 20·log10(2) + HD2 − Lref = 6.0206 − 70 + 1 = −62.9794, plus L1 + L2:
 *   wanted difference [0, 50 − 40] = [0, 10], both at −1: −64.9794 (blocking);
 *   ADJ-UP−wanted: [120 − 50, 130 − 40] = [70, 90], −62.9794 − 20.1072 − 1 = −84.0866 (blocking);
 *   wanted+ADJ-UP: [40 + 120, 50 + 130] = [160, 180], −84.0866 (blocking);
 *   ADJ-LO−wanted: [15 − 50, 20 − 40] = [−35, −20], −62.9794 − 50.1072 − 1 = −114.0866;
 *   wanted+ADJ-LO: [40 + 15, 50 + 20] = [55, 70], −114.0866;
 *   ADJ-UP−ADJ-LO: [120 − 20, 130 − 15] = [100, 115], −62.9794 − 20.1072 − 50.1072 = −133.1939;
 *   ADJ-UP+ADJ-LO: [120 + 15, 130 + 20] = [135, 150], −133.1939.
 * Converter: DC −80 (r·0); rate/4 −95 (r·0.25); no rate/2 figure, so none;
 *   2-way interleave: IL offset 1/2 at r/2, −85; images r/2 − [40, 50] = r/2 + [−50, −40]
 *   and r/2 + [40, 50], at −1 − 70 = −71. All blocking.
 */
const handWorked: Scenario = {
  name: 'Heron-HW',
  description: 'hand-worked test scenario',
  wanted: { low: hz(40 * MHz), high: hz(50 * MHz), weakestLevel: db(-60), strongestLevel: db(-1) },
  guard: { low: hz(1 * MHz), high: hz(1 * MHz) },
  converter: {
    label: 'Saltmarsh SR-12D',
    minRate: hz(20 * MHz),
    maxRate: hz(300 * MHz),
    clockDividers: [1],
    inputBandwidth: hz(500 * MHz),
    bits: 12,
    harmonics: new Map([
      [2, db(-70)],
      [3, db(-75)],
    ]),
    intercept3: null,
    rateSpurs: { dc: db(-80), halfRate: null, quarterRate: db(-95) },
    interleave: { ways: 2, offsetSpur: db(-85), imageLevel: db(-70) },
    apertureJitter: seconds(0),
  },
  harmonicOrder: 4,
  boardSpurs: [
    { label: 'REF 10M', low: hz(10 * MHz), high: hz(10 * MHz), level: db(-30), coupling: 'before-filter', harmonics: 2 },
    { label: 'CLK 125M', low: hz(125 * MHz), high: hz(125 * MHz), level: db(-70), coupling: 'after-filter', harmonics: 1 },
  ],
  neighbours: [
    { label: 'ADJ-UP', low: hz(120 * MHz), high: hz(130 * MHz), level: db(10) },
    { label: 'ADJ-LO', low: hz(15 * MHz), high: hz(20 * MHz), level: db(-20) },
  ],
  filter: { kind: 'butterworth', order: 5, passLow: hz(30 * MHz), passHigh: hz(80 * MHz) },
  requirements: { margin: hz(0.5 * MHz), rejection: db(40), tolerancePpm: ppm(20) },
  clocks: [],
  goal: { kind: 'widest-margin' },
  ifShift: null,
  afterRate: scenarioFixture().afterRate,
};

// [label, kind, order, rateMultiple, low MHz, high MHz, level dBFS, blocking], from the comment above.
const expected: Array<[string, string, number | null, number, number, number, number, boolean]> = [
  ['H2 wanted', 'harmonic', 2, 0, 80, 100, -71, true],
  ['H3 wanted', 'harmonic', 3, 0, 120, 150, -76, true],
  ['H4 wanted', 'harmonic', 4, 0, 160, 200, -76, true],
  ['REF 10M', 'spur', null, 0, 10, 10, -96.2758, true],
  ['REF 10M H2', 'spur', 2, 0, 20, 20, -66.1278, true],
  ['CLK 125M', 'spur', null, 0, 125, 125, -70, true],
  ['ADJ-UP', 'neighbour', null, 0, 120, 130, -20.1072, true],
  ['ADJ-UP H2', 'harmonic', 2, 0, 240, 260, -109.2145, false],
  ['ADJ-UP H3', 'harmonic', 3, 0, 360, 390, -133.3217, false],
  ['ADJ-LO', 'neighbour', null, 0, 15, 20, -50.1072, true],
  ['ADJ-LO H2', 'harmonic', 2, 0, 30, 40, -169.2145, false],
  ['ADJ-LO H3', 'harmonic', 3, 0, 45, 60, -223.3217, false],
  ['IM3 2·ADJ-UP−ADJ-LO', 'intermod', 3, 0, 220, 245, -153.7793, false],
  ['IM3 2·ADJ-LO−ADJ-UP', 'intermod', 3, 0, -100, -80, -183.7793, false],
  ['IM3 2·wanted−ADJ-UP', 'intermod', 3, 0, -50, -20, -85.5648, true],
  ['IM3 2·ADJ-UP−wanted', 'intermod', 3, 0, 190, 220, -104.6721, false],
  ['IM3 2·wanted−ADJ-LO', 'intermod', 3, 0, 60, 85, -115.5648, false],
  ['IM3 2·ADJ-LO−wanted', 'intermod', 3, 0, -20, 0, -164.6721, false],
  ['IM2 wanted difference', 'intermod', 2, 0, 0, 10, -64.9794, true],
  ['IM2 ADJ-UP−wanted', 'intermod', 2, 0, 70, 90, -84.0866, true],
  ['IM2 wanted+ADJ-UP', 'intermod', 2, 0, 160, 180, -84.0866, true],
  ['IM2 ADJ-LO−wanted', 'intermod', 2, 0, -35, -20, -114.0866, false],
  ['IM2 wanted+ADJ-LO', 'intermod', 2, 0, 55, 70, -114.0866, false],
  ['IM2 ADJ-UP−ADJ-LO', 'intermod', 2, 0, 100, 115, -133.1939, false],
  ['IM2 ADJ-UP+ADJ-LO', 'intermod', 2, 0, 135, 150, -133.1939, false],
  ['DC', 'converter', null, 0, 0, 0, -80, true],
  ['rate/4', 'converter', null, 0.25, 0, 0, -95, true],
  ['IL offset 1/2', 'converter', null, 0.5, 0, 0, -85, true],
  ['IL image 1/2−', 'converter', null, 0.5, -50, -40, -71, true],
  ['IL image 1/2+', 'converter', null, 0.5, 40, 50, -71, true],
];

describe('deriveInterferers: a hand-worked scenario', () => {
  const derived = deriveInterferers(handWorked);

  it('derives exactly the interferers worked out on paper, in order', () => {
    expect(derived.map((i) => i.label)).toEqual(expected.map((e) => e[0]));
  });

  it.each(expected)('%s: kind, order, extent, level and blocking', (label, kind, order, rateMultiple, low, high, level, blocking) => {
    const found = derived.find((i) => i.label === label)!;
    expect(found.kind).toBe(kind);
    expect(found.order).toBe(order);
    expect(found.rateMultiple).toBe(rateMultiple);
    expect(found.low / MHz).toBeCloseTo(low, 9);
    expect(found.high / MHz).toBeCloseTo(high, 9);
    expect(found.level).toBeCloseTo(level, 3);
    expect(found.blocking).toBe(blocking);
    expect(found.requiredMargin).toBe(0.5 * MHz);
  });

  it('says in the source text where a figure was assumed', () => {
    const h4 = derived.find((i) => i.label === 'H4 wanted')!;
    expect(h4.source).toMatch(/no 4th-order figure stated; the lowest stated, −75\.0 dBc, assumed/);
    expect(derived.find((i) => i.label === 'H2 wanted')!.source).not.toMatch(/assumed/);
  });

  it('with a stated intercept, IM3 is 2·L1 + L2 − 2·IP3', () => {
    // IP3 +20 dBFS: 2·wanted−ADJ-UP = 2·(−1) + (−20.1072) − 40 = −62.1072 (worked by hand).
    const withIntercept = deriveInterferers({ ...handWorked, converter: { ...handWorked.converter, intercept3: db(20) } });
    expect(withIntercept.find((i) => i.label === 'IM3 2·wanted−ADJ-UP')!.level).toBeCloseTo(-62.1072, 3);
    expect(withIntercept.find((i) => i.label === 'IM3 2·wanted−ADJ-UP')!.source).toMatch(/intercept/);
  });

  it('without any harmonic figure: no converter harmonics, no derived IM3, the rest unchanged', () => {
    const bare = deriveInterferers({ ...handWorked, converter: { ...handWorked.converter, harmonics: new Map() } });
    expect(bare.some((i) => i.kind === 'harmonic' || i.kind === 'intermod')).toBe(false);
    expect(bare.map((i) => i.label)).toEqual(expected.filter((e) => e[1] !== 'harmonic' && e[1] !== 'intermod').map((e) => e[0]));
  });

  it('harmonicOrder 2 keeps only the 2nd harmonics', () => {
    const low = deriveInterferers({ ...handWorked, harmonicOrder: 2 });
    expect(low.filter((i) => i.kind === 'harmonic').map((i) => i.label)).toEqual(['H2 wanted', 'ADJ-UP H2', 'ADJ-LO H2']);
  });

  it('board spur harmonics roll off as 1/h', () => {
    // −20·log10(3) = −9.5424 dB at h = 3, after the filter: no attenuation.
    const s = scenarioFixture({ boardSpurs: [{ label: 'SW 1M', low: hz(1e6), high: hz(1e6), level: db(-40), coupling: 'after-filter', harmonics: 3 }] });
    const h3 = deriveInterferers(s).find((i) => i.label === 'SW 1M H3')!;
    expect(h3.level).toBeCloseTo(-49.5424, 4);
    expect([h3.low, h3.high]).toEqual([3e6, 3e6]);
  });
});

describe('blocking: at the threshold is weak enough, just above blocks', () => {
  // Fixture: weakest −60 dBFS, rejection 40 dB → threshold −100 dBFS.
  const spur = (level: number) => ({ label: 'TEST', low: hz(1e6), high: hz(1e6), level: db(level), coupling: 'after-filter' as const, harmonics: 1 });

  it('levelThreshold is weakestLevel − rejection', () => {
    expect(levelThreshold(scenarioFixture())).toBe(-100);
    expect(isBlocking(db(-100), scenarioFixture())).toBe(false);
    expect(isBlocking(db(-99.999), scenarioFixture())).toBe(true);
  });

  it('a spur exactly at −100 dBFS is non-blocking; at −99.999 dBFS it blocks', () => {
    const at = deriveInterferers(scenarioFixture({ boardSpurs: [spur(-100)] })).find((i) => i.label === 'TEST')!;
    const above = deriveInterferers(scenarioFixture({ boardSpurs: [spur(-99.999)] })).find((i) => i.label === 'TEST')!;
    expect(at.blocking).toBe(false);
    expect(above.blocking).toBe(true);
  });

  it('a wanted harmonic landing exactly on the threshold (−1 + −99 = −100) is non-blocking', () => {
    const s = scenarioFixture({ harmonicOrder: 3, converter: converterFixture({ harmonics: new Map([[2, db(-99)], [3, db(-98.999)]]) }) });
    const [h2, h3] = deriveInterferers(s);
    expect(h2!.level).toBe(-100);
    expect(h2!.blocking).toBe(false);
    expect(h3!.blocking).toBe(true);
  });
});

describe('labels are unique, even when the scenario repeats them', () => {
  it('many sources, colliding user labels', () => {
    const neighbours = ['ADJ-UP', 'ADJ-LO', 'ALT-UP', 'ADJ-UP', 'DC'].map((label, i) => ({ label, low: hz((100 + 20 * i) * MHz), high: hz((110 + 20 * i) * MHz), level: db(-20) }));
    const boardSpurs = [
      { label: 'REF 10M', low: hz(10 * MHz), high: hz(10 * MHz), level: db(-50), coupling: 'before-filter' as const, harmonics: 5 },
      { label: 'REF 10M', low: hz(10 * MHz), high: hz(10 * MHz), level: db(-60), coupling: 'after-filter' as const, harmonics: 3 },
      { label: 'REF 10M H2', low: hz(7 * MHz), high: hz(7 * MHz), level: db(-60), coupling: 'after-filter' as const, harmonics: 1 },
      { label: 'H2 wanted', low: hz(3 * MHz), high: hz(3.2 * MHz), level: db(-60), coupling: 'after-filter' as const, harmonics: 2 },
    ];
    const s = scenarioFixture({
      harmonicOrder: 7,
      neighbours,
      boardSpurs,
      converter: converterFixture({ rateSpurs: { dc: db(-80), halfRate: db(-85), quarterRate: db(-90) }, interleave: { ways: 4, offsetSpur: db(-80), imageLevel: db(-65) } }),
      filter: { kind: 'table', points: [{ frequency: hz(1e6), attenuation: db(60) }, { frequency: hz(70e6), attenuation: db(0) }, { frequency: hz(300e6), attenuation: db(50) }] },
    });
    const derived = deriveInterferers(s);
    const n = neighbours.length;
    // 6 wanted harmonics, spurs 5 + 3 + 1 + 2, neighbours 3 each, IM3 n(n−1) + 2n, IM2 1 + 2n + n(n−1), DC/rate2/rate4, 3 offsets, 6 images.
    expect(derived).toHaveLength(6 + 11 + 3 * n + (n * (n - 1) + 2 * n) + (1 + 2 * n + n * (n - 1)) + 3 + 3 + 6);
    expect(new Set(derived.map((i) => i.label)).size).toBe(derived.length);
    const labels = derived.map((i) => i.label);
    // The first of a repeated label keeps it; later ones are numbered.
    expect(labels).toContain('REF 10M #2');
    expect(labels).toContain('DC #2');
    expect(labels).toContain('H2 wanted #2');
    expect(labels).toContain('IM2 ADJ-UP−wanted #2');
    expect(labels).toContain('IM2 ADJ-UP−ADJ-UP');
    expect(labels.indexOf('H2 wanted')).toBe(0);
    for (const label of ['IL offset 1/4', 'IL offset 2/4', 'IL offset 3/4', 'IL image 3/4−', 'IL image 3/4+', 'rate/2', 'rate/4']) expect(labels).toContain(label);
  });
});
