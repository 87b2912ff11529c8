import * as z from 'zod';
import { InputError } from '../units/input-error.js';
import { parseFrequency } from '../units/parse-frequency.js';
import { parseTime } from '../units/parse-time.js';
import { db, hz, ppm, type Db, type Hz, type Ppm, type Seconds } from '../units/quantities.js';

/*
 * Field schemas shared by the scenario file format. Each reads what a person
 * writes (text with units, plain numbers) and yields branded numbers; a
 * refusal becomes a zod issue whose message is the `expected` words of the
 * unit parser, so the path zod attaches names the field.
 */

const FREQUENCY_WORDS = 'a frequency: hertz as a number, or text such as "70M", "70 MHz", "455k"';

/** Pushes an InputError from a unit parser as a zod issue at the field. */
function refuse(ctx: z.RefinementCtx, error: unknown, value: unknown): never {
  if (!(error instanceof InputError)) throw error;
  ctx.issues.push({ code: 'custom', message: error.expected, input: value });
  return z.NEVER;
}

const frequencyText = z
  .union([z.string(), z.number()], { error: FREQUENCY_WORDS })
  .transform((value, ctx): Hz => {
    try {
      return parseFrequency(value, '');
    } catch (error) {
      return refuse(ctx, error, value);
    }
  });

const positiveFrequencyText = frequencyText.refine((value) => value > 0, { error: 'a frequency above zero' });
const FREQUENCY_HINT = 'hertz as a number, or text such as "70M", "70 MHz", "455k"';

/**
 * A frequency ≥ 0 field: hertz as a number, or text with a prefix (`70M`,
 * `455 kHz`), read by parseFrequency.
 *
 * @param description what the field means, for the JSON Schema
 */
export const frequency = (description: string) => frequencyText.meta({ description: `${description}: ${FREQUENCY_HINT}` });

/** A frequency field above zero (rates, bandwidths). */
export const positiveFrequency = (description: string) => positiveFrequencyText.meta({ description: `${description}: ${FREQUENCY_HINT}` });

const SIGNED_WORDS = 'a frequency, signed: hertz as a number, or text such as "-5M", "+2.5 MHz", "455k"';
const SIGN = /^[-−+]/;

/** A signed frequency: parseFrequency reads the magnitude after one leading sign. */
function signedHz(value: string | number): Hz {
  if (typeof value === 'number') {
    const magnitude = parseFrequency(Math.abs(value), '');
    return value < 0 ? hz(-magnitude) : magnitude;
  }
  const text = value.trim();
  const sign = SIGN.exec(text)?.[0];
  if (sign === undefined) return parseFrequency(text, '');
  const rest = text.slice(sign.length);
  if (SIGN.test(rest.trim())) throw new InputError('', 'a frequency with at most one sign, such as -5M', value);
  const magnitude = parseFrequency(rest, '');
  // A minus on zero gives 0, not -0, so the value reads back equal to itself.
  return sign === '+' || magnitude === 0 ? magnitude : hz(-magnitude);
}

const signedFrequencyText = z.union([z.string(), z.number()], { error: SIGNED_WORDS }).transform((value, ctx): Hz => {
  try {
    return signedHz(value);
  } catch (error) {
    return refuse(ctx, error, value);
  }
});

/**
 * A frequency field that may be negative (a shift, an offset): a leading
 * `-` (or `−`, or `+`) then what parseFrequency reads, or a plain number of
 * hertz of either sign.
 *
 * @param description what the field means, for the JSON Schema
 * @example signedFrequency('Lowest shift').parse('-5M') // -5000000
 */
export const signedFrequency = (description: string) =>
  signedFrequencyText.meta({ description: `${description}: hertz as a number of either sign, or text such as "-5M", "+2.5 MHz"` });

/** A time ≥ 0 in seconds, or text with a unit (`150 fs`, `0.2 ps`). */
export const time = z
  .union([z.string(), z.number()], { error: 'a time: seconds as a number, or text such as "150 fs", "0.2 ps"' })
  .transform((value, ctx): Seconds => {
    try {
      return parseTime(value, '');
    } catch (error) {
      return refuse(ctx, error, value);
    }
  });

