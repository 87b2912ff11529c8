import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { mkdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { hz } from '../../src/units/quantities.js';
import { readScenarioFile } from '../../src/cli/read-scenario.js';
import { verifyCapture, verifyCaptureWithSpectrum, type VerifiedCapture } from '../../src/report/verify-capture.js';
import { captureSvg } from '../../src/pictures/capture-picture.js';
import { maxHoldColumns } from '../../src/pictures/max-hold-columns.js';
import { badRate, passingRates } from '../capture/plan-rates.js';
import { elementsOf, parseSvg, rootOf, textsOf } from './svg-check.js';
import { inkStatistics, renderPng } from './render-png.js';

/**
 * The picture of `ifzone verify` on the invented Heron demo scenario, at a
 * rate the solver passes and at one where a wanted harmonic lands in the
 * band: parsed by two registry XML readers (resvg's and @xmldom/xmldom),
 * rendered with @resvg/resvg-js; PNGs left in ifzone-pictures under the system's temporary folder. The
 * max-hold reduction is checked against a plain maximum over fast-check's
 * generated spectra.
 */
const OUT = join(tmpdir(), 'ifzone-pictures');
const base = readScenarioFile('scenarios/heron-base.json');
let good: VerifiedCapture;
let bad: VerifiedCapture;

beforeAll(() => {
  mkdirSync(OUT, { recursive: true });
  good = verifyCaptureWithSpectrum(base, { rate: passingRates(base)[0]!, wantedTones: 1 });
  bad = verifyCaptureWithSpectrum(base, { rate: badRate(base).rate, wantedTones: 1 });
  // The fixtures must exercise what the picture draws.
  expect(good.result.consistent).toBe(true);
  expect(bad.result.intrusions.length).toBeGreaterThan(0);
  expect(good.result.predictions.length).toBeGreaterThan(3);
}, 60_000);

function checkPicture(name: string, svg: string): string[] {
  const document = parseSvg(svg);
  const root = rootOf(document);
  expect(root.getAttribute('xmlns')).toBe('http://www.w3.org/2000/svg');
  expect(root.getAttribute('width')).toBe('960');
  const height = Number(root.getAttribute('height'));
  expect(Number.isInteger(height) && height > 300).toBe(true);
  expect(root.getAttribute('viewBox')).toBe(`0 0 960 ${height}`);
  for (const el of elementsOf(document)) expect(['image', 'script', 'style', 'foreignObject', 'use']).not.toContain(el.localName);
  const rendered = renderPng(svg);
  writeFileSync(`${OUT}/${name}.png`, rendered.png);
  expect([rendered.width, rendered.height]).toEqual([960, height]);
  const ink = inkStatistics(rendered);
  expect(ink.inkShare).toBeGreaterThan(0.04);
  expect(ink.distinct).toBeGreaterThan(8);
  return textsOf(document);
}

describe('captureSvg', () => {
  it('draws the capture at a passing rate: title with scenario, rate and verdict, check labels, axis units, threshold and floor', () => {
    const { result, levels } = good;
    const texts = checkPicture('capture-good', captureSvg(result, levels));
    const all = texts.join('\n');
    expect(texts[0]).toMatch(/^Simulated capture at .*: Heron-4 base$/);
    expect(all).toMatch(/bin width .*Hz/);
    expect(all).toMatch(/the capture agrees with the plan/);
    expect(texts).toContain('level (dBFS)');
    expect(texts).toContain('frequency after sampling (MHz)');
    expect(all).toMatch(/threshold −\d/);
    expect(all).toMatch(/peak floor −\d/);
    // The strongest predicted line is never thinned out (labels are packed strongest first).
    const strongest = [...result.predictions].sort((a, b) => b.planLevel - a.planLevel)[0]!;
    expect(texts).toContain(strongest.check);
    expect(texts.filter((t) => result.predictions.some((p) => p.check === t)).length).toBeGreaterThan(3);
  });

  it('draws one spectrum polyline of at most one point per plot pixel, inside the plot, and one marker per predicted line', () => {
    const document = parseSvg(captureSvg(good.result, good.levels));
    const lines = elementsOf(document).filter((e) => e.localName === 'polyline' && e.getAttribute('class') === 'spectrum');
    expect(lines).toHaveLength(1);
    const points = lines[0]!
      .getAttribute('points')!
      .split(' ')
      .map((p) => p.split(',').map(Number));
    expect(points.length).toBeLessThanOrEqual(1200);
    expect(points.length).toBeGreaterThan(500);
    for (const [x, y] of points) {
      expect(x).toBeGreaterThanOrEqual(84);
      expect(x).toBeLessThanOrEqual(932);
      expect(Number.isFinite(y)).toBe(true);
    }
    const triangles = elementsOf(document).filter((e) => e.localName === 'path' && /^M[^L]*L[^L]*L[^L]*Z$/.test(e.getAttribute('d') ?? ''));
    // One per prediction, plus the legend's open swatch: the capture agrees, so no line contradicts and the filled swatch is left out.
    expect(good.result.contradictions).toHaveLength(0);
    expect(triangles).toHaveLength(good.result.predictions.length + 1);
  });

  it('at a rate where a harmonic lands in the band, says the capture confirms the failing plan and lists the intrusion', () => {
    const texts = checkPicture('capture-bad', captureSvg(bad.result, bad.levels));
    const all = texts.join('\n');
    expect(all).toMatch(/the capture agrees with the plan \(the plan fails at this rate\)/);
    expect(all).toMatch(/intrusion into the margin \([1-9]/);
    expect(texts.some((t) => /inside the wanted image|from the wanted image/.test(t))).toBe(true);
  });

  it('refuses a spectrum of the wrong length', () => {
    expect(() => captureSvg(good.result, good.levels.subarray(1))).toThrow(RangeError);
  });

  it('verifyCapture gives the same result as verifyCaptureWithSpectrum, and the spectrum holds N/2 + 1 bins', () => {
    const rate = hz(184.32e6);
    const alone = verifyCapture(base, { rate, samples: 4096, wantedTones: 1 });
    const both = verifyCaptureWithSpectrum(base, { rate, samples: 4096, wantedTones: 1 });
    expect(both.result).toEqual(alone);
    expect(both.levels).toHaveLength(2049);
    // The floor is median + 15 dB of these very levels.
    const sorted = Float64Array.from(both.levels).sort();
    expect(both.result.levels.noiseMedian).toBe(sorted[Math.floor(sorted.length / 2)]);
  });
});

describe('maxHoldColumns', () => {
  it('keeps every peak: each column is the maximum of its own bins, and the columns cover every bin once (fast-check)', () => {
    // Reference: Math.max over the column's bins (property test with fast-check, a library from the npm registry).
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -200, max: 10, noNaN: true }), { minLength: 1, maxLength: 3000 }),
        fc.integer({ min: 1, max: 1300 }),
        (levels, columns) => {
          const out = maxHoldColumns(levels, columns);
          expect(out.length).toBe(Math.min(columns, levels.length));
          let next = 0;
          for (const c of out) {
            expect(c.first).toBe(next);
            expect(c.last).toBeGreaterThanOrEqual(c.first);
            expect(c.level).toBe(Math.max(...levels.slice(c.first, c.last + 1)));
            next = c.last + 1;
          }
          expect(next).toBe(levels.length);
          // Hence no peak vanishes: the highest bin is some column's level.
          expect(Math.max(...out.map((c) => c.level))).toBe(Math.max(...levels));
          const runs = out.map((c) => c.last - c.first + 1);
          expect(Math.max(...runs) - Math.min(...runs)).toBeLessThanOrEqual(1);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('keeps a one-bin spike among 32769 bins reduced to 848 columns, and counts empty bins as the lowest', () => {
    const levels = new Float64Array(32769).fill(-120);
    levels[12345] = -3;
    levels[0] = -Infinity;
    const out = maxHoldColumns(levels, 848);
    expect(out).toHaveLength(848);
    const holder = out.find((c) => c.first <= 12345 && 12345 <= c.last)!;
    expect(holder.level).toBe(-3);
    expect(out[0]!.level).toBe(-120);
    expect(() => maxHoldColumns(levels, 0)).toThrow(RangeError);
  });
});
