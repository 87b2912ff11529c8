// How `ifzone solve --json` grows on the direct-RF scenario (test/bench/direct-rf.json,
// invented): time, peak memory and JSON size against the number of
// neighbours (2 … 200, each one blocking: placed where the filter lets it
// through, a few dB above the blocking threshold, with third-order
// intermodulation between every pair judged) and of clock parts
// (1 … 1,000), each run in its own process through the bundle bin/ifzone
// runs, with the growth exponent fitted on a log-log scale. Then the
// synthesiser search on a plan where nothing passes.
// Targets: 1,000 parts and 200 neighbours each within 3 s and 500 MB, with
// JSON under 5 MB; the failing synthesiser search within 1 s.
import { spawnSync } from 'node:child_process';
import { rmSync } from 'node:fs';
import { dirname } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { blockingNeighbours, clockParts, directRf, writeScenario } from './lib/direct-rf.mjs';
import { scenarioFromDocument } from '../../dist/scenario/resolve-scenario.js';
import { deriveInterferers } from '../../dist/interferers/derive-interferers.js';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const CHILD = fileURLToPath(new URL('./lib/measure-child.mjs', import.meta.url));
const TIMEOUT_MS = 60_000;
const LIMIT_MS = 3000;
const LIMIT_MB = 500;
const LIMIT_JSON_MB = 5;
const SYNTH_LIMIT_MS = 1000;

/** One `solve --json` of a scenario object in a child process: { ms, peakRssMb, outBytes, exit, error } or { failed }. */
function measure(scenario) {
  const path = writeScenario(scenario);
  try {
    return measureFile(path);
  } finally {
    rmSync(dirname(path), { recursive: true, force: true });
  }
}

function measureFile(path) {
  const run = spawnSync(process.execPath, [CHILD, 'solve', path, '--json'], {
    cwd: ROOT,
    encoding: 'utf8',
    timeout: TIMEOUT_MS,
    maxBuffer: 1 << 20,
  });
  const line = (run.stderr ?? '').split('\n').find((l) => l.startsWith('MEASURE '));
  if (line) return JSON.parse(line.slice('MEASURE '.length));
  const why =
    run.error?.code === 'ETIMEDOUT'
      ? `over ${TIMEOUT_MS / 1000} s`
      : `died (${run.signal ?? run.status}): ${(run.stderr ?? '').trim().split('\n').pop()}`;
  return { failed: why };
}

/** Least-squares slope of log(y) on log(x). */
function growthExponent(points) {
  const xs = points.map((p) => Math.log(p.x));
  const ys = points.map((p) => Math.log(p.y));
  const mx = xs.reduce((a, b) => a + b, 0) / xs.length;
  const my = ys.reduce((a, b) => a + b, 0) / ys.length;
  let sxy = 0;
  let sxx = 0;
  xs.forEach((x, i) => {
    sxy += (x - mx) * (ys[i] - my);
    sxx += (x - mx) ** 2;
  });
  return sxy / sxx;
}

const MB = 1024 * 1024;

/** How many interferers the scenario derives, and how many of them block. */
function interfererCounts(scenario) {
  const list = deriveInterferers(scenarioFromDocument(scenario, 'scenario.json'));
  return { all: list.length, blocking: list.filter((i) => i.blocking).length };
}

