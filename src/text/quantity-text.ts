import { trimmed } from '../units/format-frequency.js';

/**
 * Where text goes. Each medium has one minus sign: the terminal (tables,
 * messages) the ASCII hyphen-minus, which pastes into scripts and
 * spreadsheets as a number; HTML and SVG the typographic minus U+2212.
 */
export type Medium = 'terminal' | 'html' | 'svg';

/** The minus sign of each medium. */
export const MINUS: Readonly<Record<Medium, string>> = { terminal: '-', html: '\u2212', svg: '\u2212' };

/** Relative drift above this many ppm is written in per cent. */
export const PPM_LIMIT = 10_000;
/** Levels below this, dBFS, are written "< −200": they are far under any noise floor. */
export const LEVEL_FLOOR = -200;
/** Significant digits of margins, extents and widths. */
export const SHORT_DIGITS = 4;

const PREFIXES: ReadonlyArray<readonly [number, string]> = [
  [1e9, 'GHz'],
  [1e6, 'MHz'],
  [1e3, 'kHz'],
];

/** A part's integer settings, rate = f·N/(M·D). */
export interface Settings {
  readonly N: number;
  readonly M: number;
  readonly D: number;
}

/**
 * The one way every output writes each quantity. Frequencies: rates and
 * programmed frequencies to 1 Hz (at least 7 significant digits), margins,
 * extents and widths to 4 significant digits; levels to 0.1 dB; relative
 * drift in ppm up to 10 000, in per cent beyond; synthesiser settings as
 * ×N/M ÷D. JSON and CSV carry the full numbers instead.
 */
export interface QuantityText {
  readonly medium: Medium;
  readonly minus: string;
  /** A number to `digits` significant digits with the medium's minus. */
  readonly number: (value: number, digits: number) => string;
  /** A rate or a frequency that programs a part (NCO, clock), to 1 Hz. */
  readonly rate: (value: number) => string;
  /** A margin, width or one frequency of an extent, 4 significant digits; signed when negative. */
  readonly frequency: (value: number) => string;
  /** An extent of input or aliased frequencies: one frequency for a tone, else low–high sharing the unit. */
  readonly extent: (low: number, high: number) => string;
  /** A range of rates rounded inward (every rate written lies inside), at least 4 significant digits. */
  readonly rateRange: (low: number, high: number) => string;
  /** The least rate of a range, rounded up to 4 significant digits (still inside it). */
  readonly leastRate: (value: number) => string;
  /** An extent linear in the rate r (multiple·r + [low, high]) written as input frequencies, e.g. "r − 38–2 MHz"; a fixed one as given (the caller passes its magnitudes). */
  readonly tiedExtent: (multiple: number, low: number, high: number) => string;
  /** A level in dBFS to 0.1 dB; below −200 dBFS "< −200". */
  readonly level: (value: number) => string;
  /** A level difference or ratio in dB (level margin, SNR) to 0.1 dB. */
  readonly decibels: (value: number) => string;
  /** A relative drift with its unit: ppm up to 10 000, else per cent; `sign` adds + to positive values. */
  readonly drift: (value: number, sign?: boolean) => string;
  /** A tolerance, ±drift. */
  readonly tolerance: (value: number) => string;
  /** How far a rate may move down and up, e.g. "−72 ppm / +55 ppm". */
  readonly driftRoom: (down: number, up: number) => string;
  /** Synthesiser settings: direct, ÷D, ×N ÷D, ×N/M ÷D. */
  readonly settings: (settings: Settings | null) => string;
  /** A value with an explicit sign (+, the medium's minus, or none for 0). */
  readonly signedFrequency: (value: number) => string;
  /** A level difference in dB to 0.1 dB with an explicit sign: "+2.2", "−17.3" ("0.0" for 0). */
  readonly signedDecibels: (value: number) => string;
  /** A candidate by its label with its rate in brackets, or the label alone when it is that rate ("184.32 MHz"). */
  readonly candidate: (label: string, rate: number) => string;
  /** A frequency an NCO word gives or aims at, to 0.1 mHz: its error from the target is a fraction of a hertz. */
  readonly tuned: (value: number) => string;
  /** A dimensionless number in e-notation to `digits` significant digits, the medium's minus in the mantissa and the exponent. */
  readonly scientific: (value: number, digits: number) => string;
  /** Tick labels of an axis: each value with just the decimals the whole set needs (at most 6), the medium's minus. */
  readonly ticks: (values: readonly number[]) => string[];
}

