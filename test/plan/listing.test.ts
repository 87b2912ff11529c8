import { describe, expect, it } from 'vitest';
import { db, hz } from '../../src/units/quantities.js';
import type { CheckResult } from '../../src/solve/evaluate-rate.js';
import type { Interferer } from '../../src/interferers/interferer.js';
import { listedChecks, listedInterferers, MOST_LISTED } from '../../src/plan/listing.js';

/**
 * What a report lists when a plan has more interferers than it prints. The
 * expected sets are built by construction (which items block, which levels
 * are nearest the threshold), not by the code under test.
 */
function check(index: number, blocking: boolean, slack: number, levelMargin: number): CheckResult {
  return {
    label: `C${index}`,
    kind: 'intermod',
    source: 'made up for the test',
    alias: [],
    margin: hz(1e6 + slack),
    requiredMargin: hz(1e6),
    level: db(-100 - levelMargin),
    levelMargin: db(levelMargin),
    blocking,
    pass: slack >= 0,
  };
}

describe('listedChecks', () => {
  it('lists an empty evaluation as all (the doc example)', () => {
    expect(listedChecks([], true, { kind: 'zone edge' }, 'bounded')).toEqual({ checks: [], listed: 'all' });
  });

  it('keeps every check up to the limit, or with listing all', () => {
    const checks = Array.from({ length: MOST_LISTED }, (_, i) => check(i, i % 3 === 0, i, i));
    expect(listedChecks(checks, true, { kind: 'interferer', label: 'C0' }, 'bounded')).toEqual({ checks, listed: 'all' });
    const more = [...checks, check(MOST_LISTED, false, 0, 5)];
    expect(listedChecks(more, true, { kind: 'interferer', label: 'C0' }, 'all')).toEqual({ checks: more, listed: 'all' });
  });

  it('past the limit keeps the blocking checks, then the non-blocking ones with the least level margin, in the plan order', () => {
    // 1,500 checks: every 5th blocks (300); the others have level margins 0.5, 1.5, ... by a scrambled index.
    const total = 1500;
    const scrambled = (i: number) => (i * 7919) % total; // a permutation of 0..1499 (7919 is prime, coprime to 1500)
    const checks = Array.from({ length: total }, (_, i) => check(i, i % 5 === 0, 1e6 - i, scrambled(i) + 0.5));
    const { checks: kept, listed } = listedChecks(checks, true, { kind: 'interferer', label: 'C0' }, 'bounded');
    expect(listed).toBe('nearest');
    expect(kept).toHaveLength(MOST_LISTED);
    const nonBlocking = checks.filter((c) => !c.blocking).sort((a, b) => a.levelMargin - b.levelMargin);
    const expected = new Set([...checks.filter((c) => c.blocking), ...nonBlocking.slice(0, MOST_LISTED - 300)].map((c) => c.label));
    expect(new Set(kept.map((c) => c.label))).toEqual(expected);
    const positions = kept.map((c) => Number(c.label.slice(1)));
    expect(positions).toEqual([...positions].sort((a, b) => a - b));
  });

  it('for a candidate judged on the blocking interferers, lists its limiting check only', () => {
    const checks = [check(0, true, 5, -1), check(1, true, -2, -3), check(2, true, 9, -4)];
    expect(listedChecks(checks, false, { kind: 'interferer', label: 'C1' }, 'bounded')).toEqual({
      checks: [checks[1]],
      listed: 'limiting',
    });
    expect(listedChecks(checks, false, { kind: 'zone edge' }, 'all')).toEqual({ checks: [], listed: 'limiting' });
  });
});

describe('listedInterferers', () => {
  const interferer = (index: number, blocking: boolean, level: number): Interferer => ({
    label: `I${index}`,
    kind: 'intermod',
    order: 3,
    source: 'made up for the test',
    rateMultiple: 0,
    shiftMultiple: 0,
    low: hz(1e6),
    high: hz(1e6),
    level: db(level),
    requiredMargin: hz(1e5),
    blocking,
  });

  it('lists an empty plan as all (the doc example)', () => {
    expect(listedInterferers([], 'bounded')).toEqual({ interferers: [], listed: 'all' });
  });

  it('past the limit keeps the blocking ones, then the strongest others, in the plan order', () => {
    const all = Array.from({ length: 1200 }, (_, i) => interferer(i, i < 50, -50 - ((i * 37) % 1200) / 10));
    const { interferers, listed } = listedInterferers(all, 'bounded');
    expect(listed).toBe('nearest');
    const strongest = all
      .slice(50)
      .sort((a, b) => b.level - a.level)
      .slice(0, MOST_LISTED - 50);
    expect(new Set(interferers.map((i) => i.label))).toEqual(new Set([...all.slice(0, 50), ...strongest].map((i) => i.label)));
    expect(listedInterferers(all, 'all')).toEqual({ interferers: all, listed: 'all' });
  });
});
