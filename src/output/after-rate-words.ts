import { formatFrequency, trimmed } from '../units/format-frequency.js';
import type { AfterRate } from '../after-rate/after-rate.js';
import { MASK_CHECK, type MaskBand } from '../after-rate/filter-mask.js';
import type { ReportedCandidate } from '../plan/plan-report.js';
import type { VariantVerdict } from '../plan/compare-report.js';

/*
 * The after-rate figures in words and table rows, shared by the text table
 * and the HTML page so that both say the same thing the same way.
 */

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
export function maskRows(after: AfterRate, most = Infinity): string[][] {
  const ordered = [...after.mask.bands].sort((a, b) => a.marginDb - b.marginDb).slice(0, most);
  return ordered.map((band) => [
    range(band.low, band.high, 7),
    imageText(band),
    trimmed(after.mask.requiredDb, 4),
    trimmed(band.givenDb, 4),
    trimmed(band.marginDb, 4),
    band.marginDb >= 0 ? 'holds' : after.mask.levelStated ? 'FAIL' : 'short',
  ]);
}

/** "2·r − channel" or "r + channel". */
function imageText(band: MaskBand): string {
  const multiple = band.multiple === 1 ? 'r' : `${band.multiple}·r`;
  return band.sense === 'upright' ? `${multiple} + channel` : `${multiple} − channel`;
}

/**
 * What the mask asks, in one sentence.
 *
 * @example maskSentence(after) // 'Anti-alias mask: ...'
 */
export function maskSentence(after: AfterRate): string {
  const { mask } = after;
  const level = mask.levelStated
    ? `${trimmed(mask.outOfBandLevel, 4)} dBFS (stated: a shortfall blocks the rate)`
    : `${trimmed(mask.outOfBandLevel, 4)} dBFS (full scale; no level stated, so reported only)`;
  const worst = mask.worst ? ` Least margin ${trimmed(mask.worst.marginDb, 4)} dB at ${range(mask.worst.low, mask.worst.high, 7)}.` : '';
  return (
    `Anti-alias mask: an out-of-band signal at ${level} must reach the converter at or below ${trimmed(mask.threshold, 4)} dBFS, ` +
    `so the filter needs ${trimmed(mask.requiredDb, 4)} dB over each of the ${mask.bands.length} alias bands (images of the channel widened by the required margin, over the rate's ±ppm).${worst}`
  );
}

/**
 * The filter orders that would meet the mask, in one sentence.
 *
 * @example designSentence(after) // 'Filter that would do ...'
 */
