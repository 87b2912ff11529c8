/**
 * An independent brute-force enumerator of the mixing products of a set of
 * signals through a memoryless polynomial, written for the generator's tests
 * from the multinomial expansion alone (common practice, no source). It
 * imports nothing from src/ and prunes nothing: every way of taking each
 * signal p times with + and q times with − (a tone one way only, since
 * f − f = 0) with total order 2..maxOrder, and every single signal's own
 * harmonics up to harmonicOrder, is listed with its extent and level.
 *
 * Level, in amplitudes (full scale 1): a tone of amplitude A through a_n·x^n
 * makes its n-th harmonic at |a_n|·A^n/2^(n−1), stated as HDn dBc at the
 * reference amplitude R, so |a_n|/2^(n−1) = R·10^(HDn/20)/R^n; the product
 * taking signal i pᵢ and qᵢ times has the multinomial amplitude
 *   |a_n|/2^(n−1) · n! · Πᵢ Aᵢ^(pᵢ+qᵢ)/(pᵢ!·qᵢ!).
 */

export interface BruteSignal {
  readonly low: number;
  readonly high: number;
  /** Amplitude, full scale 1. */
  readonly amplitude: number;
  /** True for the wanted band. */
  readonly wanted: boolean;
}

export interface BruteProduct {
  /** (plus, minus) per signal, in signal order. */
  readonly picks: ReadonlyArray<readonly [number, number]>;
  readonly order: number;
  /** Extent of the frequencies, Hz (one of the two signs). */
  readonly low: number;
  readonly high: number;
  /** dBFS. */
  readonly level: number;
}

function fact(n: number): number {
  return n <= 1 ? 1 : n * fact(n - 1);
}

/**
 * A key naming a product and its negative alike: the smaller of the two
 * (plus, minus) listings.
 */
export function productKey(picks: ReadonlyArray<readonly [number, number]>): string {
  const one = picks.map(([p, q]) => `${p}/${q}`).join(' ');
  const other = picks.map(([p, q]) => `${q}/${p}`).join(' ');
  return one < other ? one : other;
}

/**
 * Every product (one of each ± pair) with its level.
 *
 * @param signals the signals at the converter input
 * @param hdDbc HDn by order, dBc at the reference amplitude
 * @param reference R, the reference amplitude
 * @param maxOrder highest mixing order
 * @param harmonicOrder highest single-signal harmonic order
 */
export function bruteProducts(
  signals: readonly BruteSignal[],
  hdDbc: ReadonlyMap<number, number>,
  reference: number,
  maxOrder: number,
  harmonicOrder: number,
): BruteProduct[] {
  const found = new Map<string, BruteProduct>();
  const picks: Array<[number, number]> = signals.map(() => [0, 0]);
  const record = () => {
    const order = picks.reduce((sum, [p, q]) => sum + p + q, 0);
    const hd = hdDbc.get(order);
    if (hd === undefined) return;
    const single = picks.filter(([p, q]) => p + q > 0).length === 1 && picks.some(([p, q]) => q === 0 && p === order);
    if (order > maxOrder && !single) return;
    let amplitude = ((reference * 10 ** (hd / 20)) / reference ** order) * fact(order);
    let low = 0;
    let high = 0;
    picks.forEach(([p, q], i) => {
      const s = signals[i]!;
      amplitude *= s.amplitude ** (p + q) / (fact(p) * fact(q));
      low += p * s.low - q * s.high;
      high += p * s.high - q * s.low;
    });
    const key = productKey(picks);
    if (!found.has(key))
      found.set(key, { picks: picks.map(([p, q]) => [p, q] as const), order, low, high, level: 20 * Math.log10(amplitude) });
  };
  const highest = Math.max(maxOrder, harmonicOrder);
  const walk = (i: number, left: number) => {
    if (i === signals.length) {
      const order = highest - left;
      if (order >= 2) record();
      return;
    }
    const tone = signals[i]!.low === signals[i]!.high;
    for (let p = 0; p <= left; p++) {
      for (let q = 0; p + q <= left; q++) {
        if (tone && p > 0 && q > 0) continue;
        picks[i] = [p, q];
        walk(i + 1, left - p - q);
      }
    }
    picks[i] = [0, 0];
  };
  walk(0, highest);
  return [...found.values()];
}

/** A product of the wanted band alone with net multiple ±1: it falls back onto the band. */
export function fallsOnWanted(product: BruteProduct, signals: readonly BruteSignal[]): boolean {
  const onlyWanted = product.picks.every(([p, q], i) => p + q === 0 || signals[i]!.wanted);
  const net = product.picks.reduce((sum, [p, q]) => sum + p - q, 0);
  return onlyWanted && Math.abs(net) === 1;
}
