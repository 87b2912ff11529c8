// The exact solver against a vectorised grid sweep (test/bench/lib/grid-sweep.mjs:
// typed arrays, no object per rate), in the same process, on the demo and on
// the direct-RF scenario (test/bench/direct-rf.json), at 10 kHz and 1 kHz
// steps. Prints the time ratio grid/exact and every interval the grid misses,
// invents, merges or mis-edges. Target: the exact solver at least 50× faster
// than the 10 kHz grid on both scenarios.
import { fileURLToPath, pathToFileURL } from 'node:url';
import { readScenarioFile } from '../../dist/cli/read-scenario.js';
import { contextFromScenario } from '../../dist/solve/context-from-scenario.js';
import { planRates } from '../../dist/solve/feasible-set.js';
import { compareWithExact, gridSweep, passingRuns } from './lib/grid-sweep.mjs';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const SCENARIOS = [
  ['demo (heron-base)', `${ROOT}scenarios/heron-base.json`],
  ['direct RF (Kestrel-24)', `${ROOT}test/bench/direct-rf.json`],
];
const STEPS = [10e3, 1e3];
const TARGET_RATIO = 50;
const MIN_TIMED_MS = 200;

const mhz = (f) => `${(f / 1e6).toFixed(6)} MHz`;

/** Median milliseconds of one call, over enough calls to fill MIN_TIMED_MS (after a warm-up call). */
function timeOf(work) {
  let result = work();
  const times = [];
  let total = 0;
  while (total < MIN_TIMED_MS || times.length < 5) {
    const start = process.hrtime.bigint();
    result = work();
    const ms = Number(process.hrtime.bigint() - start) / 1e6;
    times.push(ms);
    total += ms;
  }
  times.sort((a, b) => a - b);
  return { result, ms: times[times.length >> 1] };
}

export default async function gridVsExact() {
  let ok = true;
  for (const [name, file] of SCENARIOS) {
    const context = contextFromScenario(readScenarioFile(file));
    const blocking = context.interferers.filter((i) => i.blocking).length;
    const exact = timeOf(() => planRates(context).feasible);
    console.log(
      `${name}: ${context.interferers.length} interferers, ${blocking} blocking; rates ${mhz(context.limits.minRate)} – ${mhz(context.limits.maxRate)}`,
    );
    console.log(`  exact feasible set: ${exact.result.length} intervals in ${exact.ms.toFixed(3)} ms (median)`);
    const problem = {
      band: context.band,
      guard: context.guard,
      minRate: context.limits.minRate,
      maxRate: context.limits.maxRate,
      interferers: context.interferers,
    };
    for (const step of STEPS) {
      const grid = timeOf(() => gridSweep(problem, step));
      const runs = passingRuns(grid.result);
      const ratio = grid.ms / exact.ms;
      const { missed, invented, merged, misEdged, largestEdgeError } = compareWithExact(exact.result, runs, step);
      const label = `${step / 1e3} kHz grid`;
      const target = step === 10e3 ? ` (target ≥ ${TARGET_RATIO}×)` : '';
      console.log(
        `  ${label}: ${grid.result.rates.length.toLocaleString('en')} rates in ${grid.ms.toFixed(2)} ms, ${runs.length} runs; grid/exact ${ratio.toFixed(0)}×${target}`,
      );
      console.log(
        `    misses ${missed.length}, invents ${invented.length}, merges ${merged.length}, mis-edges ${misEdged.length}; largest edge error ${(largestEdgeError / 1e3).toFixed(3)} kHz`,
      );
      for (const f of missed)
        console.log(
          `    missed:   ${mhz(f.minRate)} – ${mhz(f.maxRate)} (${((f.maxRate - f.minRate) / 1e3).toFixed(3)} kHz wide, zone ${f.zone})`,
        );
      for (const r of invented) console.log(`    invented: ${mhz(r.low)} – ${mhz(r.high)}`);
      for (const r of merged) console.log(`    merged:   ${mhz(r.low)} – ${mhz(r.high)} spans several exact intervals`);
      for (const { run, error } of misEdged)
        console.log(`    mis-edged: ${mhz(run.low)} – ${mhz(run.high)} off by ${(error / 1e3).toFixed(3)} kHz`);
      if (step === 10e3 && ratio < TARGET_RATIO) ok = false;
    }
  }
  return ok;
}

// Also runnable on its own: node test/bench/grid-vs-exact.mjs
if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  process.exitCode = (await gridVsExact()) ? 0 : 1;
}