export function designSentence(after: AfterRate): string {
  const d = after.design;
  const stops = [
    d.stopBelow === null ? null : `from ${formatFrequency(d.stopBelow, 7)} down`,
    d.stopAbove === null ? null : `from ${formatFrequency(d.stopAbove, 7)} up`,
  ].filter((s) => s !== null);
  const mask = `${trimmed(d.passbandRippleDb, 4)} dB ripple over the channel, ${trimmed(d.stopbandDb, 4)} dB ${stops.length > 0 ? stops.join(' and ') : 'nowhere (no alias band below the input bandwidth)'}`;
  const side = d.tightest === null || d.selectivity === null ? '' : `; tightest side: ${d.tightest}, Ωs ${trimmed(d.selectivity, 4)}`;
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
export function noiseSentence(after: AfterRate, candidate: ReportedCandidate): string {
  const noise = after.noise;
  if (noise === null) return 'Noise folding: not computed, the filter stops the whole channel.';
  const penalty =
    `Noise folding: +${noise.penaltyDb.toFixed(3)} dB (quadrature error below ${noise.accuracyDb.toPrecision(1)} dB): wideband noise from the alias bands ` +
    "on top of the channel's own through the filter (with no filter it would be 10·log10 of the zones up to the input bandwidth).";
  if (noise.driverNoiseDensity === null || noise.driverSnrDb === null) return `${penalty} No driver noise density stated.`;
  const driver = ` Driver at ${trimmed(noise.driverNoiseDensity, 4)} dBFS/Hz leaves ${trimmed(noise.driverSnrDb, 4)} dB`;
  const lowered =
    candidate.channelSnrDb !== null && candidate.channelSnrWithDriverDb !== null
      ? `; channel SNR ${trimmed(candidate.channelSnrDb, 4)} dB → ${trimmed(candidate.channelSnrWithDriverDb, 4)} dB with it.`
      : ' (no channel SNR to lower: not a clock part).';
  return penalty + driver + lowered;
}

/**
 * The NCO and decimation settings, in one or two sentences.
 *
 * @example downConverterSentences(after)[0] // 'NCO ...'
 */
export function downConverterSentences(after: AfterRate): string[] {
  const { nco, decimation } = after.downConverter;
  const sentences: string[] = [];
  if (nco) {
    const tuned = `NCO (${nco.bits}-bit): word ${nco.word} (0x${nco.word.toString(16).toUpperCase()}) gives ${formatFrequency(nco.actual, 12)}, ${signedHz(nco.error)} from ${formatFrequency(nco.target, 10)}`;
    sentences.push(
      nco.inverted
        ? `${tuned}; the channel is inverted: load ${nco.negativeWord} (0x${nco.negativeWord.toString(16).toUpperCase()}) for −${formatFrequency(nco.target, 10)} (error ${signedHz(-nco.error)}), or conjugate the output.`
        : `${tuned}.`,
    );
  }
  if (decimation) {
    const d = decimation;
    const how = d.factor === null ? `${d.refusal}` : `÷${d.factor} = ${stagesText(d.halfBandStages, d.remainder ?? 1)}`;
    const fit = `the channel ${d.fits ? 'fits' : 'does not fit'} in ${formatFrequency(d.usableBandwidth, 7)} usable (${signedHz(d.fitSlack)} each side)`;
    sentences.push(`Decimation to ${formatFrequency(d.outputRate)}: ${how}; ${fit}.`);
  }
  return sentences;
}

function stagesText(halfBand: number, remainder: number): string {
  const parts = [
    halfBand > 0 ? `${halfBand} half-band stage${halfBand === 1 ? '' : 's'}` : null,
    remainder > 1 ? `a ÷${remainder} stage` : null,
  ].filter((p) => p !== null);
  return parts.length > 0 ? parts.join(' then ') : 'no decimation';
}

function signedHz(value: number): string {
  return value >= 0 ? `+${formatFrequency(value, 4)}` : `−${formatFrequency(-value, 4)}`;
}

/**
 * A frequency range for people, one frequency when low = high.
 *
 * @param low, high Hz
 * @param significant digits kept (default 10)
 * @example range(217.63631e6, 239.64369e6, 7) // '217.6363 MHz – 239.6437 MHz'
 */
export function range(low: number, high: number, significant = 10): string {
  return low === high ? formatFrequency(low, significant) : `${formatFrequency(low, significant)} – ${formatFrequency(high, significant)}`;
}

const UNIT_WORD = /^(?:[kMG]?Hz|dB|dBFS|dBFS\/Hz|dBc)[.,;:)]*$/;

/**
 * Text broken at spaces into lines of at most `width` characters (a word
 * longer than that keeps its own line); a number stays on the line of its
 * unit.
 *
 * @param text one paragraph
 * @param width columns (default 100)
 * @example wrapText('aa bb cc', 5) // 'aa bb\ncc'
 */
export function wrapText(text: string, width = 100): string {
  const lines: string[] = [];
  let line = '';
  const words = text.split(' ').reduce<string[]>((kept, word) => {
    if (UNIT_WORD.test(word) && kept.length > 0) kept[kept.length - 1] += ` ${word}`;
    else kept.push(word);
    return kept;
  }, []);
  for (const word of words) {
    if (line !== '' && line.length + 1 + word.length > width) {
      lines.push(line);
      line = word;
    } else line = line === '' ? word : `${line} ${word}`;
  }
  if (line !== '') lines.push(line);
  return lines.join('\n');
}

/**
 * Why the mask fails a candidate, in words; null when it does not (no level
 * stated, or every alias band holds).
 *
 * @example maskShortfall(candidate) // null (the mask holds at the best rate)
 */
export function maskShortfall(candidate: ReportedCandidate): string | null {
  const mask = candidate.afterRate?.mask;
  if (!mask || mask.pass || mask.worst === null) return null;
  const w = mask.worst;
  return `${MASK_CHECK}: the filter gives ${trimmed(w.givenDb, 4)} dB at ${range(w.low, w.high, 7)} where ${trimmed(w.requiredDb, 4)} dB is needed (short by ${trimmed(-w.marginDb, 4)} dB)`;
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
 * filter cannot hold back), "FAIL, mask too" when the mask fails besides.
 *
 * @example candidateVerdict(candidate) // 'pass' (the demo's best rate; 'FAIL: mask' where only the anti-alias mask fails)
 */
export function candidateVerdict(candidate: ReportedCandidate): string {
  if (candidate.pass) return 'pass';
  const mask = candidate.afterRate?.mask;
  if (!mask || mask.pass) return 'FAIL';
  const restPasses = candidate.zone !== null && candidate.zoneEdgeMargin >= 0 && candidate.checks.every((c) => c.pass);
  return restPasses ? 'FAIL: mask' : 'FAIL, mask too';
}
