import { hz, ppm, seconds } from '../../src/units/quantities.js';
import type { ClockPart, RateDerivation } from '../../src/scenario/scenario.js';

/**
 * Clock parts for the clock-planning tests: invented demo parts of the
 * "Heron" receiver line (Saltmarsh Radio), not real products.
 */
export function part(
  label: string,
  frequency: number,
  derivation: RateDerivation,
  tolerance = 20,
  jitter: number | null = null,
): ClockPart {
  return {
    label,
    frequency: hz(frequency),
    tolerancePpm: ppm(tolerance),
    toleranceBreakdown: null,
    jitter: jitter === null ? null : seconds(jitter),
    note: '',
    derivation,
  };
}

/** A synthesiser derivation with inclusive integer ranges and an optional VCO range, Hz. */
export function synthesiser(
  n: [number, number],
  m: [number, number],
  d: [number, number],
  vco: [number, number] | null = null,
): RateDerivation {
  return {
    kind: 'synthesiser',
    n: { min: n[0], max: n[1] },
    m: { min: m[0], max: m[1] },
    d: { min: d[0], max: d[1] },
    vco: vco ? { low: hz(vco[0]), high: hz(vco[1]) } : null,
  };
}

/**
 * Every (N, M, D) of a part inside [low, high] (its rate, or its whole drift), written straight from the
 * definition rate = f·N/(M·D) with the VCO f·N/M inside its range (the
 * synthesiser relation; common practice, no source), by plain loops over
 * every integer: the reference the planner's narrowed ranges are checked
 * against.
 */
export function everySetting(
  p: ClockPart,
  dividers: readonly number[],
  low: number,
  high: number,
  drift: 'nominal' | 'whole drift' = 'nominal',
): { N: number; M: number; D: number; rate: number }[] {
  const out: { N: number; M: number; D: number; rate: number }[] = [];
  const d = p.derivation;
  // 'nominal': the rate itself inside [low, high] (what partRates lists); 'whole drift': the part's drift
  // r·(1 ± ε) inside it too (the rates the planner may choose within the converter's range).
  const epsilon = drift === 'whole drift' ? p.tolerancePpm * 1e-6 : 0;
  const push = (N: number, M: number, D: number) => {
    const rate = (p.frequency * N) / (M * D);
    if (rate * (1 - epsilon) >= low && rate * (1 + epsilon) <= high) out.push({ N, M, D, rate });
  };
  if (d.kind === 'direct') push(1, 1, 1);
  else if (d.kind === 'divider') for (const D of dividers) push(1, 1, D);
  else {
    for (let M = d.m.min; M <= d.m.max; M++) {
      for (let D = d.d.min; D <= d.d.max; D++) {
        for (let N = d.n.min; N <= d.n.max; N++) {
          const vco = (p.frequency * N) / M;
          if (d.vco && (vco < d.vco.low || vco > d.vco.high)) continue;
          push(N, M, D);
        }
      }
    }
  }
  return out;
}
