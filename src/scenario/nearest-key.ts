/**
 * Edit distance between two words: insertions, deletions, substitutions and
 * swaps of two adjacent characters each cost 1 (the optimal string
 * alignment distance, Damerau's extension of Levenshtein's), so `lable` is
 * one edit from `label`.
 *
 * @param a first word
 * @param b second word
 * @returns the number of edits, 0 when equal
 * @example editDistance('bitz', 'bits') // 1
 */
export function editDistance(a: string, b: string): number {
  const rows: number[][] = [];
  for (let i = 0; i <= a.length; i += 1) {
    const row: number[] = [i];
    for (let j = 1; j <= b.length; j += 1) {
      if (i === 0) {
        row.push(j);
        continue;
      }
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let best = Math.min((rows[i - 1]?.[j] ?? 0) + 1, (row[j - 1] ?? 0) + 1, (rows[i - 1]?.[j - 1] ?? 0) + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) best = Math.min(best, (rows[i - 2]?.[j - 2] ?? 0) + 1);
      row.push(best);
    }
    rows.push(row);
  }
  return rows[a.length]?.[b.length] ?? 0;
}

/**
 * The known key a mistyped key most likely meant: the nearest by edit
 * distance ignoring case, if within a third of the longer word's length (at
 * least one edit); ties go to the earlier known key.
 *
 * @param typed the unknown key as written
 * @param known the keys allowed at that place, in schema order
 * @returns the suggestion, or null when nothing is near
 * @example nearestKey('bitz', ['label', 'minRate', 'bits']) // 'bits'
 */
export function nearestKey(typed: string, known: readonly string[]): string | null {
  let best: string | null = null;
  let bestDistance = Infinity;
  for (const key of known) {
    const distance = editDistance(typed.toLowerCase(), key.toLowerCase());
    const allowed = Math.max(1, Math.floor(Math.max(typed.length, key.length) / 3));
    if (distance <= allowed && distance < bestDistance) {
      best = key;
      bestDistance = distance;
    }
  }
  return best;
}
