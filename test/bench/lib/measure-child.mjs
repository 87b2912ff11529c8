// Runs one ifzone command line in this process through the bundle bin/ifzone
// runs, counts what it writes to standard output without keeping it, and
// prints on standard error one line `MEASURE {"ms","peakRssMb","outBytes","exit","error"}`.
// Used by the scaling benchmark: node test/bench/lib/measure-child.mjs solve FILE --json
import { Buffer } from 'node:buffer';
import { loadBundle } from '../../../bin/load-bundle.js';

const { runCli } = loadBundle().exports;

const start = process.hrtime.bigint();
let outBytes = 0;
let error = '';
const io = {
  out: (text) => {
    outBytes += Buffer.byteLength(text);
  },
  err: (text) => {
    error += text;
  },
};
let exit;
try {
  exit = await runCli(process.argv.slice(2), io);
} catch (thrown) {
  exit = 'threw';
  error += String(thrown);
}
const ms = Number(process.hrtime.bigint() - start) / 1e6;
const peakRssMb = process.resourceUsage().maxRSS / 1024;
process.stderr.write(`MEASURE ${JSON.stringify({ ms, peakRssMb, outBytes, exit, error: error.trim().split('\n')[0] ?? '' })}\n`);
