import { reviewPage } from '../../output/html-report.js';
import { writeFileSafely } from '../safe-write.js';
import { EXIT, type ExitCode, type Io } from '../io.js';
import type { ReportOptions } from './report-command.js';
import { planVariants } from './plan-variants.js';

/** Solves every variant and writes the review page; exit 0 when every variant has a passing candidate, 1 otherwise. */
export function runReport(files: readonly string[], options: ReportOptions, io: Io, version: string): ExitCode {
  const { plans, comparison: compared, inputs } = planVariants(files, io, { paths: [options.html], force: options.force === true });
  const comparison = plans.length > 1 ? compared : null;
  const page = reviewPage({ plans, comparison, generated: new Date().toISOString().slice(0, 16).replace('T', ' ') + ' UTC', version });
  writeFileSafely(options.html, page, { force: options.force === true, inputs });
  io.out(`Wrote ${options.html}: ${plans.length} plan(s)${comparison ? ' and the comparison of clock parts' : ''}.\n`);
  return plans.every((p) => p.best !== null) ? EXIT.answered : EXIT.noAnswer;
}
