import { db, hz, type Hz, type Seconds } from '../units/quantities.js';
import type { Band } from '../math/band.js';
import { combinedSnr, jitterLimitedSnr, processingGain, quantisationSnr, totalJitter } from './jitter-snr.js';
import type { ClockSnr } from './part-plan.js';

/**
 * The SNR figures one clock allows for a band (the standard formulas, as in
 * IEEE Std 1241-2010 on ADC terms): the jitter limit at the band's highest
 * frequency with the part's and the converter's aperture jitter in
 * quadrature; the ideal quantisation limit; the two combined (noise powers
 * add); and the channel SNR after the processing gain of keeping only the
 * band, 10·log10(rate / (2·bandwidth)).
 *
 * @param band the wanted band, Hz (its highest frequency is the worst case; its width the channel)
 * @param rate the sampling rate, Hz
 * @param partJitter the part's rms jitter, s; null when the part states none
 *   (then no jitter figure, and the combined SNR is the quantisation limit alone)
 * @param apertureJitter the converter's rms aperture jitter, s (0 when not stated)
 * @param bits the converter's resolution
 * @example clockSnr({ low: hz(90e6), high: hz(100e6) }, hz(122.88e6), seconds(1e-12), seconds(0), 12) // { jitterSnrDb: 64.0, quantisationSnrDb: 74.0, combinedSnrDb: 63.6 }
 */
export function clockSnr(band: Band, rate: Hz, partJitter: Seconds | null, apertureJitter: Seconds, bits: number): ClockSnr {
  const jitterSnrDb = partJitter === null ? null : jitterLimitedSnr(band.high, totalJitter([partJitter, apertureJitter]));
  const quantisationSnrDb = quantisationSnr(bits);
  const combinedSnrDb = combinedSnr(jitterSnrDb === null ? [quantisationSnrDb] : [jitterSnrDb, quantisationSnrDb]);
  const channelSnrDb = db(combinedSnrDb + processingGain(rate, hz(band.high - band.low)));
  return { jitterSnrDb, quantisationSnrDb, combinedSnrDb, channelSnrDb };
}
