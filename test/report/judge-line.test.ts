import { describe, expect, it } from 'vitest';
import { db, hz } from '../../src/units/quantities.js';
import type { CheckResult } from '../../src/solve/evaluate-rate.js';
import { judgeLine, type LineSetting, type Measurement } from '../../src/report/judge-line.js';
import type { LineDraft } from '../../src/capture/family-lines.js';

/**
 * judgeLine on hand-made spectra: each way a line can contradict the plan,
 * and each way it is left unjudged. Levels and bins are invented; the rules
 * are the ones stated in judge-line.ts.
 */
const N = 1024;
const BIN = 1000; // Hz per bin
const FLOOR = -110;

function spectrum(peaks: ReadonlyArray<readonly [number, number]>): Float64Array {
  const levels = new Float64Array(N / 2 + 1).fill(-130);
  for (const [bin, level] of peaks) levels[bin] = level;
  return levels;
}

function measurement(peaks: ReadonlyArray<readonly [number, number]>): Measurement {
  return {
    levels: spectrum(peaks),
    peaks: peaks.map(([b]) => b).sort((a, b) => a - b),
    floor: FLOOR,
    threshold: -90,
    tolerance: 1,
    components: [],
    edgeKeys: new Set(),
  };
}

function check(alias: ReadonlyArray<readonly [number, number]>, level: number): CheckResult {
  return {
    label: 'X',
    kind: 'spur',
    source: 'x',
    alias: alias.map(([a, b]) => [hz(a), hz(b)] as const),
    margin: hz(0),
    requiredMargin: hz(0),
    level: db(level),
    levelMargin: db(0),
    blocking: true,
    pass: true,
  };
}

const line: LineDraft = { what: 'X', component: 'n:1', cycles: 200, net: [1], tone: null };

function setting(c: CheckResult, width: 'tone' | 'band', basis: 'plan' | 'bound', amplitudeDb: number): LineSetting {
  return { check: c, line, width, basis, amplitude: 10 ** (amplitudeDb / 20), samples: N, binWidth: BIN, bin: 200 };
}

describe('judgeLine', () => {
  it("agrees when the peak is on the plan's alias and within the tolerance of its level", () => {
    const row = judgeLine(setting(check([[200 * BIN, 200 * BIN]], -80), 'tone', 'plan', -80), measurement([[200, -80.4]]));
    expect(row.status).toBe('agrees');
    expect(row.binError).toBe(0);
    expect(row.levelError).toBeCloseTo(-0.4, 9);
  });

  it("is off position when the peak is two bins from the plan's alias", () => {
    const row = judgeLine(setting(check([[198 * BIN, 198 * BIN]], -80), 'tone', 'plan', -80), measurement([[200, -80]]));
    expect(row.status).toBe('off position');
    expect(row.binError).toBe(2);
  });

  it('is missing when no peak lies within 3 bins', () => {
    expect(judgeLine(setting(check([[200 * BIN, 200 * BIN]], -80), 'tone', 'plan', -80), measurement([[210, -80]])).status).toBe('missing');
  });

  it('is off level when a plan-basis level is 1.5 dB away', () => {
    expect(judgeLine(setting(check([[200 * BIN, 200 * BIN]], -80), 'tone', 'plan', -80), measurement([[200, -78.5]])).status).toBe(
      'off level',
    );
  });

  it('on a bound: below it agrees; more than the tolerance above it, and above the threshold, contradicts', () => {
    const c = check([[150 * BIN, 250 * BIN]], -80);
    expect(judgeLine(setting(c, 'band', 'bound', -85), measurement([[200, -85]])).status).toBe('agrees');
    expect(judgeLine(setting(c, 'band', 'bound', -75), measurement([[200, -75]])).status).toBe('above plan level');
  });

  it("is outside the plan's segments when a band product lands off the aliased extent", () => {
    expect(judgeLine(setting(check([[300 * BIN, 400 * BIN]], -80), 'band', 'bound', -85), measurement([[200, -85]])).status).toBe(
      'outside plan segments',
    );
  });

  it('is not looked for under the floor, and not judged on level within 15 dB of it', () => {
    expect(judgeLine(setting(check([[200 * BIN, 200 * BIN]], -120), 'tone', 'plan', -120), measurement([])).status).toBe('below floor');
    expect(judgeLine(setting(check([[200 * BIN, 200 * BIN]], -100), 'tone', 'plan', -100), measurement([[200, -98]])).status).toBe('found');
  });

  it('is crowded when another component within 4 bins is at most 40 dB weaker', () => {
    const m = {
      ...measurement([[200, -80]]),
      components: [{ key: 'n:2', name: 'Y', order: 2, bin: 203, amplitude: 10 ** (-100 / 20), wanted: false }],
    };
    expect(judgeLine(setting(check([[200 * BIN, 200 * BIN]], -80), 'tone', 'plan', -80), m).status).toBe('crowded');
    const weak = { ...m, components: [{ ...m.components[0]!, amplitude: 10 ** (-130 / 20) }] };
    expect(judgeLine(setting(check([[200 * BIN, 200 * BIN]], -80), 'tone', 'plan', -80), weak).status).toBe('agrees');
  });
});
