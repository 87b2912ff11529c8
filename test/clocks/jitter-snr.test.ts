import { describe, expect, it } from 'vitest';
import { db, hz, seconds } from '../../src/units/quantities.js';
import { combinedSnr, jitterLimitedSnr, processingGain, quantisationSnr, totalJitter } from '../../src/clocks/jitter-snr.js';

describe('jitter-limited SNR, −20·log10(2π·f·σ) (the standard formula, as in IEEE Std 1241-2010 on ADC terms)', () => {
  it('gives 64.0 dB for 100 MHz and 1 ps rms', () => {
    expect(jitterLimitedSnr(hz(100e6), seconds(1e-12))).toBeCloseTo(64.0, 1);
  });
  it('gives 78.0 dB for 200 MHz and 100 fs rms', () => {
    expect(jitterLimitedSnr(hz(200e6), seconds(100e-15))).toBeCloseTo(78.0, 1);
  });
  it('loses 6.02 dB per doubling of frequency or of jitter (follows from the formula)', () => {
    const base = jitterLimitedSnr(hz(70e6), seconds(200e-15));
    expect(base - jitterLimitedSnr(hz(140e6), seconds(200e-15))).toBeCloseTo(20 * Math.log10(2), 10);
    expect(base - jitterLimitedSnr(hz(70e6), seconds(400e-15))).toBeCloseTo(20 * Math.log10(2), 10);
  });
});

describe('jitter sources add in quadrature (common practice, no source)', () => {
  it('combines 300 fs and 400 fs into 500 fs', () => {
    expect(totalJitter([seconds(300e-15), seconds(400e-15)])).toBeCloseTo(500e-15, 25);
  });
});

describe('ideal quantisation SNR, 6.02·N + 1.76 dB', () => {
  it('gives 74.0 dB at 12 bits and 86.0 dB at 14 bits', () => {
    expect(quantisationSnr(12)).toBeCloseTo(74.0, 1);
    expect(quantisationSnr(14)).toBeCloseTo(86.0, 1);
  });
});

describe('combining independent noise limits (noise powers add; common practice, no source)', () => {
  it('two equal limits lose 3.01 dB', () => {
    expect(combinedSnr([db(74), db(74)])).toBeCloseTo(74 - 10 * Math.log10(2), 10);
  });
  it('a limit far above the other changes little', () => {
    expect(combinedSnr([db(60), db(100)])).toBeCloseTo(60, 3);
  });
});

describe('processing gain, 10·log10(fs / (2B))', () => {
  it('is 0 dB when the channel fills the first Nyquist zone', () => {
    expect(processingGain(hz(40e6), hz(20e6))).toBeCloseTo(0, 12);
  });
  it('is 10 dB when the rate is ten times the Nyquist rate of the channel', () => {
    expect(processingGain(hz(200e6), hz(10e6))).toBeCloseTo(10, 12);
  });
});
