// Solver benchmarks (issue 3): the whole-process time of `ifzone solve` on the
// demo scenario (median at most 250 ms), and the exact solver against a
// 10 kHz-step grid sweep of the same checks, in the same run: the time ratio
// (target at least 50×) and the feasible intervals the grid misses or merges.
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { readScenarioFile } from '../../dist/cli/read-scenario.js';
import { contextFromScenario } from '../../dist/solve/context-from-scenario.js';
import { guardedBand, rateWindows } from '../../dist/windows/enumerate-windows.js';
import { feasibleSet } from '../../dist/solve/feasible-set.js';
import { evaluateRate } from '../../dist/solve/evaluate-rate.js';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const DEMO = 'scenarios/heron-base.json';
const ROUNDS = 15;
const PROCESS_LIMIT_MS = 250;
const TARGET_RATIO = 50;
const GRID_STEP = 10e3;

function median(values) {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

function wholeProcessMs() {
  const start = process.hrtime.bigint();
  const run = spawnSync(process.execPath, ['bin/ifzone', 'solve', DEMO, '--json'], { cwd: ROOT, stdio: ['ignore', 'ignore', 'pipe'] });
  if (run.status !== 0) throw new Error(`ifzone solve exited ${run.status}: ${run.stderr}`);
  return Number(process.hrtime.bigint() - start) / 1e6;
}

/** Feasible intervals of the exact solver, and the time to compute them. */
function exact(context) {
  const start = process.hrtime.bigint();
  let result;
  const repeats = 20;
  for (let i = 0; i < repeats; i++) {
    const windows = rateWindows(guardedBand(context.band, context.guard.low, context.guard.high), context.limits);
    result = feasibleSet(windows, context.interferers, context.band).feasible;
  }
  return { intervals: result, ms: Number(process.hrtime.bigint() - start) / 1e6 / repeats };
}

/** Runs of grid rates that pass the same checks (each rate judged exactly, tolerance 0). */
function grid(context) {
  const start = process.hrtime.bigint();
  const runs = [];
  let open = null;
  const steps = Math.floor((context.limits.maxRate - context.limits.minRate) / GRID_STEP);
  for (let i = 0; i <= steps; i++) {
    const rate = context.limits.minRate + i * GRID_STEP;
    if (evaluateRate(context, rate, 0).pass) {
      if (open) open.high = rate;
      else open = { low: rate, high: rate };
    } else if (open) {
      runs.push(open);
      open = null;
    }
  }
  if (open) runs.push(open);
  return { runs, points: steps + 1, ms: Number(process.hrtime.bigint() - start) / 1e6 };
}

export default async function solveDemo() {
  wholeProcessMs();
  const times = Array.from({ length: ROUNDS }, wholeProcessMs);
  const processMedian = median(times);
  console.log(`ifzone solve ${DEMO}: median ${processMedian.toFixed(1)} ms over ${ROUNDS} runs (limit ${PROCESS_LIMIT_MS} ms)`);

  const context = contextFromScenario(readScenarioFile(`${ROOT}${DEMO}`));
  const solved = exact(context);
  const swept = grid(context);
  const ratio = swept.ms / solved.ms;
  const missed = solved.intervals.filter((f) => !swept.runs.some((r) => r.high >= f.minRate && r.low <= f.maxRate));
  const merged = swept.runs.filter((r) => solved.intervals.filter((f) => r.high >= f.minRate && r.low <= f.maxRate).length > 1);
  const invented = swept.runs.filter((r) => !solved.intervals.some((f) => r.high >= f.minRate && r.low <= f.maxRate));
  const edgeError = Math.max(
    0,
    ...solved.intervals.map((f) => {
      const run = swept.runs.find((r) => r.high >= f.minRate && r.low <= f.maxRate);
      return run ? Math.max(Math.abs(run.low - f.minRate), Math.abs(run.high - f.maxRate)) : 0;
    }),
  );
  console.log(`exact feasible set: ${solved.intervals.length} intervals in ${solved.ms.toFixed(3)} ms`);
  console.log(`10 kHz grid: ${swept.points} rates judged in ${swept.ms.toFixed(1)} ms, ${swept.runs.length} runs`);
  console.log(`time ratio grid/exact: ${ratio.toFixed(0)}× (target ≥ ${TARGET_RATIO}×)`);
  console.log(`grid misses ${missed.length} interval(s), merges ${merged.length}, invents ${invented.length}; largest edge error ${(edgeError / 1e3).toFixed(3)} kHz`);
  return processMedian <= PROCESS_LIMIT_MS && ratio >= TARGET_RATIO;
}
