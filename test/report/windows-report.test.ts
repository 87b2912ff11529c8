import { guardBands } from '../../src/math/band.js';
import { describe, expect, it } from 'vitest';
import { hz } from '../../src/units/quantities.js';
import { windowsReport } from '../../src/report/windows-report.js';
import { aliasReport } from '../../src/report/alias-report.js';
import { foldFrequency } from '../../src/math/fold.js';

const NO_LIMITS = { minRate: hz(0), maxRate: hz(Infinity) };
const band = (low: number, high: number) => ({ low: hz(low), high: hz(high) });
const guard = (low: number, high: number) => guardBands(hz(low), hz(high));

describe('windowsReport', () => {
  // 60–80 MHz with 2 MHz guards: windows from Vaughan, Scott & White 1991 on the guarded 58–82 MHz.
  const report = windowsReport(band(60e6, 80e6), guard(2e6, 2e6), NO_LIMITS);

  it('gives each bounded window its width, centre and the ±ppm a centre rate may drift', () => {
    const zone2 = report.windows.find((w) => w.zone === 2)!;
    expect(zone2.width).toBe(34e6); // 116 − 82 MHz
    expect(zone2.center).toBe(99e6);
    // ppm as crystal tolerances are quoted (common practice: a 100 MHz clock at ±20 ppm lies within ±2 kHz): drifting the centre by
    // ±tolerance reaches the window edges exactly.
    expect(zone2.center! * (1 + zone2.tolerancePpm! * 1e-6)).toBeCloseTo(116e6, 3);
    expect(zone2.center! * (1 - zone2.tolerancePpm! * 1e-6)).toBeCloseTo(82e6, 3);
    expect(zone2.tolerancePpm).toBeCloseTo((17 / 99) * 1e6, 6);
  });

  it('puts the wanted band where folding it at the centre rate puts it', () => {
    // Folding rule (common practice, no source): at 99 MHz, 60 MHz → 39 MHz and 80 MHz → 19 MHz, mirrored (zone 2).
    const zone2 = report.windows.find((w) => w.zone === 2)!;
    expect(zone2.image).toEqual({ zone: 2, inverted: true, low: 19e6, high: 39e6 });
    for (const w of report.windows.filter((x) => x.center !== null)) {
      const edges = [foldFrequency(hz(60e6), w.center!).alias, foldFrequency(hz(80e6), w.center!).alias].sort((a, b) => a - b);
      expect(w.image!.low).toBeCloseTo(edges[0]!, 3);
      expect(w.image!.high).toBeCloseTo(edges[1]!, 3);
      expect(w.image!.inverted).toBe(w.inverted);
    }
  });

  it('leaves the unbounded zone-1 window without centre, tolerance or image', () => {
    expect(report.windows[0]).toMatchObject({ zone: 1, maxRate: Infinity, width: Infinity, center: null, tolerancePpm: null, image: null });
  });

  it('reports the zero-width window with width 0 and no drift allowed', () => {
    // Common practice, no source: 60–80 MHz (80 = 4·20) is sampled at exactly 40 MHz in zone 4.
    const point = windowsReport(band(60e6, 80e6), guard(0, 0), NO_LIMITS).windows.find((w) => w.zone === 4)!;
    expect(point).toMatchObject({ minRate: 40e6, maxRate: 40e6, width: 0, center: 40e6, tolerancePpm: 0 });
    expect(point.image).toEqual({ zone: 4, inverted: true, low: 0, high: 20e6 });
  });

  it('has no minimum rate and no windows when the limits shut everything out', () => {
    const empty = windowsReport(band(60e6, 80e6), guard(0, 0), { minRate: hz(41e6), maxRate: hz(53e6) });
    expect(empty.windows).toEqual([]);
    expect(empty.minimumRate).toBeNull();
    expect(report.minimumRate).toBe(164e6 / 3);
  });
});

describe('aliasReport', () => {
  it('folds each tone and lists its lookalikes', () => {
    // Common practice, no source: 1 Hz at 7 Hz cannot be told from 6, 8, 13, 15 Hz.
    const alias = aliasReport(hz(7), [hz(1), hz(6)], 2);
    expect(alias.rate).toBe(7);
    expect(alias.tones[0]).toEqual({ frequency: 1, alias: 1, zone: 1, inverted: false, lookalikes: [6, 8, 13, 15] });
    expect(alias.tones[1]).toMatchObject({ frequency: 6, alias: 1, zone: 2, inverted: true });
    expect(alias.tones[1]!.lookalikes).toEqual([1, 8, 13, 15]);
  });
});
