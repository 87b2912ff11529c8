import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { db, hz } from '../../src/units/quantities.js';
import { sortedTable, tableAttenuation, tableLeastAttenuation, type AttenuationPoint } from '../../src/filter/table-attenuation.js';

const point = (frequency: number, attenuation: number): AttenuationPoint => ({ frequency: hz(frequency), attenuation: db(attenuation) });

/** Invented response: a pass band 40–60 MHz, a notch at 20 MHz shallower than its surroundings. */
const table = sortedTable([
  point(100e6, 50),
  point(1e6, 60),
  point(20e6, 35),
  point(30e6, 40),
  point(10e6, 45),
  point(40e6, 0.5),
  point(60e6, 1),
]);

describe('tableAttenuation: linear in dB over log-frequency', () => {
  it('interpolates on the log axis (hand-worked)', () => {
    // 1 MHz → 0 dB, 100 MHz → 40 dB: 10 MHz is halfway in log10 f (6 → 8), so 20 dB.
    const two = [point(1e6, 0), point(100e6, 40)];
    expect(tableAttenuation(two, hz(10e6))).toBeCloseTo(20, 12);
    // √10 MHz sits a quarter of the way: 10 dB.
    expect(tableAttenuation(two, hz(Math.sqrt(10) * 1e6))).toBeCloseTo(10, 12);
    // Linear in f would give 40·(10 − 1)/99 = 3.64 dB at 10 MHz: the log axis matters.
    expect(tableAttenuation(two, hz(10e6))).not.toBeCloseTo((40 * 9) / 99, 1);
  });

  it('holds the end values flat beyond the table, and the first value at 0 Hz', () => {
    expect(tableAttenuation(table, hz(0.5e6))).toBe(60);
    expect(tableAttenuation(table, hz(0))).toBe(60);
    expect(tableAttenuation(table, hz(3e9))).toBe(50);
  });

  it('hits the points exactly and takes negative frequencies as magnitudes', () => {
    for (const p of table) expect(tableAttenuation(table, p.frequency)).toBe(p.attenuation);
    expect(tableAttenuation(table, hz(-20e6))).toBe(35);
  });

  it('a one-point table is flat', () => {
    expect(tableAttenuation(sortedTable([point(5e6, 12)]), hz(1))).toBe(12);
    expect(tableAttenuation(sortedTable([point(5e6, 12)]), hz(1e12))).toBe(12);
  });

  it('refuses malformed tables', () => {
    expect(() => sortedTable([])).toThrow(RangeError);
    expect(() => sortedTable([point(0, 1)])).toThrow(/> 0 Hz/);
    expect(() => sortedTable([point(1e6, -1)])).toThrow(/≥ 0 dB/);
    expect(() => sortedTable([point(1e6, 1), point(1e6, 2)])).toThrow(/two points/);
    expect(() => sortedTable([point(Number.NaN, 1)])).toThrow(RangeError);
  });
});

describe('tableLeastAttenuation: exact, against a dense sweep', () => {
  it('hand-worked extents', () => {
    // 15–25 MHz holds the 20 MHz notch point (35 dB), lower than both ends:
    // 15 MHz: 45 − 10·log(1.5)/log(2) = 39.15 dB; 25 MHz: 35 + 5·log(1.25)/log(1.5) = 37.75 dB.
    expect(tableAttenuation(table, hz(15e6))).toBeCloseTo(45 - (10 * Math.log(1.5)) / Math.log(2), 12);
    expect(tableAttenuation(table, hz(25e6))).toBeCloseTo(35 + (5 * Math.log(1.25)) / Math.log(1.5), 12);
    expect(tableLeastAttenuation(table, hz(15e6), hz(25e6))).toBe(35);
    // 40–60 MHz: the 40 MHz point, 0.5 dB.
    expect(tableLeastAttenuation(table, hz(40e6), hz(60e6))).toBe(0.5);
    // Below the table: flat 60 dB; straddling 0 ([−2, 0.5] MHz → magnitudes [0, 2] MHz): the 2 MHz end.
    expect(tableLeastAttenuation(table, hz(0), hz(0.5e6))).toBe(60);
    expect(tableLeastAttenuation(table, hz(-2e6), hz(0.5e6))).toBeCloseTo(tableAttenuation(table, hz(2e6)), 12);
  });

  it('equals the minimum of a 20001-point sweep to within one step of a table point', () => {
    // Independent interpolation written here: linear in dB over log10 f, flat outside.
    const reference = (points: AttenuationPoint[], f: number) => {
      const a = Math.abs(f);
      if (a <= points[0]!.frequency) return points[0]!.attenuation;
      for (let i = 1; i < points.length; i++) {
        const p = points[i - 1]!;
        const q = points[i]!;
        if (a <= q.frequency)
          return (
            p.attenuation +
            ((Math.log10(a) - Math.log10(p.frequency)) / (Math.log10(q.frequency) - Math.log10(p.frequency))) *
              (q.attenuation - p.attenuation)
          );
      }
      return points[points.length - 1]!.attenuation;
    };
    const tables = fc
      // Frequencies on a 1/200-decade lattice, 100 kHz–10 GHz: distinct points at least 1.2 % apart
      // (points a few ulps apart make any two log interpolations disagree in the last bits).
      .uniqueArray(
        fc.integer({ min: 0, max: 1000 }).map((i) => 1e5 * 10 ** (i / 200)),
        { minLength: 1, maxLength: 8 },
      )
      .chain((fs) =>
        fc.tuple(fc.constant(fs), fc.array(fc.double({ min: 0, max: 80, noNaN: true }), { minLength: fs.length, maxLength: fs.length })),
      );
    fc.assert(
      fc.property(
        tables,
        fc.double({ min: -1e10, max: 1e10, noNaN: true }),
        fc.double({ min: 0, max: 1e10, noNaN: true }),
        ([fs, as], low, width) => {
          const points = sortedTable(fs.map((f, i) => point(f, as[i]!)));
          const high = low + width;
          const steps = 20000;
          let bruteMin = Infinity;
          for (let i = 0; i <= steps; i++) bruteMin = Math.min(bruteMin, reference(points, low + (width * i) / steps));
          const least = tableLeastAttenuation(points, hz(low), hz(high));
          expect(least).toBeLessThanOrEqual(bruteMin + 1e-9);
          // The sweep misses a table point inside the extent by at most one step; take the
          // reference's value one step either side of each inside point as the slack.
          const step = width / steps;
          const near = points.filter((p) => (p.frequency > low && p.frequency < high) || (-p.frequency > low && -p.frequency < high));
          const slack = Math.max(
            0,
            ...near.map((p) => Math.max(reference(points, p.frequency + step), reference(points, p.frequency - step)) - p.attenuation),
          );
          expect(bruteMin - least).toBeLessThanOrEqual(slack + 1e-9);
        },
      ),
      { numRuns: 300 },
    );
  });
});
