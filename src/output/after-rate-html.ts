import { quantityText } from '../text/quantity-text.js';
import { escapeXml } from '../pictures/escape-xml.js';
import type { ReportedCandidate } from '../plan/plan-report.js';
import { htmlTable } from './html-table.js';
import { designSentence, downConverterSentences, MASK_HEAD, maskRows, maskSentence, noiseSentence } from './after-rate-words.js';

const HTML = quantityText('html');

/**
 * The after-rate section of the review page for one candidate: the mask in
 * words with every alias band in a table (tightest first), the filter orders,
 * the noise folding and the down-converter settings.
 *
 * @param candidate a reported candidate
 * @returns HTML; '' when the candidate has no after-rate figures
 * @example afterRateHtml(report.candidates[0]) // '<h3>After the rate, at best in 171–194.5 MHz...'
 */
export function afterRateHtml(candidate: ReportedCandidate): string {
  const after = candidate.afterRate;
  if (after === null) return '';
  const rows = maskRows(after, Infinity, HTML).map((row) =>
    row.map((cell, i) => (i === row.length - 1 && cell === 'FAIL' ? ([cell, 'fail'] as const) : cell)),
  );
  const paragraphs = [designSentence(after, HTML), noiseSentence(after, candidate, HTML), ...downConverterSentences(after, HTML)];
  return (
    `<h3>${escapeXml(`After the rate, at ${HTML.candidate(candidate.label, candidate.rate)}`)}</h3>` +
    `<p>${escapeXml(maskSentence(after, HTML))}</p>` +
    (rows.length > 0 ? htmlTable(MASK_HEAD, rows, 'Alias bands up to the input bandwidth, tightest first') : '') +
    paragraphs.map((p) => `<p>${escapeXml(p)}</p>`).join('')
  );
}
