import { quantityText, type QuantityText } from '../text/quantity-text.js';
import type { AfterRate } from '../after-rate/after-rate.js';
import { MASK_CHECK, type MaskBand } from '../after-rate/filter-mask.js';
import type { ReportedCandidate } from '../plan/plan-report.js';
import type { VariantVerdict } from '../plan/compare-report.js';
import { channelCheckLabel } from '../solve/limited-by.js';
import { wrapProse } from './wrap-prose.js';

/*
 * The after-rate figures in words and table rows, shared by the text table
 * and the HTML page so that both say the same thing the same way. Every
 * quantity goes through the text layer of the medium (TERMINAL by default);
 * the NCO frequencies are written to 0.1 mHz (`tuned`), since the error they
 * show is a fraction of a hertz.
 */

const TERMINAL = quantityText('terminal');

/** Column heads of the alias-band table. */
export const MASK_HEAD = ['alias band (input)', 'image', 'needs dB', 'filter gives dB', 'margin dB', 'verdict'] as const;

/**
 * The alias bands as table rows, tightest first.
 *
 * @param after the candidate's after-rate figures
 * @param most how many rows at most (default all)
 * @returns rows of MASK_HEAD's columns
 * @example maskRows(after, 3).length // 3
 */
export function maskRows(after: AfterRate, most = Infinity, text: QuantityText = TERMINAL): string[][] {
  const ordered = [...after.mask.bands].sort((a, b) => a.marginDb - b.marginDb).slice(0, most);
  return ordered.map((band) => [
    text.extent(band.low, band.high),
    imageText(band, text),
    text.decibels(after.mask.requiredDb),
    text.decibels(band.givenDb),
    text.decibels(band.marginDb),
    band.marginDb >= 0 ? 'holds' : after.mask.levelStated ? 'FAIL' : 'short',
  ]);
}

/** "2·r − channel" or "r + channel". */
function imageText(band: MaskBand, text: QuantityText): string {
  const multiple = band.multiple === 1 ? 'r' : `${band.multiple}·r`;
  return band.sense === 'upright' ? `${multiple} + channel` : `${multiple} ${text.minus} channel`;
}

/**
 * What the mask asks, in one sentence.
 *
 * @example maskSentence(after) // 'Anti-alias mask: ...'
 */
export function maskSentence(after: AfterRate, text: QuantityText = TERMINAL): string {
  const { mask } = after;
  const level = mask.levelStated
    ? `${text.level(mask.outOfBandLevel)} dBFS (stated: a shortfall blocks the rate)`
    : `${text.level(mask.outOfBandLevel)} dBFS (full scale; no level stated, so reported only)`;
  const worst = mask.worst
    ? ` Least margin ${text.decibels(mask.worst.marginDb)} dB at ${text.extent(mask.worst.low, mask.worst.high)}.`
    : '';
  return (
    `Anti-alias mask: an out-of-band signal at ${level} must reach the converter at or below ${text.level(mask.threshold)} dBFS, ` +
    `so the filter needs ${text.decibels(mask.requiredDb)} dB over each of the ${mask.bands.length} alias bands (images of the channel widened by the required margin, over the rate's ±ppm).${worst}`
  );
}

/**
 * The filter orders that would meet the mask, in one sentence.
 *
 * @example designSentence(after) // 'Filter that would do ...'
 */
