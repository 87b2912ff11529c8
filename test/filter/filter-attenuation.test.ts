import { describe, expect, it } from 'vitest';
import { db, hz } from '../../src/units/quantities.js';
import { filterAttenuation, leastAttenuation } from '../../src/filter/filter-attenuation.js';
import type { AntiAliasFilter } from '../../src/scenario/scenario.js';

const butterworth: AntiAliasFilter = { kind: 'butterworth', order: 5, passLow: hz(30e6), passHigh: hz(80e6) };
const table: AntiAliasFilter = {
  kind: 'table',
  // Given out of order on purpose: the model sorts.
  points: [
    { frequency: hz(100e6), attenuation: db(40) },
    { frequency: hz(1e6), attenuation: db(0) },
  ],
};

describe('filterAttenuation and leastAttenuation: the scenario filter', () => {
  it('no filter attenuates nothing, anywhere', () => {
    for (const f of [0, 1, 70e6, 1e12, -5e6]) expect(filterAttenuation(null, hz(f))).toBe(0);
    expect(leastAttenuation(null, hz(-1e9), hz(1e9))).toBe(0);
  });

  it('dispatches to the Butterworth model', () => {
    // 5th order at Ω = 2 (120 MHz for 30–80 MHz): 10·log10(1025) dB (Williams & Taylor, from memory: 30.1 dB).
    expect(filterAttenuation(butterworth, hz(120e6))).toBeCloseTo(30.1, 1);
    expect(leastAttenuation(butterworth, hz(120e6), hz(200e6))).toBeCloseTo(10 * Math.log10(1025), 10);
    expect(filterAttenuation(butterworth, hz(0))).toBe(300);
  });

  it('dispatches to the table model, sorting its points', () => {
    expect(filterAttenuation(table, hz(10e6))).toBeCloseTo(20, 12);
    expect(leastAttenuation(table, hz(10e6), hz(1e9))).toBeCloseTo(20, 12);
  });

  it('refuses a reversed extent and a malformed filter', () => {
    expect(() => leastAttenuation(null, hz(2), hz(1))).toThrow(RangeError);
    expect(() => leastAttenuation({ ...butterworth, order: 0 }, hz(1), hz(2))).toThrow(RangeError);
    expect(() => filterAttenuation({ kind: 'table', points: [] }, hz(1))).toThrow(RangeError);
  });
});
