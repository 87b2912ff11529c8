import type { Command } from 'commander';
import { glossaryHelp } from '../../output/glossary-text.js';
import { parseFrequency } from '../../units/parse-frequency.js';
import { aliasReport } from '../../report/alias-report.js';
import { aliasTable } from '../../output/alias-table.js';
import { writeJson } from '../../output/json.js';
import { EXIT, type ExitCode, type Io } from '../io.js';
import { helpWidth, layoutWidth, withLayoutOptions, type LayoutOptions } from '../layout-options.js';
import { positiveFrequency, wholeNumber } from '../option-values.js';

interface AliasOptions extends LayoutOptions {
  rate: string;
  multiples: string;
  json?: boolean;
}

/** `ifzone alias`: where frequencies show after sampling at one rate. */
export function addAliasCommand(program: Command, io: Io, settle: (code: ExitCode) => void): void {
  withLayoutOptions(program.command('alias'))
    .description('show where frequencies land after sampling at a rate')
    .argument('<freq...>', 'frequencies to fold, e.g. 70M 140.5M')
    .requiredOption('--rate <freq>', 'sampling rate, e.g. 61.44M')
    .option('--multiples <k>', 'list lookalikes k·rate ± alias up to this k', '2')
    .option('--json', 'print JSON for programs')
    .addHelpText('after', () => glossaryHelp('alias', helpWidth(io)))
    .action((frequencies: string[], options: AliasOptions) => {
      const rate = positiveFrequency(options.rate, '--rate');
      const multiples = wholeNumber(options.multiples, '--multiples', 1, 1000);
      const tones = frequencies.map((f, i) => parseFrequency(f, `frequency ${i + 1}`));
      const report = aliasReport(rate, tones, multiples);
      if (options.json) writeJson(report, io.out);
      else io.out(aliasTable(report, layoutWidth(options, io)));
      settle(EXIT.answered);
    });
}
