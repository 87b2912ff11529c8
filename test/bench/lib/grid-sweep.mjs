// A grid sweep of sampling rates written as a practitioner would, vectorised
// over typed arrays: the rates in one Float64Array, a pass mask in one
// Uint8Array, one tight loop per blocking interferer over every rate, and no
// object per rate. It judges the same conditions as the exact solver (the
// guarded band inside one Nyquist zone; each blocking interferer at least its
// required margin from every image j·r ± band of the wanted band) from the
// same inputs, but point by point: what falls between two grid rates is not
// seen. It shares no code with the solver.

/**
 * Sweeps rates minRate, minRate + step, ... ≤ maxRate.
 *
 * @param problem { band: {low, high}, guard: {low, high}, minRate, maxRate,
 *   interferers: [{ rateMultiple, low, high, requiredMargin, blocking }] } (Hz)
 * @param step grid step, Hz
 * @returns { rates: Float64Array, pass: Uint8Array }
 */
export function gridSweep(problem, step) {
  const { band, guard, minRate, maxRate } = problem;
  const count = Math.floor((maxRate - minRate) / step) + 1;
  const rates = new Float64Array(count);
  const pass = new Uint8Array(count);
  const guardedLow = Math.max(0, band.low - guard.low);
  const guardedHigh = band.high + guard.high;
  for (let i = 0; i < count; i++) {
    const r = minRate + i * step;
    rates[i] = r;
    // Smallest zone n whose upper edge n·r/2 is at or above the guarded top; the band fits when its lower edge is above (n − 1)·r/2.
    const n = Math.ceil((2 * guardedHigh) / r);
    pass[i] = ((n - 1) * r) / 2 <= guardedLow ? 1 : 0;
  }
  // The blocking interferers as columns of numbers.
  const blocking = problem.interferers.filter((it) => it.blocking);
  const multiple = Float64Array.from(blocking, (it) => it.rateMultiple);
  const lows = Float64Array.from(blocking, (it) => it.low);
  const highs = Float64Array.from(blocking, (it) => it.high);
  const needs = Float64Array.from(blocking, (it) => it.requiredMargin);
  const bl = band.low;
  const bh = band.high;
  for (let k = 0; k < blocking.length; k++) {
    const a = multiple[k];
    const low = lows[k];
    const high = highs[k];
    const need = needs[k];
    for (let i = 0; i < count; i++) {
      if (pass[i] === 0) continue;
      const r = rates[i];
      const lo = a * r + low;
      const hi = a * r + high;
      // The few upright images j·r + [bl, bh] within reach of [lo, hi], then the mirrored ones j·r − [bh, bl].
      let clear = true;
      for (let j = Math.floor((lo - need - bh) / r), last = Math.ceil((hi + need - bl) / r); clear && j <= last; j++) {
        clear = Math.max(j * r + bl - hi, lo - (j * r + bh)) >= need;
      }
      for (let j = Math.floor((lo - need + bl) / r), last = Math.ceil((hi + need + bh) / r); clear && j <= last; j++) {
        clear = Math.max(j * r - bh - hi, lo - (j * r - bl)) >= need;
      }
      if (!clear) pass[i] = 0;
    }
  }
  return { rates, pass };
}

/** Runs of consecutive passing grid rates, as [{ low, high }] (Hz). */
export function passingRuns({ rates, pass }) {
  const runs = [];
  let start = -1;
  for (let i = 0; i <= pass.length; i++) {
    const on = i < pass.length && pass[i] === 1;
    if (on && start < 0) start = i;
    if (!on && start >= 0) {
      runs.push({ low: rates[start], high: rates[i - 1] });
      start = -1;
    }
  }
  return runs;
}

/**
 * Sets the grid's runs beside the exact feasible intervals.
 *
 * missed: exact intervals no grid rate passes in; invented: runs that touch no
 * exact interval; merged: runs spanning several exact intervals (the grid
 * stepped over a forbidden gap); misEdged: runs whose edge lies more than one
 * step from the exact edge it stands for (a grid run's edges can be off by up
 * to a step by construction).
 */
export function compareWithExact(exact, runs, step) {
  const overlaps = (run, f) => run.high >= f.minRate && run.low <= f.maxRate;
  const missed = exact.filter((f) => !runs.some((run) => overlaps(run, f)));
  const invented = runs.filter((run) => !exact.some((f) => overlaps(run, f)));
  const merged = runs.filter((run) => exact.filter((f) => overlaps(run, f)).length > 1);
  let largestEdgeError = 0;
  const misEdged = [];
  for (const run of runs) {
    const covered = exact.filter((f) => overlaps(run, f));
    if (covered.length === 0) continue;
    const error = Math.max(Math.abs(run.low - covered[0].minRate), Math.abs(run.high - covered[covered.length - 1].maxRate));
    largestEdgeError = Math.max(largestEdgeError, error);
    if (error > step * (1 + 1e-9)) misEdged.push({ run, error });
  }
  return { missed, invented, merged, misEdged, largestEdgeError };
}
