/**
 * Makes labels unique by suffixing repeats ` #2`, ` #3`, ... in order of
 * appearance (the first keeps its label). Scenario labels are the user's, so
 * two spurs may share one, or a neighbour may be called `DC`; a plan's labels
 * must still name one interferer each. A suffixed label that is itself taken
 * moves on to the next number.
 *
 * @param items anything with a label
 * @returns copies with unique labels, same order
 * @example uniqueLabels([{ label: 'A' }, { label: 'A' }]) // [{ label: 'A' }, { label: 'A #2' }]
 */
export function uniqueLabels<T extends { readonly label: string }>(items: readonly T[]): T[] {
  const taken = new Set(items.map((item) => item.label));
  const seen = new Set<string>();
  return items.map((item) => {
    if (!seen.has(item.label)) {
      seen.add(item.label);
      return item;
    }
    let n = 2;
    while (taken.has(`${item.label} #${n}`)) n++;
    const label = `${item.label} #${n}`;
    taken.add(label);
    seen.add(label);
    return { ...item, label };
  });
}
