import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { quantityText, settingsText } from '../../src/text/quantity-text.js';
import { wrapProse } from '../../src/output/wrap-prose.js';

const terminal = quantityText('terminal');
const svg = quantityText('svg');
const html = quantityText('html');

// Expected texts are written by hand from the rules the issue sets (common practice for engineering
// notation; SI prefixes from BIPM, The International System of Units, 9th ed., Table 7).
describe('quantityText: one way of writing each quantity', () => {
  it('levels to 0.1 dB, below −200 dBFS as "< −200"', () => {
    expect(svg.level(-268.7)).toBe('< \u2212200');
    expect(terminal.level(-268.7)).toBe('< -200');
    expect(terminal.level(-76)).toBe('-76.0');
    expect(html.level(-40.98)).toBe('\u221241.0');
    expect(terminal.level(-200)).toBe('-200.0');
    expect(terminal.level(-0.04)).toBe('0.0');
    expect(terminal.level(-Infinity)).toBe('< -200');
  });

  it('one minus sign per medium: ASCII in the terminal, U+2212 in HTML and SVG', () => {
    expect(terminal.frequency(-10.76246e6)).toBe('-10.76 MHz');
    expect(svg.frequency(-10.76246e6)).toBe('\u221210.76 MHz');
    expect(html.driftRoom(72300, 55200)).toBe('\u22127.23 % / +5.52 %');
    expect(terminal.driftRoom(5534, 17250)).toBe('-5534 ppm / +1.73 %');
  });

  it('rates to 1 Hz (enough to program a part), margins and extents to 4 significant digits', () => {
    expect(terminal.rate(184.32e6)).toBe('184.32 MHz');
    expect(terminal.rate((10e6 * 128) / 13)).toBe('98.461538 MHz');
    expect(terminal.rate(186663555.64)).toBe('186.663556 MHz');
    expect(terminal.frequency(3707712)).toBe('3.708 MHz');
    expect(terminal.frequency(96153.84615)).toBe('96.15 kHz');
    expect(terminal.frequency(0)).toBe('0 Hz');
  });

  it("extents: one frequency for a tone, low–high with the unit once, 0 takes the other end's unit", () => {
    expect(terminal.extent(19.2e6, 19.2e6)).toBe('19.2 MHz');
    expect(terminal.extent(105e6, 125e6)).toBe('105–125 MHz');
    expect(terminal.extent(0, 20e6)).toBe('0–20 MHz');
    expect(terminal.extent(500e3, 1.5e6)).toBe('500 kHz – 1.5 MHz');
    // Digits are added until two different ends read differently.
    expect(terminal.extent(100.01e6, 100.02e6)).toBe('100.01–100.02 MHz');
  });

  it('rate ranges are rounded inward, so every rate written lies inside', () => {
    expect(terminal.rateRange(304e6 / 3, 128e6)).toBe('101.4–128 MHz');
    expect(terminal.rateRange(152e6 / 3, 51.2e6)).toBe('50.67–51.2 MHz');
    expect(terminal.rateRange(40e6, Infinity)).toBe('40 MHz and up');
    fc.assert(
      fc.property(fc.double({ min: 1e3, max: 5e9, noNaN: true }), fc.double({ min: 1e-9, max: 0.5, noNaN: true }), (low, relative) => {
        const high = low * (1 + relative);
        const text = terminal.rateRange(low, high);
        const [a, b] = readRange(text);
        expect(a!).toBeGreaterThanOrEqual(low * (1 - 1e-12));
        expect(b!).toBeLessThanOrEqual(high * (1 + 1e-12));
        expect(a!).toBeLessThanOrEqual(b!);
      }),
      { numRuns: 300 },
    );
  });

  it('relative drift in ppm up to 10 000, per cent beyond', () => {
    expect(terminal.tolerance(10)).toBe('±10 ppm');
    expect(terminal.tolerance(2.5)).toBe('±2.5 ppm');
    expect(terminal.drift(10000)).toBe('10000 ppm');
    expect(terminal.drift(10001)).toBe('1 %');
    expect(terminal.tolerance(301200)).toBe('±30.1 %');
  });

  it('extents tied to the rate are written as input frequencies, never as negative ranges', () => {
    expect(html.tiedExtent(1, -38e6, -2e6)).toBe('r \u2212 2–38 MHz');
    expect(html.tiedExtent(0.25, 0, 0)).toBe('r/4');
    expect(html.tiedExtent(0, 19.2e6, 19.2e6)).toBe('19.2 MHz');
    expect(html.tiedExtent(2, 1e6, 3e6)).toBe('2r + 1–3 MHz');
  });

  it('one notation for synthesiser settings (rate = f × N / M ÷ D)', () => {
    expect(settingsText({ N: 1, M: 1, D: 1 })).toBe('direct');
    expect(settingsText({ N: 1, M: 1, D: 2 })).toBe('÷2');
    expect(settingsText({ N: 93, M: 1, D: 5 })).toBe('×93 ÷5');
    expect(settingsText({ N: 128, M: 3, D: 13 })).toBe('×128/3 ÷13');
    expect(settingsText(null)).toBe('–');
  });
});

describe('wrapProse', () => {
  it("breaks at spaces within the width and keeps a list item's hanging indent", () => {
    expect(wrapProse('Best: VCXO-C at 184.32 MHz', 12)).toBe('Best: VCXO-C\nat 184.32\nMHz');
    expect(wrapProse('- one two three four', 10)).toBe('- one two\n  three\n  four');
  });

  it('never makes a line longer than the width unless one word is (fast-check)', () => {
    fc.assert(
      fc.property(fc.array(fc.stringMatching(/^[a-z]{1,12}$/), { maxLength: 40 }), fc.integer({ min: 12, max: 100 }), (words, width) => {
        const lines = wrapProse(words.join(' '), width).split('\n');
        for (const line of lines) expect(line.length).toBeLessThanOrEqual(width);
        expect(
          lines
            .join(' ')
            .split(/ +/)
            .filter((w) => w !== ''),
        ).toEqual(words);
      }),
      { numRuns: 300 },
    );
  });
});

/** Reads "101.4–128 MHz", "710.2 kHz – 1 MHz" or "50 MHz" back to hertz (SI prefixes). */
function readRange(text: string): [number, number] {
  const scale: Record<string, number> = { Hz: 1, kHz: 1e3, MHz: 1e6, GHz: 1e9 };
  const across = /^([\d.]+) (\w+) – ([\d.]+) (\w+)$/.exec(text);
  if (across) return [Number(across[1]) * scale[across[2]!]!, Number(across[3]) * scale[across[4]!]!];
  const within = /^([\d.]+)(?:–([\d.]+))? (\w+)$/.exec(text);
  if (!within) throw new Error(`not a range: ${text}`);
  const unit = scale[within[3]!]!;
  return [Number(within[1]) * unit, Number(within[2] ?? within[1]) * unit];
}
