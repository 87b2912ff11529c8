import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readScenarioFile } from '../../src/cli/read-scenario.js';
import { compareFamily, planFamily } from '../../src/plan/plan-family.js';
import { ROOT } from '../helpers/run-bin.js';

/**
 * `ifzone compare` writes only the comparison, so it plans the family with
 * compareFamily, which skips the IF-shift search and the plan reports. The
 * comparison must be the one planFamily makes (which `report` and
 * `compare --svg` use): same parts, verdicts, rates and margins, field for
 * field. The demo family includes a variant whose first LO may move
 * (heron-narrow), the case where the skipped work is largest.
 */
const variants = ['heron-base', 'heron-lowif', 'heron-narrow', 'heron-wide'].map((name) => ({
  scenario: readScenarioFile(join(ROOT, 'scenarios', `${name}.json`)),
  source: `${name}.json`,
}));

describe('compareFamily', () => {
  it('gives the comparison planFamily gives, for the demo family and each variant alone', () => {
    expect(compareFamily(variants)).toEqual(planFamily(variants).comparison);
    for (const variant of variants) expect(compareFamily([variant])).toEqual(planFamily([variant]).comparison);
  });

  it('with a goal given for every variant', () => {
    const goal = { kind: 'lowest-rate' } as const;
    expect(compareFamily(variants, { goal })).toEqual(planFamily(variants, { goal }).comparison);
  });
});