/**
 * The quantity writers of one medium.
 *
 * @param medium terminal, html or svg (decides the minus sign)
 * @returns the writers
 * @example quantityText('svg').level(-268.7) // '< −200'
 */
export function quantityText(medium: Medium): QuantityText {
  const minus = MINUS[medium];
  const withMinus = (text: string) => (text.startsWith('-') ? minus + text.slice(1) : text);
  const number = (value: number, digits: number) => withMinus(trimmed(value, digits));
  const inUnit = (value: number, digits: number) => {
    if (value === Infinity) return '∞';
    if (value === -Infinity) return `${minus}∞`;
    const [scale, unit] = prefixOf(value);
    return `${number(value / scale, digits)} ${unit}`;
  };
  const rate = (value: number) => inUnit(value, preciseDigits(value));
  const frequency = (value: number) => inUnit(value, SHORT_DIGITS);
  const extent = (low: number, high: number) => {
    if (low === high) return frequency(low);
    for (let digits = SHORT_DIGITS; digits <= 12; digits++) {
      const text = pairText(low, high, digits, (v, d) => number(v, d), inUnit);
      if (text !== null) return text;
    }
    return `${inUnit(low, 12)} – ${inUnit(high, 12)}`;
  };
  const rateRange = (low: number, high: number) => {
    if (high === Infinity) return `${rate(low)} and up`;
    for (let digits = SHORT_DIGITS; digits <= 12; digits++) {
      const [a, b] = [roundInward(low, digits, 'up'), roundInward(high, digits, 'down')];
      if (a <= b && (a < b || low === high)) return pairText(a, b, 12, number, inUnit, true) ?? `${inUnit(a, 12)} – ${inUnit(b, 12)}`;
    }
    return `${rate(low)} – ${rate(high)}`;
  };
  const tiedExtent = (multiple: number, low: number, high: number) => {
    if (multiple === 0) return extent(low, high);
    const r = rateTerm(multiple, minus);
    if (low === 0 && high === 0) return r;
    if (low >= 0) return `${r} + ${extent(low, high)}`;
    if (high <= 0) return `${r} ${minus} ${extent(-high, -low)}`;
    return `${r} ${minus} ${frequency(-low)} to ${r} + ${frequency(high)}`;
  };
  const tenths = (value: number) => withMinus(value.toFixed(1) === '-0.0' ? '0.0' : value.toFixed(1));
  const level = (value: number) => (value >= LEVEL_FLOOR ? tenths(value) : `< ${minus}${-LEVEL_FLOOR}`);
  const decibels = (value: number) => (Number.isFinite(value) ? tenths(value) : value > 0 ? '∞' : `${minus}∞`);
  const drift = (value: number, sign = false) => {
    const plus = sign && value > 0 ? '+' : '';
    const magnitude = Math.abs(value);
    if (magnitude > PPM_LIMIT) return `${plus}${number(value / 1e4, 3)} %`;
    const digits = magnitude >= 100 ? Math.floor(Math.log10(magnitude)) + 1 : 3;
    return `${plus}${number(value, digits)} ppm`;
  };
  return {
    medium,
    minus,
    number,
    rate,
    frequency,
    extent,
    rateRange,
    leastRate: (value) => inUnit(roundInward(value, SHORT_DIGITS, 'up'), 12),
    tiedExtent,
    level,
    decibels,
    drift,
    tolerance: (value) => `±${drift(value)}`,
    driftRoom: (down, up) => `${drift(-Math.abs(down))} / ${drift(Math.abs(up), true)}`,
    settings: settingsText,
    candidate: (label, value) => (label === rate(value) ? label : `${label} (${rate(value)})`),
    signedFrequency: (value) => (value > 0 ? `+${frequency(value)}` : frequency(value)),
    signedDecibels: (value) => {
      const text = decibels(value);
      return value > 0 && text !== '0.0' ? `+${text}` : text;
    },
    tuned: (value) => {
      const [scale, unit] = prefixOf(value);
      // 0.1 mHz is 1e-4 Hz: decimals of the prefix's unit that reach it.
      const decimals = Math.max(0, Math.round(Math.log10(scale)) + 4);
      return `${withMinus(String(Number((value / scale).toFixed(decimals))))} ${unit}`;
    },
    scientific: (value, digits) =>
      value
        .toExponential(digits - 1)
        .replace(/-/g, minus)
        .replace('e+', 'e'),
    ticks: (values) => {
      let decimals = 0;
      while (
        decimals < 6 &&
        values.some((v) => Math.abs(v * 10 ** decimals - Math.round(v * 10 ** decimals)) > 1e-9 * Math.max(1, Math.abs(v * 10 ** decimals)))
      )
        decimals++;
      // One count of decimals for the whole axis, so that its labels line up (−20.0, −19.5); no "−0".
      return values.map((v) => withMinus(v.toFixed(decimals).replace(/^-(?=0(?:\.0*)?$)/, '')));
    },
  };
}

