import { quantityText } from '../text/quantity-text.js';
import { wrapProse } from './wrap-prose.js';
import type { PeakRow, VerifyResult } from '../report/verify-result.js';
import { textTable, type TextColumn } from './text-table.js';
import { FIND_ABOVE_FLOOR } from '../report/judge-line.js';

/** Unlisted peaks shown in the table; JSON carries them all. */
const MOST_PEAKS_SHOWN = 25;
const T = quantityText('terminal');

/**
 * A simulated capture beside the plan, as text for people laid out for a
 * width: the record and converter model, the tones synthesised, with
 * several channels each channel's plan beside its capture, every
 * predicted line with its measurement, the peaks the plan does not list,
 * the verdict, what was compared, and the caution.
 *
 * @param result from verifyCapture
 * @param width characters per line (Infinity: one block per table)
 * @returns the text, ending in a newline
 * @example verifyTable(verifyCapture(s, { rate: hz(184.32e6) }), 100).startsWith('Simulated capture: ') // true
 */
export function verifyTable(result: VerifyResult, width = 100): string {
  const prose = (text: string) => wrapProse(text, width);
  const sections = [heading(result, prose), tonesSection(result, width)];
  if (result.channels.length > 1) sections.push(channelsSection(result, width));
  sections.push(linesSection(result, width));
  const peaks = peaksSection(result.unlisted, width);
  if (peaks) sections.push(peaks);
  sections.push(prose(verdict(result)), prose(`What was compared: ${result.compared}`), prose(result.caution));
  return sections.join('\n\n') + '\n';
}

/** The blocking threshold; with several channels each channel's own (its weakest level less its rejection). */
function thresholdText(r: VerifyResult): string {
  if (r.channels.length < 2) return `${T.level(r.levels.threshold)} dBFS`;
  return r.channels.map((c) => `${T.level(c.threshold)} dBFS (${c.label})`).join(', ');
}

function heading(r: VerifyResult, prose: (text: string) => string): string {
  const coefficients = r.converter.coefficients.flatMap((a, k) => (k >= 2 ? [`a${k} = ${T.scientific(a, 4)}`] : [])).join(', ');
  const plan = r.plan.pass ? 'pass' : 'FAIL';
  return [
    `Simulated capture: ${r.scenario} at ${T.rate(r.rate)}`,
    `Record ${r.samples} samples, bin width ${T.frequency(r.binWidth)}; ${r.window.name} window, coherent gain ${T.number(r.window.coherentGain, 4)}, noise bandwidth ${T.number(r.window.noiseBandwidthBins, 4)} bins.`,
    `Converter: ${r.converter.bits} bits; y = x + Σ a_k·x^k${coefficients ? ` with ${coefficients}` : ' (linear: no harmonic figures)'}; dither ${r.converter.dither}; ${r.converter.clippedSamples} samples clipped.`,
    `Levels: threshold ${thresholdText(r)}, peak floor ${T.level(r.levels.floor)} dBFS (median bin ${T.level(r.levels.noiseMedian)} dBFS), tolerance ${T.decibels(r.levels.tolerance)} dB.`,
    `The plan at this rate, no drift: ${plan}, limited by ${r.plan.limitedBy} (margin ${T.frequency(r.plan.worstMargin)}).`,
  ]
    .map(prose)
    .join('\n');
}

function tonesSection(r: VerifyResult, width: number): string {
  const rows = r.tones.map((t) => [
    t.label,
    t.role,
    T.rate(t.nominal),
    T.rate(t.frequency),
    T.frequency(t.move),
    String(t.bin),
    T.level(t.level),
  ]);
  const columns: TextColumn[] = [
    { head: 'tone', role: 'key', wrap: true },
    { head: 'role' },
    { head: 'asked', align: 'right' },
    { head: 'synthesised', align: 'right' },
    { head: 'moved', align: 'right' },
    { head: 'bin', align: 'right' },
    { head: 'level dBFS', align: 'right' },
  ];
  return wrapProse('Tones synthesised (moved to whole cycles of the record):', width) + '\n' + textTable(columns, rows, width);
}

/** Each channel: the plan's zone and image there beside where its tones show, the peaks on it, and its own verdict. */
function channelsSection(r: VerifyResult, width: number): string {
  const rows = r.channels.map((c) => [
    c.label,
    c.zone === null ? 'straddles' : `${c.zone}${c.inverted ? ' inv' : ''}`,
    c.image.map(([low, high]) => T.extent(low, high)).join(', '),
    c.tonesSeen === null ? '–' : `${c.tonesSeen} of ${r.wantedTones}`,
    c.order ?? '–',
    String(c.intrusions.length),
    c.planPass ? 'pass' : 'FAIL',
    c.consistent ? 'agrees' : 'contradicts',
    T.level(c.threshold),
  ]);
  const columns: TextColumn[] = [
    { head: 'channel', role: 'key', wrap: true },
    { head: 'zone' },
    { head: 'image (plan)', wrap: true },
    { head: 'tones seen', align: 'right' },
    { head: 'order seen' },
    { head: 'peaks on it', align: 'right' },
    { head: 'plan' },
    { head: 'capture' },
    { head: 'threshold dBFS', align: 'right', role: 'detail' },
  ];
  return (
    wrapProse(
      "Channels: the plan's zone and image of each beside where its tones show (rising: upright, falling: inverted) and the peaks above its threshold on it or within its margin:",
      width,
    ) +
    '\n' +
    textTable(columns, rows, width)
  );
}

