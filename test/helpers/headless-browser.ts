import { existsSync } from 'node:fs';
import { chromium, type Browser } from 'playwright-core';

/** Debian's Chromium, installed by .ci/run when it is missing. */
export const CHROMIUM = '/usr/bin/chromium';

/** Whether the browser is on this machine (the browser tests say so plainly when it is not). */
export const hasChromium = existsSync(CHROMIUM);

/**
 * Headless Chromium with every background connection off: this machine has
 * no network, and a browser that phones home fills the log with refused
 * connections (the flags the machine's own probe uses). playwright gives
 * the browser a new, empty profile of its own.
 */
export function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: CHROMIUM,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}
