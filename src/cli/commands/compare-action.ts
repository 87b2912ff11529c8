import { InputError } from '../../units/input-error.js';
import { compareCsv, compareTable } from '../../output/compare-table.js';
import { toJson, writeJson } from '../../output/json.js';
import { rateMapFigure } from '../../pictures/rate-map.js';
import { stackFigures, svgDocument } from '../../pictures/svg-document.js';
import { writeFilesSafely, type OutputFile } from '../safe-write.js';
import { layoutWidth } from '../layout-options.js';
import { EXIT, type ExitCode, type Io } from '../io.js';
import type { CompareOptions } from './compare-command.js';
import { planVariants } from './plan-variants.js';

/**
 * Plans the union of the variants' clock catalogues on every variant and
 * prints the comparison; exit 0 when a part passes (with several variants:
 * passes every one), 1 when none does.
 */
export function runCompare(files: readonly string[], options: CompareOptions, io: Io): ExitCode {
  if (options.json && options.csv) throw new InputError('--csv', 'either --json or --csv, not both', '--json --csv');
  const width = layoutWidth(options, io);
  const outputs = [options.svg, options.output].filter((path): path is string => path !== undefined);
  const force = options.force === true;
  // The plans themselves (IF-shift search, reports) only for the rate maps of --svg: the comparison does not read them.
  const { plans, comparison: report, inputs } = planVariants(files, io, { paths: outputs, force }, options.svg !== undefined);
  // Standard output takes the JSON in pieces; a file gets it whole (the safe write swaps in complete files).
  const text =
    options.json && options.output === undefined
      ? null
      : options.json
        ? toJson(report)
        : options.csv
          ? compareCsv(report)
          : compareTable(report, width);
  const written: OutputFile[] = [];
  if (options.svg !== undefined) {
    const maps = plans.map((plan) => rateMapFigure(plan));
    written.push({ path: options.svg, content: svgDocument(stackFigures(maps, `Clock parts on ${report.variants.join(', ')}`, 24)) });
  }
  if (options.output !== undefined && text !== null) written.push({ path: options.output, content: text });
  // Every file or none: the picture and the table are committed together.
  writeFilesSafely(written, { force, inputs });
  if (text === null) writeJson(report, io.out);
  else if (options.output === undefined) io.out(text);
  const answered = files.length > 1 ? report.family.length > 0 : report.parts.some((p) => p.passesAll);
  return answered ? EXIT.answered : EXIT.noAnswer;
}
