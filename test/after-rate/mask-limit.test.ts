import { describe, expect, it } from 'vitest';
import { db, hz } from '../../src/units/quantities.js';
import { filterMask, limitWithMasks, MASK_CHECK } from '../../src/after-rate/filter-mask.js';
import { interfererLimit, limitInChannel, limitText, ZONE_EDGE } from '../../src/solve/limited-by.js';

/**
 * Which check limits a rate once the anti-alias mask is judged. Worked by hand: a signal at the stated
 * out-of-band level L must reach the converter at or below the non-blocking threshold T, so the filter
 * needs L − T dB over each alias band (common practice, no source). With no filter (0 dB everywhere):
 *   L = −20, T = −80: needs 60 dB, gives 0, margin −60 dB (falls short);
 *   L = −20, T = −30: needs 10 dB, gives 0, margin −10 dB;
 *   L not stated: full scale assumed, the margin reported only (never blocks).
 */
const alias = [{ multiple: 1, sense: 'mirrored' as const, low: hz(15e6), high: hz(19e6) }];
const shortBy60 = filterMask(alias, null, db(-20), db(-80));
const shortBy10 = filterMask(alias, null, db(-20), db(-30));
const notStated = filterMask(alias, null, null, db(-80));

describe('limitWithMasks', () => {
  it('the doc example: every frequency check passes and the mask falls 60 dB short, so the mask limits the rate', () => {
    expect([shortBy60.worst?.marginDb, shortBy60.pass]).toEqual([-60, false]);
    expect(limitWithMasks(ZONE_EDGE, true, [{ channel: null, mask: shortBy60 }])).toEqual({ kind: 'anti-alias mask' });
    expect(limitText(limitWithMasks(interfererLimit('H3 wanted'), true, [{ channel: null, mask: shortBy60 }]))).toBe(MASK_CHECK);
  });

  it('a failing frequency check keeps its own limit: the mask fails besides, it does not hide the check', () => {
    expect(limitWithMasks(interfererLimit('H3 wanted'), false, [{ channel: null, mask: shortBy60 }])).toEqual(interfererLimit('H3 wanted'));
  });

  it('a mask that holds, one not stated (reported only) or not computed leaves the frequency checks’ limit', () => {
    const holds = filterMask(alias, null, db(-90), db(-80)); // needs max(0, −90 + 80) = 0 dB, gives 0: margin 0, holds
    expect(holds.pass).toBe(true);
    for (const mask of [holds, notStated, null]) {
      expect(limitWithMasks(interfererLimit('IM3 2·A−B'), true, [{ channel: null, mask }])).toEqual(interfererLimit('IM3 2·A−B'));
    }
  });

  it('several channels: the channel whose mask falls shortest is named, as limitedBy names a channel', () => {
    const limit = limitWithMasks(ZONE_EDGE, true, [
      { channel: 'IF-A', mask: shortBy10 },
      { channel: 'IF-B', mask: shortBy60 },
    ]);
    expect(limit).toEqual({ kind: 'anti-alias mask', channel: 'IF-B' });
    expect(limitText(limit)).toBe('IF-B: anti-alias mask');
    // The same words limitInChannel gives any check of a channel.
    expect(limitText(limitInChannel({ kind: 'anti-alias mask' }, 'IF-A'))).toBe('IF-A: anti-alias mask');
  });
});
