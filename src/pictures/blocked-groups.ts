import type { PlanReport } from '../plan/plan-report.js';

/** The checks that block the same rates inside one window, drawn as one row of brackets. */
export interface BlockedGroup {
  /** Rate ranges [min, max], Hz, widest first. */
  readonly ranges: ReadonlyArray<readonly [number, number]>;
  readonly labels: readonly string[];
  readonly keys: readonly number[];
}

/**
 * Key numbers 1, 2, ... for every label that blocks somewhere, in the order
 * of the report's interferers (then any other label in order of appearance).
 *
 * @param report the solved plan
 * @returns label → key
 */
export function blockingKeys(report: PlanReport): Map<string, number> {
  const blocking = new Set(report.blocked.map((b) => b.label));
  const ordered = [...report.interferers.map((i) => i.label).filter((l) => blocking.has(l)), ...blocking];
  const keys = new Map<string, number>();
  for (const label of ordered) if (!keys.has(label)) keys.set(label, keys.size + 1);
  return keys;
}

/**
 * The blocked ranges of one zone's window, one group per set of ranges:
 * checks that block exactly the same ranges (they are clipped to the same
 * window edges, so equal edges are equal numbers) share a group and a label.
 *
 * @param report the solved plan
 * @param zone the window's zone
 * @param keys from blockingKeys
 * @returns groups, the widest range of each first in `ranges`, widest group first
 */
export function blockedGroups(report: PlanReport, zone: number, keys: ReadonlyMap<string, number>): BlockedGroup[] {
  const byLabel = new Map<string, Array<readonly [number, number]>>();
  for (const range of report.blocked.filter((b) => b.zone === zone)) {
    const ranges = byLabel.get(range.label) ?? [];
    ranges.push([range.minRate, range.maxRate]);
    byLabel.set(range.label, ranges);
  }
  const groups = new Map<string, { ranges: Array<readonly [number, number]>; labels: string[] }>();
  for (const [label, ranges] of byLabel) {
    const widestFirst = [...ranges].sort((a, b) => b[1] - b[0] - (a[1] - a[0]) || a[0] - b[0]);
    const id = [...ranges]
      .sort((a, b) => a[0] - b[0])
      .map(([a, b]) => `${a}|${b}`)
      .join(';');
    const group = groups.get(id) ?? { ranges: widestFirst, labels: [] };
    group.labels.push(label);
    groups.set(id, group);
  }
  const width = (g: { ranges: ReadonlyArray<readonly [number, number]> }) => g.ranges[0]![1] - g.ranges[0]![0];
  return [...groups.values()].sort((a, b) => width(b) - width(a)).map((g) => ({ ...g, keys: g.labels.map((l) => keys.get(l) ?? 0) }));
}
