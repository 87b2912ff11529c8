import { describe, expect, it } from 'vitest';
import { uniqueLabels } from '../../src/interferers/unique-labels.js';

describe('uniqueLabels', () => {
  it('numbers repeats in order and skips numbers already taken', () => {
    const out = uniqueLabels([{ label: 'A' }, { label: 'A' }, { label: 'A #2' }, { label: 'A' }, { label: 'B' }]);
    expect(out.map((o) => o.label)).toEqual(['A', 'A #3', 'A #2', 'A #4', 'B']);
  });

  it('leaves unique labels alone', () => {
    const items = [
      { label: 'x', v: 1 },
      { label: 'y', v: 2 },
    ];
    expect(uniqueLabels(items)).toEqual(items);
  });
});

import { dbText, ordinal } from '../../src/interferers/words.js';

describe('source-text words', () => {
  it('ordinals and levels', () => {
    expect([1, 2, 3, 4, 11, 12, 13, 21, 22, 23, 111].map(ordinal)).toEqual([
      '1st',
      '2nd',
      '3rd',
      '4th',
      '11th',
      '12th',
      '13th',
      '21st',
      '22nd',
      '23rd',
      '111th',
    ]);
    expect(dbText(-70, 'dBc')).toBe('−70.0 dBc');
    expect(dbText(-0.01, 'dB')).toBe('0.0 dB');
    expect(dbText(30.1072, 'dB')).toBe('30.1 dB');
  });
});
