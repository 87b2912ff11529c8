import { hz, type Hz } from '../units/quantities.js';
import { quantityText } from '../text/quantity-text.js';
import { channelRates, type ChannelRates } from '../report/channel-rates.js';
import type { ChannelPlanReport } from './channels.js';
import { textWidth } from './typography.js';
import { COLLIDE_FILL, FILL } from './patterns.js';
import type { Scale } from './scale.js';
import { element, textElement } from './svg-element.js';

const T = quantityText('svg');

const LANE = 30;
const BODY = 16;
const TITLE_FONT = 11;
const ZONE_FONT = 8.5;

/**
 * The least distance each pair of channels keeps between their aliases, read
 * from the first candidate's checks of kind 'channel' (the other channel as
 * an interferer of this one): the larger required margin of the directions
 * that block; null when neither blocks or no such check is listed.
 *
 * @param report a report of several channels
 * @returns (first, second) → Hz or null
 */
export function pairSpacing(report: ChannelPlanReport): (first: number, second: number) => Hz | null {
  const candidate = report.candidates[0];
  const required = (of: number, other: number): number | null => {
    const check = candidate?.channels[of]?.checks?.find(
      (c) => (c.kind as string) === 'channel' && c.label === report.channels[other]!.label,
    );
    return check && check.blocking ? check.requiredMargin : null;
  };
  return (first, second) => {
    const both = [required(first, second), required(second, first)].filter((m): m is number => m !== null);
    return both.length === 0 ? null : hz(Math.max(...both));
  };
}

/**
 * The rate map's lanes of a multi-channel plan, drawn above the lanes of the
 * channels together: one lane per channel with its own windows (its guarded
 * band whole in one zone; upright white, inverted dotted, the zone number
 * inside where it fits), then one lane per pair of channels with the rates
 * at which both are whole (white) and, hatched, those at which their aliases
 * come closer than the spacing (`channelRates`).
 *
 * @param report a report of several channels
 * @param scale rate → x, px
 * @param top px
 * @param low, high the rates drawn, Hz
 * @returns the markup, the height used (px) and the rates drawn
 */
export function channelLanes(
  report: ChannelPlanReport,
  scale: Scale,
  top: number,
  low: number,
  high: number,
): { markup: string; height: number; rates: ChannelRates; drawn: { upright: boolean; inverted: boolean; collide: boolean } } {
  const rates = channelRates(report.channels, pairSpacing(report), report.search);
  const parts: string[] = [];
  const drawn = { upright: false, inverted: false, collide: false };
  const [left] = scale.range;
  let y = top;
  const title = (text: string, mid: number) =>
    textElement(left - 10, mid + 4, clipText(text, left - 14), { 'text-anchor': 'end', 'font-size': TITLE_FONT, 'font-weight': 'bold' });
  const span = (minRate: number, maxRate: number) => {
    const [a, b] = [Math.max(minRate, low), Math.min(maxRate, high)];
    return a <= b ? ([scale.at(a), scale.at(b)] as const) : null;
  };
  const box = (x0: number, x1: number, bodyTop: number, fill: string, outline: boolean) =>
    element('rect', {
      x: x0,
      y: bodyTop,
      width: Math.max(x1 - x0, 1.5),
      height: BODY,
      fill,
      stroke: outline ? '#000' : undefined,
      'stroke-width': outline ? 1 : undefined,
    });
  report.channels.forEach((channel, i) => {
    const bodyTop = y + (LANE - BODY) / 2;
    parts.push(title(`${channel.label} alone`, bodyTop + BODY / 2));
    for (const w of rates.windows[i]!) {
      const at = span(w.minRate, Math.min(w.maxRate, report.search.maxRate));
      if (!at) continue;
      drawn[w.inverted ? 'inverted' : 'upright'] = true;
      parts.push(box(at[0], at[1], bodyTop, w.inverted ? FILL.inverted : '#fff', true));
      const name = String(w.zone);
      if (at[1] - at[0] >= textWidth(name, ZONE_FONT) + 4)
        parts.push(textElement((at[0] + at[1]) / 2, bodyTop + BODY / 2 + 3, name, { 'text-anchor': 'middle', 'font-size': ZONE_FONT }));
    }
    y += LANE;
  });
  for (const pair of rates.pairs) {
    const bodyTop = y + (LANE - BODY) / 2;
    const [a, b] = [report.channels[pair.first]!.label, report.channels[pair.second]!.label];
    parts.push(title(`${a} & ${b}`, bodyTop + BODY / 2));
    // Where both are whole: the two channels' windows intersected.
    for (const wa of rates.windows[pair.first]!)
      for (const wb of rates.windows[pair.second]!) {
        const at = span(Math.max(wa.minRate, wb.minRate), Math.min(wa.maxRate, wb.maxRate, report.search.maxRate));
        if (at && Math.max(wa.minRate, wb.minRate) <= Math.min(wa.maxRate, wb.maxRate))
          parts.push(box(at[0], at[1], bodyTop, '#fff', true));
      }
    for (const f of pair.forbidden) {
      const at = span(f.minRate, f.maxRate);
      if (!at) continue;
      drawn.collide = true;
      parts.push(
        element('rect', { x: at[0], y: bodyTop, width: Math.max(at[1] - at[0], 1.5), height: BODY, fill: COLLIDE_FILL, class: 'collide' }),
      );
    }
    if (pair.spacing === null)
      parts.push(
        textElement(scale.range[1], bodyTop - 2, 'not kept apart: neither blocks the other', {
          'text-anchor': 'end',
          'font-size': ZONE_FONT,
          'font-style': 'italic',
        }),
      );
    y += LANE;
  }
  return { markup: element('g', { class: 'channel-lanes' }, parts.join('')), height: y - top, rates, drawn };
}

/**
 * The notes under a multi-channel rate map: what the channel and pair lanes show, with each pair's spacing.
 *
 * @param report a report of several channels
 * @param rates what channelLanes drew
 * @returns lines of text
 */
export function channelLaneNotes(report: ChannelPlanReport, rates: ChannelRates): string[] {
  const spacings = rates.pairs.map((p) => {
    const names = `${report.channels[p.first]!.label} & ${report.channels[p.second]!.label}`;
    return p.spacing === null ? `${names}: not kept apart` : `${names}: ${T.frequency(p.spacing)}`;
  });
  return [
    'Channel lanes: each channel alone, its windows with their zone numbers. Pair lanes: where both channels are whole (outlined) and,',
    `    hatched, where their aliases come closer than the spacing (${spacings.join('; ')}).`,
  ];
}

function clipText(text: string, width: number): string {
  const chars = [...text];
  if (textWidth(text, TITLE_FONT) <= width) return text;
  let kept = chars.length;
  while (kept > 1 && textWidth(chars.slice(0, kept).join('') + '…', TITLE_FONT) > width) kept--;
  return chars.slice(0, kept).join('') + '…';
}