export function designSentence(after: AfterRate, text: QuantityText = TERMINAL): string {
  const d = after.design;
  const stops = [
    // Stopband edges are a specification for the filter maker: written to 1 Hz, like a rate, not rounded to 4 digits.
    d.stopBelow === null ? null : `from ${text.rate(d.stopBelow)} down`,
    d.stopAbove === null ? null : `from ${text.rate(d.stopAbove)} up`,
  ].filter((s) => s !== null);
  const mask = `${text.decibels(d.passbandRippleDb)} dB ripple over the channel, ${text.decibels(d.stopbandDb)} dB ${stops.length > 0 ? stops.join(' and ') : 'nowhere (no alias band below the input bandwidth)'}`;
  const side = d.tightest === null || d.selectivity === null ? '' : `; tightest side: ${d.tightest}, Ωs ${text.number(d.selectivity, 4)}`;
  if (d.orders === null) return `Filter that would do (${mask}${side}): none, an alias band reaches into the channel.`;
  const { butterworth, chebyshev, elliptic } = d.orders;
  if (butterworth === 0) return `Filter that would do (${mask}${side}): no filter needed.`;
  const kind = d.lowPass
    ? 'low-pass orders: the channel starts at 0 Hz'
    : 'low-pass prototype orders; the band-pass has twice as many poles';
  return `Filter that would do (${mask}${side}): Butterworth ${butterworth}, Chebyshev I ${chebyshev}, elliptic ${elliptic} (${kind}).`;
}

/**
 * The noise folded into the channel, in one sentence.
 *
 * @example noiseSentence(after, candidate) // 'Noise folding: ...'
 */
export function noiseSentence(after: AfterRate, candidate: ReportedCandidate, text: QuantityText = TERMINAL): string {
  const noise = after.noise;
  if (noise === null) return 'Noise folding: not computed, the filter stops the whole channel.';
  const penalty =
    `Noise folding: +${text.decibels(noise.penaltyDb)} dB (${accuracyText(noise.accuracyDb, text)}): wideband noise from the alias bands ` +
    "on top of the channel's own through the filter (with no filter it would be 10·log10 of the zones up to the input bandwidth).";
  if (noise.driverNoiseDensity === null || noise.driverSnrDb === null) return `${penalty} No driver noise density stated.`;
  const driver = ` Driver at ${text.level(noise.driverNoiseDensity)} dBFS/Hz leaves ${text.decibels(noise.driverSnrDb)} dB`;
  const lowered =
    candidate.channelSnrDb !== null && candidate.channelSnrWithDriverDb !== null
      ? `; channel SNR ${text.decibels(candidate.channelSnrDb)} dB → ${text.decibels(candidate.channelSnrWithDriverDb)} dB with it.`
      : ' (no channel SNR to lower: not a clock part).';
  return penalty + driver + lowered;
}

/**
 * The NCO and decimation settings, in one or two sentences.
 *
 * @example downConverterSentences(after)[0] // 'NCO ...'
 */
export function downConverterSentences(after: AfterRate, text: QuantityText = TERMINAL): string[] {
  const { nco, decimation } = after.downConverter;
  const sentences: string[] = [];
  if (nco) {
    const tuned = `NCO (${nco.bits}-bit): word ${nco.word} (0x${nco.word.toString(16).toUpperCase()}) gives ${text.tuned(nco.actual)}, ${text.signedFrequency(nco.error)} from ${text.tuned(nco.target)}`;
    sentences.push(
      nco.inverted
        ? `${tuned}; the channel is inverted: load ${nco.negativeWord} (0x${nco.negativeWord.toString(16).toUpperCase()}) for ${text.tuned(-nco.target)} (error ${text.signedFrequency(-nco.error)}), or conjugate the output.`
        : `${tuned}.`,
    );
  }
  if (decimation) {
    const d = decimation;
    const how = d.factor === null ? `${d.refusal}` : `÷${d.factor} = ${stagesText(d.halfBandStages, d.remainder ?? 1)}`;
    const fit = `the channel ${d.fits ? 'fits' : 'does not fit'} in ${text.frequency(d.usableBandwidth)} usable (${text.signedFrequency(d.fitSlack)} each side)`;
    sentences.push(`Decimation to ${text.rate(d.outputRate)}: ${how}; ${fit}.`);
  }
  return sentences;
}

/** The quadrature's error bound, in the 0.1 dB the penalty is written to. */
function accuracyText(accuracyDb: number, text: QuantityText): string {
  return accuracyDb < 0.1 ? 'quadrature error below 0.1 dB' : `quadrature error up to ${text.decibels(accuracyDb)} dB`;
}

