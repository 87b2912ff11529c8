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
