import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { resolveScenario } from '../../src/scenario/resolve-scenario.js';
import { ScenarioError } from '../../src/scenario/scenario-issue.js';
import { memoryFiles } from './memory-files.js';

/**
 * Levels bounded by what they mean, and counts bounded so that the work
 * stays proportionate. A harmonic or image figure in dBc lies below its
 * carrier (a positive figure is a dropped minus sign: common practice, no
 * source); a level at the converter is at most full scale (0 dBFS, by the
 * definition of dBFS); a level at the filter's input may exceed it. Before,
 * +75 dBc and +40 dBFS at the converter were accepted silently.
 */
const BASE = JSON.parse(readFileSync(new URL('../../scenarios/heron-base.json', import.meta.url), 'utf8')) as Record<string, unknown>;

function firstIssue(
  variant: Record<string, unknown>,
): { path: string; expected: string; kind?: string; suggestion?: string | null } | null {
  try {
    resolveScenario('v.json', memoryFiles({ 'v.json': { extends: 'b.json', ...variant }, 'b.json': BASE }));
    return null;
  } catch (error) {
    if (!(error instanceof ScenarioError)) throw error;
    return error.issues[0]!;
  }
}

describe('levels bounded by meaning', () => {
  it.each([
    ['a harmonic at +75 dBc', { converter: { harmonics: { '2': 75 } } }, 'converter.harmonics["2"]', 'below 0'],
    ['a harmonic at 0 dBc', { converter: { harmonics: { '3': 0 } } }, 'converter.harmonics["3"]', 'below 0'],
    [
      'an interleaving image at +60 dBc',
      { converter: { interleave: { ways: 2, offsetSpur: -80, imageLevel: 60 } } },
      'converter.interleave.imageLevel',
      'below 0',
    ],
    ['a rate-tied spur above full scale', { converter: { rateSpurs: { dc: 3 } } }, 'converter.rateSpurs.dc', 'at most 0'],
    [
      'a board spur at +40 dBFS at the converter',
      { boardSpurs: [{ label: 's', frequency: '10M', level: 40 }] },
      'boardSpurs[0].level',
      'at most 0 dBFS',
    ],
    [
      'a neighbour at +140 dBFS',
      { neighbours: [{ label: 'n', center: '100M', width: '1M', level: 140 }] },
      'neighbours[0].level',
      'from -300 to +100',
    ],
    [
      'a filter point of negative attenuation',
      {
        filter: {
          kind: 'table',
          points: [
            ['1M', -3],
            ['2M', 40],
          ],
        },
      },
      'filter.points[0][1]',
      'from 0 to 300',
    ],
    ['a wanted level of -1000 dBFS', { wanted: { weakestLevel: -1000 } }, 'wanted.weakestLevel', 'at least -300'],
  ])('refuses %s', (_name, variant, path, words) => {
    const issue = firstIssue(variant);
    expect(issue?.path).toBe(path);
    expect(issue?.expected).toContain(words);
  });

  it('takes levels above full scale at the filter input: a neighbour, a spur coupled before the filter', () => {
    expect(firstIssue({ neighbours: [{ label: 'n', center: '100M', width: '1M', level: 20 }] })).toBeNull();
    expect(firstIssue({ boardSpurs: [{ label: 's', frequency: '10M', level: 20, coupling: 'before-filter' }] })).toBeNull();
  });
});

describe('counts and frequencies bounded', () => {
  const many = (count: number, make: (i: number) => unknown) => Array.from({ length: count }, (_, i) => make(i));

  it.each([
    [
      '257 neighbours',
      { neighbours: many(257, (i) => ({ label: `n${i}`, center: `${100 + i}M`, width: '100k', level: -30 })) },
      'neighbours',
      'at most 256',
    ],
    [
      '1,025 clock parts',
      { clocks: many(1025, (i) => ({ label: `c${i}`, frequency: `${100 + i}M`, tolerance: 20 })) },
      'clocks',
      'at most 1024',
    ],
    [
      '65 board spurs',
      { boardSpurs: many(65, (i) => ({ label: `s${i}`, frequency: `${i + 1}M`, level: -90 })) },
      'boardSpurs',
      'at most 64',
    ],
    ['a spur at 1e18 Hz', { boardSpurs: [{ label: 's', frequency: 1e18, level: -90 }] }, 'boardSpurs[0].frequency', 'at most 1 THz'],
    ['a spur at 1e308 Hz', { boardSpurs: [{ label: 's', frequency: '1e308', level: -90 }] }, 'boardSpurs[0].frequency', 'at most 1 THz'],
    [
      'an exponent with a prefix (1e6k)',
      { boardSpurs: [{ label: 's', frequency: '1e6k', level: -90 }] },
      'boardSpurs[0].frequency',
      'not both',
    ],
    [
      'a frequency that underflows',
      { boardSpurs: [{ label: 's', frequency: '1e-400 Hz', level: -90 }] },
      'boardSpurs[0].frequency',
      'underflows',
    ],
    [
      'a synthesiser with a million (M, D) pairs',
      {
        clocks: [
          { label: 'ref', frequency: '10M', tolerance: 10, derive: { kind: 'synthesiser', n: [1, 100], m: [1, 1000], d: [1, 1000] } },
        ],
      },
      'clocks[0].derive.m',
      'at most 4096',
    ],
  ])('refuses %s', (_name, variant, path, words) => {
    const issue = firstIssue(variant);
    expect(issue?.path).toBe(path);
    expect(issue?.expected).toContain(words);
  });

  it('takes the limits themselves: 256 neighbours, 64 spurs, 1,024 clock parts, 1 THz', () => {
    // 256 neighbours pass the count (whether their products are too much work is judged once they are derived).
    const crowded = firstIssue({ neighbours: many(256, (i) => ({ label: `n${i}`, center: `${100 + i}M`, width: '100k', level: -30 })) });
    expect(crowded?.expected ?? '').not.toContain('a list of at most');
    expect(firstIssue({ clocks: many(1024, (i) => ({ label: `c${i}`, frequency: `${100 + i}M`, tolerance: 20 })) })).toBeNull();
    expect(firstIssue({ boardSpurs: many(64, (i) => ({ label: `s${i}`, frequency: `${i + 1}M`, level: -90 })) })).toBeNull();
    expect(firstIssue({ boardSpurs: [{ label: 's', frequency: '1000G', level: -90 }] })).toBeNull();
  });
});

