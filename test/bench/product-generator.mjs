// Interferer derivation benchmark: the mixing-product generator at order 3
// on the demo scenario with 200 neighbours (invented: seeded centres across
// 10–400 MHz, widths up to 2 MHz, levels −40 to +10 dBFS at the filter
// input), target under 1 s per derivation (median of 5). Prints how many
// products were listed and how many pruned before enumeration.
import { readScenarioFile } from '../../dist/cli/read-scenario.js';
import { deriveInterfererList } from '../../dist/interferers/derive-interferers.js';

const LIMIT_MS = 1000;
const NEIGHBOURS = 200;
const ROUNDS = 5;

/** A small seeded generator (xorshift32), so the bench is the same every run. */
function seeded(seed) {
  let state = seed >>> 0 || 1;
  return () => {
    state ^= state << 13;
    state ^= state >>> 17;
    state ^= state << 5;
    return (state >>> 0) / 2 ** 32;
  };
}

export default async function bench() {
  const base = readScenarioFile('scenarios/heron-base.json');
  const random = seeded(0x2008);
  const neighbours = Array.from({ length: NEIGHBOURS }, (_, i) => {
    const centre = 10e6 + random() * 390e6;
    const width = random() < 0.5 ? 0 : random() * 2e6;
    return { label: `N${i + 1}`, low: centre - width / 2, high: centre + width / 2, level: -40 + random() * 50 };
  });
  let worst = 0;
  // The demo's own threshold, then a far stricter one (many more products above it).
  for (const rejection of [base.requirements.rejection, base.requirements.rejection + 40]) {
    const scenario = { ...base, neighbours, maxOrder: 3, requirements: { ...base.requirements, rejection } };
    const times = [];
    let derived;
    for (let round = 0; round < ROUNDS; round++) {
      const start = process.hrtime.bigint();
      derived = deriveInterfererList(scenario);
      times.push(Number(process.hrtime.bigint() - start) / 1e6);
    }
    times.sort((a, b) => a - b);
    const median = times[ROUNDS >> 1];
    worst = Math.max(worst, median);
    const s = derived.summary;
    console.log(
      `threshold ${s.threshold.toFixed(1)} dBFS: ${s.products} products listed, ${s.pruned} left out (strongest ${s.strongestPruned?.toFixed(1)} dBFS), ${derived.interferers.length} interferers in all`,
    );
    console.log(
      `  derivation: median ${median.toFixed(0)} ms of ${ROUNDS} (${times.map((t) => t.toFixed(0)).join(', ')}), limit ${LIMIT_MS} ms`,
    );
  }
  return worst < LIMIT_MS;
}
