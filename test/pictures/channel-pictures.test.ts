import { describe, expect, it } from 'vitest';
import type { Document, Element } from '@xmldom/xmldom';
import { hz } from '../../src/units/quantities.js';
import { spectrumSvg } from '../../src/pictures/spectrum.js';
import { rateMapSvg } from '../../src/pictures/rate-map.js';
import { planPicturesSvg } from '../../src/pictures/plan-pictures.js';
import { filterMaskSvg } from '../../src/pictures/filter-mask.js';
import { channelReportView } from '../../src/pictures/channels.js';
import { channelFill } from '../../src/pictures/patterns.js';
import { jointFeasibleSet } from '../../src/solve/joint-feasible-set.js';
import type { PlanReport } from '../../src/plan/plan-report.js';
import { TWO_CHANNELS, guardedEdges, twoChannelReport } from '../helpers/channel-report.js';
import { elementsOf, parseSvg, textsOf } from './svg-check.js';
import { inkStatistics, renderPng } from './render-png.js';

/**
 * The pictures of a plan of two channels (a hand-made report in the agreed
 * multi-channel shape, invented Heron demo bands: IF-A 65–75 MHz with 2 MHz
 * guards, IF-B 100–104 MHz with 1 MHz guards, 1 MHz kept between them),
 * read back from the SVG (parsed by resvg's XML reader and @xmldom/xmldom).
 *
 * Where each channel's image must be, and where two channels collide, is
 * worked out here by folding frequencies point by point (common practice:
 * a frequency f sampled at r shows at |f − r·round(f/r)|), not by the
 * project's image algebra; the pair lanes are also set against
 * jointFeasibleSet, the exact set the task names.
 */

const report = twoChannelReport();
const asPlan: PlanReport = report;
const MHZ = 1e6;

/** Where a frequency shows after sampling at r (the folding of the trade). */
const fold = (f: number, r: number) => Math.abs(f - r * Math.round(f / r));

/** A band's alias by folding 4001 points across it: [lowest, highest] shown, and whether the points keep their order (or reverse it). */
function foldedBand(low: number, high: number, rate: number): { low: number; high: number; monotone: 'up' | 'down' | 'no' } {
  const points = Array.from({ length: 4001 }, (_, i) => fold(low + ((high - low) * i) / 4000, rate));
  const up = points.every((p, i) => i === 0 || p > points[i - 1]!);
  const down = points.every((p, i) => i === 0 || p < points[i - 1]!);
  return { low: Math.min(...points), high: Math.max(...points), monotone: up ? 'up' : down ? 'down' : 'no' };
}

function inGroup(el: Element, cls: string): boolean {
  for (let p = el.parentNode as Element | null; p; p = p.parentNode as Element | null)
    if (p.localName === 'g' && p.getAttribute?.('class') === cls) return true;
  return false;
}

const num = (el: Element, name: string) => Number(el.getAttribute(name));

/** The x of 0 and of rate/2, read from the spectrum's DC and fs/2 marks. */
function spectrumScale(doc: Document, rate: number): (f: number) => number {
  const lines = elementsOf(doc).filter((el) => el.localName === 'line' && inGroup(el, 'marks'));
  const [x0, xHalf] = [num(lines[0]!, 'x1'), num(lines[2]!, 'x1')];
  return (f) => x0 + ((xHalf - x0) * f) / (rate / 2);
}

/** Rate ↔ x of the rate map, fitted to two of its axis's tick labels (log or linear as its title says). */
function rateScale(doc: Document): { toRate: (x: number) => number; toX: (rate: number) => number } {
  const axis = elementsOf(doc).filter((el) => el.localName === 'text' && inGroup(el, 'axis-x'));
  const title = axis[axis.length - 1]!.textContent ?? '';
  const unit = title.includes('(GHz)') ? 1e9 : title.includes('(MHz)') ? 1e6 : title.includes('(kHz)') ? 1e3 : 1;
  const ticks = axis.slice(0, -1).map((el) => ({ x: num(el, 'x'), rate: Number(el.textContent) * unit }));
  const [a, b] = [ticks[0]!, ticks[ticks.length - 1]!];
  const log = title.includes('logarithmic');
  const t = (r: number) => (log ? Math.log(r) : r);
  const slope = (b.x - a.x) / (t(b.rate) - t(a.rate));
  return {
    toX: (rate) => a.x + slope * (t(rate) - t(a.rate)),
    toRate: (x) => {
      const v = t(a.rate) + (x - a.x) / slope;
      return log ? Math.exp(v) : v;
    },
  };
}

