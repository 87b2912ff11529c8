import { describe, expect, it } from 'vitest';
import { hz, seconds } from '../../src/units/quantities.js';
import { clockSnr } from '../../src/clocks/clock-snr.js';

const MHZ = 1e6;

/**
 * The assembly of a part's SNR figures from the standard formulas (as in IEEE
 * Std 1241-2010 on ADC terms; check values recomputed from the formulas):
 * jitter −20·log10(2π·f·σ) (100 MHz and 1 ps: 64.0 dB), quantisation
 * 6.02·N + 1.76 (12 bits: 74.0 dB), independent sources in quadrature and
 * noise powers adding (common practice, no source), processing gain
 * 10·log10(fs / (2B)).
 */
describe('clock SNR at the band top', () => {
  const band = { low: hz(80 * MHZ), high: hz(100 * MHZ) }; // top 100 MHz, width 20 MHz

  it('puts the part and aperture jitter in quadrature: 0.6 ps and 0.8 ps make 1 ps, 64.0 dB at 100 MHz', () => {
    const snr = clockSnr(band, hz(122.88 * MHZ), seconds(0.6e-12), seconds(0.8e-12), 12);
    expect(snr.jitterSnrDb).toBeCloseTo(64.0, 1);
    expect(snr.quantisationSnrDb).toBeCloseTo(74.0, 1);
  });

  it('adds the jitter and quantisation noise powers, then the processing gain to the 20 MHz channel', () => {
    const snr = clockSnr(band, hz(122.88 * MHZ), seconds(1e-12), seconds(0), 12);
    // From the check values: −10·log10(10^(−6.40) + 10^(−7.40)) = 63.59 dB (to the 0.1 dB of the checks).
    const combined = -10 * Math.log10(10 ** (-64.0 / 10) + 10 ** (-74.0 / 10));
    expect(snr.combinedSnrDb).toBeCloseTo(combined, 1);
    // 10·log10(122.88 / 40) = 4.87 dB.
    expect(snr.channelSnrDb - snr.combinedSnrDb).toBeCloseTo(10 * Math.log10(122.88 / 40), 10);
  });

  it('gives no jitter figure when the part states none; the combined SNR is then the quantisation limit alone', () => {
    const snr = clockSnr(band, hz(200 * MHZ), null, seconds(0.5e-12), 14);
    expect(snr.jitterSnrDb).toBeNull();
    expect(snr.combinedSnrDb).toBeCloseTo(86.0, 1); // 14 bits
    expect(snr.channelSnrDb).toBeCloseTo(snr.quantisationSnrDb + 10 * Math.log10(200 / 40), 10);
  });

  it('uses the band top, not its centre: 200 MHz and 100 fs give 78.0 dB', () => {
    const snr = clockSnr({ low: hz(180 * MHZ), high: hz(200 * MHZ) }, hz(245.76 * MHZ), seconds(100e-15), seconds(0), 12);
    expect(snr.jitterSnrDb).toBeCloseTo(78.0, 1);
  });
});
