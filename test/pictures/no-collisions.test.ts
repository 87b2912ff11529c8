import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { Resvg } from '@resvg/resvg-js';
import { escapeXml } from '../../src/pictures/escape-xml.js';
import { textBox, textWidth } from '../../src/pictures/typography.js';
import { ROOT } from '../helpers/run-bin.js';
import { ifzone, scratchDirectory, writeInto } from '../helpers/run-in-process.js';
import { collisions, geometryOf, type Geometry } from './svg-geometry.js';

/**
 * Pictures without collisions: every SVG the commands write (solve --svg,
 * compare --svg, verify --svg, and the pictures report --html embeds), for
 * every bundled scenario and for random scenarios (fast-check, seeded), is
 * read back into geometry by svg-geometry.ts, which knows no picture in
 * particular, and must hold no overlapping texts, no line through a text,
 * no marker over a text or cut by an axis, nothing outside the viewBox, and
 * no marker that names no label. The text boxes come from the typography's
 * character-width model; the first block checks that model against the ink
 * of every text the demo pictures write, rendered alone by @resvg/resvg-js
 * (an SVG renderer from the npm registry) in DejaVu Sans and in Liberation
 * Sans (metric-compatible with Arial), the faces a reader's "sans-serif"
 * most often resolves to on Linux and Windows. Common practice for charts:
 * a label covered by another label or struck through by a line cannot be read.
 */

interface Picture {
  readonly name: string;
  readonly svg: string;
  readonly geometry: Geometry;
}

/** Every <svg> document in a text: the file itself, or each picture embedded in an HTML page. */
function svgsIn(text: string): string[] {
  return [...text.matchAll(/<svg[\s\S]*?<\/svg>/g)].map((m) => m[0]);
}

const SCENARIOS = readdirSync(join(ROOT, 'scenarios'))
  .filter((f) => f.endsWith('.json') && !f.endsWith('.schema.json'))
  .map((f) => join(ROOT, 'scenarios', f));

/**
 * Runs one command that writes a file, expects it answered (0) or without
 * answer (1), and returns the file's pictures; none when it refuses with
 * the one line `refusal` matches (a question the command does not take yet).
 */
async function picturesOf(name: string, args: string[], out: string, refusal?: RegExp): Promise<Picture[]> {
  const run = await ifzone(...args, '--force');
  if (refusal && run.code === 2 && refusal.test(run.err)) return [];
  expect([0, 1], `${args.join(' ')}: ${run.err}`).toContain(run.code);
  return svgsIn(readFileSync(out, 'utf8')).map((svg, i) => ({ name: `${name} #${i + 1}`, svg, geometry: geometryOf(svg) }));
}

/** The rates verify is run at: the best candidate's and a failing candidate's (where the capture shows intrusions). */
async function verifyRates(file: string): Promise<number[]> {
  const run = await ifzone('solve', file, '--json');
  const report = JSON.parse(run.out) as { best: string | null; candidates: Array<{ label: string; rate: number; pass: boolean }> };
  const best = report.candidates.find((c) => c.label === report.best) ?? report.candidates[0];
  const failing = report.candidates.find((c) => !c.pass);
  return [best, failing].filter((c) => c !== undefined).map((c) => c.rate);
}

const demos: Picture[] = [];

