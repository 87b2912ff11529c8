// Loads the bundled command line (dist/bundle/cli/ifzone.cjs, built by
// `npm run build`) with V8's code cache: the build runs the common commands
// once and saves the compiled code beside the bundle, so a start deserialises
// code instead of parsing and compiling it. The cache is read, never written,
// here: nothing is left in the user's directories. It is used only when the
// copy of the bundle it holds matches the bundle byte for byte (a memory
// compare: hashing would load node:crypto, several milliseconds of every
// start); V8 itself refuses it when its version or flags differ. Either way
// the bundle is then compiled from source and runs the same, only slower to
// start. CommonJS, like bin/ifzone (bin/package.json).
'use strict';
const { Buffer } = require('node:buffer');
const { readFileSync } = require('node:fs');
const Module = require('node:module');
const { dirname, join } = require('node:path');
const { Script, constants } = require('node:vm');

/** The bundle: one CommonJS file, each lazily imported command a module run on first use. */
const BUNDLE = join(__dirname, '..', 'dist', 'bundle', 'cli', 'ifzone.cjs');
/** The code cache: the bundle's length n (4 bytes, little-endian), the n bytes of the bundle it was made from, then V8's cached data. */
const CODE_CACHE = `${BUNDLE}.cache`;

/** The code cache file's contents for a bundle's bytes and V8's cached data of it. */
function codeCacheFile(bytes, cachedData) {
  const length = Buffer.alloc(4);
  length.writeUInt32LE(bytes.length);
  return Buffer.concat([length, bytes, cachedData]);
}

/**
 * Compiles and runs the bundle. Returns its exports (`runCli`), the compiled
 * script (the build asks it for the cached data), and whether V8 took a cache.
 */
function loadBundle({ useCache = true } = {}) {
  const bytes = readFileSync(BUNDLE);
  const cachedData = useCache ? matchingCache(bytes) : undefined;
  const script = new Script(Module.wrap(bytes.toString('utf8')), {
    filename: BUNDLE,
    cachedData,
    // Older Node 20 releases lack the constant; the bundle has no import() of its own to serve.
    importModuleDynamically: constants?.USE_MAIN_CONTEXT_DEFAULT_LOADER,
  });
  const module = { exports: {} };
  script.runInThisContext()(module.exports, Module.createRequire(BUNDLE), module, BUNDLE, dirname(BUNDLE));
  return { exports: module.exports, script, cacheUsed: cachedData !== undefined && !script.cachedDataRejected };
}

/** V8's cached data when the cache file exists and was made from these bytes. */
function matchingCache(bytes) {
  let cache;
  try {
    cache = readFileSync(CODE_CACHE);
  } catch {
    return undefined;
  }
  if (cache.length < 4 || cache.readUInt32LE(0) !== bytes.length || cache.length <= 4 + bytes.length) return undefined;
  return cache.subarray(4, 4 + bytes.length).equals(bytes) ? cache.subarray(4 + bytes.length) : undefined;
}

module.exports = { BUNDLE, CODE_CACHE, codeCacheFile, loadBundle };
