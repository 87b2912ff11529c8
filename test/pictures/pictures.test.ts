import { beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { hz } from '../../src/units/quantities.js';
import { InputError } from '../../src/units/input-error.js';
import type { PlanReport } from '../../src/plan/plan-report.js';
import { rateMapSvg } from '../../src/pictures/rate-map.js';
import { rateMapView, MOST_LANES } from '../../src/pictures/rate-map-view.js';
import { spectrumSvg } from '../../src/pictures/spectrum.js';
import { bandPositionSvg } from '../../src/pictures/band-position.js';
import { planPicturesSvg } from '../../src/pictures/plan-pictures.js';
import { converterFixture, scenarioFixture } from '../helpers/scenario-fixture.js';
import { heronBoardScenario, heronHighIfScenario, heronLowPassScenario, heronStraddleScenario, reportOf } from './picture-plan.js';
import { elementsOf, parseSvg, rootOf, textsOf } from './svg-check.js';
import { inkStatistics, renderPng } from './render-png.js';

/**
 * The pictures of plans solved by the real solver (invented Heron scenarios,
 * test/pictures/picture-plan.ts): each parses as XML with @xmldom/xmldom,
 * states its size, carries the labels it must, refers to nothing outside
 * itself, and renders with @resvg/resvg-js to a picture that is not blank.
 * The PNGs are left in ifzone-pictures under the system's temporary folder for a person to look at.
 */

const OUT = join(tmpdir(), 'ifzone-pictures');
let board: PlanReport;
let high: PlanReport;
let empty: PlanReport;

beforeAll(() => {
  board = reportOf(heronBoardScenario());
  high = reportOf(heronHighIfScenario());
  // Converter rates 20–25 MHz hold no window for 63–77 MHz (zone 6 would need 25.67–25.2 MHz).
  empty = reportOf(scenarioFixture({ name: 'Heron-0 no window', converter: converterFixture({ maxRate: hz(25e6) }) }));
  mkdirSync(OUT, { recursive: true });
  // The fixtures must exercise what the pictures draw, or the checks below prove little.
  expect(board.blocked.length).toBeGreaterThan(10);
  expect(board.feasible.length).toBeGreaterThan(0);
  expect(board.candidates.some((c) => !c.pass)).toBe(true);
  expect(high.windows.length).toBeGreaterThan(MOST_LANES);
  expect(empty.windows).toHaveLength(0);
});

/** Parses, checks the stated size and the self-containment, renders and checks ink; returns the texts. */
function checkPicture(name: string, svg: string, width: number): string[] {
  const document = parseSvg(svg);
  const root = rootOf(document);
  expect(root.getAttribute('xmlns')).toBe('http://www.w3.org/2000/svg');
  expect(root.getAttribute('width')).toBe(String(width));
  const height = Number(root.getAttribute('height'));
  expect(Number.isInteger(height) && height > 100).toBe(true);
  expect(root.getAttribute('viewBox')).toBe(`0 0 ${width} ${height}`);
  expect(root.getAttribute('font-family')).toBe('sans-serif');
  for (const el of elementsOf(document)) {
    // No images, scripts, styles or foreign content; text stays <text>.
    expect(['image', 'script', 'style', 'foreignObject', 'use', 'a', 'font', 'glyph']).not.toContain(el.localName);
    for (let i = 0; i < el.attributes.length; i++) {
      const attr = el.attributes.item(i)!;
      expect(attr.name).not.toMatch(/href$/);
      if (attr.name !== 'xmlns') expect(attr.value, `${el.localName} ${attr.name}`).not.toMatch(/https?:|url\((?!#)|@import/);
    }
  }
  const rendered = renderPng(svg);
  writeFileSync(`${OUT}/${name}.png`, rendered.png);
  expect([rendered.width, rendered.height]).toEqual([width, height]);
  const ink = inkStatistics(rendered);
  // Not blank: a fair share of the canvas inked, in more than one tone (lines, text, fills, hatching).
  expect(ink.inkShare).toBeGreaterThan(0.04);
  expect(ink.distinct).toBeGreaterThan(8);
  return textsOf(document);
}

describe('rate map', () => {
  it('draws every window of a short range with zone labels, inversion marks, blocking labels and candidates', () => {
    const texts = checkPicture('rate-map-board', rateMapSvg(board), 960);
    for (const w of board.windows) expect(texts).toContain(`zone ${w.zone}${w.inverted ? ' (inv)' : ''}`);
    expect(texts).toContain('zone 2 (inv)');
    const all = texts.join('\n');
    // The legend names every blocking label with its key.
    for (const label of new Set(board.blocked.map((b) => b.label))) expect(all).toContain(` = ${label}`);
    // Every candidate is labelled at its marker, or by its rank number there and named in the notes.
    board.candidates.forEach((c, i) => {
      expect(texts.includes(c.label) || (texts.includes(String(i + 1)) && all.includes(`${i + 1} = ${c.label} (`)), c.label).toBe(true);
    });
    expect(all).toContain('sampling rate (MHz)');
    expect(all).toContain('Heron-4 board <rev "B"> & co');
  });

  it('zooms a long range with many narrow windows onto a run of lanes on a log axis, and says so', () => {
    const view = rateMapView(high);
    expect(view.windows).toHaveLength(MOST_LANES);
    expect(view.windows.map((w) => w.zone)).toEqual(Array.from({ length: MOST_LANES }, (_, i) => i + 1));
    expect(view.log).toBe(true);
    expect(view.hidden).toBe(high.windows.length - MOST_LANES);
    const texts = checkPicture('rate-map-high-if', rateMapSvg(high), 960);
    const all = texts.join('\n');
    expect(all).toContain('sampling rate (GHz), logarithmic');
    expect(all).toContain(`${view.hidden} more windows`);
    expect(texts).not.toContain(`zone ${MOST_LANES + 1}`);
    expect(texts).toContain(high.best!);
  });

  it('says so when no window lies in the search range', () => {
    const texts = checkPicture('rate-map-empty', rateMapSvg(empty), 960);
    expect(texts).toContain('No legal window inside the search range');
  });
});

describe('spectrum after sampling', () => {
  it('labels the wanted image, DC, rate/4, rate/2, and lists every check with level and verdict', () => {
    const candidate = board.candidates.find((c) => !c.pass)!;
    const texts = checkPicture('spectrum-board-failing', spectrumSvg(board, candidate.label), 960);
    expect(texts).toContain('wanted (inverted)');
    expect(texts).toContain('DC');
    // Named as the converter's spur checks are ("rate/2", "rate/4"), never "fs/…", and written as a frequency that is not
    // programmed: 4 significant digits (the README's table of how each quantity is written; common practice).
    expect(texts).toContain('rate/2');
    expect(texts.some((t) => t.startsWith('fs/'))).toBe(false);
    const quarter = texts.find((t) => t.startsWith('rate/4 = '))!;
    const [, figure, unit] = /^rate\/4 = ([\d.]+) (kHz|MHz|GHz)$/.exec(quarter)!;
    expect(figure!.replace('.', '').replace(/^0+/, '').length).toBeLessThanOrEqual(4);
    const scale = { kHz: 1e3, MHz: 1e6, GHz: 1e9 }[unit as 'kHz' | 'MHz' | 'GHz'];
    expect(Math.abs(Number(figure) * scale - candidate.rate / 4)).toBeLessThanOrEqual(5e-4 * (candidate.rate / 4));
    for (const check of candidate.checks) expect(texts).toContain(check.label);
    expect(texts).toContain('FAIL');
    expect(texts).toContain('level (dBFS)');
    expect(texts).toContain('frequency after sampling (MHz)');
    expect(texts.filter((t) => t === 'FAIL').length).toBe(candidate.checks.filter((c) => !c.pass).length);
  });

  it('draws a passing candidate of the high IF plan on a GHz axis', () => {
    const texts = checkPicture('spectrum-high-if', spectrumSvg(high, high.best!), 960);
    expect(texts).toContain('frequency after sampling (GHz)');
    for (const check of high.candidates[0]!.checks) expect(texts).toContain(check.label);
  });

  it('refuses a label that names no candidate, naming the ones there are', () => {
    expect(() => spectrumSvg(board, 'XO-Z')).toThrow(InputError);
    expect(() => spectrumSvg(board, 'XO-Z')).toThrow(/XO-A 122\.88M/);
  });
});

describe('band-position chart', () => {
  it('labels the axes, the zones, the design line and every candidate', () => {
    const texts = checkPicture('band-position-board', bandPositionSvg(board), 960);
    expect(texts).toContain('upper band edge / bandwidth, fH/B');
    expect(texts).toContain('sampling rate / bandwidth, fs/B');
    // Guarded band 63–77 MHz: fH/B = 77/14 = 5.5 (picture-plan.ts).
    expect(texts).toContain('this design: fH/B = 5.5');
    for (const label of ['zone 1', 'zone 2 (inv)', 'zone 3', 'zone 4 (inv)', 'zone 5']) expect(texts).toContain(label);
    for (const c of board.candidates) expect(texts.some((t) => t.startsWith(`${c.label}: `))).toBe(true);
  });

  it('draws one polygon per zone below the chart edge, and marks only the chosen candidate when asked', () => {
    const svg = bandPositionSvg(high, high.best!);
    const document = parseSvg(svg);
    // fH/B = 1411/12 = 117.58; the x axis ends at the next 20 (140): zones 1..139.
    expect(document.getElementsByTagName('polygon').length).toBe(139);
    const texts = checkPicture('band-position-high-if-one', svg, 960);
    expect(texts.filter((t) => /^(best in|centre of|[A-Z]+-)[^:]*: /.test(t))).toEqual([
      `${high.best!}: ${texts.find((t) => t.startsWith(`${high.best!}: `))!.slice(high.best!.length + 2)}`,
    ]);
  });
});

describe('edge cases', () => {
  it('shows a clock whose rate lands in no window on its own lane, and the wanted band folding onto itself', () => {
    const report = reportOf(heronStraddleScenario());
    const clock = report.candidates.find((c) => c.label === 'XO-S 140M')!;
    expect(clock.zone).toBeNull();
    expect(checkPicture('rate-map-straddle', rateMapSvg(report), 960)).toContain('outside windows');
    expect(checkPicture('spectrum-straddle', spectrumSvg(report, clock.label), 960)).toContain(
      'wanted band folds onto itself (straddles a zone edge)',
    );
  });

  it('draws a low-pass band (guard down to DC) with fH/B = 1 on the band-position chart', () => {
    const report = reportOf(heronLowPassScenario());
    expect(report.windows.map((w) => w.zone)).toEqual([1]);
    // Guarded band 0–12 MHz: fH/B = 1.
    expect(checkPicture('band-position-low-pass', bandPositionSvg(report), 960)).toContain('this design: fH/B = 1');
    expect(checkPicture('rate-map-low-pass', rateMapSvg(report), 960)).toContain('zone 1');
  });
});

describe('all three pictures in one document', () => {
  it('stacks the rate map, the spectrum at the best candidate and the band-position chart', () => {
    const texts = checkPicture('plan-pictures-board', planPicturesSvg(board), 960);
    const all = texts.join('\n');
    expect(all).toContain('Sampling-rate map: ');
    expect(all).toContain(`Spectrum after sampling at ${board.best}: `);
    expect(all).toContain('Band-position chart: ');
  });

  it('leaves out the spectrum when there is no candidate', () => {
    const noCandidates: PlanReport = { ...empty, candidates: [], best: null };
    const texts = checkPicture('plan-pictures-empty', planPicturesSvg(noCandidates), 960);
    expect(texts.join('\n')).not.toContain('Spectrum after sampling');
  });
});

describe('the XML check itself', () => {
  it('refuses malformed markup, so the checks above can fail', () => {
    expect(() => parseSvg('<svg xmlns="http://www.w3.org/2000/svg"><text>a & b</text></svg>')).toThrow();
    expect(() => parseSvg('<svg xmlns="http://www.w3.org/2000/svg"><g></svg>')).toThrow();
    expect(() => parseSvg('<svg xmlns="http://www.w3.org/2000/svg"><text a="1" a="2">x</text></svg>')).toThrow();
    expect(() => parseSvg('<svg xmlns="http://www.w3.org/2000/svg"><text>a < b</text></svg>')).toThrow();
  });
});
