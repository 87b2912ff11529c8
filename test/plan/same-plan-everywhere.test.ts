import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { ensureBuilt, ROOT, runBin } from '../helpers/run-bin.js';
import { quantityText } from '../../src/text/quantity-text.js';
import type { PlanReport } from '../../src/plan/plan-report.js';

/**
 * One plan, three media: the JSON of `solve`, its table and the HTML page of
 * `report` come from one planScenario call, so they carry the same sections
 * and the same numbers. Checked on the demo scenario whose first LO may move
 * (heron-narrow, with ifShift): before the plan stage, the page lacked the
 * IF-shift section that the table printed.
 */
const scenario = join(ROOT, 'scenarios', 'heron-narrow.json');
let report: PlanReport;
let table: string;
let html: string;

beforeAll(() => {
  ensureBuilt();
  const json = runBin('solve', scenario, '--json');
  expect(json.status).toBe(0);
  report = JSON.parse(json.stdout) as PlanReport;
  table = runBin('solve', scenario).stdout;
  const out = join(mkdtempSync(join(tmpdir(), 'ifzone-same-plan-')), 'narrow.html');
  expect(runBin('report', scenario, '--html', out).status).toBe(0);
  html = readFileSync(out, 'utf8');
}, 120_000);

/** Each medium with its own way of writing numbers (one minus sign per medium), from the one text layer. */
const media = () =>
  [
    ['table', table, quantityText('terminal')],
    ['HTML', html, quantityText('html')],
  ] as const;

describe('the same plan in the JSON, the table and the HTML page', () => {
  it('the best candidate: label, rate and worst margin in all three', () => {
    const best = report.candidates.find((c) => c.label === report.best)!;
    for (const [name, text, t] of media()) {
      expect(text, name).toContain(best.label);
      expect(text, name).toContain(t.rate(best.rate));
      expect(text, name).toContain(t.frequency(best.worstMargin));
    }
  });

  it("the IF-shift section: the best pair's shift centre and rate in all three", () => {
    expect(report.ifShift?.best).toBeTruthy();
    const pair = report.ifShift!.best!;
    for (const [name, text, t] of media()) {
      expect(text, name).toContain('Best IF shift and rate');
      expect(text, name).toContain(t.rate(pair.center));
      expect(text, name).toContain(t.rate(pair.rate));
      expect(text, name).toContain(t.frequency(pair.worstMargin));
    }
  });

  it('every feasible interval in all three', () => {
    expect(report.feasible.length).toBeGreaterThan(0);
    for (const f of report.feasible) for (const [name, text, t] of media()) expect(text, name).toContain(t.rateRange(f.minRate, f.maxRate));
  });
});