describe('the spectrum of two channels', () => {
  // The picture is asked for by label: the first candidate of each label.
  const firsts = report.candidates.filter((c, i) => report.candidates.findIndex((d) => d.label === c.label) === i);
  for (const candidate of firsts) {
    it(`draws and names each channel's image where folding puts it, at ${candidate.label}`, () => {
      const svg = spectrumSvg(asPlan, candidate.label);
      const doc = parseSvg(svg);
      const x = spectrumScale(doc, candidate.rate);
      const all = elementsOf(doc);
      const names = all.filter((el) => el.localName === 'text' && inGroup(el, 'wanted-label')).map((el) => el.textContent);
      TWO_CHANNELS.forEach((channel, i) => {
        const folded = foldedBand(channel.low, channel.high, candidate.rate);
        const fills = all.filter((el) => el.localName === 'rect' && inGroup(el, 'wanted') && el.getAttribute('fill') === channelFill(i));
        if (folded.monotone === 'no') {
          // Straddles a zone edge: drawn folded, and said so.
          expect(names).toContain(`${channel.label} folds onto itself`);
          expect(fills.length).toBeGreaterThan(0);
          return;
        }
        expect(names).toContain(folded.monotone === 'down' ? `${channel.label} (inverted)` : channel.label);
        expect(fills).toHaveLength(1);
        const rect = fills[0]!;
        expect(num(rect, 'x')).toBeCloseTo(x(folded.low), 1);
        expect(num(rect, 'x') + num(rect, 'width')).toBeCloseTo(x(folded.high), 1);
      });
      // Every channel keyed in the legend by its label.
      const texts = textsOf(doc);
      for (const channel of TWO_CHANNELS) expect(texts).toContain(`channel ${channel.label}`);
      expect(inkStatistics(renderPng(svg)).inkShare).toBeGreaterThan(0.05);
    });
  }

  it('lists every interferer of every channel once, against the channel it comes closest to', () => {
    const candidate = report.candidates[0]!;
    const texts = textsOf(parseSvg(spectrumSvg(asPlan, candidate.label)));
    const labels = new Set(candidate.channels.flatMap((c) => (c.checks ?? []).map((k) => k.label)));
    for (const label of labels) {
      const rows = texts.filter((t) => t.startsWith(`${label} → `));
      expect(rows, label).toHaveLength(1);
      const [, channel] = rows[0]!.split(' → ');
      // The named channel is the tightest: no other channel's check of this label has less slack.
      const slack = (c: (typeof candidate.channels)[number]) => {
        const k = (c.checks ?? []).find((x) => x.label === label);
        return k === undefined ? Infinity : k.blocking ? k.margin - k.requiredMargin : k.margin;
      };
      const named = candidate.channels.find((c) => c.label === channel)!;
      for (const other of candidate.channels) expect(slack(named)).toBeLessThanOrEqual(slack(other));
    }
  });
});

