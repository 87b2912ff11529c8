import { describe, expect, it } from 'vitest';
import { db, hz } from '../../src/units/quantities.js';
import { planScenario } from '../../src/plan/plan-scenario.js';
import { candidateVerdict, filterOrdersText, maskRows, wrapText } from '../../src/output/after-rate-words.js';
import { afterRateSection } from '../../src/output/after-rate-table.js';
import { scenarioFixture } from '../helpers/scenario-fixture.js';

/** The after-rate words and rows the text table and the HTML page share (plumbing: the figures are checked in test/after-rate/). */
describe('after-rate words', () => {
  it('the doc example of wrapText, and a number kept on the line of its unit', () => {
    expect(wrapText('aa bb cc', 5)).toBe('aa bb\ncc');
    expect(wrapText('needs 80 dB from 217.6 MHz up', 14)).toBe('needs 80 dB\nfrom 217.6 MHz\nup');
  });

  it('filter orders as B/C/E, "none" when no filter can meet the mask, "–" when not computed', () => {
    expect(filterOrdersText({ rate: hz(1e8), filterOrders: { butterworth: 6, chebyshev: 5, elliptic: 4 }, maskMarginDb: db(3) })).toBe(
      '6/5/4',
    );
    expect(filterOrdersText({ rate: hz(1e8), filterOrders: null, maskMarginDb: db(-3) })).toBe('none');
    expect(filterOrdersText({ rate: null, filterOrders: null, maskMarginDb: null })).toBe('–');
  });

  it('rows tightest first; verdicts name the mask when it alone fails a candidate', () => {
    const base = scenarioFixture();
    const report = planScenario({ ...base, afterRate: { ...base.afterRate, outOfBandLevel: db(-20) } });
    const candidate = report.candidates[0]!;
    const margins = maskRows(candidate.afterRate!).map((row) => Number(row[4]));
    expect(margins).toEqual([...margins].sort((a, b) => a - b));
    expect(maskRows(candidate.afterRate!, 2)).toHaveLength(2);
    for (const c of report.candidates) {
      const solverPasses = c.zone !== null && c.zoneEdgeMargin >= 0 && c.checks.every((k) => k.pass);
      expect(candidateVerdict(c)).toBe(solverPasses ? 'FAIL: mask' : 'FAIL, mask too');
    }
    expect(afterRateSection(candidate)).toMatch(/^After the rate, at /);
    expect(afterRateSection({ ...candidate, afterRate: null })).toBe('');
  });
});
