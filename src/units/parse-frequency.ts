import { InputError } from './input-error.js';
import { hz, type Hz } from './quantities.js';

const NUMBER = String.raw`(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?`;
const WRITTEN = new RegExp(String.raw`^(${NUMBER})\s*([A-Za-z]*)$`);
// Prefixes as powers of ten: the prefix joins the decimal exponent, so '1.001M' reads as
// the double nearest 1 001 000 (multiplying by 1e6 would give 1000999.9999999999).
const PREFIX_POWER: Readonly<Record<string, number>> = { '': 0, k: 3, M: 6, G: 9 };

/**
 * The highest frequency read, Hz (1 THz): far above any converter's input,
 * and low enough that the folding work it implies stays bounded.
 */
export const MOST_FREQUENCY = 1e12;

/**
 * Reads a frequency as engineers write it: plain hertz (`70000000`, `70e6`) or
 * a number with an SI prefix and an optional unit (`70M`, `70 MHz`, `455k`,
 * `2.4G`, `10.7e6 Hz`). Prefixes are case-sensitive as in SI; the unit `Hz`
 * is accepted in any case. A plain JSON number is taken as hertz.
 *
 * @param written the text (or number of hertz) to read
 * @param where the option or path named in an error, e.g. `--low`
 * @returns the frequency in Hz, finite, not negative, at most MOST_FREQUENCY (1 THz)
 * @throws InputError naming `where` and the value, for an empty text, NaN,
 *   an infinity, a negative value, a value above 1 THz, a non-zero value too
 *   small for a double (`1e-400`), an exponent together with a prefix
 *   (`1e6k`), an unknown unit, or a lower-case `m` (milli, nearly always a
 *   typo for M)
 * @example parseFrequency('12.288 MHz', '--rate') // 12288000
 */
export function parseFrequency(written: string | number, where: string): Hz {
  if (typeof written === 'number') return checkedNumber(written, String(written), where);
  const text = written.trim();
  if (text === '') throw new InputError(where, 'a frequency such as 70M or 455 kHz', written);
  if (/^[-−]/.test(text)) throw new InputError(where, 'a frequency that is not negative', written);
  const match = WRITTEN.exec(text);
  if (!match) throw new InputError(where, 'a frequency such as 70M, 70 MHz, 455k or 70e6', written);
  const [, digits = '', suffix = ''] = match;
  const prefix = unitPrefix(suffix, digits, written, where);
  const [mantissa = '', exponent = '0'] = digits.split(/[eE]/);
  if (prefix !== '' && /[eE]/.test(digits)) {
    throw new InputError(where, `a frequency with an exponent or a prefix, not both (${digits} Hz, or ${mantissa}${prefix})`, written);
  }
  if (/[1-9]/.test(mantissa) && Number(`${mantissa}e${Number(exponent) + (PREFIX_POWER[prefix] ?? 0)}`) === 0) {
    throw new InputError(where, 'a frequency above zero that a double can hold (this one underflows to 0)', written);
  }
  const power = Number(exponent) + (PREFIX_POWER[prefix] ?? 0);
  return checkedNumber(Number(`${mantissa}e${power}`), written, where);
}

function unitPrefix(suffix: string, digits: string, written: string, where: string): string {
  const prefix = /hz$/i.test(suffix) ? suffix.slice(0, -2) : suffix;
  if (Object.hasOwn(PREFIX_POWER, prefix)) return prefix;
  if (prefix === 'm') {
    throw new InputError(where, `a frequency; 'm' is milli, write ${digits}M for megahertz`, written);
  }
  if (prefix === 'K') throw new InputError(where, `a frequency; the SI prefix for kilo is lower-case: ${digits}k`, written);
  if (prefix === 'g') throw new InputError(where, `a frequency; the SI prefix for giga is upper-case: ${digits}G`, written);
  throw new InputError(where, 'a frequency with unit Hz, kHz, MHz or GHz (or k, M, G)', written);
}

function checkedNumber(value: number, written: string, where: string): Hz {
  if (Number.isNaN(value)) throw new InputError(where, 'a frequency, not NaN', written);
  if (!Number.isFinite(value)) throw new InputError(where, 'a finite frequency', written);
  if (value < 0) throw new InputError(where, 'a frequency that is not negative', written);
  if (value > MOST_FREQUENCY) throw new InputError(where, 'a frequency of at most 1 THz (1e12 Hz)', written);
  return hz(value);
}
