import { describe, expect, it } from 'vitest';
import { parseTime } from '../../src/units/parse-time.js';
import { InputError } from '../../src/units/input-error.js';

/**
 * Check values: the SI sub-multiple prefixes milli 1e-3, micro 1e-6, nano
 * 1e-9, pico 1e-12, femto 1e-15 (BIPM, The International System of Units,
 * 9th ed. 2019, Table 7). Each written time must read as the same double as
 * the JavaScript literal with that exponent (one correctly rounded division).
 */
describe('parseTime', () => {
  it.each([
    ['150 fs', 150e-15],
    ['0.2 ps', 0.2e-12],
    ['1e-12', 1e-12],
    ['80fs', 80e-15],
    ['1.5 ns', 1.5e-9],
    ['2 us', 2e-6],
    ['2 µs', 2e-6],
    ['3ms', 3e-3],
    ['1 s', 1],
    ['.5 ps', 0.5e-12],
    ['  100 fs  ', 100e-15],
    ['0', 0],
  ])('reads %s as %s s', (written, seconds) => {
    expect(parseTime(written, 'x')).toBe(seconds);
  });

  it('reads a plain number as seconds', () => {
    expect(parseTime(8e-14, 'x')).toBe(8e-14);
  });

  it('agrees across notations of the same time (1 ps = 1000 fs = 0.001 ns)', () => {
    // 1000/1e15 and 1/1e12 are the same real number, each rounded once: the same double.
    expect(parseTime('1000 fs', 'x')).toBe(parseTime('1 ps', 'x'));
    // 0.001 is itself rounded, so allow one more rounding step (2^-52 relative).
    const ps = parseTime('1 ps', 'x');
    expect(Math.abs(parseTime('0.001 ns', 'x') - ps) / ps).toBeLessThanOrEqual(2 ** -52);
  });

  it.each([
    ['', 'a time such as'],
    ['-1 ps', 'not negative'],
    ['−1 ps', 'not negative'],
    ['150 f', 'with its unit, e.g. 150 fs'],
    ['150 Fs', 'unit s, ms, us, ns, ps or fs'],
    ['2 hours', 'unit s, ms, us, ns, ps or fs'],
    ['1e400 s', 'finite'],
    ['ps', 'a time such as'],
    ['1..2 ps', 'a time such as'],
  ])('refuses %j, naming the place and saying %s', (written, words) => {
    const thrown = (() => {
      try {
        parseTime(written, 'converter.apertureJitter');
      } catch (error) {
        return error;
      }
      return null;
    })();
    expect(thrown).toBeInstanceOf(InputError);
    const error = thrown as InputError;
    expect(error.where).toBe('converter.apertureJitter');
    expect(error.received).toBe(written);
    expect(error.expected).toContain(words);
  });

  it.each([NaN, Infinity, -1e-12])('refuses the number %s', (value) => {
    expect(() => parseTime(value, 'x')).toThrow(InputError);
  });
});
