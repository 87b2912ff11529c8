import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hz } from '../../src/units/quantities.js';
import { foldFrequency, lookalikes, nyquistZone } from '../../src/math/fold.js';
import { bandImage } from '../../src/math/band.js';

/**
 * The folding rule, a fact of the trade (common practice, no source), written
 * out independently: f shows at |f − fs·round(f/fs)|, in zone ⌈2f/fs⌉.
 */
const referenceAlias = (f: number, fs: number) => Math.abs(f - fs * Math.round(f / fs));

describe('foldFrequency and lookalikes: facts of the trade', () => {
  it('1 Hz sampled at 7 Hz cannot be told from 6, 8, 13 or 15 Hz', () => {
    // Common practice, no source.
    expect(lookalikes(hz(1), hz(7), 2)).toEqual([6, 8, 13, 15]);
    expect(foldFrequency(hz(1), hz(7))).toEqual({ alias: 1, zone: 1, inverted: false });
    for (const f of [6, 8, 13, 15]) expect(foldFrequency(hz(f), hz(7)).alias).toBe(1);
  });

  it('1 Hz sampled at 4 Hz cannot be told from 3, 5 and 7 Hz', () => {
    // Common practice, no source.
    expect(lookalikes(hz(1), hz(4), 2)).toEqual([3, 5, 7, 9]);
    expect(lookalikes(hz(1), hz(4), 2).slice(0, 3)).toEqual([3, 5, 7]);
    for (const f of [3, 5, 7]) expect(foldFrequency(hz(f), hz(4)).alias).toBe(1);
  });

  it('1 Hz sampled at 1.5 Hz shows at 0.5 Hz, mirrored from zone 2', () => {
    // Common practice, no source.
    expect(foldFrequency(hz(1), hz(1.5))).toEqual({ alias: 0.5, zone: 2, inverted: true });
  });

  it('the 44.1 kHz audio rate exceeds twice 20 kHz, so 20 kHz lies in zone 1, not inverted', () => {
    // Common practice, no source: 44.1 kHz > 2 · 20 kHz leaves room for the anti-alias filter.
    expect(44.1e3).toBeGreaterThan(2 * 20e3);
    expect(foldFrequency(hz(20e3), hz(44.1e3))).toEqual({ alias: 20e3, zone: 1, inverted: false });
    expect(nyquistZone(hz(20e3), hz(44.1e3))).toBe(1);
  });

  it('lookalikes are exactly the frequencies that fold onto the same alias', () => {
    // Folding rule (common practice, no source): every k·fs ± alias folds to the alias.
    for (const [f, fs] of [
      [70e6, 100e6],
      [10.7e6, 12.288e6],
      [455e3, 200e3],
      [140e6, 61.44e6],
    ] as const) {
      const alias = referenceAlias(f, fs);
      const found = lookalikes(hz(f), hz(fs), 3);
      expect(found).not.toContain(f);
      for (const g of found) expect(Math.abs(referenceAlias(g, fs) - alias)).toBeLessThan(1e-6);
      expect(found.length).toBeGreaterThanOrEqual(5);
      for (let i = 1; i < found.length; i++) expect(found[i]!).toBeGreaterThan(found[i - 1]!);
    }
  });
});

describe('foldFrequency: agrees with the reference folding rule', () => {
  it('for random frequencies and rates', () => {
    // Folding rule (common practice, no source): alias |f − fs·round(f/fs)| in [0, fs/2], zone ⌈2f/fs⌉, even zones inverted.
    fc.assert(
      fc.property(fc.double({ min: 1e3, max: 1e10, noNaN: true }), fc.double({ min: 1e3, max: 1e9, noNaN: true }), (f, fs) => {
        const fold = foldFrequency(hz(f), hz(fs));
        expect(Math.abs(fold.alias - referenceAlias(f, fs))).toBeLessThanOrEqual(1e-9 * Math.max(f, fs));
        expect(fold.alias).toBeGreaterThanOrEqual(0);
        expect(fold.alias).toBeLessThanOrEqual(fs / 2);
        const q = (2 * f) / fs;
        if (Math.abs(q - Math.round(q)) > 1e-9 * q) expect(fold.zone).toBe(Math.ceil(q));
        expect(fold.inverted).toBe(fold.zone % 2 === 0);
      }),
      { numRuns: 5000 },
    );
  });
});

