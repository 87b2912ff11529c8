import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseFrequency } from '../../src/units/parse-frequency.js';
import { formatFrequency } from '../../src/units/format-frequency.js';
import { InputError } from '../../src/units/input-error.js';

/** The refusal parseFrequency throws, so its fields can be read. */
function refusal(written: string | number, where = '--low'): InputError {
  try {
    parseFrequency(written, where);
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error(`${JSON.stringify(written)} was accepted`);
}

describe('parseFrequency: every notation the README lists (SI prefixes; common practice)', () => {
  // SI prefixes are exact powers of ten and case-sensitive: k = 10³, M = 10⁶, G = 10⁹
  // (BIPM, The International System of Units (SI Brochure), prefixes table; from memory).
  const notations: Array<[string, number]> = [
    ['70000000', 70e6],
    ['70e6', 70e6],
    ['70M', 70e6],
    ['70 MHz', 70e6],
    ['70MHz', 70e6],
    ['12.288 MHz', 12_288_000],
    ['455k', 455_000],
    ['2.4G', 2_400_000_000],
    ['10.7e6 Hz', 10_700_000],
  ];
  it.each(notations)('reads %j as %d Hz', (written, expected) => {
    expect(parseFrequency(written, '--low')).toBe(expected);
  });

  it('reads the common receiver IFs exactly', () => {
    // Common receiver IFs (common practice, no source): 455 kHz, 10.7 MHz, 21.4 MHz, 70 MHz, 140 MHz.
    expect(parseFrequency('455 kHz', 'x')).toBe(455_000);
    expect(parseFrequency('10.7 MHz', 'x')).toBe(10_700_000);
    expect(parseFrequency('21.4M', 'x')).toBe(21_400_000);
    expect(parseFrequency('140MHz', 'x')).toBe(140_000_000);
  });

  it('accepts the unit Hz in any case, spaces around the text, zero and a JSON number', () => {
    expect(parseFrequency('70 Mhz', 'x')).toBe(70e6);
    expect(parseFrequency('455 kHZ', 'x')).toBe(455e3);
    expect(parseFrequency('  70M  ', 'x')).toBe(70e6);
    expect(parseFrequency('0', 'x')).toBe(0);
    expect(parseFrequency('.5k', 'x')).toBe(500);
    expect(parseFrequency(61.44e6, 'x')).toBe(61.44e6);
  });

  it('gives the same hertz as the decimal text with the prefix written as a power of ten', () => {
    // SI Brochure (from memory): "1.001 MHz" is exactly 1 001 000 Hz, so the result must be the double
    // nearest that decimal, which is what Number('1.001e6') gives (ECMAScript Number: correctly rounded).
    const decimal = fc
      .tuple(fc.integer({ min: 0, max: 999_999 }), fc.integer({ min: 0, max: 99_999 }), fc.integer({ min: 1, max: 5 }))
      .map(([whole, fraction, places]) => `${whole}.${String(fraction).padStart(5, '0').slice(0, places)}`);
    const prefix = fc.constantFrom(['k', 3], ['M', 6], ['G', 9], ['', 0]) as fc.Arbitrary<[string, number]>;
    fc.assert(
      fc.property(decimal, prefix, fc.constantFrom('', ' ', 'Hz', ' Hz'), (digits, [p, power], unit) => {
        const written = `${digits}${unit.startsWith(' ') ? ' ' : ''}${p}${unit.trim()}`;
        // Above 1 THz the reader refuses (its stated bound), tested below.
        fc.pre(Number(`${digits}e${power}`) <= 1e12);
        expect(parseFrequency(written, 'x')).toBe(Number(`${digits}e${power}`));
      }),
      { numRuns: 3000 },
    );
    expect(parseFrequency('1.001M', 'x')).toBe(1_001_000);
    expect(parseFrequency('1.005 MHz', 'x')).toBe(1_005_000);
    expect(parseFrequency('1.5e-3', 'x')).toBe(0.0015);
  });
});

describe('parseFrequency: refusals name the value and where it was found', () => {
  it('refuses a lower-case m (milli) with the hint "write 70M"', () => {
    // 'm' is milli, nearly always a typo for M on a frequency.
    const error = refusal('70m', '--center');
    expect(error.where).toBe('--center');
    expect(error.received).toBe('70m');
    expect(error.message).toContain('--center');
    expect(error.message).toContain('"70m"');
    expect(error.message).toContain('write 70M');
    expect(refusal('70 mHz').message).toContain('write 70M');
  });

  it('refuses a unit named like an object property as an unknown unit', () => {
    const error = refusal('70constructor');
    expect(error.message).toContain('unit');
    expect(error.message).not.toContain('NaN');
  });

  it('refuses a capital K with the lower-case hint', () => {
    const error = refusal('70K', '--rate');
    expect(error.message).toContain('--rate');
    expect(error.message).toContain('"70K"');
    expect(error.message).toContain('70k');
    expect(refusal('455 KHz').received).toBe('455 KHz');
  });

  const refused: Array<[string, string | number]> = [
    ['NaN', 'NaN'],
    ['NaN as a number', Number.NaN],
    ['Infinity', 'Infinity'],
    ['-Infinity', '-Infinity'],
    ['Infinity as a number', Infinity],
    ['an overflowing exponent', '1e400'],
    ['a negative', '-70M'],
    ['a negative with the Unicode minus', '−70M'],
    ['a negative number', -5],
    ['an empty text', ''],
    ['blanks only', '   '],
    ['an unknown unit', '70 rad'],
    ['an unknown prefix', '70T'],
    ['a lower-case g', '2.4g'],
    ['hertz spelt out', '70 hertz'],
    ['no number', 'MHz'],
    ['two numbers', '70 80'],
    ['a hex number', '0x10'],
    ['a comma decimal', '12,288M'],
  ];
  it.each(refused)('refuses %s (%j), naming the option and the value', (_, written) => {
    const error = refusal(written, '--high');
    expect(error).toBeInstanceOf(InputError);
    expect(error.where).toBe('--high');
    expect(error.message.startsWith('--high: ')).toBe(true);
    expect(error.message).toContain(JSON.stringify(String(written)));
  });
});

describe('formatFrequency', () => {
  it('writes SI prefixes and trims trailing zeros', () => {
    expect(formatFrequency(12_288_000)).toBe('12.288 MHz');
    expect(formatFrequency(70e6)).toBe('70 MHz');
    expect(formatFrequency(455e3)).toBe('455 kHz');
    expect(formatFrequency(2.4e9)).toBe('2.4 GHz');
    expect(formatFrequency(0.5)).toBe('0.5 Hz');
    expect(formatFrequency(0)).toBe('0 Hz');
    expect(formatFrequency(Infinity)).toBe('∞');
  });

  it('keeps ten significant digits: 28/3 kHz from the Vaughan, Scott & White worked case', () => {
    // 2·14 kHz / 3 (Vaughan, Scott & White 1991, zone 3 of 10–14 kHz).
    expect(formatFrequency(28e3 / 3)).toBe('9.333333333 kHz');
    expect(formatFrequency(35e6 / 3)).toBe('11.66666667 MHz');
  });

  it('reads back through parseFrequency to ten significant digits', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e12, noNaN: true }), (value) => {
        const back = parseFrequency(formatFrequency(value), 'x');
        expect(Math.abs(back - value) / value).toBeLessThanOrEqual(5e-10);
      }),
      { numRuns: 2000 },
    );
  });
});
