import { guardBands } from '../../src/math/band.js';
import { describe, expect, it } from 'vitest';
import { db, hz, ppm, seconds } from '../../src/units/quantities.js';
import type { Scenario } from '../../src/scenario/scenario.js';
import { deriveInterfererList, deriveInterferers } from '../../src/interferers/derive-interferers.js';
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
 * Converter laws (converter-law.ts): gain_n = HDn − (n − 1)·Lref with Lref = −1:
 *   gain2 = −70 + 1 = −69, gain3 = −75 + 2 = −73, gain4 (no figure: lowest stated −75) = −72.
 *   A product's level is gain_n + 20·log10(n!/Π pᵢ!·qᵢ!) + Σ (pᵢ + qᵢ)·Lᵢ.
 * Board spurs:
 *   REF 10M, 10 MHz tone, −30 dBFS before the filter, 2 harmonics:
 *     fundamental −30 − 66.2758 = −96.2758 (blocking: above −100);
 *     H2 at 20 MHz: −30 − 20·log10(2) − 30.1072 = −30 − 6.0206 − 30.1072 = −66.1278.
 *   CLK 125M, 125 MHz tone, −70 dBFS after the filter: −70, blocking.
 * Neighbours (levels at the filter input):
 *   ADJ-UP [120, 130] MHz, +10: above f0 (48.99), least at 120 (Ω = 2): −20.1072.
 *   ADJ-LO [15, 20] MHz, −20: below f0, least at 20 (Ω = −2): −50.1072.
 * Products above −100 (everything else is below; the nearest misses, worked too):
 *   H2 wanted [80, 100]: −69 − 2 = −71; H3 wanted [120, 150]: −73 − 3 = −76; H4 wanted [160, 200]: −72 − 4 = −76.
 *   IM2 wanted difference [−10, 10] (w − w'): −69 + 6.0206 − 2 = −64.9794.
 *   IM2 ADJ-UP−wanted [70, 90] and IM2 wanted+ADJ-UP [160, 180]: −69 + 6.0206 − 1 − 20.1072 = −84.0866.
 *   IM3 2·wanted+ADJ-UP [200, 230] and IM3 ADJ-UP−2·wanted [20, 50]: −73 + 9.5424 − 2 − 20.1072 = −85.5648.
 *   IM3 wanted+ADJ-UP−wanted [110, 140] (a triple beat of two wanted tones and the blocker): −73 + 15.5630 − 2 − 20.1072 = −79.5442.
 *   IM3 wanted+ADJ-UP−ADJ-UP [40 + 120 − 130, 50 + 130 − 120] = [30, 60] (two blocker tones and a wanted one): −73 + 15.5630 − 1 − 40.2145 = −98.6515.
 *   Misses: ADJ-UP's own difference −69 + 6.0206 − 40.2145 = −103.19; wanted ± 2·ADJ-UP −73 + 9.5424 − 1 − 40.2145 = −104.67;
 *   ADJ-UP H2 −69 − 40.2145 = −109.21; wanted ± ADJ-LO −69 + 6.0206 − 1 − 50.1072 = −114.09.
 *   2·w − w' (net 1, inside the band at every rate) is the band's own distortion: counted, not listed.
 * Converter: DC −80 (r·0); rate/4 −95 (r·0.25); no rate/2 figure, so none;
 *   2-way interleave: IL offset 1/2 at r/2, −85; images r/2 − [40, 50] = r/2 + [−50, −40]
 *   and r/2 + [40, 50], at −1 − 70 = −71; ADJ-UP's at r/2 ∓ [120, 130], −20.1072 − 70 = −90.1072.
 *   Every other source's image is under −100 (the strongest, IM2 wanted difference, at −134.98).
 */
const handWorked: Scenario = {
  name: 'Heron-HW',
  description: 'hand-worked test scenario',
  wanted: { low: hz(40 * MHz), high: hz(50 * MHz), weakestLevel: db(-60), strongestLevel: db(-1) },
  guard: guardBands(hz(1 * MHz), hz(1 * MHz)),
  channels: [], // one wanted band: every stage reads it from wanted
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
  maxOrder: 3,
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

// [label, kind, order, rateMultiple, low MHz, high MHz, level dBFS], from the comment above; all blocking.
const expected: Array<[string, string, number | null, number, number, number, number]> = [
  ['REF 10M', 'spur', null, 0, 10, 10, -96.2758],
  ['REF 10M H2', 'spur', 2, 0, 20, 20, -66.1278],
  ['CLK 125M', 'spur', null, 0, 125, 125, -70],
  ['ADJ-UP', 'neighbour', null, 0, 120, 130, -20.1072],
  ['ADJ-LO', 'neighbour', null, 0, 15, 20, -50.1072],
  ['H2 wanted', 'harmonic', 2, 0, 80, 100, -71],
  ['IM2 wanted difference', 'intermod', 2, 0, -10, 10, -64.9794],
  ['IM2 ADJ-UP−wanted', 'intermod', 2, 0, 70, 90, -84.0866],
  ['IM2 wanted+ADJ-UP', 'intermod', 2, 0, 160, 180, -84.0866],
  ['H3 wanted', 'harmonic', 3, 0, 120, 150, -76],
  ['IM3 2·wanted+ADJ-UP', 'intermod', 3, 0, 200, 230, -85.5648],
  ['IM3 ADJ-UP−2·wanted', 'intermod', 3, 0, 20, 50, -85.5648],
  ['IM3 wanted+ADJ-UP−wanted', 'intermod', 3, 0, 110, 140, -79.5442],
  ['IM3 wanted+ADJ-UP−ADJ-UP', 'intermod', 3, 0, 30, 60, -98.6515],
  ['H4 wanted', 'harmonic', 4, 0, 160, 200, -76],
  ['DC', 'converter', null, 0, 0, 0, -80],
  ['rate/4', 'converter', null, 0.25, 0, 0, -95],
  ['IL offset 1/2', 'converter', null, 0.5, 0, 0, -85],
  ['IL image 1/2−', 'converter', null, 0.5, -50, -40, -71],
  ['IL image 1/2+', 'converter', null, 0.5, 40, 50, -71],
  ['IL image 1/2− ADJ-UP', 'converter', null, 0.5, -130, -120, -90.1072],
  ['IL image 1/2+ ADJ-UP', 'converter', null, 0.5, 120, 130, -90.1072],
];
const isProduct = (kind: string) => kind === 'harmonic' || kind === 'intermod';

describe('deriveInterferers: a hand-worked scenario', () => {
  const { interferers: derived, summary } = deriveInterfererList(handWorked);

  it('derives exactly the interferers worked out on paper: spurs, neighbours, products, converter spurs, images', () => {
    const labels = derived.map((i) => i.label);
    expect(labels.filter((l) => !isProduct(derived.find((i) => i.label === l)!.kind))).toEqual(
      expected.filter((e) => !isProduct(e[1])).map((e) => e[0]),
    );
    expect([...labels.filter((l) => isProduct(derived.find((i) => i.label === l)!.kind))].sort()).toEqual(
      expected
        .filter((e) => isProduct(e[1]))
        .map((e) => e[0])
        .sort(),
    );
    expect(summary.products).toBe(10);
    expect(summary.inBand).toBe(1);
    // Images left out: REF 10M, its H2, CLK 125M, ADJ-LO and the 10 products, 2 sides each.
    expect(summary.prunedImages).toBe(28);
  });

  it.each(expected)('%s: kind, order, extent, level and blocking', (label, kind, order, rateMultiple, low, high, level) => {
    const found = derived.find((i) => i.label === label)!;
    expect(found.kind).toBe(kind);
    expect(found.order).toBe(order);
    expect(found.rateMultiple).toBe(rateMultiple);
    expect(found.low / MHz).toBeCloseTo(low, 9);
    expect(found.high / MHz).toBeCloseTo(high, 9);
    expect(found.level).toBeCloseTo(level, 3);
    expect(found.blocking).toBe(true);
    expect(found.requiredMargin).toBe(0.5 * MHz);
  });

  it("prunes the nearest misses and reports the strongest of them: ADJ-UP's own difference at −103.19 dBFS", () => {
    expect(summary.strongestPruned!).toBeCloseTo(-69 + 20 * Math.log10(2) - 2 * 20.1072, 3);
    expect(derived.some((i) => i.label === 'ADJ-UP H2' || i.label === 'IM2 ADJ-UP difference')).toBe(false);
  });

  it('says in the source text where a figure was assumed', () => {
    const h4 = derived.find((i) => i.label === 'H4 wanted')!;
    expect(h4.source).toMatch(/no 4th-order figure stated; the lowest stated, −75\.0 dBc, assumed/);
    expect(derived.find((i) => i.label === 'H2 wanted')!.source).not.toMatch(/assumed/);
  });

  it('with a stated intercept, 2·f1 − f2 is 2·L1 + L2 − 2·IP3', () => {
    // IP3 +20 dBFS: ADJ-UP − 2·wanted = 2·(−1) + (−20.1072) − 40 = −62.1072 (worked by hand).
    const withIntercept = deriveInterferers({ ...handWorked, converter: { ...handWorked.converter, intercept3: db(20) } });
    expect(withIntercept.find((i) => i.label === 'IM3 ADJ-UP−2·wanted')!.level).toBeCloseTo(-62.1072, 3);
    expect(withIntercept.find((i) => i.label === 'IM3 ADJ-UP−2·wanted')!.source).toMatch(/intercept/);
  });

  it('without any harmonic figure: no converter harmonics, no products, the rest unchanged', () => {
    const bare = deriveInterferers({ ...handWorked, converter: { ...handWorked.converter, harmonics: new Map() } });
    expect(bare.some((i) => i.kind === 'harmonic' || i.kind === 'intermod')).toBe(false);
    expect(bare.map((i) => i.label)).toEqual(expected.filter((e) => !isProduct(e[1])).map((e) => e[0]));
  });

  it('harmonicOrder 2 and maxOrder 2 keep only the second-order products', () => {
    const low = deriveInterferers({ ...handWorked, harmonicOrder: 2, maxOrder: 2 });
    expect(low.filter((i) => isProduct(i.kind)).map((i) => i.order)).toEqual([2, 2, 2, 2]);
  });

  it('board spur harmonics roll off as 1/h', () => {
    // −20·log10(3) = −9.5424 dB at h = 3, after the filter: no attenuation.
    const s = scenarioFixture({
      boardSpurs: [{ label: 'SW 1M', low: hz(1e6), high: hz(1e6), level: db(-40), coupling: 'after-filter', harmonics: 3 }],
    });
    const h3 = deriveInterferers(s).find((i) => i.label === 'SW 1M H3')!;
    expect(h3.level).toBeCloseTo(-49.5424, 4);
    expect([h3.low, h3.high]).toEqual([3e6, 3e6]);
  });
});

describe('blocking: at the threshold is weak enough, just above blocks', () => {
  // Fixture: weakest −60 dBFS, rejection 40 dB → threshold −100 dBFS.
  const spur = (level: number) => ({
    label: 'TEST',
    low: hz(1e6),
    high: hz(1e6),
    level: db(level),
    coupling: 'after-filter' as const,
    harmonics: 1,
  });

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

  it('a wanted harmonic landing exactly on the threshold (−1 + −99 = −100) is non-blocking, so it is pruned and reported as the strongest pruned', () => {
    const s = scenarioFixture({
      harmonicOrder: 3,
      converter: converterFixture({
        harmonics: new Map([
          [2, db(-99)],
          [3, db(-98.999)],
        ]),
      }),
    });
    const { interferers, summary } = deriveInterfererList(s);
    expect(interferers.some((i) => i.label === 'H2 wanted')).toBe(false);
    expect(summary.strongestPruned).toBe(-100);
    const h3 = interferers.find((i) => i.label === 'H3 wanted')!;
    expect(h3.level).toBeCloseTo(-99.999, 9);
    expect(h3.blocking).toBe(true);
  });
});

describe('labels are unique, even when the scenario repeats them', () => {
  it('many sources, colliding user labels', () => {
    const neighbours = ['ADJ-UP', 'ADJ-LO', 'ALT-UP', 'ADJ-UP', 'DC'].map((label, i) => ({
      label,
      low: hz((100 + 20 * i) * MHz),
      high: hz((110 + 20 * i) * MHz),
      level: db(-20),
    }));
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
      converter: converterFixture({
        rateSpurs: { dc: db(-80), halfRate: db(-85), quarterRate: db(-90) },
        interleave: { ways: 4, offsetSpur: db(-80), imageLevel: db(-65) },
      }),
      filter: {
        kind: 'table',
        points: [
          { frequency: hz(1e6), attenuation: db(60) },
          { frequency: hz(70e6), attenuation: db(0) },
          { frequency: hz(300e6), attenuation: db(50) },
        ],
      },
    });
    const derived = deriveInterferers(s);
    expect(derived.length).toBeGreaterThan(30);
    expect(new Set(derived.map((i) => i.label)).size).toBe(derived.length);
    const labels = derived.map((i) => i.label);
    // The first of a repeated label keeps it (board spurs, then neighbours, products, converter spurs); later ones are numbered.
    expect(labels).toContain('REF 10M #2');
    expect(labels).toContain('DC #2');
    expect(derived.find((i) => i.label === 'DC #2')!.kind).toBe('converter');
    expect(derived.find((i) => i.label === 'H2 wanted')!.kind).toBe('spur');
    expect(derived.find((i) => i.label === 'H2 wanted #2')!.kind).toBe('harmonic');
    for (const label of ['IL offset 1/4', 'IL offset 2/4', 'IL offset 3/4', 'IL image 3/4−', 'IL image 3/4+', 'rate/2', 'rate/4'])
      expect(labels).toContain(label);
  });
});
