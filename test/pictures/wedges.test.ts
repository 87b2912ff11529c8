import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { allowedWedges, wedgeSection, type ChartPoint } from '../../src/pictures/wedges.js';
import { rateWindows } from '../../src/windows/enumerate-windows.js';
import { hz } from '../../src/units/quantities.js';

/**
 * The band-position wedges against Vaughan, Scott & White, "The theory of
 * bandpass sampling", IEEE Trans. Signal Processing 39(9), 1991: zone n
 * allows 2·fH/n ≤ fs ≤ 2·fL/(n − 1), i.e. 2x/n ≤ y ≤ 2(x − 1)/(n − 1) with
 * x = fH/B, y = fs/B.
 */

/** The vertical section of a polygon at x: [lowest, highest] y on its edges, or null when x misses it. */
function sectionAt(points: readonly ChartPoint[], x: number): readonly [number, number] | null {
  const ys: number[] = [];
  points.forEach(([x0, y0], i) => {
    const [x1, y1] = points[(i + 1) % points.length]!;
    if (x0 === x1) {
      if (x === x0) ys.push(y0, y1);
    } else if ((x - x0) * (x - x1) <= 0) ys.push(y0 + ((x - x0) * (y1 - y0)) / (x1 - x0));
  });
  return ys.length === 0 ? null : [Math.min(...ys), Math.max(...ys)];
}

describe('allowedWedges', () => {
  it('has its tip at (n, 2) and its edges on the two lines of the condition', () => {
    const xMax = 9;
    const yMax = 12;
    for (const w of allowedWedges(xMax, yMax)) {
      expect(w.points[0]).toEqual([w.zone, 2]);
      expect(w.inverted).toBe(w.zone % 2 === 0);
      for (const [x, y] of w.points) {
        const onLower = Math.abs(y - (2 * x) / w.zone) <= 1e-12 * y;
        const onUpper = w.zone > 1 && Math.abs(y - (2 * (x - 1)) / (w.zone - 1)) <= 1e-12 * y;
        const onEdge = x === xMax || y === yMax || (w.zone === 1 && x === 1);
        expect(onLower || onUpper || onEdge, `zone ${w.zone} vertex (${x}, ${y})`).toBe(true);
      }
    }
  });

  it('reproduces the worked case 10–14 kHz: 28 kHz and up, 14–20 kHz, 9.333–10 kHz', () => {
    // Band 10–14 kHz: B = 4 kHz, fH/B = 3.5 (Vaughan, Scott & White 1991 worked case, recomputed from the paper's condition).
    const wedges = allowedWedges(5, 10);
    const B = 4e3;
    const cut = (zone: number) => sectionAt(wedges[zone - 1]!.points, 3.5)!.map((y) => y * B);
    expect(cut(1)[0]).toBeCloseTo(28e3, 6);
    expect(cut(1)[1]).toBe(10 * B); // zone 1 has no upper bound: it runs to the chart's top
    expect(cut(2)[0]).toBeCloseTo(14e3, 6);
    expect(cut(2)[1]).toBeCloseTo(20e3, 6);
    expect(cut(3)[0]).toBeCloseTo(28e3 / 3, 6);
    expect(cut(3)[1]).toBeCloseTo(10e3, 6);
    expect(wedgeSection(2, 3.5)).toEqual([3.5, 5]);
  });

  it('cuts, at any band position, the same rates as the window enumerator (random bands)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e3, max: 1e9, noNaN: true }), fc.double({ min: 1.01, max: 40, noNaN: true }), (width, position) => {
        const high = width * position;
        const low = high - width;
        const xMax = Math.ceil(position) + 1;
        const yMax = 2.5 * xMax;
        const wedges = allowedWedges(xMax, yMax);
        // src/windows/enumerate-windows.ts: its own implementation of the same condition.
        for (const window of rateWindows({ low: hz(low), high: hz(high) })) {
          // The enumerator takes fH/B within 1e-12 below an integer n as n (src/math/edge-tolerance.ts): the zero-width window at the wedge's tip.
          if (window.zone > position) continue;
          const section = sectionAt(wedges[window.zone - 1]!.points, position);
          expect(section, `zone ${window.zone}`).not.toBeNull();
          expect(section![0] * width).toBeCloseTo(window.minRate, -Math.log10(window.minRate) + 8);
          const top = Math.min(window.maxRate / width, yMax);
          expect(section![1]).toBeCloseTo(top, 6);
        }
      }),
      { numRuns: 300, seed: 91 },
    );
  });

  it('leaves out the zone whose wedge would be the single point at the right edge', () => {
    expect(allowedWedges(7, 20).map((w) => w.zone)).toEqual([1, 2, 3, 4, 5, 6]);
    expect(allowedWedges(7.5, 20).map((w) => w.zone)).toEqual([1, 2, 3, 4, 5, 6, 7]);
  });
});
