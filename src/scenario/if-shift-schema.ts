import './zod-config.js';
import * as z from 'zod';
import { formatFrequency } from '../units/format-frequency.js';
import type { Hz } from '../units/quantities.js';
import { refuseAt } from './band-forms.js';
import { signedFrequency } from './scenario-fields.js';

/**
 * How far the IF centre may move when the first LO is retuned, as a signed
 * range of shifts (`{ "low": "-5M", "high": "5M" }`), low ≤ high. The checks
 * against the wanted band and the converter run with the whole scenario.
 */
export const ifShiftSchema = z
  .strictObject({
    low: signedFrequency('Lowest shift of the IF centre (negative: downwards)'),
    high: signedFrequency('Highest shift of the IF centre, at or above low'),
  })
  .meta({ description: 'How far the IF may move when the first LO is retuned; leave out (or null) for a fixed LO' })
  .transform((written, ctx): { readonly low: Hz; readonly high: Hz } => {
    if (written.low > written.high) {
      refuseAt(ctx, ['high'], `a shift at or above low (${formatFrequency(written.low)})`, formatFrequency(written.high), [['low']]);
    }
    return { low: written.low, high: written.high };
  });
