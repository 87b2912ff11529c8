import type * as z from 'zod';
import { formatFrequency } from '../units/format-frequency.js';
import { hz, type Hz } from '../units/quantities.js';
import type { Band } from '../math/band.js';

/** The key sets a band may be written with; exactly one must be used. */
export type BandForms = readonly (readonly BandKey[])[];
export type BandKey = 'low' | 'high' | 'center' | 'width' | 'frequency';

/** A band by its edges, or by its centre and width. */
export const EDGES_OR_CENTRE: BandForms = [
  ['low', 'high'],
  ['center', 'width'],
];
/** A tone by its frequency, or a band by its edges. */
export const TONE_OR_EDGES: BandForms = [['frequency'], ['low', 'high']];

/**
 * Pushes a refusal onto a zod context, with the received value already in
 * words (a frequency written for people, or `nothing`).
 *
 * @param path where the refusal sits, relative to the object being checked
 * @param related other fields the check compared, relative to the same
 *   object: the refusal is charged to whichever file wrote any of them last
 */
export function refuseAt(
  ctx: z.RefinementCtx,
  path: readonly (string | number)[],
  expected: string,
  received: string,
  related: readonly (readonly (string | number)[])[] = [],
): void {
  ctx.issues.push({
    code: 'custom',
    path: [...path],
    message: expected,
    input: received,
    params: { received, related, depth: path.length },
  });
}

/**
 * Reads a band written in one of several forms, checking that exactly one
 * form is used, completely, and that the band is not upside down.
 *
 * @param written the parsed keys, Hz (absent keys undefined, cleared keys null)
 * @param forms the allowed key sets
 * @param ctx the zod context that collects refusals (paths relative to the object)
 * @param zeroWidth whether low = high is allowed (a tone-like blocker); the
 *   wanted band must have width
 * @returns the band, or null after pushing at least one issue
 * @example resolveScenario(join(root, 'scenarios', 'heron-base.json'), (p) => readFileSync(p, 'utf8')).wanted // { low: 130e6, high: 150e6 } (its centre and width form, through bandFromForm)
 */
export function bandFromForm(
  written: Partial<Record<BandKey, Hz | null>>,
  forms: BandForms,
  ctx: z.RefinementCtx,
  zeroWidth: boolean,
): Band | null {
  // null clears a key, so a variant can switch forms over its base's.
  const given: Partial<Record<BandKey, Hz>> = Object.fromEntries(Object.entries(written).filter(([, value]) => value !== null));
  const words = forms.map((keys) => keys.join(' and ')).join(', or ');
  const used = forms.filter((keys) => keys.some((key) => given[key] !== undefined));
  const form = used[0];
  if (!form) {
    refuseAt(ctx, [], words, 'none of them');
    return null;
  }
  if (used.length > 1) {
    const keys = forms.flat().filter((key) => given[key] !== undefined);
    refuseAt(ctx, [], `either ${words}, not a mix (set a base's keys to null to clear them)`, keys.join(', '));
    return null;
  }
  const missing = form.filter((key) => given[key] === undefined);
  if (missing.length > 0) {
    const present = form.filter((key) => given[key] !== undefined);
    for (const key of missing) refuseAt(ctx, [key], `a frequency (with ${present.join(' and ')})`, 'nothing');
    return null;
  }
  const { low, high, center, width, frequency } = given;
  if (frequency !== undefined) return { low: frequency, high: frequency };
  if (center !== undefined && width !== undefined) return centred(center, width, ctx, zeroWidth);
  if (low === undefined || high === undefined) return null;
  if (high < low || (high === low && !zeroWidth)) {
    refuseAt(ctx, ['high'], `a frequency above low (${formatFrequency(low)})`, formatFrequency(high), [['low']]);
    return null;
  }
  return { low, high };
}

function centred(center: Hz, width: Hz, ctx: z.RefinementCtx, zeroWidth: boolean): Band | null {
  if (width === 0 && !zeroWidth) {
    refuseAt(ctx, ['width'], 'a width above zero', formatFrequency(width));
    return null;
  }
  if (width / 2 > center) {
    refuseAt(ctx, ['width'], `a width of at most twice the centre (${formatFrequency(center)})`, formatFrequency(width), [['center']]);
    return null;
  }
  const band = { low: hz(center - width / 2), high: hz(center + width / 2) };
  if (!zeroWidth && !(band.high > band.low)) {
    // Below the centre's last digit the edges round to one frequency (a width of 1e-300 Hz at 70 MHz).
    refuseAt(
      ctx,
      ['width'],
      `a width the centre's precision can hold (edges that differ at ${formatFrequency(center)})`,
      formatFrequency(width),
      [['center']],
    );
    return null;
  }
  return band;
}
