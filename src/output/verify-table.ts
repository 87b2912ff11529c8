import { formatFrequency, trimmed } from '../units/format-frequency.js';
import type { PeakRow, PredictionRow, VerifyResult } from '../report/verify-result.js';
import { plainTable } from './table.js';

/** Unlisted peaks shown in the table; JSON carries them all. */
const MOST_PEAKS_SHOWN = 25;

/**
 * A simulated capture beside the plan, as text for people: the record and
 * converter model, the tones synthesised, every predicted line with its
 * measurement, the peaks the plan does not list, the verdict, what was
 * compared, and the caution.
 *
 * @param result from verifyCapture
 * @returns the text, ending in a newline
 * @example verifyTable(verifyCapture(s, { rate: hz(184.32e6) })).startsWith('Simulated capture: ') // true
 */
export function verifyTable(result: VerifyResult): string {
  const sections = [heading(result), tonesSection(result), linesSection(result)];
  const peaks = peaksSection(result.unlisted);
  if (peaks) sections.push(peaks);
  sections.push(verdict(result), `What was compared: ${result.compared}`, result.caution);
  return sections.join('\n\n') + '\n';
}

function heading(r: VerifyResult): string {
  const coefficients = r.converter.coefficients.flatMap((a, k) => (k >= 2 ? [`a${k} = ${a.toExponential(3)}`] : [])).join(', ');
  const plan = r.plan.pass ? 'pass' : 'FAIL';
  return [
    `Simulated capture: ${r.scenario} at ${formatFrequency(r.rate)}`,
    `Record ${r.samples} samples, bin width ${formatFrequency(r.binWidth, 7)}; ${r.window.name} window, coherent gain ${trimmed(r.window.coherentGain, 5)}, noise bandwidth ${trimmed(r.window.noiseBandwidthBins, 4)} bins.`,
    `Converter: ${r.converter.bits} bits; y = x + Σ a_k·x^k${coefficients ? ` with ${coefficients}` : ' (linear: no harmonic figures)'}; dither ${r.converter.dither}; ${r.converter.clippedSamples} samples clipped.`,
    `Levels: threshold ${db(r.levels.threshold)}, peak floor ${db(r.levels.floor)} (median bin ${db(r.levels.noiseMedian)}), tolerance ${trimmed(r.levels.tolerance, 3)} dB.`,
    `The plan at this rate, no drift: ${plan}, limited by ${r.plan.limitedBy} (margin ${formatFrequency(r.plan.worstMargin, 7)}).`,
  ].join('\n');
}

function tonesSection(r: VerifyResult): string {
  const rows = r.tones.map((t) => [t.label, t.role, formatFrequency(t.nominal), formatFrequency(t.frequency), formatFrequency(t.move, 6), String(t.bin), level(t.level)]);
  return 'Tones synthesised (moved to whole cycles of the record):\n' + plainTable(['tone', 'role', 'asked', 'synthesised', 'moved', 'bin', 'dBFS'], rows);
}

function linesSection(r: VerifyResult): string {
  const rows = r.predictions.map((p) => [
    p.check,
    p.line,
    `${formatFrequency(p.predicted.frequency, 7)} (${trimmed(p.predicted.bin, 7)})`,
    p.measured ? `${formatFrequency(p.measured.frequency, 7)} (${p.measured.bin})` : '–',
    p.binError === null ? '–' : trimmed(p.binError, 3),
    level(p.planLevel),
    p.basis === 'plan' ? `±${trimmed(r.levels.tolerance, 3)} dB` : `≤ +${trimmed(r.levels.tolerance, 3)} dB`,
    level(p.modelLevel),
    p.measured ? level(p.measured.level) : '–',
    p.levelError === null ? '–' : p.levelError.toFixed(2),
    statusText(p),
  ]);
  const table = plainTable(['check', 'line', 'predicted (bin)', 'measured (bin)', 'Δ bins', 'plan dBFS', 'level rule', 'model dBFS', 'measured dBFS', 'Δ dB', 'result'], rows);
  const under = r.underFloor.reduce((sum, u) => sum + u.lines, 0);
  const note = under > 0 ? `\n${under} further line${under === 1 ? '' : 's'} of ${r.underFloor.length} check${r.underFloor.length === 1 ? '' : 's'} under the floor by the model (not looked for): ${r.underFloor.map((u) => u.check).join(', ')}.` : '';
  const rule = `Level rule: ±${trimmed(r.levels.tolerance, 3)} dB where the plan's level is the level the capture put there; ≤ +${trimmed(r.levels.tolerance, 3)} dB above it (when above the threshold) where it is a bound.`;
  return `Predicted lines beside the capture (looked for: the model puts them at least 3 dB above the floor). ${rule}\n` + table + note;
}

function statusText(p: PredictionRow): string {
  return p.note ? `${p.status}: ${p.note}` : p.status;
}

function peaksSection(peaks: readonly PeakRow[]): string | null {
  if (peaks.length === 0) return null;
  const strongest = [...peaks].sort((a, b) => b.level - a.level).slice(0, MOST_PEAKS_SHOWN);
  const rows = strongest.map((p) => [formatFrequency(p.frequency, 7), String(p.bin), level(p.level), formatFrequency(p.distance, 6), p.explainedBy ?? 'unexplained']);
  const more = peaks.length > strongest.length ? `\n${peaks.length - strongest.length} weaker ones in the JSON.` : '';
  return 'Measured peaks the plan does not list:\n' + plainTable(['frequency', 'bin', 'dBFS', 'from band', 'what the model says'], rows) + more;
}

function verdict(r: VerifyResult): string {
  const unsimulated = r.notSimulated.length ? `\nNot simulated (nothing in the capture stands for them): ${r.notSimulated.join(', ')}.` : '';
  if (r.consistent) return `Verdict: the capture agrees with the plan at ${formatFrequency(r.rate)}.${unsimulated}`;
  return `Verdict: the capture contradicts the plan at ${formatFrequency(r.rate)}:\n${r.contradictions.map((c) => `- ${c}`).join('\n')}${unsimulated}`;
}

function level(value: number): string {
  return Number.isFinite(value) ? value.toFixed(2) : '–';
}

function db(value: number): string {
  return `${value.toFixed(1)} dBFS`;
}
