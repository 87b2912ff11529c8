import { describe, expect, it } from 'vitest';
import { editDistance, nearestKey } from '../../src/scenario/nearest-key.js';

/**
 * Edit distance check values. kitten → sitting = 3 is the textbook example
 * of Levenshtein distance (e.g. Wikipedia, "Levenshtein distance"; from
 * memory). With adjacent swaps counted once (optimal string alignment,
 * Damerau 1964), "ca" → "ac" is 1 and "ca" → "abc" is 3, not the 2 of the
 * unrestricted Damerau–Levenshtein distance (Wikipedia,
 * "Damerau–Levenshtein distance"; from memory).
 */
describe('editDistance', () => {
  it.each([
    ['kitten', 'sitting', 3],
    ['', 'abc', 3],
    ['abc', '', 3],
    ['same', 'same', 0],
    ['bitz', 'bits', 1],
    ['lable', 'label', 1],
    ['ca', 'ac', 1],
    ['ca', 'abc', 3],
    ['centre', 'center', 1],
    ['flaw', 'lawn', 2],
  ])('%s → %s is %i', (a, b, distance) => {
    expect(editDistance(a, b)).toBe(distance);
    expect(editDistance(b, a)).toBe(distance);
  });
});

describe('nearestKey', () => {
  const converterKeys = [
    'label',
    'minRate',
    'maxRate',
    'inputBandwidth',
    'bits',
    'harmonics',
    'intercept3',
    'rateSpurs',
    'interleave',
    'apertureJitter',
  ];

  it.each([
    ['bitz', 'bits'],
    ['lable', 'label'],
    ['minrate', 'minRate'],
    ['MaxRate', 'maxRate'],
    ['harmonic', 'harmonics'],
    ['inputBandWith', 'inputBandwidth'],
    ['jitter', null],
    ['colour', null],
  ])('suggests %s → %s', (typed, meant) => {
    expect(nearestKey(typed, converterKeys)).toBe(meant);
  });

  it('gives ties to the earlier key and nothing when no key is known', () => {
    expect(nearestKey('lo', ['low', 'lot'])).toBe('low');
    expect(nearestKey('x', [])).toBeNull();
  });
});
