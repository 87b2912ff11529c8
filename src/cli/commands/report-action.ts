import { reviewPage } from '../../output/html-report.js';
import { writeFileSafely } from '../safe-write.js';
import { EXIT, type ExitCode, type Io } from '../io.js';
import type { ReportOptions } from './report-command.js';
import { planVariants } from './plan-variants.js';

/** Solves every variant and writes the review page; exit 0 when every variant has a passing candidate, 1 otherwise. */
export function runReport(files: readonly string[], options: ReportOptions, io: Io, version: string): ExitCode {
  const { plans, comparison: compared, inputs } = planVariants(files, io, { paths: [options.html], force: options.force === true });
  const comparison = plans.length > 1 ? compared : null;
  // SOURCE_DATE_EPOCH (reproducible-builds.org) fixes the page's date, so that the same inputs give the same page.
  const epoch = process.env['SOURCE_DATE_EPOCH'];
  const when = epoch !== undefined && /^\d+$/.test(epoch) ? new Date(Number(epoch) * 1000) : new Date();
  const page = reviewPage({ plans, comparison, generated: when.toISOString().slice(0, 16).replace('T', ' ') + ' UTC', version });
  writeFileSafely(options.html, page, { force: options.force === true, inputs });
  io.out(`Wrote ${options.html}: ${plans.length} plan(s)${comparison ? ' and the comparison of clock parts' : ''}.\n`);
  return plans.every((p) => p.best !== null) ? EXIT.answered : EXIT.noAnswer;
}
