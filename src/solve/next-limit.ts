import { hz, type Hz } from '../units/quantities.js';
import type { RateEvaluation } from './evaluate-rate.js';
import { interfererLimit, limitText, ZONE_EDGE, type Limit, type LimitKind } from './limited-by.js';

/** The check that decides between rates that tie on the worst: the tightest one with more slack than the worst. */
export interface NextLimit {
  readonly limitedBy: string;
  readonly limitedByKind: LimitKind;
  readonly margin: Hz;
  /** Its margin minus its requirement, Hz. */
  readonly slack: Hz;
}

/**
 * The tightest check (the zone edge or a blocking interferer) whose slack
 * exceeds the worst by more than tieAllowance: what ranks rates that tie on
 * the worst margin.
 *
 * @param evaluation a rate judged exactly
 * @param bandwidth the wanted band's width, Hz (sets what counts as a tie)
 * @returns that check, or null when every check ties with the worst
 * @example nextLimit(evaluateRate(handWorked, hz(26e6), ppm(0)), hz(4e6))?.limitedBy // 'board tone 10M' (the rate/4 spur is the worst; the tone 5 MHz away is next)
 */
export function nextLimit(evaluation: RateEvaluation, bandwidth: number): NextLimit | null {
  // Several channels: each channel's zone edge is a check of its own.
  const edges: { limit: Limit; margin: Hz }[] = evaluation.channels
    ? evaluation.channels.map((c) => ({ limit: { kind: 'zone edge', channel: c.label }, margin: c.zoneEdgeMargin }))
    : [{ limit: ZONE_EDGE, margin: evaluation.zoneEdgeMargin }];
  const rows: { limit: Limit; margin: Hz; slack: number }[] = edges.map((e) => ({ ...e, slack: e.margin }));
  for (const c of evaluation.checks)
    if (c.blocking) rows.push({ limit: interfererLimit(c.label), margin: c.margin, slack: c.margin - c.requiredMargin });
  const next = rows.filter((r) => r.slack > evaluation.worstSlack + tieAllowance(bandwidth)).sort((a, b) => a.slack - b.slack)[0];
  return next ? { limitedBy: limitText(next.limit), limitedByKind: next.limit.kind, margin: next.margin, slack: hz(next.slack) } : null;
}

/**
 * Two worst slacks closer than this tie, Hz: 1e-9 of the bandwidth, far
 * below any margin an engineer sets and far above rounding.
 *
 * @param bandwidth the wanted band's width, Hz
 * @example tieAllowance(20e6) // 0.02
 */
export function tieAllowance(bandwidth: number): number {
  return 1e-9 * bandwidth;
}
