import './zod-config.js';
import * as z from 'zod';
import { formatFrequency } from '../units/format-frequency.js';
import { hz } from '../units/quantities.js';
import type { AntiAliasFilter } from './scenario.js';
import { refuseAt } from './band-forms.js';
import { decibels, frequency, positiveFrequency, wholeNumber } from './scenario-fields.js';

const butterworth = z
  .strictObject({
    kind: z.literal('butterworth'),
    order: wholeNumber(1, 20, 'Filter order N'),
    passLow: frequency('Lower passband (3 dB) edge; 0 for a low-pass'),
    passHigh: positiveFrequency('Upper passband (3 dB) edge; leave out (or null) for a high-pass').nullable().prefault(null),
  })
  .meta({ description: 'A Butterworth band-pass of order N between its 3 dB edges (passLow 0: a low-pass; no passHigh: a high-pass)' });

const table = z
  .strictObject({
    kind: z.literal('table'),
    points: z
      .array(
        z.tuple([positiveFrequency('Frequency'), decibels('Attenuation, dB', 'an attenuation')], {
          error: 'a [frequency, attenuation dB] pair',
        }),
        {
          error: 'a list of [frequency, attenuation dB] pairs',
        },
      )
      .min(2, { error: 'at least 2 [frequency, attenuation dB] points' })
      .max(1000, { error: 'at most 1000 [frequency, attenuation dB] points' })
      .meta({ description: '[frequency, attenuation dB] points, frequencies strictly increasing; interpolated in dB over log-frequency' }),
  })
  .meta({ description: 'A measured or datasheet attenuation table' });

/**
 * The analog anti-alias filter as written: a Butterworth band-pass or a
 * table of points. Checks passLow < passHigh (passLow 0: a low-pass; passHigh
 * left out: a high-pass, held as Infinity; not both) and strictly increasing
 * table frequencies.
 */
export const filterSchema = z
  .discriminatedUnion('kind', [butterworth, table], { error: 'a filter: { "kind": "butterworth", ... } or { "kind": "table", ... }' })
  .meta({ description: 'The analog anti-alias filter; leave out (or null) for none' })
  .transform((written, ctx): AntiAliasFilter => {
    if (written.kind === 'butterworth') {
      const passHigh = written.passHigh ?? hz(Infinity);
      if (written.passLow === 0 && written.passHigh === null) {
        refuseAt(
          ctx,
          ['passLow'],
          'a frequency above 0 for a high-pass (passHigh left out); with passLow 0 and no passHigh the filter passes everything',
          '0 Hz',
          [['passHigh']],
        );
      } else if (written.passLow >= passHigh) {
        refuseAt(ctx, ['passHigh'], `a frequency above passLow (${formatFrequency(written.passLow)})`, formatFrequency(passHigh), [
          ['passLow'],
        ]);
      }
      return { kind: 'butterworth', order: written.order, passLow: written.passLow, passHigh };
    }
    const points = written.points.map(([f, attenuation]) => ({ frequency: f, attenuation }));
    points.forEach((point, i) => {
      const before = points[i - 1];
      if (before && point.frequency <= before.frequency) {
        refuseAt(
          ctx,
          ['points', i, 0],
          `a frequency above the point before (${formatFrequency(before.frequency)})`,
          formatFrequency(point.frequency),
          [['points', i - 1, 0]],
        );
      }
    });
    return { kind: 'table', points };
  });
