import './zod-config.js';
import * as z from 'zod';
import { formatFrequency } from '../units/format-frequency.js';
import { ppm } from '../units/quantities.js';
import type { ClockPart, IntegerRange, RateDerivation } from './scenario.js';
import { refuseAt } from './band-forms.js';
import { countFromOne, label, positiveFrequency, time, tolerance } from './scenario-fields.js';

/** Most (M, D) pairs of a synthesiser: the planner searches N for each pair. */
export const MOST_DIVIDER_PAIRS = 4096;

const RANGE_WORDS = 'a whole number 1 or more, or a [min, max] pair of them';

/**
 * An inclusive integer range written as one whole number (`40`: exactly
 * that) or a `[min, max]` pair; both ends at least 1 and min ≤ max.
 */
const integerRange = (description: string) =>
  z
    .union([countFromOne('The one value allowed'), z.tuple([countFromOne('Least value'), countFromOne('Greatest value')])], {
      error: RANGE_WORDS,
    })
    .meta({ description: `${description}: one whole number, or [min, max]` })
    .transform((written, ctx): IntegerRange => {
      const [min, max] = typeof written === 'number' ? [written, written] : written;
      if (min > max) refuseAt(ctx, [1], `a whole number at or above min (${min})`, String(max), [[0]]);
      return { min, max };
    });

/** The VCO's lock range, low strictly below high. */
const vcoRange = z
  .strictObject({
    low: positiveFrequency('Lowest VCO frequency'),
    high: positiveFrequency('Highest VCO frequency'),
  })
  .meta({ description: 'The range the VCO (f × N / M) must stay inside; leave out (or null) when any frequency will do' })
  .transform((written, ctx) => {
    if (written.low >= written.high) {
      refuseAt(ctx, ['high'], `a frequency above low (${formatFrequency(written.low)})`, formatFrequency(written.high), [['low']]);
    }
    return { low: written.low, high: written.high };
  });

const synthesiser = z
  .strictObject({
    kind: z.literal('synthesiser'),
    n: integerRange('Feedback multiplier N'),
    m: integerRange('Reference divider M'),
    d: integerRange('Output divider D (default [1, 1])').prefault([1, 1]),
    vco: vcoRange.nullable().prefault(null),
  })
  .meta({
    description: `A synthesiser fed by the part: rate = f × N / (M × D), with the VCO at f × N / M; at most ${MOST_DIVIDER_PAIRS} (M, D) pairs`,
  })
  .superRefine((written, ctx) => {
    const pairs = (written.m.max - written.m.min + 1) * (written.d.max - written.d.min + 1);
    if (pairs > MOST_DIVIDER_PAIRS) {
      refuseAt(
        ctx,
        ['m'],
        `ranges of M and D that give at most ${MOST_DIVIDER_PAIRS} (M, D) pairs, each planned on its own; narrow m or d`,
        `${pairs} pairs`,
        [['d']],
      );
    }
  });

const DERIVE_WORDS = ['direct', 'divider'] as const;

/** How the part's frequency becomes a sample rate. */
const derivation = z
  .union(
    [
      z.enum(DERIVE_WORDS),
      z.discriminatedUnion('kind', [
        z.strictObject({ kind: z.literal('direct') }),
        z.strictObject({ kind: z.literal('divider') }),
        synthesiser,
      ]),
    ],
    { error: 'a derivation: "direct", "divider" or { "kind": "synthesiser", "n": ..., "m": ... }' },
  )
  .meta({
    description:
      'How the part gives a sample rate: "direct" (its own frequency, the default), "divider" (f / D for each of converter.clockDividers) or a synthesiser',
  })
  .transform((written): RateDerivation => (typeof written === 'string' ? { kind: written } : written));

/** Tolerance as one total or as its three contributions, ±ppm. */
const partTolerance = z
  .union(
    [
      tolerance,
      z
        .strictObject({
          initial: tolerance.meta({ description: 'Initial (calibration at 25 °C) tolerance, ±ppm' }),
          temperature: tolerance.meta({ description: 'Stability over the operating temperature range, ±ppm' }),
          ageing: tolerance.meta({ description: 'Ageing over the service life, ±ppm' }),
        })
        .meta({ description: 'The contributions, ±ppm; the part is planned for their sum' }),
    ],
    { error: 'a tolerance in ppm, or { "initial": ..., "temperature": ..., "ageing": ... } in ppm' },
  )
  .meta({ description: 'Frequency tolerance, ±ppm: one total, or its contributions (summed)' });

/**
 * A clock part as written in a scenario file: label, nominal frequency,
 * tolerance (a total or initial + temperature + ageing), optional rms jitter
 * and note, and how it becomes a sample rate (directly, through the
 * converter's clock dividers, or through a synthesiser with integer ranges
 * for N, M and D and an optional VCO range). Checks each range (min ≤ max)
 * and the VCO range (low < high).
 */
export const clockPartSchema = z
  .strictObject({
    label,
    frequency: positiveFrequency('Nominal frequency of the part, e.g. "122.88M"'),
    tolerance: partTolerance,
    jitter: time
      .meta({ description: 'rms jitter of the part: seconds as a number, or text such as "90 fs", "0.3 ps"; leave out when not known' })
      .nullable()
      .prefault(null),
    note: z.string().default('').meta({ description: 'Free text for people: cost, stock, preference' }),
    derive: derivation.prefault('direct'),
  })
  .meta({ description: 'A clock part: a crystal or oscillator, or a reference feeding a synthesiser' })
  .transform((written): ClockPart => ({
    label: written.label,
    frequency: written.frequency,
    tolerancePpm:
      typeof written.tolerance === 'number'
        ? written.tolerance
        : ppm(written.tolerance.initial + written.tolerance.temperature + written.tolerance.ageing),
    toleranceBreakdown: typeof written.tolerance === 'number' ? null : { ...written.tolerance },
    jitter: written.jitter,
    note: written.note,
    derivation: written.derive,
  }));
