import './zod-config.js';
import * as z from 'zod';
import type { Db } from '../units/quantities.js';
import type { KindMargins, RateFractionSpur } from './scenario.js';
import { frequency, level, levelAtMostFullScale, positiveFrequency, wholeNumber } from './scenario-fields.js';

/**
 * The parts of the scenario file that shape the interferer model: the
 * highest mixing order, stated intercepts per order, rate-tied spurs at any
 * fraction of the rate, the frequency an interleaving image level is quoted
 * at, and required margins per interferer kind or per signal.
 */

const ORDER_KEY = /^(?:[2-9]|[1-9]\d)$/;

/** Highest order of the mixing products generated (default 3). */
export const maxOrderSchema = wholeNumber(
  2,
  7,
  'Highest total order |c|₁ of the mixing products Σ cᵢ·fᵢ generated among the signals at the converter input (default 3)',
).default(3);

/** Input intercepts by order, dBFS: { "2": IIP2, "3": IIP3, ... }. */
export const interceptsSchema = z
  .record(z.string().regex(ORDER_KEY, { error: 'an order as the key: a whole number 2 or more, e.g. "3"' }), level('dBFS'))
  .meta({
    description:
      'Input intercepts by order referred to full scale, dBFS, e.g. { "2": 60, "3": 30 }; an order given here takes its products from the intercept instead of the harmonic figure',
  })
  .transform(
    (written): ReadonlyMap<number, Db> =>
      new Map(
        Object.entries(written)
          .map(([order, value]) => [Number(order), value] as const)
          .sort(([a], [b]) => a - b),
      ),
  );

const FRACTION = /^\s*(\d+)\s*\/\s*(\d+)\s*$/;

/** One rate-tied spur at p/q of the sample rate. */
export const rateFractionSpurSchema = z
  .strictObject({
    fraction: z
      .string()
      .regex(FRACTION, { error: 'a fraction of the rate as "p/q", e.g. "1/3" or "3/8"' })
      // zod runs this check even when the pattern failed: a text that is no fraction is left to the pattern's refusal.
      .refine((text) => Number(FRACTION.exec(text)?.[2] ?? 1) >= 1, { error: 'a fraction with a denominator of 1 or more' })
      .meta({ description: 'Where the spur sits, as a fraction p/q of the sample rate, e.g. "1/3", "3/8"' }),
    level: levelAtMostFullScale('Level, dBFS'),
  })
  .meta({ description: 'A converter spur at p/q of the sample rate' })
  .transform((written): RateFractionSpur => {
    const [, p, q] = FRACTION.exec(written.fraction)!;
    return { numerator: Number(p), denominator: Number(q), level: written.level };
  });

/** Frequency at which an interleaving image level is quoted (timing skew: +20 dB per decade). */
export const imageReferenceSchema = positiveFrequency(
  'Input frequency at which imageLevel is quoted; the image then rises 20 dB per decade of input frequency (timing skew). Leave out for a level flat in frequency (gain mismatch)',
)
  .nullable()
  .prefault(null);

/** An interferer's own required margin (null: its kind's, else the scenario's). */
export const ownMarginSchema = frequency(
  "Margin this signal needs from the wanted alias, instead of its kind's or the scenario's (0: none, e.g. an adjacent channel the digital channel filter removes)",
)
  .nullable()
  .prefault(null);

/** Required margins per interferer kind. */
export const kindMarginsSchema = z
  .strictObject({
    harmonic: frequency('Margin for harmonics made in the converter').optional(),
    intermod: frequency('Margin for mixing products of two or more signals').optional(),
    neighbour: frequency('Margin for neighbour channels and blockers').optional(),
    spur: frequency('Margin for board spurs').optional(),
    converter: frequency('Margin for rate-tied converter spurs and interleaving images').optional(),
  })
  .meta({ description: 'Required margins by interferer kind, overriding requirements.margin for that kind' })
  .transform((written): KindMargins => ({
    harmonic: written.harmonic ?? null,
    intermod: written.intermod ?? null,
    neighbour: written.neighbour ?? null,
    spur: written.spur ?? null,
    converter: written.converter ?? null,
  }));

/** No kind margin stated. */
export const NO_KIND_MARGINS: KindMargins = { harmonic: null, intermod: null, neighbour: null, spur: null, converter: null };
