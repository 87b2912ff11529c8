/** One column of a reduced spectrum: a run of consecutive bins and the highest level among them. */
export interface HoldColumn {
  /** First bin of the run. */
  readonly first: number;
  /** Last bin of the run (inclusive). */
  readonly last: number;
  /** The run's highest level, dBFS (−Infinity when every bin is empty). */
  readonly level: number;
}

/**
 * Reduces a spectrum to at most `columns` columns by max-hold: the bins are
 * cut into consecutive runs whose lengths differ by at most one (run j holds
 * bins ⌊j·n/c⌋ to ⌊(j+1)·n/c⌋ − 1, integer arithmetic), and each column
 * keeps the highest level of its run, so a one-bin peak never vanishes. With
 * no more bins than columns, each bin is its own column.
 *
 * @param levels dBFS per bin (NaN counts as −Infinity)
 * @param columns most columns wanted, a whole number ≥ 1
 * @returns the columns, in bin order, covering every bin exactly once
 * @throws RangeError when columns is not a whole number ≥ 1
 * @example maxHoldColumns(Float64Array.of(-90, -20, -95, -99), 2) // [{ first: 0, last: 1, level: -20 }, { first: 2, last: 3, level: -95 }]
 */
export function maxHoldColumns(levels: ArrayLike<number>, columns: number): HoldColumn[] {
  if (!(Number.isInteger(columns) && columns >= 1)) throw new RangeError(`columns must be a whole number ≥ 1, got ${columns}`);
  const n = levels.length;
  const c = Math.min(columns, n);
  const out: HoldColumn[] = [];
  for (let j = 0; j < c; j++) {
    const first = Math.floor((j * n) / c);
    const end = Math.floor(((j + 1) * n) / c);
    let level = -Infinity;
    for (let k = first; k < end; k++) {
      const v = levels[k]!;
      if (v > level) level = v;
    }
    out.push({ first, last: end - 1, level });
  }
  return out;
}
