import './zod-config.js';
import * as z from 'zod';
import { hz } from '../units/quantities.js';
import type { Goal, Requirements, WantedBand } from './scenario.js';
import { bandFromForm, EDGES_OR_CENTRE, refuseAt } from './band-forms.js';
import {
  decibels,
  frequency,
  guardWidth,
  levelAtMostFullScale,
  oneFormOf,
  positiveFrequency,
  tolerance,
  type GuardWidth,
} from './scenario-fields.js';
import { kindMarginsSchema } from './interferer-model-schema.js';

/** The wanted IF band, by low/high or center/width, with its planning levels. */
export const wantedSchema = z
  .strictObject({
    low: frequency('Lower edge (or give center and width)').nullable().optional(),
    high: frequency('Upper edge').nullable().optional(),
    center: frequency('Centre (with width)').nullable().optional(),
    width: frequency('Width (with center)').nullable().optional(),
    weakestLevel: levelAtMostFullScale('Weakest wanted level at which the requirements apply, dBFS'),
    strongestLevel: levelAtMostFullScale('Strongest wanted level, dBFS: the level harmonic figures are quoted at (default -1)').prefault(
      -1,
    ),
  })
  .meta({ description: 'The wanted IF band', ...oneFormOf(EDGES_OR_CENTRE) })
  .transform((written, ctx): WantedBand => {
    const band = bandFromForm(written, EDGES_OR_CENTRE, ctx, false);
    if (written.strongestLevel < written.weakestLevel) {
      refuseAt(
        ctx,
        ['strongestLevel'],
        `a level at or above weakestLevel (${written.weakestLevel} dBFS)`,
        `${written.strongestLevel} dBFS`,
        [['weakestLevel']],
      );
    }
    if (!band) return z.NEVER;
    return { ...band, weakestLevel: written.weakestLevel, strongestLevel: written.strongestLevel };
  });

/** The two guard widths, still possibly percentages of the wanted width. */
export interface GuardSides {
  readonly low: GuardWidth;
  readonly high: GuardWidth;
}

const NO_GUARD: GuardWidth = { hz: hz(0) };

/** Guard bands: one value for both sides, or per side (each default 0). */
export const guardSchema = z
  .union([guardWidth, z.strictObject({ low: guardWidth.optional(), high: guardWidth.optional() })], {
    error: 'a guard: a frequency or percentage for both sides, or { "low": ..., "high": ... }',
  })
  .meta({ description: "Guard bands for the anti-alias filter's transitions: one value for both sides, or per side (default 0)" })
  .transform((written): GuardSides =>
    'hz' in written || 'percent' in written
      ? { low: written, high: written }
      : { low: written.low ?? NO_GUARD, high: written.high ?? NO_GUARD },
  );

/** What the plan must keep: frequency margin, rejection, drift. */
export const requirementsSchema = z
  .strictObject({
    margin: frequency("Frequency margin to keep between a blocking interferer's alias and the wanted alias"),
    rejection: decibels('An interferer this many dB below the weakest wanted level may land anywhere', 'a rejection'),
    tolerancePpm: tolerance.meta({ description: 'Drift a solved rate (not a listed clock) must survive, ±ppm (default 50)' }).prefault(50),
    kindMargins: kindMarginsSchema.optional(),
  })
  .meta({ description: 'What a frequency plan must keep' })
  .transform(({ kindMargins, ...written }): Requirements => (kindMargins ? { ...written, kindMargins } : written));

const GOAL_KINDS = ['widest-margin', 'lowest-rate', 'quarter-rate'] as const;

/** What "best" means inside a feasible interval. */
export const goalSchema = z
  .union(
    [
      z.enum(GOAL_KINDS),
      z.discriminatedUnion('kind', [
        z.strictObject({ kind: z.literal('widest-margin') }),
        z.strictObject({ kind: z.literal('lowest-rate') }),
        z.strictObject({ kind: z.literal('quarter-rate') }),
        z.strictObject({
          kind: z.literal('decimation'),
          outputRate: positiveFrequency('Output rate the sample rate must be a whole multiple of'),
        }),
      ]),
    ],
    { error: `a goal: ${GOAL_KINDS.map((k) => `"${k}"`).join(', ')} or { "kind": "decimation", "outputRate": ... }` },
  )
  .meta({ description: 'What "best" means for a rate inside a feasible interval (default "widest-margin")' })
  .transform((written): Goal => (typeof written === 'string' ? { kind: written } : written));
