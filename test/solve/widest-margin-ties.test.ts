import { describe, expect, it } from 'vitest';
import { hz } from '../../src/units/quantities.js';
import { maximiseWorstSlack } from '../../src/solve/widest-margin.js';

// Worked by hand: on [171, 194.5] (MHz units) with slacks 4 (constant), r − 171
// and 389 − 2r, the worst slack cannot exceed 4, and every r in [175, 192.5]
// reaches it. Among those ties the balanced rate keeps the varying slacks
// equal: r − 171 = 389 − 2r, so r = 560/3 ≈ 186.667 with both at 47/3.
describe('widest-margin LP with a constant slack (lexicographic second stage)', () => {
  const MHz = 1e6;
  const slacks = [
    { slope: 0, offset: 4 * MHz },
    { slope: 1, offset: -171 * MHz },
    { slope: -2, offset: 389 * MHz },
  ];
  const range = { low: 171 * MHz, high: 194.5 * MHz };

  it('keeps the first-stage worst slack as its promise', () => {
    const answer = maximiseWorstSlack(slacks, range, hz(20 * MHz));
    expect(answer?.worstSlack).toBeCloseTo(4 * MHz, -2);
  });

  it('balances the slacks that vary instead of returning an arbitrary tie', () => {
    const answer = maximiseWorstSlack(slacks, range, hz(20 * MHz));
    expect(answer!.rate / MHz).toBeCloseTo(560 / 3, 4);
  });

  it('without a constant slack, the first stage alone decides (same balanced point)', () => {
    const answer = maximiseWorstSlack(slacks.slice(1), range, hz(20 * MHz));
    expect(answer!.rate / MHz).toBeCloseTo(560 / 3, 4);
    expect(answer!.worstSlack / MHz).toBeCloseTo(47 / 3, 4);
  });
});

// javascript-lp-solver 1.0.3 reports an unrestricted variable with a negative
// right-hand side as infeasible (found while testing the part planner); the
// LP must still answer when every slack is negative. By hand: on [0, 1] MHz
// with slacks −5 MHz and r − 10 MHz, the best is r = 1 MHz with −9 MHz.
describe('widest-margin LP when every slack is negative', () => {
  it('answers instead of calling the model infeasible', () => {
    const MHz = 1e6;
    const answer = maximiseWorstSlack(
      [
        { slope: 0, offset: -5 * MHz },
        { slope: 1, offset: -10 * MHz },
      ],
      { low: 0, high: 1 * MHz },
      hz(1 * MHz),
    );
    expect(answer).not.toBeNull();
    expect(answer!.rate / MHz).toBeCloseTo(1, 6);
    expect(answer!.worstSlack / MHz).toBeCloseTo(-9, 6);
  });
});