describe('zone boundaries', () => {
  it('belong to the lower zone; DC is zone 1', () => {
    // Convention: zone n spans ((n−1)·fs/2, n·fs/2]; a boundary belongs to the lower zone.
    expect(foldFrequency(hz(0), hz(100e6))).toEqual({ alias: 0, zone: 1, inverted: false });
    expect(foldFrequency(hz(50e6), hz(100e6))).toEqual({ alias: 50e6, zone: 1, inverted: false });
    expect(foldFrequency(hz(100e6), hz(100e6))).toEqual({ alias: 0, zone: 2, inverted: true });
    expect(foldFrequency(hz(150e6), hz(100e6))).toEqual({ alias: 50e6, zone: 3, inverted: false });
    expect(nyquistZone(hz(50e6 + 1), hz(100e6))).toBe(2);
  });

  it('a tone exactly on a zone edge lands exactly on 0 or rate/2, for awkward rates', () => {
    // Common practice, no source: the edge k·fs/2 folds to fs/2 for odd k and to 0 for even k.
    // The edge is written as k·fs/2 in floating point, as a caller would compute it.
    const rates = [0.3, 61.44e6, 12.288e6 / 7, 100e6 / 3, 7, 1.5, 122.88e6, 1.3, 245.76e6 / 11, 0.1];
    let checked = 0;
    for (const rate of rates) {
      for (let k = 1; k <= 300; k++) {
        const edge = (k * rate) / 2;
        const fold = foldFrequency(hz(edge), hz(rate));
        expect(fold.zone, `rate ${rate}, k ${k}`).toBe(k);
        expect(fold.alias, `rate ${rate}, k ${k}`).toBe(k % 2 === 1 ? rate / 2 : 0);
        checked++;
      }
    }
    expect(checked).toBe(3000);
  });

  it('tones just inside either side of an edge land just inside [0, rate/2]', () => {
    const rate = 61.44e6;
    const edge = 3 * 30.72e6; // 92.16 MHz, top of zone 3
    expect(foldFrequency(hz(edge - 1), hz(rate))).toMatchObject({ zone: 3, inverted: false });
    expect(foldFrequency(hz(edge - 1), hz(rate)).alias).toBeCloseTo(30.72e6 - 1, 6);
    expect(foldFrequency(hz(edge + 1), hz(rate))).toMatchObject({ zone: 4, inverted: true });
    expect(foldFrequency(hz(edge + 1), hz(rate)).alias).toBeCloseTo(30.72e6 - 1, 6);
  });
});

describe('bandImage', () => {
  it('60–80 MHz at 100 MHz lands mirrored at 20–40 MHz in zone 2', () => {
    // Folding rule (common practice, no source): 100 − 80 = 20 and 100 − 60 = 40; zone 2 is inverted.
    expect(bandImage({ low: hz(60e6), high: hz(80e6) }, hz(100e6))).toEqual({ zone: 2, inverted: true, low: 20e6, high: 40e6 });
  });

  it('10–14 kHz at 9.5 kHz (inside the zone-3 window of Vaughan, Scott & White 1991) lands upright', () => {
    // 10 − 9.5 = 0.5 kHz, 14 − 9.5 = 4.5 kHz, zone 3 is not inverted.
    const image = bandImage({ low: hz(10e3), high: hz(14e3) }, hz(9.5e3));
    expect(image).toMatchObject({ zone: 3, inverted: false });
    expect(image!.low).toBeCloseTo(500, 9);
    expect(image!.high).toBeCloseTo(4500, 9);
  });

  it('agrees with folding each edge', () => {
    // The image edges are the folds of the band edges (folding rule; common practice, no source).
    const band = { low: hz(17.5e6), high: hz(22.5e6) };
    for (const rate of [16e6, 30e6, 11.5e6, 50e6]) {
      const image = bandImage(band, hz(rate))!;
      const edges = [referenceAlias(17.5e6, rate), referenceAlias(22.5e6, rate)].sort((a, b) => a - b);
      expect(image.low).toBeCloseTo(edges[0]!, 6);
      expect(image.high).toBeCloseTo(edges[1]!, 6);
    }
  });

  it('keeps a band whose edges sit on zone boundaries (the twice-the-width point)', () => {
    // 60–80 MHz at 40 MHz: zone 4 spans exactly 60–80 MHz (common practice, no source).
    expect(bandImage({ low: hz(60e6), high: hz(80e6) }, hz(40e6))).toEqual({ zone: 4, inverted: true, low: 0, high: 20e6 });
  });

  it('is null when the band straddles a zone boundary', () => {
    // 60–80 MHz at 130 MHz: the boundary 65 MHz lies inside the band, so it folds onto itself.
    expect(bandImage({ low: hz(60e6), high: hz(80e6) }, hz(130e6))).toBeNull();
    expect(bandImage({ low: hz(10e3), high: hz(14e3) }, hz(12e3))).toBeNull();
  });
});
