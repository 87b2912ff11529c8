import { textWidth, type TextStyle } from './typography.js';

/** A label to place on one of a few rows, centred on `x` when it can be. */
export interface LabelRequest<T> {
  readonly x: number;
  readonly text: string;
  /** A shorter text (a key number) tried when the full one finds no room. */
  readonly short?: string;
  /** Drawn extents that share the label's row (brackets), px: kept free too. */
  readonly spans?: ReadonlyArray<readonly [number, number]>;
  /**
   * Where a leader line leaves the label for what it names, px: it runs down
   * through every later row (row + 1 … rows − 1) to the plot, so no text of
   * those rows may sit on it, and it may sit on none.
   */
  readonly leader?: number;
  /** Set in bold (wider). */
  readonly bold?: boolean;
  /** What the label stands for, handed back with its placement. */
  readonly item: T;
}

export interface PlacedLabel<T> {
  readonly item: T;
  readonly text: string;
  /** Centre of the text, px (moved inside the bounds when needed). */
  readonly x: number;
  readonly row: number;
  readonly width: number;
}

const GAP = 4;
/** Least room between a leader line and a text, px. */
const LEADER_GAP = 2;

/**
 * Places labels on up to `rows` rows without overlap, in the order given
 * (put the most important first): each takes the first row with room for
 * its full text, else for its short text; a label with no room is left out.
 * Rows count from the one farthest from the plot: a label's leader crosses
 * the rows after its own, and is kept clear of their texts (both ways); a
 * label with a leader that finds no room centred on it may sit just beside
 * its leader, on either side.
 *
 * @param requests labels, most important first
 * @param rows number of rows available (≥ 1)
 * @param bounds [left, right] px the text must stay inside
 * @param fontSize px
 * @returns the placed labels; the ones missing were thinned out
 */
export function packLabels<T>(
  requests: readonly LabelRequest<T>[],
  rows: number,
  bounds: readonly [number, number],
  fontSize: number,
): PlacedLabel<T>[] {
  const taken: Array<Array<readonly [number, number]>> = Array.from({ length: rows }, () => []);
  // The x of every leader that crosses each row.
  const leaders: number[][] = Array.from({ length: rows }, () => []);
  const placed: PlacedLabel<T>[] = [];
  for (const request of requests) {
    const texts = request.short === undefined ? [request.text] : [request.text, request.short];
    let done = false;
    for (const text of texts) {
      const width = textWidth(text, fontSize, { bold: request.bold });
      // A text wider than the room is never placed: its short text is tried instead.
      if (width > bounds[1] - bounds[0]) continue;
      const half = width / 2;
      const leader = request.leader;
      // Centred on its point; with a leader, also just beside it on either side (the leader then runs past the text).
      const wanted = leader === undefined ? [request.x] : [request.x, leader + half + LEADER_GAP + 1, leader - half - LEADER_GAP - 1];
      const xs = [...new Set(wanted.map((x) => Math.min(Math.max(x, bounds[0] + half), bounds[1] - half)))];
      for (let row = 0; row < rows && !done; row++) {
        for (const x of xs) {
          const needs: Array<readonly [number, number]> = [[x - half, x + half], ...(request.spans ?? [])];
          const spans = taken[row]!;
          if (needs.some(([left, right]) => spans.some(([a, b]) => left < b + GAP && right > a - GAP))) continue;
          if (leaders[row]!.some((at) => at > x - half - LEADER_GAP && at < x + half + LEADER_GAP)) continue;
          const below = taken.slice(row + 1);
          if (leader !== undefined && below.some((later) => later.some(([a, b]) => leader > a - LEADER_GAP && leader < b + LEADER_GAP)))
            continue;
          spans.push(...needs);
          if (leader !== undefined) for (let later = row + 1; later < rows; later++) leaders[later]!.push(leader);
          placed.push({ item: request.item, text, x, row, width });
          done = true;
          break;
        }
      }
      if (done) break;
    }
  }
  return placed;
}

/**
 * Breaks a list of phrases into lines no wider than `width`, joining the
 * phrases of a line with `separator`; a phrase is never split.
 *
 * @param phrases in order
 * @param width px
 * @param fontSize px
 * @param separator put between phrases on one line
 * @param style bold, italic (wider)
 * @example wrapPhrases(['1 H2 wanted', '2 LO leak'], 500, 10, '   ') // ['1 H2 wanted   2 LO leak']
 */
export function wrapPhrases(
  phrases: readonly string[],
  width: number,
  fontSize: number,
  separator: string,
  style: TextStyle = {},
): string[] {
  const lines: string[] = [];
  let line = '';
  for (const phrase of phrases) {
    const joined = line === '' ? phrase : line + separator + phrase;
    if (line !== '' && textWidth(joined, fontSize, style) > width) {
      lines.push(line);
      line = phrase;
    } else line = joined;
  }
  if (line !== '') lines.push(line);
  return lines;
}

/**
 * Moves positions along one axis apart by at least `gap`, keeping their
 * order and staying inside [low, high] where room allows: for labels stacked
 * beside points.
 *
 * @param wanted positions wanted, px, ascending
 * @param gap least distance, px
 * @param low, high the room, px
 * @returns adjusted positions, ascending
 * @example spreadApart([10, 12, 30], 10, 0, 100) // [10, 20, 30]
 */
export function spreadApart(wanted: readonly number[], gap: number, low: number, high: number): number[] {
  const out = wanted.map((v) => Math.min(Math.max(v, low), high));
  for (let i = 1; i < out.length; i++) out[i] = Math.max(out[i]!, out[i - 1]! + gap);
  for (let i = out.length - 1; i >= 0; i--) {
    const ceiling = i === out.length - 1 ? high : out[i + 1]! - gap;
    out[i] = Math.min(out[i]!, ceiling);
  }
  return out;
}
