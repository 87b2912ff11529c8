import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { reviewPage } from '../../src/output/html-report.js';
import { hasChromium, launchChromium } from '../helpers/headless-browser.js';
import { TWO_CHANNELS, twoChannelReport } from '../helpers/channel-report.js';

/**
 * The review page of a plan of two channels (a hand-made report in the
 * agreed multi-channel shape; invented Heron demo bands), opened in headless
 * Chromium (Debian's, via playwright-core): the channels, every candidate's
 * result per channel, the checks per channel and a band-position chart per
 * channel are on it. The zone and inversion each row states are checked
 * against the trade's rule, worked here: a band whose centre f sits at rate
 * r lies in zone ⌊2f/r⌋ + 1, inverted when that zone is even (common
 * practice).
 */
const report = twoChannelReport();
const dir = mkdtempSync(join(tmpdir(), 'ifzone-channel-page-'));
let browser: Browser | undefined;

beforeAll(async () => {
  if (hasChromium || process.env['CI']) browser = await launchChromium();
}, 60_000);
afterAll(async () => browser?.close());

describe('the review page of two channels', () => {
  const html = reviewPage({ plans: [report], comparison: null, generated: 'test', version: '0' });

  it('stays self-contained', () => {
    expect(html).not.toMatch(/<script|<link|@import|url\((?!#)|src=/i);
  });

  it("writes every channel's zone in the windows and feasible tables, by the zone rule at each interval's middle rate", () => {
    const zoneAt = (f: number, r: number) => Math.floor((2 * f) / r) + 1;
    for (const f of report.feasible) {
      const mid = (f.minRate + f.maxRate) / 2;
      const cell = TWO_CHANNELS.map((c) => {
        const zone = zoneAt((c.low + c.high) / 2, mid);
        return `${c.label} ${zone}${zone % 2 === 0 ? ' inv' : ''}`;
      }).join(', ');
      expect(html).toContain(`<td>${cell}</td>`);
    }
    expect(html).toContain('<th>channel zones</th>');
    expect(html).not.toContain('Legal windows (band with guards whole in one zone');
  });

  it('gives each channel its own figures after the rate and its own filter mask', () => {
    const best = report.candidates.find((c) => c.label === report.best)!;
    for (const channel of TWO_CHANNELS) {
      expect(html).toContain(`After the rate, at ${best.label}, channel ${channel.label} (`);
      expect(html).toMatch(new RegExp(`Anti-alias filter mask at ${best.label} \\([^)]*\\): [^<]*, channel ${channel.label}<`));
    }
  });

  it.skipIf(!hasChromium && !process.env['CI'])(
    'shows each channel, each candidate per channel, the checks per channel and a chart per channel',
    async () => {
      const out = join(dir, 'two.html');
      writeFileSync(out, html);
      const page = await browser!.newPage();
      const errors: string[] = [];
      page.on('pageerror', (error) => errors.push(error.message));
      await page.goto(pathToFileURL(out).href);
      expect(errors).toEqual([]);
      const captions = await page.locator('caption').allTextContents();
      expect(captions).toContain('Channels (2, digitised together by one converter)');
      const focus = report.candidates.find((c) => c.label === report.best) ?? report.candidates[0]!;
      for (const channel of TWO_CHANNELS)
        expect(captions.some((c) => c.startsWith(`Checks at ${focus.label}`) && c.includes(`against channel ${channel.label}`))).toBe(true);

      const table = page.locator('table', { has: page.locator('caption', { hasText: 'Each channel at each candidate' }) });
      const rowLocators = await table.locator('tr:has(td)').all();
      const rows = await Promise.all(rowLocators.map((row) => row.locator('td').allTextContents()));
      expect(rows).toHaveLength(report.candidates.length * TWO_CHANNELS.length);
      rows.forEach((cells, i) => {
        const candidate = report.candidates[Math.floor(i / TWO_CHANNELS.length)]!;
        const channel = TWO_CHANNELS[i % TWO_CHANNELS.length]!;
        expect(cells[3]).toBe(channel.label);
        const centre = (channel.low + channel.high) / 2;
        const zone = Math.floor((2 * centre) / candidate.rate) + 1;
        // A band straddling a zone edge has no zone; otherwise the row's zone is the rule's.
        const straddles = Math.floor((2 * channel.low) / candidate.rate) !== Math.floor((2 * channel.high) / candidate.rate);
        expect(cells[4]).toBe(straddles ? 'straddles' : zone % 2 === 0 ? `${zone} inv` : String(zone));
      });

      const titles = await page.locator('figure svg > title').allTextContents();
      for (const channel of TWO_CHANNELS) expect(titles).toContain(`Band-position chart: ${report.scenario}, channel ${channel.label}`);
      expect(titles.filter((t) => t.startsWith('Band-position chart'))).toHaveLength(2);
      await page.close();
    },
    60_000,
  );
});
