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

  it('a candidate with its rate in brackets, the rate once when the label is that rate (common practice: say a thing once)', () => {
    expect(terminal.candidate('best in 171–194.5 MHz', 186663555.64)).toBe('best in 171–194.5 MHz (186.663556 MHz)');
    expect(terminal.candidate('VCXO-C 184.32M', 184.32e6)).toBe('VCXO-C 184.32M (184.32 MHz)');
    expect(terminal.candidate('184.32 MHz', 184.32e6)).toBe('184.32 MHz');
    expect(html.candidate('200 MHz', 200e6)).toBe('200 MHz');
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
    // A value is never split from its unit (SI Brochure, 9th ed., 5.4.3: one space between them, kept unbroken in print).
    expect(wrapProse('Best: VCXO-C at 184.32 MHz', 12)).toBe('Best: VCXO-C\nat\n184.32 MHz');
    expect(wrapProse('17.12 MHz, 105.76 MHz, 228.64 MHz, 262.88 MHz', 44)).toBe('17.12 MHz, 105.76 MHz, 228.64 MHz,\n262.88 MHz');
    expect(wrapProse('drift -7.23 % / +5.52 %, tolerance ±10 ppm', 20)).toBe('drift -7.23 % /\n+5.52 %, tolerance\n±10 ppm');
    // A zone and its inversion mark are one value ("2 inv", common practice of the tables); a lone "inv" is a word.
    expect(wrapProse('best first (zone "2 inv": inverted)', 18)).toBe('best first (zone\n"2 inv": inverted)');
    expect(wrapProse('"inv": spectrally inverted', 10)).toBe('"inv":\nspectrally\ninverted');
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

// Expected texts written by hand from the rules: dB to 0.1 with an explicit sign; an NCO's frequency to 0.1 mHz
// (its error is a fraction of a hertz); e-notation to the digits asked; tick labels with the decimals the axis needs.
describe('quantityText: signed dB, NCO frequencies, e-notation, tick labels', () => {
  it('signed dB to 0.1 dB, no sign on a figure that reads 0.0', () => {
    expect(terminal.signedDecibels(-17.34)).toBe('-17.3');
    expect(svg.signedDecibels(-17.34)).toBe('\u221217.3');
    expect(terminal.signedDecibels(2.24)).toBe('+2.2');
    expect(terminal.signedDecibels(0.04)).toBe('0.0');
    expect(terminal.signedDecibels(-0.04)).toBe('0.0');
  });

  it('an NCO frequency to 0.1 mHz, trailing zeros dropped', () => {
    expect(terminal.tuned(46663555.6635)).toBe('46.6635556635 MHz');
    expect(terminal.tuned(46663555.64)).toBe('46.66355564 MHz');
    expect(html.tuned(-46663555.6422)).toBe('\u221246.6635556422 MHz');
    expect(terminal.tuned(12.5)).toBe('12.5 Hz');
  });

  it('e-notation with the medium minus in the mantissa and the exponent', () => {
    expect(terminal.scientific(-7.5641e-4, 4)).toBe('-7.564e-4');
    expect(svg.scientific(-7.5641e-4, 4)).toBe('\u22127.564e\u22124');
    expect(terminal.scientific(1234, 3)).toBe('1.23e3');
  });

  it('tick labels: one count of decimals for the whole axis, no −0', () => {
    expect(svg.ticks([-100, -80, 0])).toEqual(['\u2212100', '\u221280', '0']);
    expect(svg.ticks([-1, -0.5, 0, 0.5])).toEqual(['\u22121.0', '\u22120.5', '0.0', '0.5']);
    // 0.1 + 0.2 is not 0.3 in binary: the label still reads 0.3.
    expect(terminal.ticks([0.1, 0.2, 0.1 + 0.2])).toEqual(['0.1', '0.2', '0.3']);
    expect(terminal.ticks([122.88, 130])).toEqual(['122.88', '130.00']);
  });
});
