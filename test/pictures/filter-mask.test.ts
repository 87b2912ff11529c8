import { describe, expect, it } from 'vitest';
import { mkdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { db, hz } from '../../src/units/quantities.js';
import { planScenario } from '../../src/plan/plan-scenario.js';
import { filterMaskFigure, filterMaskSvg } from '../../src/pictures/filter-mask.js';
import { planPicturesSvg } from '../../src/pictures/plan-pictures.js';
import type { Scenario } from '../../src/scenario/scenario.js';
import { heronBoardScenario, reportOf } from './picture-plan.js';
import { parseSvg, rootOf, textsOf } from './svg-check.js';
import { inkStatistics, renderPng } from './render-png.js';

/**
 * The filter-mask picture of plans solved by the real pipeline (invented Heron scenarios): it parses as XML
 * (resvg's reader and @xmldom/xmldom), states its size, draws one stop region per alias band, labels the
 * margins (the tightest always), and renders with @resvg/resvg-js to a picture that is not blank. The PNGs
 * are left in the system's temp folder (ifzone-pictures) for a person to look at.
 */
const OUT = join(tmpdir(), 'ifzone-pictures');
mkdirSync(OUT, { recursive: true });

const withLevel = (scenario: Scenario, outOfBandLevel: number | null): Scenario => ({
  ...scenario,
  afterRate: { ...scenario.afterRate, outOfBandLevel: outOfBandLevel === null ? null : db(outOfBandLevel) },
});

function check(name: string, scenario: Scenario): { texts: string[]; stops: number; bands: number; tightest: number } {
  const report = planScenario(scenario);
  const label = report.best ?? report.candidates[0]!.label;
  const svg = filterMaskSvg(report, label);
  const document = parseSvg(svg);
  const root = rootOf(document);
  expect(root.getAttribute('width')).toBe('960');
  const height = Number(root.getAttribute('height'));
  expect(root.getAttribute('viewBox')).toBe(`0 0 960 ${height}`);
  const rendered = renderPng(svg);
  writeFileSync(join(OUT, `${name}.png`), rendered.png);
  expect([rendered.width, rendered.height]).toEqual([960, height]);
  const ink = inkStatistics(rendered);
  expect(ink.inkShare).toBeGreaterThan(0.04);
  expect(ink.distinct).toBeGreaterThan(8);
  const groups = document.getElementsByTagName('g');
  let stops = 0;
  for (let i = 0; i < groups.length; i++)
    if (groups.item(i)!.getAttribute('class') === 'stop-regions') stops = groups.item(i)!.getElementsByTagName('rect').length;
  const mask = report.candidates.find((c) => c.label === label)!.afterRate!.mask;
  return { texts: textsOf(document), stops, bands: mask.bands.length, tightest: mask.worst!.marginDb };
}

// Margin labels as the text layer writes dB: to 0.1 dB, signed, with the true minus.
const marginLabel = (margin: number) => `${margin >= 0 ? '+' : '−'}${Math.abs(margin).toFixed(1)} dB`;

describe('filter-mask picture', () => {
  it('a Butterworth filter: one stop region per alias band, the tightest margin labelled, the heading says reported only', () => {
    const { texts, stops, bands, tightest } = check('filter-mask-board', withLevel(heronBoardScenario(), null));
    // Several alias bands below the input bandwidth at the best rate (three at the widest-margin rate of the board scenario).
    expect(bands).toBeGreaterThanOrEqual(3);
    expect(stops).toBe(bands);
    expect(texts).toContain(marginLabel(tightest));
    expect(texts.join('\n')).toMatch(/out-of-band level not stated: full scale assumed, reported only/);
    expect(texts).toContain("the scenario's filter (drawn up to 160.0 dB)");
  });

  it('a stated level and a table filter: the level in the heading, a shortfall labelled', () => {
    const table = {
      kind: 'table',
      points: [
        { frequency: hz(40e6), attenuation: db(50) },
        { frequency: hz(63e6), attenuation: db(0) },
        { frequency: hz(77e6), attenuation: db(0) },
        { frequency: hz(110e6), attenuation: db(45) },
      ],
    } as const;
    const { texts, tightest } = check('filter-mask-table', withLevel({ ...heronBoardScenario(), filter: table }, -10));
    expect(texts.join('\n')).toContain('out-of-band level −10.0 dBFS (stated)');
    expect(tightest).toBeLessThan(0);
    expect(texts).toContain(marginLabel(tightest));
  });

  it('no filter: a flat 0 dB line, said in the legend', () => {
    const { texts } = check('filter-mask-none', withLevel({ ...heronBoardScenario(), filter: null }, -30));
    expect(texts).toContain('no filter stated (0 dB)');
  });

  it('joins the plan pictures of solve --svg; left out of a report built without after-rate figures', () => {
    const report = planScenario(heronBoardScenario());
    expect(textsOf(parseSvg(planPicturesSvg(report))).join('\n')).toContain(`Anti-alias filter mask at ${report.best}`);
    const bare = reportOf(heronBoardScenario());
    expect(filterMaskFigure(bare, bare.candidates[0]!.label)).toBeNull();
    expect(textsOf(parseSvg(planPicturesSvg(bare))).join('\n')).not.toContain('Anti-alias filter mask');
  });
});
