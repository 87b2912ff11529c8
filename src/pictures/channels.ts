import type { PlanReport, ReportedCandidate } from '../plan/plan-report.js';
import { guardBands } from '../math/band.js';

/** A plan report of several channels (the same type: a report whose `channels` holds more than one). */
export type ChannelPlanReport = PlanReport;

/** A candidate with its per-channel results. */
export type ChannelCandidate = ReportedCandidate;

/**
 * The report as a multi-channel report when it holds more than one channel;
 * null for a single channel (whose pictures stay as they were).
 *
 * @param report the solved plan
 * @returns the report with its channels, or null
 * @example severalChannels(report) // null (the demo plan has one channel)
 */
export function severalChannels(report: PlanReport): ChannelPlanReport | null {
  return report.channels.length > 1 ? report : null;
}

/**
 * One channel of a multi-channel report seen as a single-channel report:
 * that channel's band, guards and weakest level, and each candidate's zone,
 * image, margins, verdict, checks and figures after the rate against that
 * channel; its name says which channel it is. The pictures of one band (the
 * band-position chart, the filter mask) draw it unchanged.
 *
 * @param report a report of several channels
 * @param index the channel, 0-based
 * @returns the report of that channel alone
 * @throws RangeError for an index out of range
 * @example channelReportView(twoChannels, 1).band // { low: 100e6, high: 104e6 } (the second channel's band)
 */
export function channelReportView(report: ChannelPlanReport, index: number): PlanReport {
  const channel = report.channels[index];
  if (channel === undefined) throw new RangeError(`no channel ${index} in a plan of ${report.channels.length}`);
  const candidates = report.candidates.map((c): ReportedCandidate => {
    const own = c.channels[index]!;
    return {
      ...c,
      zone: own.zone,
      inverted: own.inverted,
      center: own.center,
      nco: own.nco,
      conjugate: own.conjugate,
      image: own.image,
      zoneEdgeMargin: own.zoneEdgeMargin,
      worstMargin: own.worstMargin,
      limitedBy: own.limitedBy,
      limitedByKind: own.limitedByKind,
      worstSlack: own.worstSlack,
      pass: own.pass,
      checks: own.checks ?? c.checks,
      afterRate: own.afterRate === undefined ? c.afterRate : own.afterRate,
      channels: [own],
    };
  });
  return {
    ...report,
    scenario: `${report.scenario}, channel ${channel.label}`,
    band: { low: channel.low, high: channel.high },
    guard: guardBands(channel.guard.below, channel.guard.above),
    weakestLevel: channel.weakestLevel,
    channels: [channel],
    candidates,
  };
}

/**
 * The report once per channel for the pictures drawn one per channel: the
 * report itself for a single channel, else each channel's view
 * (channelReportView) in the scenario's order.
 *
 * @param report the solved plan
 * @returns one report per picture
 * @example eachChannelView(report).length // 1 (the demo plan has one channel)
 */
export function eachChannelView(report: PlanReport): PlanReport[] {
  const multi = severalChannels(report);
  return multi ? multi.channels.map((_, i) => channelReportView(multi, i)) : [report];
}
