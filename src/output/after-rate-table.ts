import { formatFrequency } from '../units/format-frequency.js';
import type { ReportedCandidate } from '../plan/plan-report.js';
import { plainTable } from './table.js';
import { designSentence, downConverterSentences, MASK_HEAD, maskRows, maskSentence, noiseSentence, wrapText } from './after-rate-words.js';

/** Alias bands shown in the compact block. */
const TIGHTEST_SHOWN = 4;

/**
 * The compact "after the rate" block of the solve table for one candidate:
 * the mask in a sentence with its tightest alias bands, the filter orders
 * that would do, the noise folding and the down-converter settings.
 *
 * @param candidate a reported candidate with its after-rate figures
 * @param detail list every alias band instead of the tightest few
 * @returns text, no trailing newline; '' when the candidate has no after-rate figures
 * @example afterRateSection(report.candidates[0]) // 'After the rate, at VCXO-C 184.32M (184.32 MHz):\n...'
 */
export function afterRateSection(candidate: ReportedCandidate, detail = false): string {
  const after = candidate.afterRate;
  if (after === null) return '';
  const rows = maskRows(after, detail ? Infinity : TIGHTEST_SHOWN);
  const more = after.mask.bands.length - rows.length;
  const lines = [
    `After the rate, at ${candidate.label} (${formatFrequency(candidate.rate)}):`,
    wrapText(maskSentence(after)),
    rows.length > 0 ? plainTable(MASK_HEAD, rows) + (more > 0 ? `\n(+${more} more alias bands with wider margins in --json)` : '') : '',
    wrapText(designSentence(after)),
    wrapText(noiseSentence(after, candidate)),
    ...downConverterSentences(after).map((sentence) => wrapText(sentence)),
  ];
  return lines.filter((line) => line !== '').join('\n');
}
