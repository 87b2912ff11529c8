// Start-up benchmark: whole-process time of the commands people run most,
// each against a bare `node -e 0`, measured in turn round after round in one
// run so that all see the same machine load. Limits are on the ratio of the
// medians: windows 1.5×, solve of the demo 2.5×, compare of the demo family
// 3.5×, verify of the demo's best rate 4×.
import { spawnSync } from 'node:child_process';
import { fileURLToPath, pathToFileURL } from 'node:url';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const ROUNDS = 20;
const WARM_UP = 2;
const FAMILY = ['scenarios/heron-base.json', 'scenarios/heron-lowif.json', 'scenarios/heron-narrow.json', 'scenarios/heron-wide.json'];

/** Wall-clock milliseconds of one child process run to completion (exit 0 or 1: answered or no answer). */
function timeOnce(args) {
  const start = process.hrtime.bigint();
  const result = spawnSync(process.execPath, args, { cwd: ROOT, stdio: ['ignore', 'ignore', 'pipe'] });
  const elapsed = Number(process.hrtime.bigint() - start) / 1e6;
  if (result.status !== 0 && result.status !== 1) throw new Error(`node ${args.join(' ')} exited ${result.status}: ${result.stderr}`);
  return elapsed;
}

function median(values) {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/** The middle half of the times, as text: their spread (other work on the machine widens it). */
function quartiles(values) {
  const sorted = [...values].sort((a, b) => a - b);
  const at = (p) => sorted[Math.round(p * (sorted.length - 1))];
  return `${at(0.25).toFixed(0)}–${at(0.75).toFixed(0)}`;
}

/** The demo's best rate, from `solve --json`. */
function bestRate() {
  const run = spawnSync(process.execPath, ['bin/ifzone', 'solve', FAMILY[0], '--json'], {
    cwd: ROOT,
    encoding: 'utf8',
    maxBuffer: 1 << 26,
  });
  const report = JSON.parse(run.stdout);
  return report.candidates.find((c) => c.label === report.best).rate;
}

/** Runs the benchmark, prints the medians and their ratios, returns whether every ratio is within its limit. */
export default async function startup() {
  const commands = [
    { name: 'windows --center 70M ...', args: ['bin/ifzone', 'windows', '--center', '70M', '--width', '20M', '--guard', '2M'], limit: 1.5 },
    { name: 'solve (demo)', args: ['bin/ifzone', 'solve', FAMILY[0]], limit: 2.5 },
    { name: 'compare (demo family)', args: ['bin/ifzone', 'compare', ...FAMILY], limit: 3.5 },
    { name: `verify (demo, best rate)`, args: ['bin/ifzone', 'verify', FAMILY[0], '--rate', String(bestRate())], limit: 4 },
  ];
  const bare = { name: 'node -e 0', args: ['-e', '0'], times: [] };
  for (const c of commands) c.times = [];
  for (let round = 0; round < WARM_UP + ROUNDS; round++) {
    for (const c of [bare, ...commands]) {
      const ms = timeOnce(c.args);
      if (round >= WARM_UP) c.times.push(ms);
    }
  }
  const bareMedian = median(bare.times);
  console.log(`${bare.name.padEnd(26)} median ${bareMedian.toFixed(1)} ms (quartiles ${quartiles(bare.times)}) over ${ROUNDS} runs`);
  let ok = true;
  for (const c of commands) {
    const ms = median(c.times);
    const ratio = ms / bareMedian;
    const within = ratio <= c.limit;
    ok &&= within;
    console.log(
      `${c.name.padEnd(26)} median ${ms.toFixed(1)} ms (quartiles ${quartiles(c.times)}), ${ratio.toFixed(2)}× node -e 0 (limit ${c.limit}×)${within ? '' : ' — LIMIT MISSED'}`,
    );
  }
  return ok;
}

// Also runnable on its own: node test/bench/startup.mjs
if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  process.exitCode = (await startup()) ? 0 : 1;
}
