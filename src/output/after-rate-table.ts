import { quantityText } from '../text/quantity-text.js';
import type { ReportedCandidate } from '../plan/plan-report.js';
import { textTable } from './text-table.js';
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
 * @param width characters per line
 * @returns text, no trailing newline; '' when the candidate has no after-rate figures
 * @example afterRateSection(report.candidates[0]) // 'After the rate, at best in 171–194.5 MHz (186.663556 MHz):\n...'
 */
export function afterRateSection(candidate: ReportedCandidate, detail = false, width = 100): string {
  const after = candidate.afterRate;
  if (after === null) return '';
  const rows = maskRows(after, detail ? Infinity : TIGHTEST_SHOWN);
  const more = after.mask.bands.length - rows.length;
  const lines = [
    `After the rate, at ${quantityText('terminal').candidate(candidate.label, candidate.rate)}:`,
    wrapText(maskSentence(after), width),
    rows.length > 0
      ? textTable(
          MASK_HEAD.map((head, i) => ({ head, align: i >= 2 && i <= 4 ? 'right' : 'left', role: i === 0 ? 'key' : 'main' })),
          rows,
          width,
        ) + (more > 0 ? `\n(+${more} more alias bands with wider margins in --json)` : '')
      : '',
    wrapText(designSentence(after), width),
    wrapText(noiseSentence(after, candidate), width),
    ...downConverterSentences(after).map((sentence) => wrapText(sentence, width)),
  ];
  return lines.filter((line) => line !== '').join('\n');
}
