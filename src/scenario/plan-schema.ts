import './zod-config.js';
import * as z from 'zod';
import { hz } from '../units/quantities.js';
import type { Goal, Requirements, WantedBand } from './scenario.js';
import { bandFromForm, EDGES_OR_CENTRE, refuseAt } from './band-forms.js';
import {
  decibels,
  frequency,
  guardWidth,
  label,
  levelAtMostFullScale,
  oneFormOf,
  positiveFrequency,
  tolerance,
  type GuardWidth,
} from './scenario-fields.js';
import { kindMarginsSchema } from './interferer-model-schema.js';

/** The fields of a wanted band, shared by the single `wanted` object and each channel of a `wanted` list. */
const wantedFields = {
  low: frequency('Lower edge (or give center and width)').nullable().optional(),
  high: frequency('Upper edge').nullable().optional(),
  center: frequency('Centre (with width)').nullable().optional(),
  width: frequency('Width (with center)').nullable().optional(),
  weakestLevel: levelAtMostFullScale('Weakest wanted level at which the requirements apply, dBFS'),
  strongestLevel: levelAtMostFullScale('Strongest wanted level, dBFS: the level harmonic figures are quoted at (default -1)').prefault(-1),
};

/** The band and levels of a wanted band as written, checked: one band form, strongest at or above weakest. */
function wantedBandOf(written: z.output<z.ZodObject<typeof wantedFields>>, ctx: z.RefinementCtx): WantedBand | typeof z.NEVER {
  const band = bandFromForm(written, EDGES_OR_CENTRE, ctx, false);
  if (written.strongestLevel < written.weakestLevel) {
    refuseAt(ctx, ['strongestLevel'], `a level at or above weakestLevel (${written.weakestLevel} dBFS)`, `${written.strongestLevel} dBFS`, [
      ['weakestLevel'],
    ]);
  }
  if (!band) return z.NEVER;
  return { ...band, weakestLevel: written.weakestLevel, strongestLevel: written.strongestLevel };
}

/** The wanted IF band, by low/high or center/width, with its planning levels. */
export const wantedSchema = z
  .strictObject(wantedFields)
  .meta({ description: 'The wanted IF band', ...oneFormOf(EDGES_OR_CENTRE) })
  .transform((written, ctx): WantedBand => wantedBandOf(written, ctx));

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
    channelSpacing: frequency(
      "Margin to keep between one channel's alias and another's, with a list of channels in wanted (default: margin)",
    ).optional(),
  })
  .meta({ description: 'What a frequency plan must keep' })
  .transform(({ kindMargins, channelSpacing, ...written }): Requirements => ({
    ...written,
    ...(kindMargins ? { kindMargins } : {}),
    ...(channelSpacing === undefined ? {} : { channelSpacing }),
  }));

/** What one channel of a `wanted` list states for itself: each field replaces the scenario's requirement of that name. */
const channelRequirementsSchema = z
  .strictObject({
    margin: frequency("Frequency margin to keep between a blocking interferer's alias and this channel's alias").optional(),
    rejection: decibels("An interferer this many dB below this channel's weakest level may land anywhere", 'a rejection').optional(),
    kindMargins: kindMarginsSchema.optional(),
    channelSpacing: frequency("Margin to keep between another channel's alias and this channel's alias").optional(),
  })
  .meta({ description: "This channel's own requirements: each field given replaces the scenario's (requirements)" });

/** One channel of a `wanted` list as written: its band and levels, and its guards and requirements when they differ from the scenario's. */
export interface ChannelDraft extends WantedBand {
  readonly label: string;
  /** The channel's own guard, or null: the scenario's. */
  readonly guard: GuardSides | null;
  readonly requirements: Partial<Pick<Requirements, 'margin' | 'rejection' | 'kindMargins' | 'channelSpacing'>>;
}

/** One channel of a `wanted` list (the converter's harmonic figures are quoted at the first channel's strongestLevel). */
export const channelSchema = z
  .strictObject({
    label: label.meta({ description: 'The channel\'s name, unique in the scenario, e.g. "L1"' }),
    ...wantedFields,
    guard: guardSchema.optional(),
    requirements: channelRequirementsSchema.optional(),
  })
  .meta({ description: 'One channel digitised by the converter', ...oneFormOf(EDGES_OR_CENTRE) })
  .transform((written, ctx): ChannelDraft => {
    const band = wantedBandOf(written, ctx);
    if (band === z.NEVER) return z.NEVER;
    const own = written.requirements ?? {};
    const requirements = Object.fromEntries(Object.entries(own).filter(([, value]) => value !== undefined));
    return { label: written.label, ...band, guard: written.guard ?? null, requirements };
  });

/** Most channels in one scenario: each is judged against every interferer and every other channel. */
export const MOST_CHANNELS = 16;

/** The wanted band: one object (one channel), or a list of labelled channels. */
export const wantedOrChannelsSchema = z.union(
  [
    wantedSchema,
    z
      .array(channelSchema)
      .min(1, { error: 'a list of at least one channel' })
      .max(MOST_CHANNELS, { error: `a list of at most ${MOST_CHANNELS} channels` })
      .meta({ description: `Several channels through one converter (at most ${MOST_CHANNELS}), each with a label` }),
  ],
  { error: 'the wanted band as an object, or a list of channels each with a label' },
);

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