/** A level in decibels (dBFS or dBc as the field says). */
export const level = (description: string) => z.number().meta({ description }).transform((value): Db => db(value));

/** A level at or below full scale, dBFS. */
export const levelAtMostFullScale = (description: string) =>
  z
    .number()
    .max(0, { error: 'a level in dBFS at most 0 (full scale)' })
    .meta({ description })
    .transform((value): Db => db(value));

/** A tolerance in ±ppm, not negative. */
export const tolerance = z
  .number()
  .min(0, { error: 'a tolerance in ppm, not negative' })
  .meta({ description: 'Tolerance, ±ppm' })
  .transform((value): Ppm => ppm(value));

/** A label naming a part or signal: text that is not blank. */
export const label = z.string().regex(/\S/, { error: 'a label that is not blank' }).meta({ description: 'A name for people, e.g. "XO-A 122.88M"' });

/** A whole number from least to most. */
export const wholeNumber = (least: number, most: number, description: string) =>
  z
    .number({ error: `a whole number from ${least} to ${most}` })
    .int({ error: `a whole number from ${least} to ${most}` })
    .min(least, { error: `a whole number from ${least} to ${most}` })
    .max(most, { error: `a whole number from ${least} to ${most}` })
    .meta({ description });

/**
 * A whole number 1 or more, with no upper limit beyond exact doubles (a
 * divider or a synthesiser setting).
 *
 * @param description what the field means, for the JSON Schema
 */
export const countFromOne = (description: string) =>
  z
    .number({ error: 'a whole number 1 or more' })
    .int({ error: 'a whole number 1 or more' })
    .min(1, { error: 'a whole number 1 or more' })
    .meta({ description });

/** A guard width before the band is known: Hz, or a percentage of the band's width. */
export type GuardWidth = { readonly hz: Hz } | { readonly percent: number };

const PERCENT = /^\s*(\d+\.?\d*|\.\d+)\s*%\s*$/;

/** One guard side: a frequency, or `10%` of the wanted band's width. */
export const guardWidth = z
  .union([z.string(), z.number()], { error: 'a guard: a frequency such as "2M", or a percentage of the wanted width such as "10%"' })
  .meta({ description: 'Guard band: a frequency such as "2M", or a percentage of the wanted width such as "10%"' })
  .transform((value, ctx): GuardWidth => {
    const percent = typeof value === 'string' ? PERCENT.exec(value) : null;
    if (percent) return { percent: Number(percent[1]) };
    try {
      return { hz: parseFrequency(value, '') };
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      ctx.issues.push({ code: 'custom', message: `${error.expected}, or a percentage of the wanted width such as "10%"`, input: value });
      return z.NEVER;
    }
  });

/** The guard in Hz once the wanted band's width is known. */
export function guardHz(width: GuardWidth, bandwidth: Hz): Hz {
  return 'hz' in width ? width.hz : hz((width.percent / 100) * bandwidth);
}

/**
 * JSON Schema words for "exactly one of these key sets": each form requires
 * its keys (not null) and forbids the other forms' keys unless null (null
 * clears a key inherited from a base). The runtime check in band-forms.ts
 * reads the same lists, so the two cannot disagree.
 *
 * @param forms the key sets, e.g. [['low', 'high'], ['center', 'width']]
 * @returns a `oneOf` to spread into an object schema's metadata
 */
export function oneFormOf(forms: readonly (readonly string[])[]): { oneOf: object[] } {
  const all = [...new Set(forms.flat())];
  const given = (keys: readonly string[]) => ({
    required: [...keys],
    properties: Object.fromEntries(keys.map((key) => [key, { not: { type: 'null' } }])),
  });
  return {
    oneOf: forms.map((keys) => ({
      ...given(keys),
      not: { anyOf: all.filter((key) => !keys.includes(key)).map((key) => given([key])) },
    })),
  };
}
