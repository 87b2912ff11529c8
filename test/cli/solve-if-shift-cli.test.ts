import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { ensureBuilt, ROOT, runBin } from '../helpers/run-bin.js';

/**
 * `ifzone solve` on a scenario whose first LO may move (ifShift): the JSON
 * section and the table section, end to end through the real bin/ifzone.
 * The demo family is invented data: plumbing and contracts only; the
 * reference values live in test/solve/if-shift.test.ts.
 */
const NARROW = join(ROOT, 'scenarios/heron-narrow.json');
const BASE = join(ROOT, 'scenarios/heron-base.json');

beforeAll(() => ensureBuilt());

describe('ifzone solve with ifShift', () => {
  it('adds ifShift { low, high, best: { shift, rate, center, worstMargin, limitedBy, pass } } to the JSON', () => {
    const run = runBin('solve', NARROW, '--json');
    expect(run.status).toBe(0);
    expect(run.stderr).toBe('');
    const plan = JSON.parse(run.stdout);
    const section = plan.ifShift;
    expect(section.low).toBe(-1e6);
    expect(section.high).toBe(1e6);
    const best = section.best;
    expect(Object.keys(best)).toEqual(expect.arrayContaining(['shift', 'rate', 'center', 'worstMargin', 'limitedBy', 'pass']));
    expect(best.shift).toBeGreaterThanOrEqual(-1e6);
    expect(best.shift).toBeLessThanOrEqual(1e6);
    expect(best.center).toBeCloseTo(140e6 + best.shift, 3); // the new IF centre: 140 MHz moved by the shift
    expect(best.rate).toBeGreaterThanOrEqual(plan.search.minRate);
    expect(best.rate).toBeLessThanOrEqual(plan.search.maxRate);
    expect(best.pass).toBe(true);
    // The nominal IF is one of the pairs searched, so the best is at least as good on the worst slack.
    expect(section.atNoShift.shift).toBe(0);
    expect(best.worstSlack).toBeGreaterThanOrEqual(section.atNoShift.worstSlack);
    // Fields are added to the interferers, none renamed: the neighbours move with the IF, board spurs do not.
    const byLabel = new Map(plan.interferers.map((i: { label: string; shiftMultiple: number }) => [i.label, i.shiftMultiple]));
    expect(byLabel.get('Upper adjacent channel')).toBe(1);
    expect(byLabel.get('H2 wanted')).toBe(2);
    expect(byLabel.get('TCXO-R 10M reference')).toBe(0);
  });

  it('prints the section "Best IF shift and rate" in the table, before the verdict', () => {
    const run = runBin('solve', NARROW);
    expect(run.status).toBe(0);
    const at = run.stdout.indexOf('Best IF shift and rate');
    expect(at).toBeGreaterThan(0);
    expect(at).toBeLessThan(run.stdout.indexOf('\nBest: '));
    expect(run.stdout).toMatch(/^best pair +\+1 MHz /m);
    expect(run.stdout).toMatch(/^nominal IF +0 Hz /m);
  });

  it('gives ifShift null, and no section, for a fixed LO', () => {
    const run = runBin('solve', BASE, '--json');
    expect(JSON.parse(run.stdout).ifShift).toBeNull();
    expect(runBin('solve', BASE).stdout).not.toMatch(/Best IF shift/);
  });
});
