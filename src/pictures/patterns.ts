import { element } from './svg-element.js';

/**
 * Fills that read in black-and-white print: each meaning has its own texture
 * as well as its own tone. Ids carry the `ifz-` prefix so that several
 * pictures inlined in one page share them without clashing with the page.
 */
export const FILL = {
  blocked: 'url(#ifz-blocked)',
  inverted: 'url(#ifz-inverted)',
  failing: 'url(#ifz-failing)',
  guard: 'url(#ifz-guard)',
  feasible: '#3d6b52',
  wanted: '#9db8cf',
  passing: '#d9d9d9',
} as const;

/** Textures of the second, third, … channels' images: the wanted image's blue, each with its own grain. */
const CHANNEL_PATTERNS: ReadonlyArray<(id: string) => string> = [
  (id) => tinted(id, 5, 135, 1.1),
  (id) => blueDots(id),
  (id) => tinted(id, 4, 0, 0.9),
  (id) => tinted(id, 6, 45, 2),
];

/**
 * The fill of the i-th channel's image (0-based): the first channel keeps the
 * wanted image's plain blue; the others take blue textures of their own
 * (striped, dotted, ...), repeating after five; their labels tell them apart.
 *
 * @param index the channel, 0-based
 * @returns a colour or pattern url
 * @example channelFill(1) // 'url(#ifz-channel-1)'
 */
export function channelFill(index: number): string {
  const k = index % (CHANNEL_PATTERNS.length + 1);
  return k === 0 ? FILL.wanted : `url(#ifz-channel-${k})`;
}

/** The rates at which two channels' aliases come too close (the rate map's pair lanes). */
export const COLLIDE_FILL = 'url(#ifz-channel-collide)';

/**
 * The <pattern> definitions of the channel fills that a body of markup uses,
 * so that a picture of one channel carries none of them.
 *
 * @param body the figure's markup
 * @returns pattern elements, '' when no channel fill is used
 * @example channelPatternDefs('<rect fill="#fff"/>') // ''
 */
export function channelPatternDefs(body: string): string {
  const fills = CHANNEL_PATTERNS.map((make, i) => (body.includes(`url(#ifz-channel-${i + 1})`) ? make(`ifz-channel-${i + 1}`) : ''));
  const collide = body.includes(COLLIDE_FILL) ? redCrossHatch('ifz-channel-collide') : '';
  return fills.join('') + collide;
}

function tinted(id: string, spacing: number, angle: number, width: number): string {
  return element(
    'pattern',
    { id, width: spacing, height: spacing, patternUnits: 'userSpaceOnUse', patternTransform: `rotate(${angle})` },
    element('rect', { width: spacing, height: spacing, fill: '#dfe9f2' }) +
      element('line', { x1: 0, y1: 0, x2: 0, y2: spacing, stroke: '#4f7ca3', 'stroke-width': width }),
  );
}

function redCrossHatch(id: string): string {
  const line = (x1: number, y1: number, x2: number, y2: number) =>
    element('line', { x1, y1, x2, y2, stroke: '#8f2d1f', 'stroke-width': 1.1 });
  return element(
    'pattern',
    { id, width: 5, height: 5, patternUnits: 'userSpaceOnUse' },
    element('rect', { width: 5, height: 5, fill: '#fff' }) + line(0, 0, 5, 5) + line(5, 0, 0, 5),
  );
}

function blueDots(id: string): string {
  return element(
    'pattern',
    { id, width: 5, height: 5, patternUnits: 'userSpaceOnUse' },
    element('rect', { width: 5, height: 5, fill: '#dfe9f2' }) + element('circle', { cx: 2.5, cy: 2.5, r: 1.3, fill: '#4f7ca3' }),
  );
}

/** The <pattern> definitions behind FILL, to go inside <defs>. */
export function patternDefs(): string {
  return [
    hatch('ifz-blocked', 5, 45, '#8f2d1f', 1.3),
    dots('ifz-inverted'),
    crossHatch('ifz-failing'),
    hatch('ifz-guard', 4, 90, '#6f6f6f', 0.6),
  ].join('');
}

function hatch(id: string, spacing: number, angle: number, stroke: string, width: number): string {
  return element(
    'pattern',
    { id, width: spacing, height: spacing, patternUnits: 'userSpaceOnUse', patternTransform: `rotate(${angle})` },
    element('rect', { width: spacing, height: spacing, fill: '#fff' }) +
      element('line', { x1: 0, y1: 0, x2: 0, y2: spacing, stroke, 'stroke-width': width }),
  );
}

function dots(id: string): string {
  return element(
    'pattern',
    { id, width: 4, height: 4, patternUnits: 'userSpaceOnUse' },
    element('rect', { width: 4, height: 4, fill: '#f2f2f2' }) + element('circle', { cx: 2, cy: 2, r: 0.75, fill: '#555' }),
  );
}

function crossHatch(id: string): string {
  const line = (x1: number, y1: number, x2: number, y2: number) => element('line', { x1, y1, x2, y2, stroke: '#111', 'stroke-width': 1 });
  return element(
    'pattern',
    { id, width: 6, height: 6, patternUnits: 'userSpaceOnUse' },
    // No background: what lies under a failing bar (the wanted image) shows through.
    line(0, 0, 6, 6) + line(6, 0, 0, 6),
  );
}
