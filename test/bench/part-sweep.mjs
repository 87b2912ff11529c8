// Part sweep benchmark: 1,000 reference frequencies spread over
// 9–60 MHz × every synthesiser setting N 1..128, M 1..16 (D = 1), each rate
// f·N/M judged over the demo scenario's checks with the fast judge (its whole
// drift range inside one exact feasible interval). The context and the
// feasible set are built once, outside the timing. Limit: at most 2 s.
import { fileURLToPath, pathToFileURL } from 'node:url';
import { readScenarioFile } from '../../dist/cli/read-scenario.js';
import { contextFromScenario } from '../../dist/solve/context-from-scenario.js';
import { planRates } from '../../dist/solve/feasible-set.js';
import { containingInterval } from '../../dist/solve/drift.js';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const DEMO = `${ROOT}scenarios/heron-base.json`;
const REFERENCES = 1000;
const LOWEST = 9e6;
const HIGHEST = 60e6;
const N_MAX = 128;
const M_MAX = 16;
const TOLERANCE_PPM = 20;
const LIMIT_MS = 2000;

/**
 * One pass over every (f, N, M): every rate goes to the fast judge (a rate
 * outside the converter's range lies in no feasible interval and fails there).
 */
function sweep(feasible) {
  let judged = 0;
  let passing = 0;
  for (let i = 0; i < REFERENCES; i++) {
    const f = LOWEST + ((HIGHEST - LOWEST) * i) / (REFERENCES - 1); // from the index, not accumulated
    for (let M = 1; M <= M_MAX; M++) {
      for (let N = 1; N <= N_MAX; N++) {
        const rate = (f * N) / (M * 1); // rateOf's expression, D = 1
        judged++;
        if (containingInterval(feasible, rate, TOLERANCE_PPM) >= 0) passing++;
      }
    }
  }
  return { judged, passing };
}

/** Runs the sweep (one warm-up pass, then the timed pass), prints the figures, returns whether it is within the limit. */
export default async function partSweep() {
  const context = contextFromScenario(readScenarioFile(DEMO));
  const { feasible } = planRates(context);
  sweep(feasible);
  const start = process.hrtime.bigint();
  const { judged, passing } = sweep(feasible);
  const ms = Number(process.hrtime.bigint() - start) / 1e6;
  const perSecond = judged / (ms / 1e3);
  console.log(`demo scenario: ${feasible.length} feasible intervals from ${context.interferers.length} interferers`);
  console.log(
    `rates judged:   ${judged.toLocaleString('en')} (${REFERENCES} references × N 1..${N_MAX} × M 1..${M_MAX}, ±${TOLERANCE_PPM} ppm)`,
  );
  console.log(`passing:        ${passing.toLocaleString('en')}`);
  console.log(`elapsed:        ${ms.toFixed(1)} ms (limit ${LIMIT_MS} ms)`);
  console.log(`judged per s:   ${Math.round(perSecond).toLocaleString('en')}`);
  return ms <= LIMIT_MS;
}

// Also runnable on its own: node test/bench/part-sweep.mjs
if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  process.exitCode = (await partSweep()) ? 0 : 1;
}
