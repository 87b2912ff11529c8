/**
 * English ordinal of a positive integer.
 *
 * @param n integer ≥ 1
 * @returns e.g. '2nd', '3rd', '11th', '21st'
 * @example ordinal(3) // '3rd'
 */
export function ordinal(n: number): string {
  const lastTwo = n % 100;
  if (lastTwo >= 11 && lastTwo <= 13) return `${n}th`;
  const suffix = ({ 1: 'st', 2: 'nd', 3: 'rd' } as Record<number, string>)[n % 10] ?? 'th';
  return `${n}${suffix}`;
}

/**
 * A level for source texts, one decimal, with a true minus sign.
 *
 * @param value dB
 * @param unit e.g. 'dBFS', 'dBc', 'dB'
 * @example dbText(-70, 'dBc') // '−70.0 dBc'
 */
export function dbText(value: number, unit: string): string {
  const text = (Math.abs(value) < 0.05 ? 0 : value).toFixed(1); // no "−0.0"
  return `${text.startsWith('-') ? `−${text.slice(1)}` : text} ${unit}`;
}
