import type { Hz } from './quantities.js';

const PREFIXES: ReadonlyArray<readonly [number, string]> = [
  [1e9, 'GHz'],
  [1e6, 'MHz'],
  [1e3, 'kHz'],
];

/**
 * Writes a frequency with an SI prefix for people, trimming trailing zeros.
 *
 * @param value frequency in Hz (may be Infinity, written as ∞)
 * @param significant significant digits kept (default 10: enough to set a clock)
 * @returns e.g. `70 MHz`, `9.333333333 kHz`, `455 kHz`, `0.5 Hz`
 * @example formatFrequency(hz(12288000)) // '12.288 MHz'
 */
export function formatFrequency(value: Hz | number, significant = 10): string {
  if (value === Infinity) return '∞';
  const magnitude = Math.abs(value);
  const [scale, unit] = PREFIXES.find(([s]) => magnitude >= s) ?? [1, 'Hz'];
  return `${trimmed(value / scale, significant)} ${unit}`;
}

/** A number to the given significant digits, without exponent or trailing zeros. */
export function trimmed(value: number, significant: number): string {
  if (value === 0) return '0';
  const text = Number(value.toPrecision(significant)).toString();
  return /e/.test(text) ? value.toPrecision(significant) : text;
}
