import { InputError } from './input-error.js';
import { seconds, type Seconds } from './quantities.js';

const NUMBER = String.raw`(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?`;
const WRITTEN = new RegExp(String.raw`^(${NUMBER})\s*([A-Za-zµμ]*)$`);
/**
 * Divisors of the SI sub-multiples (BIPM, The International System of Units,
 * 9th ed., Table 7). Each is an integer power of ten exactly representable in
 * a double, so `digits / divisor` is one correctly rounded operation and
 * `150 fs` reads as the same double as the literal 150e-15.
 */
const PREFIX_DIVISOR: Readonly<Record<string, number>> = { '': 1, m: 1e3, u: 1e6, µ: 1e6, μ: 1e6, n: 1e9, p: 1e12, f: 1e15 };

/**
 * Reads a time as engineers write it: plain seconds (`1e-12`) or a number
 * with a unit `s`, `ms`, `us` (or `µs`), `ns`, `ps`, `fs`, with or without a
 * space (`150 fs`, `0.2 ps`, `80fs`, `1.5 ns`). A plain JSON number is taken
 * as seconds. Prefixes are case-sensitive as in SI.
 *
 * @param written the text (or number of seconds) to read
 * @param where the option or path named in an error, e.g. `converter.apertureJitter`
 * @returns the time in seconds, finite and not negative
 * @throws InputError naming `where` and the value, for an empty text, a
 *   negative or non-finite value, a missing unit after a prefix (`150 f`) or
 *   an unknown unit
 * @example parseTime('150 fs', 'converter.apertureJitter') // 1.5e-13
 */
export function parseTime(written: string | number, where: string): Seconds {
  if (typeof written === 'number') return checkedTime(written, String(written), where);
  const text = written.trim();
  if (text === '') throw new InputError(where, 'a time such as 150 fs or 0.2 ps', written);
  if (/^[-−]/.test(text)) throw new InputError(where, 'a time that is not negative', written);
  const match = WRITTEN.exec(text);
  if (!match) throw new InputError(where, 'a time such as 150 fs, 0.2 ps, 1.5 ns or 1e-12 (seconds)', written);
  const [, digits = '', unit = ''] = match;
  if (/[1-9]/.test(digits.split(/[eE]/)[0] ?? '') && Number(digits) === 0) {
    throw new InputError(where, 'a time above zero that a double can hold (this one underflows to 0)', written);
  }
  return checkedTime(Number(digits) / divisorOf(unit, digits, written, where), written, where);
}

function divisorOf(unit: string, digits: string, written: string, where: string): number {
  if (unit === '') return 1;
  const prefix = unit.endsWith('s') ? unit.slice(0, -1) : null;
  const divisor = prefix === null ? undefined : PREFIX_DIVISOR[prefix];
  if (divisor !== undefined) return divisor;
  if (prefix === null && unit in PREFIX_DIVISOR) {
    throw new InputError(where, `a time with its unit, e.g. ${digits} ${unit}s`, written);
  }
  throw new InputError(where, 'a time with unit s, ms, us, ns, ps or fs', written);
}

function checkedTime(value: number, written: string, where: string): Seconds {
  if (Number.isNaN(value)) throw new InputError(where, 'a time, not NaN', written);
  if (!Number.isFinite(value)) throw new InputError(where, 'a finite time', written);
  if (value < 0) throw new InputError(where, 'a time that is not negative', written);
  return seconds(value);
}