/**
 * Synthesiser settings in the one notation every output uses: "direct"; "÷D"
 * through a divider; "×N ÷D" or "×N/M ÷D" through a synthesiser
 * (rate = f × N / M ÷ D), parts equal to 1 left out.
 *
 * @param settings N, M, D, or null for a rate not from a part
 * @returns the text, "–" for null
 * @example settingsText({ N: 93, M: 1, D: 5 }) // '×93 ÷5'
 */
export function settingsText(settings: Settings | null): string {
  if (settings === null) return '–';
  const { N, M, D } = settings;
  if (N === 1 && M === 1) return D === 1 ? 'direct' : `÷${D}`;
  return `×${N}${M === 1 ? '' : `/${M}`}${D === 1 ? '' : ` ÷${D}`}`;
}

/** Significant digits that resolve 1 Hz, at least 7: a rate written this way programs a part. */
function preciseDigits(value: number): number {
  const magnitude = Math.abs(value);
  return magnitude < 1 ? 7 : Math.max(7, Math.floor(Math.log10(magnitude)) + 1);
}

function prefixOf(value: number): readonly [number, string] {
  const magnitude = Math.abs(value);
  return PREFIXES.find(([s]) => magnitude >= s) ?? [1, 'Hz'];
}

/** "low–high unit" when both take the same prefix and differ when written, "low unit – high unit" across prefixes; null when the digits merge them. */
function pairText(
  low: number,
  high: number,
  digits: number,
  number: (v: number, d: number) => string,
  inUnit: (v: number, d: number) => string,
  exact = false,
): string | null {
  const [scaleHigh, unitHigh] = prefixOf(high);
  // Zero takes the unit of the other end: "0–20 MHz".
  const [scaleLow, unitLow] = low === 0 ? [scaleHigh, unitHigh] : prefixOf(low);
  if (unitLow === unitHigh) {
    const a = number(low / scaleLow, digits);
    const b = number(high / scaleHigh, digits);
    if (a === b && !exact) return null;
    return a === b ? `${a} ${unitLow}` : `${a}–${b} ${unitLow}`;
  }
  const a = inUnit(low, digits);
  const b = inUnit(high, digits);
  return `${a} – ${b}`;
}

/** A value rounded to `digits` significant digits towards the inside of a range. */
function roundInward(value: number, digits: number, direction: 'up' | 'down'): number {
  if (value === 0 || !Number.isFinite(value)) return value;
  const step = 10 ** (Math.floor(Math.log10(Math.abs(value))) - digits + 1);
  const units = value / step;
  // A value already on the grid (within rounding) stays.
  const nearest = Math.round(units);
  if (Math.abs(units - nearest) < 1e-6) return Number((nearest * step).toPrecision(digits));
  const rounded = direction === 'up' ? Math.ceil(units) : Math.floor(units);
  return Number((rounded * step).toPrecision(digits));
}

/** "r", "2r", "r/4", "3r/4", "1.5r" for the rate multiple. */
function rateTerm(multiple: number, minus: string): string {
  const sign = multiple < 0 ? minus : '';
  const m = Math.abs(multiple);
  if (m === 1) return `${sign}r`;
  for (const q of [2, 3, 4, 8]) {
    const p = m * q;
    if (Math.abs(p - Math.round(p)) < 1e-12 && Math.round(p) % q !== 0) return `${sign}${Math.round(p) === 1 ? '' : Math.round(p)}r/${q}`;
  }
  return `${sign}${trimmed(m, 6)}r`;
}
