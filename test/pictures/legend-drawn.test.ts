import { describe, expect, it } from 'vitest';
import type { Element } from '@xmldom/xmldom';
import { db, hz } from '../../src/units/quantities.js';
import { guardBands } from '../../src/math/band.js';
import { readScenarioFile } from '../../src/cli/read-scenario.js';
import { solveScenario } from '../../src/plan/plan-scenario.js';
import type { PlanReport } from '../../src/plan/plan-report.js';
import type { Scenario } from '../../src/scenario/scenario.js';
import { rateMapSvg } from '../../src/pictures/rate-map.js';
import { spectrumSvg } from '../../src/pictures/spectrum.js';
import { bandPositionSvg } from '../../src/pictures/band-position.js';
import { filterMaskSvg } from '../../src/pictures/filter-mask.js';
import { captureSvg } from '../../src/pictures/capture-picture.js';
import { textWidth } from '../../src/pictures/typography.js';
import { verifyCaptureWithSpectrum } from '../../src/report/verify-capture.js';
import { badRate, passingRates } from '../capture/plan-rates.js';
import { heronLowPassScenario } from './picture-plan.js';
import { elementsOf, parseSvg } from './svg-check.js';

/**
 * Legend entries appear only where the picture draws their kind. What is
 * drawn is read back from the SVG itself (parsed by resvg's XML reader and
 * @xmldom/xmldom, see svg-check.ts), outside the legend: a fill pattern, a
 * marker's shape. Demo scenarios (the invented Heron family) and small
 * hand-made plans where a kind is absent. Common practice for chart legends:
 * a key explains a mark on the chart, so a key with no mark misleads.
 */

const DEMOS = ['heron-base', 'heron-lowif', 'heron-narrow', 'heron-wide'];

function solved(scenario: Scenario): PlanReport {
  return solveScenario(scenario).report;
}

const demo = (name: string) => solved(readScenarioFile(`scenarios/${name}.json`));

function insideLegend(el: Element): boolean {
  for (let p = el.parentNode as Element | null; p; p = p.parentNode as Element | null)
    if (p.localName === 'g' && p.getAttribute?.('class') === 'legend') return true;
  return false;
}

function insideDefs(el: Element): boolean {
  for (let p = el.parentNode as Element | null; p; p = p.parentNode as Element | null) if (p.localName === 'defs') return true;
  return false;
}

/** The legend's words and the picture's own elements (outside the legend and the pattern definitions). */
function split(svg: string): { keys: string[]; drawn: Element[] } {
  const all = elementsOf(parseSvg(svg));
  const keys = all.filter((el) => el.localName === 'text' && insideLegend(el)).map((el) => el.textContent ?? '');
  const drawn = all.filter((el) => !insideLegend(el) && !insideDefs(el));
  return { keys, drawn };
}

const attr = (el: Element, name: string) => el.getAttribute(name);
const filled = (fill: string) => (el: Element) => attr(el, 'fill') === fill;
/** The passing candidate's disc and the failing one's crossed square (the shapes the legend shows). */
const disc = (el: Element) => el.localName === 'circle' && attr(el, 'r') === '4.5' && attr(el, 'fill') === '#000';
const crossedSquare = (el: Element) =>
  el.localName === 'rect' && attr(el, 'width') === '8' && attr(el, 'height') === '8' && attr(el, 'stroke-width') === '1.3';

/** Checks every rule (key text → what draws that kind) and returns which kinds were drawn. */
function keyedExactlyWhenDrawn(svg: string, rules: ReadonlyArray<readonly [string, (el: Element) => boolean]>): Record<string, boolean> {
  const { keys, drawn } = split(svg);
  const seen: Record<string, boolean> = {};
  for (const [key, draws] of rules) {
    const isDrawn = drawn.some(draws);
    expect(
      keys.some((k) => k.startsWith(key)),
      `${key}: drawn ${isDrawn}`,
    ).toBe(isDrawn);
    seen[key] = isDrawn;
  }
  return seen;
}

const RATE_MAP: ReadonlyArray<readonly [string, (el: Element) => boolean]> = [
  ['window, inverted zone', filled('url(#ifz-inverted)')],
  ['blocked', filled('url(#ifz-blocked)')],
  ['feasible', filled('#3d6b52')],
  ['candidate passes', disc],
  ['candidate fails', crossedSquare],
];

const SPECTRUM: ReadonlyArray<readonly [string, (el: Element) => boolean]> = [
  ['guard', filled('url(#ifz-guard)')],
  ['blocking check, passes', filled('#d9d9d9')],
  ['blocking check, FAILS', filled('url(#ifz-failing)')],
  ['below the threshold', (el) => el.localName === 'rect' && attr(el, 'fill') === 'none' && attr(el, 'stroke-dasharray') === '3 2'],
];

const BAND_POSITION: ReadonlyArray<readonly [string, (el: Element) => boolean]> = [
  ['allowed, inverted zone', filled('url(#ifz-inverted)')],
  ['candidate passes', disc],
  ['candidate fails', crossedSquare],
];