describe('work refused before it starts, saying what to narrow', () => {
  it('a 5 kHz channel at 1 GHz with the converter from 1 kHz: the window count, at converter.minRate', () => {
    const issue = firstIssue({
      wanted: { center: '1G', width: '5k', low: null, high: null },
      guard: 0,
      filter: null,
      converter: { minRate: '1k', inputBandwidth: '2G' },
    });
    // Zones up to 1 + 2·fL/minRate = 1 + 2·999997500/1000 ≈ 2,000,000 (Vaughan, Scott & White 1991).
    expect(issue?.path).toBe('converter.minRate');
    expect(issue?.expected).toContain('at most 1000 windows');
    expect(issue?.expected).toContain('raise converter.minRate');
  });

  it('a blocking board spur at 1 THz folded over 2 MHz to 250 MHz: at the spur, naming the images', () => {
    const issue = firstIssue({
      wanted: { center: '1G', width: '50k', low: null, high: null },
      guard: 0,
      filter: null,
      converter: { minRate: '2M', inputBandwidth: '2G' },
      boardSpurs: [{ label: 'far', frequency: '1000G', level: -10 }],
    });
    // About 2·F/rLow = 2·1e12/2e6 = 1,000,000 images of the band, over the 200,000 allowed.
    expect(issue?.path).toBe('boardSpurs[0].frequency');
    expect(issue?.expected).toContain('at most 200000 images');
  });
});

describe('cases the fuzz suite found', () => {
  it('a margin of 1 THz (ran 100 s) is refused as folding work, naming the margin', () => {
    const issue = firstIssue({ requirements: { margin: 1e12 } });
    expect(issue?.expected).toContain('requirements.margin');
  });

  it("a width below the centre's precision (2.2e-308 Hz at 140 MHz: edges round together) is refused at wanted.width", () => {
    const issue = firstIssue({ wanted: { center: '140M', width: 2.2250738585072014e-308, low: null, high: null } });
    expect(issue?.path).toBe('wanted.width');
    expect(issue?.expected).toContain("a width the centre's precision can hold");
  });
});

describe('misspelt words get the nearest one', () => {
  it.each([
    [{ filter: { kind: 'butterwort', order: 5, passLow: '128M', passHigh: '152M' } }, 'filter.kind', 'butterworth'],
    [{ goal: 'widest-margn' }, 'goal', 'widest-margin'],
    [{ goal: { kind: 'decimatoin', outputRate: '7.68M' } }, 'goal.kind', 'decimation'],
  ])('%j', (variant, path, nearest) => {
    const issue = firstIssue(variant) as { path: string; suggestion?: string; kind?: string } | null;
    expect(issue?.path).toBe(path);
    expect(issue?.kind).toBe('unknown-value');
    expect(issue?.suggestion).toBe(nearest);
  });

  it('a misspelt kind key is an unknown key with "kind" suggested, not a missing kind', () => {
    const issue = firstIssue({ filter: { knid: 'butterworth', order: 5, passLow: '128M', passHigh: '152M' } }) as {
      path: string;
      suggestion?: string;
      kind?: string;
    } | null;
    expect(issue).toMatchObject({ kind: 'unknown-key', path: 'filter.knid', suggestion: 'kind' });
  });
});

describe('a rate fraction that is no fraction', () => {
  it('"5%" is refused at the field, not as an internal error (the denominator check ran on a failed pattern)', () => {
    const issue = firstIssue({ converter: { rateSpurs: { fractions: [{ fraction: '5%', level: -90 }] } } });
    expect(issue?.path).toBe('converter.rateSpurs.fractions[0].fraction');
    expect(issue?.expected).toContain('a fraction of the rate as "p/q"');
  });
});
