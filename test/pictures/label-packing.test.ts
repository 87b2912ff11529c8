import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { packLabels, spreadApart, wrapPhrases } from '../../src/pictures/label-packing.js';
import { textWidth } from '../../src/pictures/typography.js';
import { escapeXml } from '../../src/pictures/escape-xml.js';
import { withMinus } from '../../src/pictures/typography.js';
import { parseSvg, textsOf } from './svg-check.js';
import { textElement } from '../../src/pictures/svg-element.js';

/** Label placement: what is placed never overlaps (the property the pictures rely on). */
describe('packLabels', () => {
  const requests = fc.array(
    fc.record({
      x: fc.double({ min: 0, max: 900, noNaN: true }),
      text: fc.string({ minLength: 1, maxLength: 30 }),
      span: fc.tuple(fc.double({ min: 0, max: 900, noNaN: true }), fc.double({ min: 0, max: 60, noNaN: true })),
    }),
    { maxLength: 40 },
  );

  it('gives a text wider than the bounds its short form (a long list of checks on a lane), never a place past the edges', () => {
    // 100 characters at 10 px and 0.62 em: 620 px, wider than the 400 px of room.
    const placed = packLabels([{ x: 200, text: 'x'.repeat(100), short: '1,2,3', item: 0 }], 2, [0, 400], 10);
    expect(placed.map((p) => p.text)).toEqual(['1,2,3']);
    expect(packLabels([{ x: 200, text: 'x'.repeat(100), item: 0 }], 2, [0, 400], 10)).toEqual([]);
  });

  it('never overlaps two labels, or a label and another bracket, in one row; stays inside the bounds', () => {
    fc.assert(
      fc.property(requests, fc.integer({ min: 1, max: 5 }), (raw, rows) => {
        const withSpans = raw.map((r, i) => ({
          x: r.x,
          text: r.text,
          short: String(i + 1),
          spans: [[r.span[0], r.span[0] + r.span[1]] as const],
          item: i,
        }));
        const placed = packLabels(withSpans, rows, [0, 960], 10);
        for (const p of placed) {
          expect(p.row).toBeLessThan(rows);
          if (p.width <= 960) expect(p.x - p.width / 2 >= -1e-9 && p.x + p.width / 2 <= 960 + 1e-9).toBe(true);
        }
        for (const a of placed) {
          for (const b of placed) {
            if (a === b || a.row !== b.row) continue;
            const boxes = (p: typeof a) => [[p.x - p.width / 2, p.x + p.width / 2], ...withSpans[p.item]!.spans];
            for (const [a0, a1] of boxes(a))
              for (const [b0, b1] of boxes(b)) expect(a0 < b1 && a1 > b0, `${a.text} / ${b.text}`).toBe(false);
          }
        }
      }),
      { numRuns: 300, seed: 17 },
    );
  });

  it('falls back to the short text, then leaves a label out', () => {
    const long = 'IM3 2·wanted−Paging 81M';
    const placed = packLabels(
      [
        { x: 100, text: long, short: '1', item: 'a' },
        { x: 100, text: long, short: '2', item: 'b' },
      ],
      1,
      [0, 960],
      10,
    );
    expect(placed.map((p) => [p.item, p.text])).toEqual([['a', long]]);
    const wide = packLabels(
      [
        { x: 100, text: long, item: 'a' },
        { x: 300, text: 'x'.repeat(60), short: 'k', item: 'b' },
      ],
      1,
      [0, 960],
      10,
    );
    expect(wide.map((p) => p.text)).toEqual([long, 'k']);
  });

  it('estimates text width by character class: thin, lower case and figures, capitals, widest', () => {
    // z o n e, space, 2: four lower-case letters and a figure at 0.65 em, a space at 0.4 em (10 px font).
    expect(textWidth('zone 2', 10)).toBeCloseTo(36.5, 9);
    expect(textWidth('mW', 10, { bold: true })).toBeCloseTo(22, 9);
  });
});

describe('spreadApart and wrapPhrases', () => {
  it('keeps order and the least gap where the room allows', () => {
    expect(spreadApart([10, 12, 30], 10, 0, 100)).toEqual([10, 20, 30]);
    expect(spreadApart([95, 96, 97], 10, 0, 100)).toEqual([80, 90, 100]);
  });

  it('breaks between phrases only', () => {
    expect(wrapPhrases(['1 = H2 wanted', '2 = LO leak 92M', '3 = SMPS 1.2M'], 200, 10, '; ')).toEqual([
      '1 = H2 wanted; 2 = LO leak 92M',
      '3 = SMPS 1.2M',
    ]);
  });
});

describe('escaping', () => {
  it('escapes the five XML specials and replaces characters XML cannot carry', () => {
    expect(escapeXml(`IM3 <2·A−B> & "co" 'x'`)).toBe('IM3 &lt;2·A−B&gt; &amp; &quot;co&quot; &apos;x&apos;');
    expect(escapeXml('bell\u0007')).toBe('bell\uFFFD');
  });

  it('round-trips any label through a registry XML parser as the same text', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme', maxLength: 40 }), (label) => {
        // eslint-disable-next-line no-control-regex -- the labels XML cannot carry are left out
        fc.pre(!/[\u0000-\u0008\u000B\u000C\u000E-\u001F\r]/.test(label) && label.trim() === label && !/\s\s/.test(label));
        const svg = `<svg xmlns="http://www.w3.org/2000/svg">${textElement(0, 0, label, { 'data-label': label })}</svg>`;
        const document = parseSvg(svg);
        expect(textsOf(document)).toEqual([label]);
        expect(document.getElementsByTagName('text').item(0)!.getAttribute('data-label')).toBe(label);
      }),
      { numRuns: 300, seed: 3 },
    );
  });

  it('sets the typographic minus before numbers only', () => {
    expect(withMinus('-76 dBFS, margin -5 MHz, IM3 2·A−B, SR-14')).toBe('−76 dBFS, margin −5 MHz, IM3 2·A−B, SR-14');
  });
});
