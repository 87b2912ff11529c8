import './zod-config.js';
import * as z from 'zod';
import type { Db, Hz } from '../units/quantities.js';
import type { Converter, Interleave, RateFractionSpur } from './scenario.js';
import { refuseAt } from './band-forms.js';
import { formatFrequency } from '../units/format-frequency.js';
import {
  countFromOne,
  label,
  level,
  levelAtMostFullScale,
  levelBelowCarrier,
  positiveFrequency,
  time,
  wholeNumber,
} from './scenario-fields.js';
import { imageReferenceSchema, interceptsSchema, rateFractionSpurSchema } from './interferer-model-schema.js';

/** Orders 2 to 99: the checks stop at harmonicOrder (at most 15), the capture model at the highest order listed. */
const HARMONIC_ORDER_KEY = /^(?:[2-9]|[1-9]\d)$/;

const optionalLevel = (description: string) => levelAtMostFullScale(description).nullable().prefault(null);

/** The converter's rate-tied spurs, dBFS; any may be left out. */
const rateSpurs = z
  .strictObject({
    dc: optionalLevel('Spur at DC (offset), dBFS'),
    halfRate: optionalLevel('Spur at rate/2, dBFS'),
    quarterRate: optionalLevel('Spur at rate/4, dBFS'),
    fractions: z
      .array(rateFractionSpurSchema)
      .meta({ description: 'Spurs at other fractions p/q of the sample rate, e.g. [{ "fraction": "1/3", "level": -90 }]' })
      .prefault([]),
  })
  .meta({ description: 'Spurs tied to the sample rate, dBFS' });

/** M-way interleaving: offset spurs at k·rate/M, images at k·rate/M ± f. */
const interleave = z
  .strictObject({
    ways: wholeNumber(2, 64, 'Number of interleaved cores M'),
    offsetSpur: levelAtMostFullScale('Offset spurs at k·rate/M, dBFS'),
    imageLevel: levelBelowCarrier('Images of the input at k·rate/M ± f, dBc (at imageReference when one is given)'),
    imageReference: imageReferenceSchema,
  })
  .meta({ description: 'Interleaved cores; leave out (or null) for a single core' });

/**
 * The converter as written in a scenario file: rate limits, input bandwidth,
 * resolution, harmonic levels by order, its rate-tied spurs and the integer
 * dividers it can apply to its clock input (sorted ascending in the model).
 * Checks that the slowest rate is not above the fastest and that no divider
 * is listed twice.
 */
export const converterSchema = z
  .strictObject({
    label,
    minRate: positiveFrequency('Slowest sample clock the converter accepts'),
    maxRate: positiveFrequency('Fastest sample clock the converter accepts'),
    inputBandwidth: positiveFrequency('Analog input bandwidth; a wanted band above it is refused'),
    bits: wholeNumber(1, 32, 'Resolution, bits'),
    harmonics: z
      .record(
        z.string().regex(HARMONIC_ORDER_KEY, { error: 'a harmonic order as the key: a whole number 2 or more (at most 99), e.g. "3"' }),
        levelBelowCarrier('dBc, below 0'),
      )
      .meta({ description: 'Harmonic levels by order, dBc at the strongest wanted level, e.g. { "2": -75, "3": -80 }' }),
    intercept3: level(
      'Third-order input intercept referred to full scale, dBFS (may exceed 0); leave out to derive it from the 3rd harmonic (the same as intercepts["3"])',
    )
      .nullable()
      .prefault(null),
    intercepts: interceptsSchema.prefault({}),
    rateSpurs: rateSpurs.nullable().prefault(null),
    interleave: interleave.nullable().prefault(null),
    apertureJitter: time
      .meta({ description: 'Aperture jitter, rms: seconds as a number, or text such as "80 fs", "0.2 ps" (default 0)' })
      .prefault(0),
    clockDividers: z
      .array(countFromOne('A divider D: the converter samples at its clock input / D'), {
        error: 'a list of whole-number clock dividers, e.g. [1, 2, 4]',
      })
      .min(1, { error: 'a list of at least one clock divider (1: undivided)' })
      .max(64, { error: 'a list of at most 64 clock dividers' })
      .meta({
        description:
          'Integer dividers the converter can apply to its clock input, each listed once, e.g. [1, 2, 4] (default [1]: undivided only)',
        uniqueItems: true,
      })
      .prefault([1]),
  })
  .meta({ description: 'The analog-to-digital converter' })
  .transform((written, ctx): Converter => {
    if (written.minRate > written.maxRate) {
      refuseAt(ctx, ['maxRate'], `a rate at or above minRate (${formatFrequency(written.minRate)})`, formatFrequency(written.maxRate), [
        ['minRate'],
      ]);
    }
    refuseRepeatedDividers(ctx, written.clockDividers);
    const intercepts = new Map(written.intercepts);
    if (written.intercept3 !== null) {
      const stated = intercepts.get(3);
      if (stated !== undefined && stated !== written.intercept3)
        refuseAt(
          ctx,
          ['intercept3'],
          `the same value as intercepts["3"] (${stated} dBFS), or only one of them`,
          `${written.intercept3} dBFS`,
          [['intercepts', '3']],
        );
      intercepts.set(3, written.intercept3);
    }
    const harmonics = new Map<number, Db>(
      Object.entries(written.harmonics)
        .map(([order, value]) => [Number(order), value] as const)
        .sort(([a], [b]) => a - b),
    );
    return {
      label: written.label,
      minRate: written.minRate,
      maxRate: written.maxRate,
      inputBandwidth: written.inputBandwidth,
      bits: written.bits,
      harmonics,
      intercept3: intercepts.get(3) ?? null,
      intercepts: new Map([...intercepts].sort(([a], [b]) => a - b)),
      rateSpurs: rateSpursModel(written.rateSpurs),
      interleave: written.interleave && interleaveModel(written.interleave),
      apertureJitter: written.apertureJitter,
      clockDividers: [...written.clockDividers].sort((a, b) => a - b),
    };
  });

/** The rate-tied spurs as the model holds them: fractions only when some are listed. */
function rateSpursModel(
  written: { dc: Db | null; halfRate: Db | null; quarterRate: Db | null; fractions: RateFractionSpur[] } | null,
): Converter['rateSpurs'] {
  if (written === null) return { dc: null, halfRate: null, quarterRate: null };
  const { fractions, ...common } = written;
  return fractions.length === 0 ? common : { ...common, fractions };
}

/** The interleaving as the model holds it: imageReference only when one is given. */
function interleaveModel({
  imageReference,
  ...rest
}: {
  ways: number;
  offsetSpur: Db;
  imageLevel: Db;
  imageReference: Hz | null;
}): Interleave {
  return imageReference === null ? rest : { ...rest, imageReference };
}

function refuseRepeatedDividers(ctx: z.RefinementCtx, dividers: readonly number[]): void {
  const firstAt = new Map<number, number>();
  dividers.forEach((divider, i) => {
    const first = firstAt.get(divider);
    if (first === undefined) firstAt.set(divider, i);
    else
      refuseAt(ctx, ['clockDividers', i], `a divider not listed already (clockDividers[${first}] is ${divider})`, String(divider), [
        ['clockDividers', first],
      ]);
  });
}
