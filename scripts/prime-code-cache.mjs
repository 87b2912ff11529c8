// Primes the code cache of the bundle (bin/load-bundle.js): loads the bundle
// without a cache, runs the commands people run most on the demo scenarios
// with their output discarded, so that V8 compiles the functions they call,
// then writes a copy of the bundle and V8's cached data of every function
// compiled so far beside the bundle. Run by scripts/bundle-cli.mjs.
import { readFileSync, writeFileSync } from 'node:fs';
import { BUNDLE, CODE_CACHE, codeCacheFile, loadBundle } from '../bin/load-bundle.js';

const FAMILY = ['scenarios/heron-base.json', 'scenarios/heron-lowif.json', 'scenarios/heron-narrow.json', 'scenarios/heron-wide.json'];
const { exports: cli, script } = loadBundle({ useCache: false });
const quiet = { out: () => {}, err: () => {} };
let best = '';
const keepJson = { out: (text) => (best += text), err: () => {} };

await cli.runCli(['--help'], quiet);
await cli.runCli(['windows', '--center', '70M', '--width', '20M', '--guard', '2M'], quiet);
await cli.runCli(['solve', FAMILY[0]], quiet);
await cli.runCli(['solve', FAMILY[0], '--json'], keepJson);
await cli.runCli(['compare', ...FAMILY], quiet);
const report = JSON.parse(best);
const rate = report.candidates.find((c) => c.label === report.best).rate;
await cli.runCli(['verify', FAMILY[0], '--rate', String(rate)], quiet);

writeFileSync(CODE_CACHE, codeCacheFile(readFileSync(BUNDLE), script.createCachedData()));
