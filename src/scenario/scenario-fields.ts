import './zod-config.js';
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

const frequencyText = z.union([z.string(), z.number()], { error: FREQUENCY_WORDS }).transform((value, ctx): Hz => {
  try {
    return parseFrequency(value, '');
  } catch (error) {
    return refuse(ctx, error, value);
  }
});

const positiveFrequencyText = frequencyText.refine((value) => value > 0, { error: 'a frequency above zero' });
const FREQUENCY_HINT = 'hertz as a number, or text such as "70M", "70 MHz", "455k"; at most 1 THz';

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

/**
 * Bounds on levels, dB. Nothing the tool models lies beyond them: a 32-bit
 * converter spans about 194 dB, and the filter model caps attenuation at
 * 300 dB. Each bound also catches a dropped minus sign.
 */
export const LEVEL_BOUNDS = {
  /** Lowest level of any kind, dB. */
  floor: -300,
  /** Highest level at the filter's input (neighbours, blockers, spurs coupled before the filter), dBFS. */
  filterInput: 100,
} as const;

/** A level number within [least, most], refused in one wording when outside. */
const boundedLevel = (description: string, least: number, most: number, words: string, strictlyBelow = false) => {
  const number = z.number().min(least, { error: words });
  return (strictlyBelow ? number.lt(most, { error: words }) : number.max(most, { error: words }))
    .meta({ description })
    .transform((value): Db => db(value));
};

/**
 * A level in dBFS at the filter's input (a neighbour, a blocker, a spur
 * coupled before the filter): it may exceed full scale, the filter takes it down.
 *
 * @param description what the field means, for the JSON Schema
 */
export const level = (description: string) =>
  boundedLevel(
    description,
    LEVEL_BOUNDS.floor,
    LEVEL_BOUNDS.filterInput,
    `a level in dBFS from ${LEVEL_BOUNDS.floor} to +${LEVEL_BOUNDS.filterInput}`,
  );

/** A level at the converter, dBFS: at most 0 (full scale). */
export const levelAtMostFullScale = (description: string) =>
  boundedLevel(description, LEVEL_BOUNDS.floor, 0, `a level in dBFS at most 0 (full scale) and at least ${LEVEL_BOUNDS.floor}`);

/**
 * A figure relative to the carrier, dBc, below 0: a harmonic, an image, a
 * spur quoted against the signal that makes it (+75 is a dropped minus sign).
 *
 * @param description what the field means, for the JSON Schema
 */
export const levelBelowCarrier = (description: string) =>
  boundedLevel(description, LEVEL_BOUNDS.floor, 0, `a level in dBc below 0, from ${LEVEL_BOUNDS.floor} (e.g. -75)`, true);

/** A positive amount of decibels (an attenuation, a rejection): 0 to 300 dB. */
export const decibels = (description: string, words: string) =>
  boundedLevel(description, 0, -LEVEL_BOUNDS.floor, `${words} from 0 to ${-LEVEL_BOUNDS.floor} dB`);

/** A tolerance in ±ppm, not negative. */
export const tolerance = z
  .number()
  .min(0, { error: 'a tolerance in ppm, not negative' })
  .max(1e6, { error: 'a tolerance in ppm of at most 1000000 (100 %)' })
  .meta({ description: 'Tolerance, ±ppm' })
  .transform((value): Ppm => ppm(value));

/** A label naming a part or signal: text that is not blank. */
export const label = z
  .string()
  .regex(/\S/, { error: 'a label that is not blank' })
  .meta({ description: 'A name for people, e.g. "XO-A 122.88M"' });

/** A whole number from least to most. */
export const wholeNumber = (least: number, most: number, description: string) =>
  z
    .number({ error: `a whole number from ${least} to ${most}` })
    .int({ error: `a whole number from ${least} to ${most}` })
    .min(least, { error: `a whole number from ${least} to ${most}` })
    .max(most, { error: `a whole number from ${least} to ${most}` })
    .meta({ description });

/** Largest divider or synthesiser setting (N, M, D): far beyond any part, and exact in a double. */
export const MOST_SETTING = 1_000_000_000;

/**
 * A whole number from 1 to MOST_SETTING (a divider or a synthesiser setting).
 *
 * @param description what the field means, for the JSON Schema
 */
export const countFromOne = (description: string) => {
  const words = 'a whole number 1 or more';
  return z
    .number({ error: words })
    .int({ error: words })
    .min(1, { error: words })
    .max(MOST_SETTING, { error: `a whole number at most ${MOST_SETTING}` })
    .meta({ description });
};

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
