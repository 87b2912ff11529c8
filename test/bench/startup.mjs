// Start-up benchmark (issue 2): whole-process time of one `ifzone windows`
// call against a bare `node -e 0`, measured alternately in one run so both
// see the same machine load. The limit is on the ratio of the medians.
import { spawnSync } from 'node:child_process';
import { fileURLToPath, pathToFileURL } from 'node:url';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const ROUNDS = 30;
const WARM_UP = 3;
const LIMIT = 3;

const IFZONE = ['bin/ifzone', 'windows', '--center', '70M', '--width', '20M', '--guard', '2M'];
const BARE = ['-e', '0'];

/** Wall-clock milliseconds of one child process run to completion. */
function timeOnce(args) {
  const start = process.hrtime.bigint();
  const result = spawnSync(process.execPath, args, { cwd: ROOT, stdio: ['ignore', 'ignore', 'pipe'] });
  const elapsed = Number(process.hrtime.bigint() - start) / 1e6;
  if (result.status !== 0) throw new Error(`node ${args.join(' ')} exited ${result.status}: ${result.stderr}`);
  return elapsed;
}

function median(values) {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/** Runs the benchmark, prints the medians and their ratio, returns whether the ratio is within the limit. */
export default async function startup() {
  for (let i = 0; i < WARM_UP; i++) {
    timeOnce(BARE);
    timeOnce(IFZONE);
  }
  const bare = [];
  const ifzone = [];
  for (let i = 0; i < ROUNDS; i++) {
    bare.push(timeOnce(BARE));
    ifzone.push(timeOnce(IFZONE));
  }
  const bareMedian = median(bare);
  const ifzoneMedian = median(ifzone);
  const ratio = ifzoneMedian / bareMedian;
  console.log(`node -e 0:           median ${bareMedian.toFixed(1)} ms over ${ROUNDS} runs`);
  console.log(`ifzone windows ...:  median ${ifzoneMedian.toFixed(1)} ms over ${ROUNDS} runs`);
  console.log(`ratio of medians:    ${ratio.toFixed(2)} (limit ${LIMIT})`);
  return ratio <= LIMIT;
}

// Also runnable on its own: node test/bench/startup.mjs
if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  process.exitCode = (await startup()) ? 0 : 1;
}
