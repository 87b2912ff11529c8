import type { PlanReport } from '../plan/plan-report.js';
import { bandPositionFigure } from './band-position.js';
import { rateMapFigure } from './rate-map.js';
import { spectrumFigure } from './spectrum.js';
import { filterMaskFigure } from './filter-mask.js';
import { stackFigures, svgDocument } from './svg-document.js';
import { eachChannelView } from './channels.js';

/**
 * The pictures of a solved plan in one SVG document, one under another:
 * the rate map, the spectrum after sampling at one candidate, the
 * band-position chart with that candidate marked, and that candidate's
 * anti-alias filter mask (when the report carries after-rate figures). This
 * is what `solve --svg FILE` writes. With several channels the spectrum
 * shows every channel's image, and the band-position chart and the filter
 * mask are drawn once per channel (each channel's own band, verdicts and mask).
 *
 * @param report the solved plan
 * @param candidateLabel the candidate for the spectrum and the mask; default the best
 *   passing one, else the first (the spectrum is left out when there is none)
 * @returns SVG text, 960 px wide
 * @throws InputError when candidateLabel names no candidate
 * @example planPicturesSvg(report) // '<svg ...' (rate map, spectrum at report.best, band-position chart, filter mask at report.best)
 */
export function planPicturesSvg(report: PlanReport, candidateLabel?: string): string {
  const label = candidateLabel ?? report.best ?? report.candidates[0]?.label;
  const figures = [rateMapFigure(report)];
  if (label !== undefined) figures.push(spectrumFigure(report, label));
  const views = eachChannelView(report);
  for (const view of views) figures.push(bandPositionFigure(view, candidateLabel));
  for (const view of label === undefined ? [] : views) {
    const mask = filterMaskFigure(view, label!);
    if (mask) figures.push(mask);
  }
  return svgDocument(stackFigures(figures, `Frequency plan pictures: ${report.scenario}`, 24));
}
