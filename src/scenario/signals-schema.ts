import './zod-config.js';
import * as z from 'zod';
import type { BoardSpur, Neighbour } from './scenario.js';
import { bandFromForm, EDGES_OR_CENTRE, refuseAt, TONE_OR_EDGES } from './band-forms.js';
import { frequency, label, level, oneFormOf, wholeNumber } from './scenario-fields.js';
import { ownMarginSchema } from './interferer-model-schema.js';

/** A fixed tone or band on the board: reference clock, LO leakage, regulator. */
export const boardSpurSchema = z
  .strictObject({
    label,
    frequency: frequency('A tone at this frequency (or give low and high for a band)').nullable().optional(),
    low: frequency('Lower edge of a band-shaped spur').nullable().optional(),
    high: frequency('Upper edge of a band-shaped spur').nullable().optional(),
    level: level("Level, dBFS at the converter (at most 0), or at the filter's input when coupling is before-filter (may exceed 0)"),
    coupling: z
      .enum(['before-filter', 'after-filter'])
      .default('after-filter')
      .meta({ description: 'Where it enters: ahead of the anti-alias filter or past it (default)' }),
    harmonics: wholeNumber(1, 20, 'Highest harmonic order of the spur itself (1: the fundamental only)').default(1),
    margin: ownMarginSchema,
  })
  .meta({ description: 'A spur from the board: a tone (frequency) or a band (low, high)', ...oneFormOf(TONE_OR_EDGES) })
  .transform((written, ctx): BoardSpur => {
    const band = bandFromForm(written, TONE_OR_EDGES, ctx, true);
    if (written.coupling === 'after-filter' && written.level > 0) {
      const words =
        'a level at the converter of at most 0 dBFS (full scale); above it only at the filter\'s input, with coupling "before-filter"';
      refuseAt(ctx, ['level'], words, `${written.level} dBFS`, [['coupling']]);
    }
    if (!band) return z.NEVER;
    return {
      label: written.label,
      ...band,
      level: written.level,
      coupling: written.coupling,
      harmonics: written.harmonics,
      ...(written.margin === null ? {} : { margin: written.margin }),
    };
  });

/** A neighbour channel or blocker: a band with its level at the filter's input. */
export const neighbourSchema = z
  .strictObject({
    label,
    low: frequency('Lower edge (or give center and width)').nullable().optional(),
    high: frequency('Upper edge').nullable().optional(),
    center: frequency('Centre (with width)').nullable().optional(),
    width: frequency('Width (with center); 0 for a single tone').nullable().optional(),
    level: level("Level at the filter's input, dBFS (referred to converter full scale)"),
    margin: ownMarginSchema,
  })
  .meta({ description: 'A neighbour channel or blocker, by low/high or center/width', ...oneFormOf(EDGES_OR_CENTRE) })
  .transform((written, ctx): Neighbour => {
    const band = bandFromForm(written, EDGES_OR_CENTRE, ctx, true);
    if (!band) return z.NEVER;
    return { label: written.label, ...band, level: written.level, ...(written.margin === null ? {} : { margin: written.margin }) };
  });
