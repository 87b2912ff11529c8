/**
 * Serialises a report for programs: frequencies stay plain numbers in Hz and
 * the unbounded edge (Infinity) becomes null, which JSON can carry.
 */
export function toJson(report: unknown): string {
  return JSON.stringify(report, (_key, value: unknown) => (value === Infinity ? null : value), 2) + '\n';
}
