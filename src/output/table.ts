import Table from 'cli-table3';

/**
 * A plain, colour-free table: it reads the same in a terminal, a log file and
 * a pasted design note.
 */
export function plainTable(head: readonly string[], rows: ReadonlyArray<readonly string[]>): string {
  const table = new Table({ head: [...head], style: { head: [], border: [], compact: true } });
  for (const row of rows) table.push([...row]);
  return table.toString();
}