beforeAll(async () => {
  const dir = scratchDirectory('no-collisions');
  for (const file of SCENARIOS) {
    const name = file.replace(/^.*\//, '').replace(/\.json$/, '');
    demos.push(...(await picturesOf(`solve ${name}`, ['solve', file, '--svg', join(dir, `${name}.svg`)], join(dir, `${name}.svg`))));
    demos.push(...(await picturesOf(`report ${name}`, ['report', file, '--html', join(dir, `${name}.html`)], join(dir, `${name}.html`))));
    for (const rate of await verifyRates(file)) {
      const out = join(dir, `${name}-${rate}.svg`);
      const args = ['verify', file, '--rate', String(rate), '--svg', out];
      demos.push(...(await picturesOf(`verify ${name} at ${rate} Hz`, args, out)));
    }
  }
  const family = join(dir, 'family.svg');
  demos.push(...(await picturesOf('compare family', ['compare', ...SCENARIOS, '--svg', family], family)));
}, 120_000);

// ---- The character-width model against rendered ink --------------------------------------------------

interface Setting {
  readonly text: string;
  readonly size: number;
  readonly bold: boolean;
  readonly italic: boolean;
}

/** Font files of one family, found where Debian installs them. */
function fontFiles(names: readonly string[]): string[] {
  const found: string[] = [];
  const walk = (dir: string) => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      const path = join(dir, entry.name);
      if (entry.isDirectory()) walk(path);
      else if (names.includes(entry.name)) found.push(path);
    }
  };
  walk('/usr/share/fonts');
  return found;
}

const FACES = [
  {
    family: 'DejaVu Sans',
    files: ['DejaVuSans.ttf', 'DejaVuSans-Bold.ttf', 'DejaVuSans-Oblique.ttf', 'DejaVuSans-BoldOblique.ttf'],
  },
  {
    family: 'Liberation Sans',
    files: ['LiberationSans-Regular.ttf', 'LiberationSans-Bold.ttf', 'LiberationSans-Italic.ttf', 'LiberationSans-BoldItalic.ttf'],
  },
];

/** Rendering scale: one rendered pixel is a quarter of a user unit, the tolerance allowed for anti-aliasing. */
const ZOOM = 4;

/** Texts rendered per image: each on its own row, far enough from the next that their ink cannot meet. */
const BATCH = 40;

/**
 * Renders settings, each alone on its own row (start-anchored at x = 10,
 * baseline 2 em into a row 3 em tall), with only the given font files, and
 * returns for each the box of its ink (every pixel not pure white, each
 * pixel taken whole) and the model's box, in user units.
 */
function inkAgainstModel(settings: readonly Setting[], family: string, files: readonly string[]) {
  const rows: Array<{ s: Setting; top: number; baseline: number }> = [];
  let height = 0;
  for (const s of settings) {
    rows.push({ s, top: height, baseline: height + 2 * s.size });
    height += Math.ceil(3 * s.size);
  }
  const width = Math.ceil(Math.max(...settings.map((s) => textWidth(s.text, s.size, s) + 2 * s.size)) + 20);
  const body = rows
    .map(({ s, baseline }) => {
      const attributes = `font-size="${s.size}"${s.bold ? ' font-weight="bold"' : ''}${s.italic ? ' font-style="italic"' : ''}`;
      return `<text x="10" y="${baseline}" ${attributes}>${escapeXml(s.text)}</text>`;
    })
    .join('');
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" font-family="${family}">${body}</svg>`;
  const image = new Resvg(svg, {
    background: '#ffffff',
    fitTo: { mode: 'zoom', value: ZOOM },
    font: { loadSystemFonts: false, fontFiles: [...files], defaultFontFamily: family, sansSerifFamily: family },
  }).render();
  // Read once: each is a native getter.
  const { pixels, width: across, height: down } = image;
  const inks = rows.map(() => ({ left: Infinity, top: Infinity, right: -Infinity, bottom: -Infinity }));
  let row = 0;
  for (let py = 0; py < down; py++) {
    while (row + 1 < rows.length && py / ZOOM >= rows[row + 1]!.top) row++;
    const ink = inks[row]!;
    for (let px = 0; px < across; px++) {
      const k = (py * across + px) * 4;
      if (pixels[k] === 255 && pixels[k + 1] === 255 && pixels[k + 2] === 255) continue;
      if (px / ZOOM < ink.left) ink.left = px / ZOOM;
      if ((px + 1) / ZOOM > ink.right) ink.right = (px + 1) / ZOOM;
      if (py / ZOOM < ink.top) ink.top = py / ZOOM;
      ink.bottom = (py + 1) / ZOOM;
    }
  }
  return rows.map(({ s, baseline }, i) => ({ setting: s, ink: inks[i]!, model: textBox(10, baseline, s.text, s.size, 'start', s) }));
}