describe('legend keys only what is drawn', () => {
  it('on the demo scenarios, every picture keys exactly the kinds it draws', () => {
    const seen: Array<Record<string, boolean>> = [];
    for (const name of DEMOS) {
      const report = demo(name);
      seen.push(keyedExactlyWhenDrawn(rateMapSvg(report), RATE_MAP));
      for (const c of report.candidates.slice(0, 3)) {
        seen.push(keyedExactlyWhenDrawn(spectrumSvg(report, c.label), SPECTRUM));
        seen.push(keyedExactlyWhenDrawn(bandPositionSvg(report, c.label), BAND_POSITION));
        const mask = filterMaskSvg(report, c.label);
        expect(mask).not.toBe('');
        keyedExactlyWhenDrawn(mask, [['alias band', filled('url(#ifz-blocked)')]]);
      }
    }
    // The demo family shows both sides of some keys: each is keyed somewhere and left out somewhere.
    for (const key of ['candidate fails', 'blocking check, FAILS']) {
      expect(seen.some((s) => s[key] === true)).toBe(true);
      expect(seen.some((s) => s[key] === false)).toBe(true);
    }
  });

  it('a plan with no inverted window keys no inverted zone on its rate map; one with one does', () => {
    // 1–10 MHz with 2 MHz guards reaches DC: only zone 1 (upright) holds it.
    const low = solved(heronLowPassScenario());
    expect(low.windows.every((w) => !w.inverted)).toBe(true);
    expect(keyedExactlyWhenDrawn(rateMapSvg(low), RATE_MAP)['window, inverted zone']).toBe(false);
    const base = demo('heron-base');
    expect(base.windows.some((w) => w.inverted)).toBe(true);
    expect(keyedExactlyWhenDrawn(rateMapSvg(base), RATE_MAP)['window, inverted zone']).toBe(true);
  });

  it('a spectrum with no guard bands keys no guard; the band-position chart of a passing candidate keys no failure', () => {
    const unguarded = solved({ ...heronLowPassScenario(), name: 'Heron-1 unguarded', guard: guardBands(hz(0), hz(0)) });
    const guarded = solved(heronLowPassScenario());
    expect(unguarded.candidates[0]!.image).not.toBeNull();
    expect(keyedExactlyWhenDrawn(spectrumSvg(unguarded, unguarded.candidates[0]!.label), SPECTRUM)['guard']).toBe(false);
    expect(keyedExactlyWhenDrawn(spectrumSvg(guarded, guarded.candidates[0]!.label), SPECTRUM)['guard']).toBe(true);
    const base = demo('heron-base');
    const passing = keyedExactlyWhenDrawn(bandPositionSvg(base, base.best!), BAND_POSITION);
    expect([passing['candidate passes'], passing['candidate fails']]).toEqual([true, false]);
    const failing = base.candidates.find((c) => !c.pass)!;
    const chart = keyedExactlyWhenDrawn(bandPositionSvg(base, failing.label), BAND_POSITION);
    expect([chart['candidate passes'], chart['candidate fails']]).toEqual([false, true]);
  });

  it('the capture picture keys intrusions only when one is drawn', () => {
    const base = readScenarioFile('scenarios/heron-base.json');
    const intrusionKey = (rate: number) => {
      const v = verifyCaptureWithSpectrum(base, { rate: hz(rate), wantedTones: 1 });
      const { keys } = split(captureSvg(v.result, v.levels));
      return { keyed: keys.some((k) => k.startsWith('intrusion into the margin')), intrusions: v.result.intrusions.length };
    };
    const good = intrusionKey(passingRates(base)[0]!);
    const bad = intrusionKey(badRate(base).rate);
    expect(good).toEqual({ keyed: false, intrusions: 0 });
    expect(bad.keyed).toBe(true);
    expect(bad.intrusions).toBeGreaterThan(0);
  }, 60_000);
});

/** The box a middle-anchored <text> takes, with the text-width estimate the picture code lays out with. */
function textBox(el: Element): { left: number; right: number; top: number; bottom: number } {
  const size = Number(attr(el, 'font-size'));
  const w = textWidth(el.textContent ?? '', size);
  const x = Number(attr(el, 'x'));
  const y = Number(attr(el, 'y'));
  expect(attr(el, 'text-anchor')).toBe('middle');
  return { left: x - w / 2, right: x + w / 2, top: y - size, bottom: y + size * 0.25 };
}

function levelLabels(svg: string): { weakest: Element; threshold: Element } {
  const texts = elementsOf(parseSvg(svg)).filter((el) => el.localName === 'text');
  const weakest = texts.filter((el) => (el.textContent ?? '').startsWith('weakest wanted level'));
  const threshold = texts.filter((el) => (el.textContent ?? '').startsWith('blocking threshold'));
  expect([weakest.length, threshold.length]).toEqual([1, 1]);
  return { weakest: weakest[0]!, threshold: threshold[0]! };
}

describe('the spectrum marks the weakest wanted level', () => {
  it('names the scenario level beside the blocking threshold, labels apart, on the demos and at small rejections', () => {
    const cases: Array<[Scenario, number]> = DEMOS.map((n) => {
      const s = readScenarioFile(`scenarios/${n}.json`);
      return [s, s.wanted.weakestLevel];
    });
    // The weakest level's line meets the threshold's when the rejection is small: 0, 3 and 12 dB.
    const board = readScenarioFile('scenarios/heron-base.json');
    for (const rejection of [0, 3, 12])
      cases.push([
        { ...board, name: `Heron rejection ${rejection}`, requirements: { ...board.requirements, rejection: db(rejection) } },
        board.wanted.weakestLevel,
      ]);
    for (const [scenario, weakestLevel] of cases) {
      const report = solved(scenario);
      const svg = spectrumSvg(report, report.best ?? report.candidates[0]!.label);
      const { weakest, threshold } = levelLabels(svg);
      // The pictures write levels with the U+2212 minus.
      const written = /^weakest wanted level (\u2212?[\d.]+) dBFS$/.exec(weakest.textContent ?? '');
      expect(Number(written?.[1]?.replace('\u2212', '-'))).toBe(weakestLevel);
      const a = textBox(weakest);
      const b = textBox(threshold);
      const apart = a.right <= b.left || b.right <= a.left || a.bottom <= b.top || b.bottom <= a.top;
      expect(apart, `${scenario.name}: ${JSON.stringify([a, b])}`).toBe(true);
    }
  });
});
