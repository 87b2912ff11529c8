// Variants of the direct-RF benchmark scenario (test/bench/direct-rf.json,
// invented) with more neighbours or more clock parts, generated from integers
// so that every run sees the same files.
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { butterworthLeastAttenuation } from '../../../dist/filter/butterworth-attenuation.js';

export const DIRECT_RF = fileURLToPath(new URL('../direct-rf.json', import.meta.url));

/** The committed scenario as a plain object. */
export function directRf() {
  return JSON.parse(readFileSync(DIRECT_RF, 'utf8'));
}

/**
 * `count` neighbours spread over 1.7–3.6 GHz, clear of the wanted channel
 * (2.43–2.45 GHz) by 15 MHz, 1 to 10 MHz wide, −20 to −50 dBFS.
 */
export function neighbours(count) {
  const list = [];
  for (let k = 0; list.length < count; k++) {
    const center = 1700e6 + ((k * 7919) % 1900) * 1e6 + (k % 7) * 137e3; // a fixed scatter, whole kHz
    if (Math.abs(center - 2440e6) < 25e6) continue;
    list.push({ label: `Neighbour ${k + 1}`, center: center, width: (1 + (k % 10)) * 1e6, level: -20 - (k % 31) });
  }
  return list;
}

/**
 * `count` neighbours that all block: spread over 2.29–2.59 GHz (the filter's
 * passband and skirts, where it lets them through), clear of the wanted
 * channel (2.43–2.45 GHz) by 15 MHz, 1 to 5 MHz wide, each at a level that
 * reaches the converter 3 to 9 dB above the blocking threshold (the
 * scenario's weakest level less its rejection) after the scenario's filter
 * takes its least attenuation over the neighbour. So every neighbour added is
 * one more blocking interferer for the solver to fold, and their
 * third-order products are judged against the threshold too.
 */
export function blockingNeighbours(count) {
  const scenario = directRf();
  const threshold = scenario.wanted.weakestLevel - scenario.requirements.rejection;
  const filter = { order: scenario.filter.order, passLow: 2380e6, passHigh: 2500e6 };
  if (scenario.filter.passLow !== '2.38G' || scenario.filter.passHigh !== '2.50G')
    throw new Error('direct-rf.json: the filter moved; update blockingNeighbours');
  const list = [];
  for (let k = 0; list.length < count; k++) {
    const center = 2290e6 + ((k * 7919) % 300) * 1e6 + (k % 7) * 137e3; // a fixed scatter, whole kHz
    const width = (1 + (k % 5)) * 1e6;
    if (Math.abs(center - 2440e6) < 25e6 + width / 2) continue;
    const attenuation = butterworthLeastAttenuation(filter, center - width / 2, center + width / 2);
    const level = Math.round((threshold + 3 + (k % 7) + attenuation) * 10) / 10;
    list.push({ label: `Neighbour ${k + 1}`, center, width, level });
  }
  return list;
}

/** `count` fixed oscillators spread over 1–3 GHz (whole kHz), ±20 ppm. */
export function clockParts(count) {
  return Array.from({ length: count }, (_, k) => ({
    label: `XO-${k + 1}`,
    frequency: Math.round((1e9 + (2e9 * (k + 0.5)) / count) / 1e3) * 1e3,
    tolerance: 20,
    jitter: '80 fs',
  }));
}

/** Writes a scenario object to a fresh temporary directory and returns its path. */
export function writeScenario(scenario, name = 'scenario.json') {
  const dir = mkdtempSync(join(tmpdir(), 'ifzone-bench-'));
  const path = join(dir, name);
  writeFileSync(path, JSON.stringify(scenario));
  return path;
}