function linesSection(r: VerifyResult, width: number): string {
  const tolerance = T.decibels(r.levels.tolerance);
  const rows = r.predictions.map((p) => [
    p.check,
    p.line,
    T.frequency(p.predicted.frequency),
    p.measured ? T.frequency(p.measured.frequency) : '–',
    T.level(p.planLevel),
    p.measured ? T.level(p.measured.level) : '–',
    p.status,
    p.note === '' ? '–' : p.note,
    `${T.number(p.predicted.bin, 7)}`,
    p.measured ? String(p.measured.bin) : '–',
    p.binError === null ? '–' : T.number(p.binError, 3),
    p.basis === 'plan' ? `±${tolerance} dB` : `≤ +${tolerance} dB`,
    T.level(p.modelLevel),
    p.levelError === null ? '–' : T.decibels(p.levelError),
  ]);
  const columns: TextColumn[] = [
    { head: 'check', role: 'key', wrap: true },
    { head: 'line', wrap: true },
    { head: 'predicted', align: 'right' },
    { head: 'measured', align: 'right' },
    { head: 'plan dBFS', align: 'right' },
    { head: 'measured dBFS', align: 'right' },
    { head: 'result', wrap: true },
    { head: 'why', wrap: true, role: 'detail' },
    { head: 'predicted bin', align: 'right', role: 'detail' },
    { head: 'measured bin', align: 'right', role: 'detail' },
    { head: 'Δ bins', align: 'right', role: 'detail' },
    { head: 'level rule', role: 'detail' },
    { head: 'model dBFS', align: 'right', role: 'detail' },
    { head: 'Δ dB', align: 'right', role: 'detail' },
  ];
  const table = textTable(columns, rows, width);
  const under = r.underFloor.reduce((sum, u) => sum + u.lines, 0);
  const note =
    under > 0
      ? `\n${wrapProse(`${under} further line${under === 1 ? '' : 's'} of ${r.underFloor.length} check${r.underFloor.length === 1 ? '' : 's'} under the floor by the model (not looked for): ${r.underFloor.map((u) => u.check).join(', ')}.`, width)}`
      : '';
  const rule = `Level rule: ±${tolerance} dB where the plan's level is the level the capture put there; ≤ +${tolerance} dB above it (when above the threshold) where it is a bound.`;
  return (
    wrapProse(
      `Predicted lines beside the capture (looked for: the model puts them at least ${T.decibels(FIND_ABOVE_FLOOR)} dB above the floor). ${rule}`,
      width,
    ) +
    '\n' +
    table +
    note
  );
}

function peaksSection(peaks: readonly PeakRow[], width: number): string | null {
  if (peaks.length === 0) return null;
  const strongest = [...peaks].sort((a, b) => b.level - a.level).slice(0, MOST_PEAKS_SHOWN);
  const rows = strongest.map((p) => [
    T.frequency(p.frequency),
    T.level(p.level),
    T.frequency(p.distance),
    p.explainedBy ?? 'unexplained',
    String(p.bin),
  ]);
  const columns: TextColumn[] = [
    { head: 'frequency', role: 'key', align: 'right' },
    { head: 'level dBFS', align: 'right' },
    { head: 'from band', align: 'right' },
    { head: 'what the model says', wrap: true },
    { head: 'bin', align: 'right', role: 'detail' },
  ];
  const more = peaks.length > strongest.length ? `\n${peaks.length - strongest.length} weaker ones in the JSON.` : '';
  return wrapProse('Measured peaks the plan does not list:', width) + '\n' + textTable(columns, rows, width) + more;
}

function verdict(r: VerifyResult): string {
  const unsimulated = r.notSimulated.length
    ? `\nNot simulated (nothing in the capture stands for them): ${r.notSimulated.join(', ')}.`
    : '';
  const plan = r.plan.pass ? 'passes' : 'fails';
  if (r.consistent) return `Verdict: the capture agrees with the plan at ${T.rate(r.rate)} (the plan ${plan} there).${unsimulated}`;
  // With several channels the verdict names each channel once: which agree, and each contradiction under its channel.
  if (r.channels.length > 1) {
    const agreeing = r.channels.filter((c) => c.consistent).map((c) => c.label);
    const agree = agreeing.length > 0 ? `\nAgrees for ${agreeing.join(', ')}.` : '';
    const own = new Set(r.channels.flatMap((c) => c.contradictions.map((w) => `${c.label}: ${w}`)));
    const others = r.contradictions.filter((w) => !own.has(w));
    const perChannel = r.channels
      .filter((c) => !c.consistent)
      .map((c) => `${c.label}:\n${c.contradictions.map((w) => `  - ${w}`).join('\n')}`);
    const rest = others.length > 0 ? [`Peaks the plan does not list:\n${others.map((w) => `  - ${w}`).join('\n')}`] : [];
    return `Verdict: the capture contradicts the plan at ${T.rate(r.rate)} (the plan ${plan} there):\n${[...perChannel, ...rest].join('\n')}${agree}${unsimulated}`;
  }
  return `Verdict: the capture contradicts the plan at ${T.rate(r.rate)} (the plan ${plan} there):\n${r.contradictions.map((c) => `- ${c}`).join('\n')}${unsimulated}`;
}
