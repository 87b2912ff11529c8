import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { hz } from '../../src/units/quantities.js';
import { MOST_WINDOWS, windowCount, zoneSpan } from '../../src/math/zone-span.js';
import { rateWindows } from '../../src/windows/enumerate-windows.js';
import { ifzone, refusalLine } from '../helpers/run-in-process.js';

/**
 * Zones visited only where the rate limits allow. The reference is the
 * condition of Vaughan, Scott & White, "The theory of bandpass sampling",
 * IEEE Trans. Signal Processing 39(9), 1991, written out again: zone n holds
 * [fL, fH] for 2·fH/n ≤ fs ≤ 2·fL/(n − 1), n ≤ ⌊fH/B⌋. Before, every zone up
 * to ⌊fH/B⌋ was walked whatever the limits, and a spread of ~125,000
 * windows into Math.min overflowed the call stack.
 */
function paperZonesMeeting(fL: number, fH: number, minRate: number, maxRate: number): number[] {
  const zones: number[] = [];
  for (let n = 1; n <= Math.floor(fH / (fH - fL)); n++) {
    const low = (2 * fH) / n;
    const high = n === 1 ? Infinity : (2 * fL) / (n - 1);
    // Strictly inside, so that no edge sits within rounding of a limit.
    if (Math.max(low, minRate) < Math.min(high, maxRate)) zones.push(n);
  }
  return zones;
}

describe('zoneSpan: the zones a rate range can meet', () => {
  it("10–14 kHz with no limits: zones 1 to 3 (the paper's worked case)", () => {
    expect(zoneSpan({ low: hz(10e3), high: hz(14e3) }, hz(0), hz(Infinity))).toEqual({ first: 1, last: 3 });
    expect(windowCount({ low: hz(10e3), high: hz(14e3) }, hz(0), hz(Infinity))).toBe(3);
  });

  it('covers every zone whose window meets the limits, and counts at most four more (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 100_000 }),
        fc.integer({ min: 1, max: 5000 }),
        fc.integer({ min: 1, max: 400 }),
        fc.integer({ min: 1, max: 400 }),
        (low, width, a, b) => {
          const fL = low * 1e3;
          const fH = fL + width * 100;
          const [minRate, maxRate] = [Math.min(a, b) * 1e5, Math.max(a, b) * 1e5];
          const expected = paperZonesMeeting(fL, fH, minRate, maxRate);
          const span = zoneSpan({ low: hz(fL), high: hz(fH) }, hz(minRate), hz(maxRate));
          for (const zone of expected) expect(zone >= span.first && zone <= span.last).toBe(true);
          expect(windowCount({ low: hz(fL), high: hz(fH) }, hz(minRate), hz(maxRate))).toBeLessThanOrEqual(expected.length + 4);
          const found = rateWindows({ low: hz(fL), high: hz(fH) }, { minRate: hz(minRate), maxRate: hz(maxRate) })
            .filter((w) => w.maxRate > w.minRate)
            .map((w) => w.zone);
          expect(found).toEqual(expected);
        },
      ),
      { numRuns: 2000, seed: 1414 },
    );
  });
});

describe('windows: a question too large is refused up front, saying what to narrow', () => {
  it('a 5 kHz channel at 1 GHz from 1 kHz: one line naming --min-rate, at once', async () => {
    const run = await ifzone('windows', '--center', '1G', '--width', '5k', '--min-rate', '1k');
    expect(run.code).toBe(2);
    expect(run.out).toBe('');
    expect(refusalLine(run)).toBe(
      `ifzone: --min-rate: a rate range holding at most ${MOST_WINDOWS} windows; raise --min-rate or give --max-rate (got "1k: the range holds about 200000 windows for this 5 kHz band")`,
    );
  });

  it('the same channel from 400 kHz: about 5,000 windows, listed, and the lowest legal rate found', async () => {
    const run = await ifzone('windows', '--center', '1G', '--width', '5k', '--min-rate', '400k', '--json');
    expect(run.code).toBe(0);
    const report = JSON.parse(run.out) as { windows: { zone: number }[]; minimumRate: number };
    // Zone n reaches 400 kHz while 2·fL/(n − 1) ≥ 400 kHz: n ≤ 1 + 2·999997500/400000 = 5000.9875;
    // the lowest legal rate is zone 5000's lower edge, 2·fH/5000 = 2·1000002500/5000 = 400001 Hz.
    expect(report.windows.at(-1)!.zone).toBe(5000);
    expect(report.minimumRate).toBeCloseTo(400001, 6);
  });
});
