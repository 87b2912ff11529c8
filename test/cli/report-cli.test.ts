import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { ensureBuilt, ROOT, runBin } from '../helpers/run-bin.js';
import { hasChromium, launchChromium } from '../helpers/headless-browser.js';

/**
 * `ifzone report --html`: one self-contained page for a design review, opened
 * in headless Chromium (Debian's, driven by playwright-core): the tables and
 * pictures are there, no request leaves the page, nothing logs an error.
 */
const VARIANTS = ['heron-base.json', 'heron-narrow.json', 'heron-wide.json', 'heron-lowif.json'].map((f) => join(ROOT, 'scenarios', f));
const dir = mkdtempSync(join(tmpdir(), 'ifzone-report-'));
let browser: Browser | undefined;

beforeAll(async () => {
  ensureBuilt();
  if (hasChromium || process.env['CI']) browser = await launchChromium();
}, 60_000);
afterAll(async () => browser?.close());

describe('ifzone report --html', () => {
  it('writes a page with no scripts, no external links and the cautions', () => {
    const out = join(dir, 'family.html');
    const run = runBin('report', ...VARIANTS, '--html', out);
    expect(run.status).toBe(0);
    const html = readFileSync(out, 'utf8');
    expect(html).not.toMatch(/<script|<link|@import|url\((?!#)|src=/i);
    expect(html).toMatch(/paper design: confirm it by measurement on hardware/);
    expect(html).toMatch(/does not show compliance with radio regulations/);
    expect(html).toMatch(/spur levels vary with the part, the input level, temperature and the clock/);
  });

  it('writes a difference product at its real input frequencies, as the checks do (0–20 MHz, not −20–20 MHz)', () => {
    // A real signal's spectrum is even (common practice): wanted − wanted of the 130–150 MHz band spans −20…20 MHz as a
    // signed extent, i.e. 0–20 MHz at the converter input; the checks' "input at this rate" writes it so.
    const out = join(dir, 'base.html');
    expect(runBin('report', VARIANTS[0]!, '--html', out).status).toBe(0);
    const html = readFileSync(out, 'utf8');
    const rows = [...html.matchAll(/<tr><td>IM2 wanted difference<\/td>(.*?)<\/tr>/g)].map((m) => m[1]!);
    expect(rows.length).toBeGreaterThanOrEqual(2); // the interferers table and the checks table
    for (const row of rows) {
      expect(row).toContain('>0–20 MHz<');
      expect(row).not.toMatch(/>\u2212[\d.]+–[\d.]+ MHz</);
    }
  });

  it('refuses to overwrite without --force and never writes over an input', () => {
    const out = join(dir, 'kept.html');
    writeFileSync(out, 'keep');
    expect(runBin('report', VARIANTS[0]!, '--html', out).status).toBe(2);
    expect(readFileSync(out, 'utf8')).toBe('keep');
    const before = readFileSync(VARIANTS[0]!);
    expect(runBin('report', VARIANTS[0]!, '--html', VARIANTS[0]!, '--force').status).toBe(2);
    expect(readFileSync(VARIANTS[0]!)).toEqual(before);
  });

  // CI installs Chromium (.ci/run), so there a missing browser fails the test instead of skipping it.
  it.skipIf(!hasChromium && !process.env['CI'])(
    'opens in headless Chromium with its tables and pictures, no outside request and no error',
    async () => {
      const out = join(dir, 'browse.html');
      expect(runBin('report', ...VARIANTS, '--html', out).status).toBe(0);
      const page = await browser!.newPage();
      const requests: string[] = [];
      const errors: string[] = [];
      page.on('request', (request) => requests.push(request.url()));
      page.on('console', (message) => {
        if (message.type() === 'error') errors.push(message.text());
      });
      page.on('pageerror', (error) => errors.push(error.message));
      const address = pathToFileURL(out).href;
      await page.goto(address);
      expect(requests).toEqual([address]);
      expect(errors).toEqual([]);
      const sections = await page.locator('h2').allTextContents();
      expect(sections).toEqual([
        'Clock parts across the variants',
        'Heron-4 base',
        'Heron-4N narrowband',
        'Heron-4W wideband',
        'Heron-2L low IF',
        'Words and abbreviations on this page',
      ]);
      const captions = await page.locator('caption').allTextContents();
      for (const caption of ['Legal windows', 'Feasible intervals', 'Candidates, best first', 'Alias bands up to the input bandwidth']) {
        expect(captions.filter((c) => c.startsWith(caption)).length).toBe(4);
      }
      expect(await page.locator('figure svg').count()).toBe(16);
      const boxes = await page.locator('figure svg').evaluateAll((svgs) => svgs.map((s) => s.getBoundingClientRect().height));
      expect(Math.min(...boxes)).toBeGreaterThan(100);
      await page.close();
    },
    60_000,
  );
  it.skipIf(!hasChromium && !process.env['CI'])(
    'uses the page at 1280 px: no number wrapped inside a cell, the content as wide as the window',
    async () => {
      const out = join(dir, 'width.html');
      expect(runBin('report', ...VARIANTS, '--html', out).status).toBe(0);
      const page = await browser!.newPage({ viewport: { width: 1280, height: 900 } });
      await page.goto(pathToFileURL(out).href);
      const body = await page.locator('body').evaluate((element) => element.getBoundingClientRect().width);
      // A cell's text occupies one line box per line it takes: count the distinct tops of its text's rectangles.
      const lines = await page.locator('td.num').evaluateAll((cells) =>
        cells.map((cell) => {
          const range = cell.ownerDocument.createRange();
          range.selectNodeContents(cell);
          return { text: cell.textContent ?? '', lines: new Set([...range.getClientRects()].map((r) => Math.round(r.top))).size };
        }),
      );
      const measured = { body, numbers: lines.length, wrapped: lines.filter((l) => l.lines > 1).map((l) => l.text) };
      // Common practice (no source): a review page fills a wide window rather than a fixed column.
      expect(measured.body).toBeGreaterThan(1180);
      expect(measured.numbers).toBeGreaterThan(500);
      expect(measured.wrapped).toEqual([]);
      const shot = await page.screenshot({ fullPage: false });
      // PNG header: width and height as 32-bit big-endian numbers at bytes 16 and 20 (PNG specification, IHDR).
      expect([shot.readUInt32BE(16), shot.readUInt32BE(20)]).toEqual([1280, 900]);
      await page.close();
    },
    60_000,
  );
});