/** Runs one series, prints its table and fitted exponents; returns the measurement at each size. */
function series(title, sizes, variant) {
  console.log(title);
  console.log('      n  interferers (blocking)    time ms   peak MB   JSON MB  exit');
  const rows = [];
  for (const n of sizes) {
    const scenario = variant(n);
    const counts = interfererCounts(scenario);
    const m = measure(scenario);
    rows.push({ n, m, counts });
    const derived = `${counts.all} (${counts.blocking})`.padStart(23);
    if (m.failed) {
      console.log(`${String(n).padStart(7)} ${derived}  ${m.failed}`);
      break; // a larger case would fail too, and take longer
    }
    const note = m.error ? `  ${m.error}` : '';
    console.log(
      `${String(n).padStart(7)} ${derived} ${m.ms.toFixed(0).padStart(10)} ${m.peakRssMb.toFixed(0).padStart(9)} ${(m.outBytes / MB).toFixed(2).padStart(9)} ${String(m.exit).padStart(5)}${note}`,
    );
  }
  // Fitted where the work outweighs start-up: sizes of 10 and above.
  const fitted = rows.filter((r) => !r.m.failed && (r.m.exit === 0 || r.m.exit === 1) && r.n >= 10);
  if (fitted.length >= 2) {
    const time = growthExponent(fitted.map((r) => ({ x: r.n, y: r.m.ms })));
    const memory = growthExponent(fitted.map((r) => ({ x: r.n, y: r.m.peakRssMb })));
    const blocking = growthExponent(fitted.map((r) => ({ x: r.n, y: r.counts.blocking })));
    console.log(
      `  fitted growth (n ≥ 10): time ∝ n^${time.toFixed(2)}, peak memory ∝ n^${memory.toFixed(2)}, blocking interferers ∝ n^${blocking.toFixed(2)}`,
    );
  }
  return rows;
}

function withinTargets(name, m) {
  if (!m || m.failed) {
    console.log(`${name}: ${m ? m.failed : 'not reached'} — LIMIT MISSED`);
    return false;
  }
  if (m.exit !== 0 && m.exit !== 1) {
    console.log(`${name}: exit ${m.exit} (${m.error}) — LIMIT MISSED`);
    return false;
  }
  const ok = m.ms <= LIMIT_MS && m.peakRssMb <= LIMIT_MB && m.outBytes < LIMIT_JSON_MB * MB;
  console.log(
    `${name}: ${m.ms.toFixed(0)} ms (≤ ${LIMIT_MS}), ${m.peakRssMb.toFixed(0)} MB peak (≤ ${LIMIT_MB}), JSON ${(m.outBytes / MB).toFixed(2)} MB (< ${LIMIT_JSON_MB})${ok ? '' : ' — LIMIT MISSED'}`,
  );
  return ok;
}

/** The scenario without its editor hint (the temporary copy lives elsewhere). */
function base() {
  const scenario = directRf();
  delete scenario.$schema;
  return scenario;
}

export default async function scaling() {
  const byNeighbours = series('Neighbours (6 clock parts):', [2, 5, 10, 20, 50, 100, 200], (n) => ({
    ...base(),
    neighbours: blockingNeighbours(n),
  }));
  const byParts = series('Clock parts (20 neighbours):', [1, 3, 10, 30, 100, 300, 1000], (n) => ({ ...base(), clocks: clockParts(n) }));
  let ok = withinTargets('200 neighbours', byNeighbours.find((r) => r.n === 200)?.m);
  ok = withinTargets('1,000 clock parts', byParts.find((r) => r.n === 1000)?.m) && ok;

  // A synthesiser on a plan where no rate passes: no filter, 25 dB rejection (about 300 blocking interferers).
  const failing = { ...base(), filter: null, requirements: { ...base().requirements, rejection: 25 } };
  failing.clocks = [
    {
      label: 'SYN-X from 10M',
      frequency: '10M',
      tolerance: 2,
      jitter: '200 fs',
      derive: { kind: 'synthesiser', n: [1, 4096], m: [1, 16], d: [1, 8], vco: { low: '2G', high: '6G' } },
    },
  ];
  const synth = measure(failing);
  if (synth.failed) {
    console.log(`failing synthesiser search (N 1..4096, M 1..16, D 1..8): ${synth.failed} — LIMIT MISSED`);
    ok = false;
  } else {
    const fast = synth.ms <= SYNTH_LIMIT_MS;
    console.log(
      `failing synthesiser search (N 1..4096, M 1..16, D 1..8): ${synth.ms.toFixed(0)} ms (≤ ${SYNTH_LIMIT_MS}), exit ${synth.exit}${fast ? '' : ' — LIMIT MISSED'}`,
    );
    ok = fast && ok;
  }
  return ok;
}

// Also runnable on its own: node test/bench/scaling.mjs
if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  process.exitCode = (await scaling()) ? 0 : 1;
}
