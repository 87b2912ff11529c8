import './zod-config.js';
import * as z from 'zod';
import { db, type Db } from '../units/quantities.js';
import { MOST_NCO_BITS, type AfterRateSettings } from './scenario.js';
import { level, positiveFrequency, wholeNumber } from './scenario-fields.js';

/** What the anti-alias filter must reject, and the passband ripple its order is sized for. */
const filterMaskSchema = z.strictObject({
  outOfBandLevel: level(
    'Strongest signal that may appear anywhere outside the channel at the filter input, dBFS (referred to converter full scale; may be above 0, the filter attenuates it); when stated, an alias band where the filter falls short blocks the rate (leave out: full scale assumed, reported only)',
  )
    .nullable()
    .prefault(null),
  passbandRipple: z
    .number({ error: 'a passband ripple in dB above 0 and at most 20' })
    .gt(0, { error: 'a passband ripple in dB above 0 and at most 20' })
    .max(20, { error: 'a passband ripple in dB above 0 and at most 20' })
    .meta({ description: 'Passband ripple the filter orders are sized for, dB (default 1)' })
    .transform((value): Db => db(value))
    .prefault(1),
});

/** The digital down-converter after the converter. */
const downConverterSchema = z.strictObject({
  ncoBits: wholeNumber(1, MOST_NCO_BITS, 'NCO phase accumulator width, bits (leave out: no tuning word reported)')
    .nullable()
    .prefault(null),
  outputRate: positiveFrequency("Complex output rate after decimation (leave out: the decimation goal's output rate, if any)")
    .nullable()
    .prefault(null),
  usableFraction: z
    .number({ error: 'a fraction above 0 and at most 1, e.g. 0.8' })
    .gt(0, { error: 'a fraction above 0 and at most 1, e.g. 0.8' })
    .max(1, { error: 'a fraction above 0 and at most 1, e.g. 0.8' })
    .meta({ description: "Fraction of the output band the digital filter's transition leaves usable (default 0.8)" })
    .prefault(0.8),
});

/**
 * The scenario file's fields for the work after the rate (src/after-rate/),
 * each optional: spread into the scenario's object schema.
 */
export const afterRateFileFields = {
  filterMask: filterMaskSchema
    .meta({ description: 'The anti-alias filter mask: the strongest out-of-band level and the passband ripple (optional)' })
    .prefault({}),
  driverNoiseDensity: level(
    'Wideband noise density of the driver ahead of the anti-alias filter, dBFS/Hz (optional: when stated, the noise folded into the channel lowers the channel SNR)',
  )
    .nullable()
    .prefault(null),
  downConverter: downConverterSchema
    .meta({ description: 'The digital down-converter: NCO width, output rate and usable band (optional)' })
    .prefault({}),
};

/**
 * The file's after-rate fields, as zod has read them, gathered into the
 * model's settings.
 *
 * @param file the parsed file's filterMask, driverNoiseDensity and downConverter
 * @returns the settings the after-rate stage reads
 * @example afterRateSettings({ filterMask: { outOfBandLevel: null, passbandRipple: db(1) }, driverNoiseDensity: null, downConverter: { ncoBits: 32, outputRate: null, usableFraction: 0.8 } }).downConverter.ncoBits // 32
 */
export function afterRateSettings(file: {
  readonly filterMask: { readonly outOfBandLevel: Db | null; readonly passbandRipple: Db };
  readonly driverNoiseDensity: Db | null;
  readonly downConverter: AfterRateSettings['downConverter'];
}): AfterRateSettings {
  return {
    outOfBandLevel: file.filterMask.outOfBandLevel,
    passbandRipple: file.filterMask.passbandRipple,
    driverNoiseDensity: file.driverNoiseDensity,
    downConverter: {
      ncoBits: file.downConverter.ncoBits,
      outputRate: file.downConverter.outputRate,
      usableFraction: file.downConverter.usableFraction,
    },
  };
}
