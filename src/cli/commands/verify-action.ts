import { InputError } from '../../units/input-error.js';
import { formatFrequency } from '../../units/format-frequency.js';
import { verifyCaptureWithSpectrum } from '../../report/verify-capture.js';
// Loaded with the action, which the command imports only when it runs; the capture itself costs far more than the picture writers.
import { captureSvg } from '../../pictures/capture-picture.js';
import { verifyTable } from '../../output/verify-table.js';
import { writeJson } from '../../output/json.js';
import { readScenarioWithInputs } from '../read-scenario.js';
import { checkOutputPaths, writeFileSafely } from '../safe-write.js';
import { positiveFrequency, wholeNumber } from '../option-values.js';
import { layoutWidth } from '../layout-options.js';
import { EXIT, progressNotes, type ExitCode, type Io } from '../io.js';
import type { VerifyOptions } from './verify-command.js';

/** Bins of the wanted band each wanted tone needs, so that tones and their products can be placed apart. */
const BINS_PER_TONE = 8;
/** Most wanted tones: their products grow as (order + tones − 1 choose tones − 1), and five already give thousands at the 15th order. */
const MOST_TONES = 5;

/**
 * Reads a scenario, takes the simulated capture at --rate and prints it;
 * with --svg, also draws it (never over an existing file without --force,
 * never over the scenario).
 *
 * @param file the scenario file
 * @param options --rate, --tones, --samples, --json, --svg, --force as written
 * @param io where the table or JSON goes
 * @returns 0 when the capture agrees with the plan, 1 when it contradicts it
 * @throws InputError (exit 2) for a rate outside the converter's range, a bad --tones or --samples, a band (or a channel) too narrow for the record, or an --svg path that exists (without --force) or is the scenario
 * @example runVerify('scenarios/heron-base.json', { rate: '184.32M', tones: '1', samples: '65536' }, io) // 0
 */
export function runVerify(file: string, options: VerifyOptions, io: Io): ExitCode {
  const progress = progressNotes(io);
  const width = layoutWidth(options, io);
  const { scenario, inputs } = readScenarioWithInputs(file);
  const rate = positiveFrequency(options.rate, '--rate');
  const { minRate, maxRate } = scenario.converter;
  if (rate < minRate || rate > maxRate) {
    throw new InputError(
      '--rate',
      `a rate within the converter's range, ${formatFrequency(minRate)} to ${formatFrequency(maxRate)}`,
      options.rate,
    );
  }
  const wantedTones = wholeNumber(options.tones, '--tones', 1, MOST_TONES);
  const samples = wholeNumber(options.samples, '--samples', 1024, 1048576);
  if ((samples & (samples - 1)) !== 0) throw new InputError('--samples', 'a power of two, e.g. 65536', options.samples);
  // Every channel's band must hold its tones apart (one channel: the wanted band).
  const bands = scenario.channels.length > 1 ? scenario.channels : [{ ...scenario.wanted, label: 'wanted' }];
  for (const band of bands) {
    const bandBins = ((band.high - band.low) * samples) / rate;
    if (bandBins < BINS_PER_TONE * wantedTones) {
      const where = bands.length > 1 ? `channel ${band.label}` : 'the wanted band';
      throw new InputError(
        '--samples',
        `a record long enough for ${wantedTones} tone(s) in ${where} (${BINS_PER_TONE} bins each; the band spans ${bandBins.toFixed(1)})`,
        options.samples,
      );
    }
  }
  if (options.svg !== undefined) checkOutputPaths([options.svg], { force: options.force === true, inputs });
  const { result, levels } = verifyCaptureWithSpectrum(scenario, { rate, samples, wantedTones });
  progress.note('drawing the capture');
  if (options.svg !== undefined) writeFileSafely(options.svg, captureSvg(result, levels), { force: options.force === true, inputs });
  progress.done();
  if (options.json) writeJson(result, io.out);
  else io.out(verifyTable(result, width));
  return result.consistent ? EXIT.answered : EXIT.noAnswer;
}