/** Every distinct text, size, weight and slant the demo pictures write, and some of the widest and tallest glyphs. */
function settingsToCheck(): Setting[] {
  const seen = new Map<string, Setting>();
  const add = (s: Setting) => seen.set(JSON.stringify(s), s);
  for (const picture of demos) for (const t of picture.geometry.settings) add(t);
  for (const text of ['WWWWWWWW', 'mmmmmmmm', 'MMMMMMMM', '%%%%', '−±×≤≥…→', 'gjpqy|()[]', 'ÅÉ', 'fs/2 = 61.44 MHz', 'A'])
    for (const bold of [false, true]) for (const italic of [false, true]) add({ text, size: 11, bold, italic });
  return [...seen.values()];
}

describe('the character-width model holds the ink of every text', () => {
  for (const face of FACES) {
    it(`in ${face.family}`, () => {
      const files = fontFiles(face.files);
      expect(files.map((f) => f.replace(/^.*\//, '')).sort(), `${face.family} font files`).toEqual([...face.files].sort());
      const settings = settingsToCheck();
      expect(settings.length).toBeGreaterThan(300);
      const outside: string[] = [];
      let widest = 0;
      // Batches of texts of like width, so that each image is little wider than its texts.
      const byWidth = [...settings].sort((a, b) => textWidth(a.text, a.size, a) - textWidth(b.text, b.size, b));
      const measured = Array.from({ length: Math.ceil(byWidth.length / BATCH) }, (_, i) =>
        inkAgainstModel(byWidth.slice(i * BATCH, (i + 1) * BATCH), face.family, files),
      ).flat();
      for (const { setting, ink, model } of measured) {
        // A text of spaces only draws no ink.
        if (!Number.isFinite(ink.left)) continue;
        const tolerance = 1 / ZOOM;
        if (
          ink.left < model.left - tolerance ||
          ink.right > model.right + tolerance ||
          ink.top < model.top - tolerance ||
          ink.bottom > model.bottom + tolerance
        )
          outside.push(`${JSON.stringify(setting)}: ink ${JSON.stringify(ink)}, model ${JSON.stringify(model)}`);
        widest = Math.max(widest, (ink.right - ink.left) / (model.right - model.left));
      }
      expect(outside).toEqual([]);
      // The model errs wide, but not absurdly: the widest ink fills most of its box.
      expect(widest).toBeGreaterThan(0.8);
    }, 60_000);
  }
});

// ---- The checks themselves can fail ----------------------------------------------------------------------

/** A small picture in the writers' own elements, to show each check finding what it must. */
function tiny(body: string): string {
  return `<svg xmlns="http://www.w3.org/2000/svg" width="200" height="100" viewBox="0 0 200 100" font-family="sans-serif" font-size="11">${body}</svg>`;
}

describe('the collision checks', () => {
  const word = (x: number, y: number, text: string) => `<text x="${x}" y="${y}" font-size="10">${text}</text>`;
  const marker = (label: string | null, cx: number, cy: number) =>
    `<g class="marker"${label === null ? '' : ` data-label="${label}"`}><circle cx="${cx}" cy="${cy}" r="4.5" fill="#000"/></g>`;

  it('pass a clean picture: apart texts, a line clear of them, a line behind a white box, a labelled marker', () => {
    const svg = tiny(
      word(10, 20, 'zone 2') +
        '<line x1="10" y1="60" x2="190" y2="60" stroke="#000"/>' +
        // The line runs behind "zone 3": a white box drawn after it hides it there.
        '<line x1="30" y1="28" x2="30" y2="90" stroke="#000"/><rect x="8" y="31" width="50" height="12" fill="#fff"/>' +
        word(10, 40, 'zone 3') +
        marker('zone 2', 120, 30),
    );
    expect(collisions(svg)).toEqual([]);
  });

  it('find two texts that overlap, a line through a text, a marker over a text, and a marker cut by an axis', () => {
    expect(collisions(tiny(word(10, 20, 'zone 2') + word(30, 24, 'zone 3')))).toEqual(['texts overlap: "zone 2" and "zone 3"']);
    expect(collisions(tiny(word(10, 20, 'zone 2') + '<line x1="20" y1="0" x2="20" y2="50" stroke="#000"/>'))).toHaveLength(1);
    // A white box drawn before the line does not hide it.
    expect(
      collisions(
        tiny(
          '<rect x="8" y="11" width="50" height="12" fill="#fff"/>' +
            word(10, 20, 'zone 2') +
            '<line x1="20" y1="0" x2="20" y2="50" stroke="#000"/>',
        ),
      ),
    ).toHaveLength(1);
    expect(collisions(tiny(word(10, 20, 'zone 2') + marker('zone 2', 20, 17)))).toEqual(['marker zone 2 over "zone 2"']);
    expect(
      collisions(
        tiny(word(10, 90, 'x') + '<g class="axis-x"><line x1="0" y1="50" x2="200" y2="50" stroke="#000"/></g>' + marker('x', 100, 50)),
      ),
    ).toEqual(['marker x cut by the axis']);
  });

  it('find a text, a marker or a line outside the picture, an unlabelled marker and a bare round mark', () => {
    expect(collisions(tiny(word(170, 20, 'zone 22')))[0]).toMatch(/^text outside the picture/);
    expect(collisions(tiny(word(10, 20, 'a') + marker('a', 198, 50)))[0]).toMatch(/^marker outside the picture/);
    expect(collisions(tiny('<path d="M10 10H240" stroke="#000"/>'))[0]).toMatch(/^path outside the picture/);
    expect(collisions(tiny(marker(null, 100, 50)))[0]).toMatch(/names no label drawn/);
    expect(collisions(tiny(word(10, 20, 'a') + marker('b', 100, 50)))[0]).toMatch(/names no label drawn/);
    expect(collisions(tiny('<circle cx="100" cy="50" r="4.5" fill="#000"/>'))[0]).toMatch(/^round mark outside a marker group/);
  });
});

// ---- Every picture of the demo scenarios ------------------------------------------------------------

describe('the pictures of the bundled scenarios', () => {
  it('every picture solve, report, verify and compare write has no collision', () => {
    // Four scenarios: solve's document and report's four pictures each, verify at two rates, and the family's rate maps.
    expect(demos.length).toBeGreaterThanOrEqual(SCENARIOS.length * 4);
    expect(demos.some((p) => p.geometry.markers.length > 20)).toBe(true);
    const found = demos.flatMap((p) => collisions(p.geometry).map((c) => `${p.name}: ${c}`));
    expect(found).toEqual([]);
  });
});

// ---- Random scenarios ------------------------------------------------------------------------------

const WORDS = [
  'XO',
  'TCXO-R',
  'PLL',
  'buck',
  'regulator',
  'Wideband',
  'MMW',
  'leak',
  'PHY-25',
  'clock',
  'H2',
  '10M',
  '1.2M',
  'blocker',
  'im',
];
const label = fc.array(fc.constantFrom(...WORDS), { minLength: 1, maxLength: 5 }).map((words) => words.join(' '));
const mhz = (min: number, max: number) => fc.double({ min, max, noNaN: true }).map((v) => Math.round(v * 1000) / 1000);

/** A scenario of the demo's form with a random band, spurs, neighbours, clocks and requirements (invented data). */
const randomScenario = fc
  .record({
    name: label,
    center: mhz(25, 300),
    widthShare: fc.double({ min: 0.01, max: 0.3, noNaN: true }),
    guard: fc.constantFrom('0', '500k', '10%'),
    maxRate: fc.constantFrom('125M', '250M', '500M'),
    spurs: fc.array(
      fc.record({ label, frequency: mhz(0.2, 400), level: fc.integer({ min: -100, max: -50 }), harmonics: fc.integer({ min: 1, max: 6 }) }),
      {
        maxLength: 4,
      },
    ),
    neighbours: fc.array(fc.record({ label, center: mhz(5, 450), width: mhz(0.1, 20), level: fc.integer({ min: -40, max: -10 }) }), {
      maxLength: 3,
    }),
    clocks: fc.array(fc.record({ label, frequency: mhz(30, 600), tolerance: fc.integer({ min: 1, max: 50 }) }), {
      minLength: 1,
      maxLength: 5,
    }),
    margin: fc.constantFrom('100k', '500k', '2M'),
    rejection: fc.integer({ min: 0, max: 30 }),
  })
  .map((r) => {
    const base = JSON.parse(readFileSync(join(ROOT, 'scenarios', 'heron-base.json'), 'utf8')) as Record<string, unknown>;
    const width = Math.max(0.2, Math.round(r.center * r.widthShare * 1000) / 1000);
    const numbered = <T extends { label: string }>(items: T[], prefix: string) =>
      items.map((item, i) => ({ ...item, label: `${prefix}${i + 1} ${item.label}` }));
    return {
      ...base,
      $schema: undefined,
      name: r.name,
      wanted: { center: `${r.center}M`, width: `${width}M`, weakestLevel: -70, strongestLevel: -1 },
      guard: r.guard,
      converter: { ...(base.converter as object), maxRate: r.maxRate },
      boardSpurs: numbered(r.spurs, 'S').map((s) => ({ ...s, frequency: `${s.frequency}M`, coupling: 'after-filter' })),
      neighbours: numbered(r.neighbours, 'N').map((n) => ({
        label: n.label,
        center: `${n.center}M`,
        width: `${Math.min(n.width, n.center)}M`,
        level: n.level,
      })),
      filter: { kind: 'butterworth', order: 5, passLow: `${r.center - width}M`, passHigh: `${r.center + width}M` },
      requirements: { margin: r.margin, rejection: r.rejection, tolerancePpm: 50 },
      clocks: numbered(r.clocks, 'C').map((c) => ({ label: c.label, frequency: `${c.frequency}M`, tolerance: c.tolerance })),
    };
  });

describe('the pictures of random scenarios', () => {
  it('solve --svg draws no collision (fast-check, seeded)', async () => {
    const dir = scratchDirectory('random-pictures');
    await fc.assert(
      fc.asyncProperty(randomScenario, async (scenario) => {
        const file = writeInto(dir, 'scenario.json', scenario);
        const out = join(dir, 'plan.svg');
        for (const picture of await picturesOf('solve', ['solve', file, '--svg', out], out))
          expect(collisions(picture.geometry), JSON.stringify(scenario)).toEqual([]);
      }),
      // A failing scenario is printed whole: shrinking would re-render pictures for minutes.
      { seed: 20261202, numRuns: 30, endOnFailure: true },
    );
  }, 180_000);

  it('verify --svg draws no collision (fast-check, seeded)', async () => {
    const dir = scratchDirectory('random-captures');
    await fc.assert(
      fc.asyncProperty(randomScenario, fc.nat(), async (scenario, pick) => {
        const file = writeInto(dir, 'scenario.json', scenario);
        const rates = await verifyRates(file);
        fc.pre(rates.length > 0);
        const out = join(dir, 'capture.svg');
        const args = ['verify', file, '--rate', String(rates[pick % rates.length]), '--tones', '1', '--svg', out];
        for (const picture of await picturesOf('verify', args, out))
          expect(collisions(picture.geometry), JSON.stringify(scenario)).toEqual([]);
      }),
      { seed: 20261203, numRuns: 8, endOnFailure: true },
    );
  }, 180_000);
});