function stagesText(halfBand: number, remainder: number): string {
  const parts = [
    halfBand > 0 ? `${halfBand} half-band stage${halfBand === 1 ? '' : 's'}` : null,
    remainder > 1 ? `a ÷${remainder} stage` : null,
  ].filter((p) => p !== null);
  return parts.length > 0 ? parts.join(' then ') : 'no decimation';
}

/**
 * Text broken at spaces into lines of at most `width` characters (a word
 * longer than that keeps its own line); a number stays on the line of its
 * unit. The one wrapper of the terminal, wrapProse, for one paragraph.
 *
 * @param text one paragraph
 * @param width columns (default 100)
 * @example wrapText('aa bb cc', 5) // 'aa bb\ncc'
 */
export function wrapText(text: string, width = 100): string {
  return wrapProse(text, width);
}

/**
 * Why the mask fails a candidate, in words (with several channels, the
 * channel whose mask falls shortest, named as limitedBy names it); null when
 * no mask fails (no level stated, or every alias band holds).
 *
 * @example maskShortfall(candidate) // null (the mask holds at the best rate)
 */
export function maskShortfall(candidate: ReportedCandidate, text: QuantityText = TERMINAL): string | null {
  let shortest: { label: string; worst: MaskBand } | null = null;
  for (const channel of channelFigures(candidate)) {
    const mask = channel.afterRate?.mask;
    if (!mask || mask.pass || mask.worst === null) continue;
    if (shortest === null || mask.worst.marginDb < shortest.worst.marginDb) shortest = { label: channel.label, worst: mask.worst };
  }
  if (shortest === null) return null;
  const w = shortest.worst;
  const check = candidate.channels.length > 1 ? channelCheckLabel(shortest.label, MASK_CHECK) : MASK_CHECK;
  return `${check}: the filter gives ${text.decibels(w.givenDb)} dB at ${text.extent(w.low, w.high)} where ${text.decibels(w.requiredDb)} dB is needed (short by ${text.decibels(-w.marginDb)} dB)`;
}

/**
 * A part's filter orders on one variant: "6/5/4" for Butterworth, Chebyshev I
 * and elliptic (low-pass prototype); "none" when no filter can meet the mask;
 * "–" when not computed.
 *
 * @example filterOrdersText({ rate: hz(1e8), maskMarginDb: db(10), filterOrders: { butterworth: 6, chebyshev: 5, elliptic: 4 } }) // '6/5/4'
 */
export function filterOrdersText(v: Pick<VariantVerdict, 'rate' | 'filterOrders' | 'maskMarginDb'>): string {
  if (v.filterOrders === null) return v.rate === null || v.maskMarginDb === null ? '–' : 'none';
  const { butterworth, chebyshev, elliptic } = v.filterOrders;
  return `${butterworth}/${chebyshev}/${elliptic}`;
}

/**
 * A candidate's verdict in a word or three: "pass", "FAIL", "FAIL: mask"
 * when only the anti-alias mask fails it (a stated out-of-band level the
 * filter cannot hold back: limitedByKind 'anti-alias mask'), "FAIL, mask
 * too" when a mask fails besides.
 *
 * @example candidateVerdict(candidate) // 'pass' (the demo's best rate; 'FAIL: mask' where only the anti-alias mask fails)
 */
export function candidateVerdict(candidate: ReportedCandidate): string {
  if (candidate.pass) return 'pass';
  if (candidate.limitedByKind === 'anti-alias mask') return 'FAIL: mask';
  const maskFails = channelFigures(candidate).some((c) => c.afterRate !== null && !c.afterRate.mask.pass);
  return maskFails ? 'FAIL, mask too' : 'FAIL';
}

/** Each channel's label with its figures after the rate: for a single wanted band, the candidate's own. */
function channelFigures(candidate: ReportedCandidate): Array<{ label: string; afterRate: AfterRate | null }> {
  if (candidate.channels.length <= 1) return [{ label: candidate.channels[0]?.label ?? 'wanted', afterRate: candidate.afterRate }];
  return candidate.channels.map((c) => ({ label: c.label, afterRate: c.afterRate ?? null }));
}