describe('the rate map of two channels', () => {
  const svg = rateMapSvg(asPlan);
  const doc = parseSvg(svg);
  const { toRate, toX } = rateScale(doc);
  const [a, b] = TWO_CHANNELS.map(guardedEdges);
  const spacing = 1e6;
  /** The gap between the two channels' aliases at a rate, by folding (negative when they overlap); null unless both are whole. */
  const gapAt = (rate: number): number | null => {
    const [fa, fb] = TWO_CHANNELS.map((c) => foldedBand(c.low, c.high, rate));
    const whole = [a!, b!].every((g) => foldedBand(g.low, g.high, rate).monotone !== 'no');
    return whole ? Math.max(fb!.low - fa!.high, fa!.low - fb!.high) : null;
  };
  const hatched = elementsOf(doc)
    .filter((el) => el.localName === 'rect' && el.getAttribute('class') === 'collide')
    .map((el) => [num(el, 'x'), num(el, 'x') + num(el, 'width')] as const);

  it('draws a lane per channel and a lane for the pair', () => {
    const texts = textsOf(doc);
    expect(texts).toContain('IF-A alone');
    expect(texts).toContain('IF-B alone');
    expect(texts).toContain('IF-A & IF-B');
    expect(texts).toContain("two channels' aliases too close");
  });

  it('hatches the rates the pair forbids where folding finds the aliases closer than 1 MHz, and only there', () => {
    expect(hatched.length).toBeGreaterThan(0);
    for (const [x0, x1] of hatched) {
      for (const share of [0.25, 0.5, 0.75]) {
        const gap = gapAt(toRate(x0 + share * (x1 - x0)));
        expect(gap).not.toBeNull();
        expect(gap!).toBeLessThan(spacing);
      }
    }
    // Between the hatches, on a sweep of the drawn rates, wherever both are whole the aliases keep 1 MHz (0.05 px clear of a hatch edge).
    const [left, right] = [toX(report.search.minRate), toX(report.search.maxRate)];
    for (let x = left; x <= right; x += 0.5) {
      if (hatched.some(([x0, x1]) => x > x0 - 0.05 && x < x1 + 0.05)) continue;
      const gap = gapAt(toRate(x));
      if (gap !== null) expect(gap, `at ${toRate(x) / MHZ} MHz`).toBeGreaterThanOrEqual(spacing - 1);
    }
  });

  it('agrees with jointFeasibleSet on the collisions inside the rates drawn', () => {
    const collisions = jointFeasibleSet(
      TWO_CHANNELS.map((c) => ({ low: c.low, high: c.high })),
      hz(spacing),
      report.search,
    ).collisions.filter((c) => [a!, b!].every((g) => foldedBand(g.low, g.high, (c.minRate + c.maxRate) / 2).monotone !== 'no'));
    const [left, right] = [toX(report.search.minRate), toX(report.search.maxRate)];
    for (const c of collisions) {
      const [x0, x1] = [Math.max(toX(c.minRate), left), Math.min(toX(c.maxRate), right)];
      if (x1 - x0 < 1) continue;
      const mid = (x0 + x1) / 2;
      expect(
        hatched.some(([h0, h1]) => h0 <= mid && mid <= h1),
        `${c.minRate / MHZ}–${c.maxRate / MHZ} MHz`,
      ).toBe(true);
    }
  });
});

describe('the pictures of a plan of two channels', () => {
  it('hold one band-position chart per channel, each at its own guarded band', () => {
    const texts = textsOf(parseSvg(planPicturesSvg(asPlan)));
    for (const channel of TWO_CHANNELS) {
      const { low, high } = guardedEdges(channel);
      // fH/B of the guarded band, worked by hand: IF-A 77/14 = 5.5, IF-B 105/6 = 17.5.
      const design = high / (high - low);
      expect(texts).toContain(`Band-position chart: ${report.scenario}, channel ${channel.label}`);
      expect(texts).toContain(`this design: fH/B = ${Number(design.toPrecision(5))}`);
    }
    expect([77 / 14, 105 / 6]).toEqual([5.5, 17.5]);
  });

  it("hold one filter mask per channel, each with that channel's alias bands: input ranges that fold onto its image", () => {
    const best = report.candidates.find((c) => c.label === report.best) ?? report.candidates[0]!;
    const texts = textsOf(parseSvg(planPicturesSvg(asPlan)));
    TWO_CHANNELS.forEach((channel, i) => {
      const title = texts.filter((t) => t.startsWith(`Anti-alias filter mask at ${best.label} (`));
      expect(title.filter((t) => t.endsWith(`: ${report.scenario}, channel ${channel.label}`))).toHaveLength(1);
      const own = best.channels[i]!;
      const bands = own.afterRate!.mask.bands;
      expect(bands.length).toBeGreaterThan(0);
      // Each alias band folds (at the rate, common practice) to within the required margin of the channel's image.
      for (const band of bands) {
        const shown = fold((band.low + band.high) / 2, best.rate);
        expect(shown).toBeGreaterThanOrEqual(own.image!.low - (band.high - band.low));
        expect(shown).toBeLessThanOrEqual(own.image!.high + (band.high - band.low));
      }
      // The picture of that channel draws one stop region per alias band.
      const doc = parseSvg(filterMaskSvg(channelReportView(report, i), best.label));
      const stops = elementsOf(doc).filter((el) => el.localName === 'rect' && inGroup(el, 'stop-regions'));
      expect(stops.length).toBe(bands.length);
    });
    // The two channels' masks differ: each is its own channel's.
    expect(best.channels[0]!.afterRate!.mask.bands).not.toEqual(best.channels[1]!.afterRate!.mask.bands);
  });
});
