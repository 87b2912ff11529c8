import { DOMParser, onWarningStopParsing, type Element } from '@xmldom/xmldom';
import { textBox, type TextBox } from '../../src/pictures/typography.js';
import { rootOf } from './svg-check.js';

/**
 * Reads any SVG the tool writes back into geometry, with no knowledge of
 * which picture it is: the box every <text> may ink (the typography's
 * character-width model, textBox, whose boxes the ink test checks against
 * renders by @resvg/resvg-js), every stroked straight segment (<line>,
 * stroked <path>, <polyline>, <polygon>, outlined <rect>), every marker
 * (a <g class="marker">, naming its label in data-label) and every opaque
 * white backing rectangle; then finds the collisions a reader would see.
 */

export type Box = TextBox;

export interface PlacedText {
  readonly text: string;
  readonly box: Box;
  /** How it is set: px, weight, slant. */
  readonly size: number;
  readonly bold: boolean;
  readonly italic: boolean;
  /** Position in document (drawing) order. */
  readonly order: number;
}

export interface Segment {
  readonly x1: number;
  readonly y1: number;
  readonly x2: number;
  readonly y2: number;
  /** Half the stroke width, px. */
  readonly halfWidth: number;
  readonly order: number;
  /** A light grid line drawn under everything (not a leader, bracket or axis). */
  readonly grid: boolean;
  /** Part of an axis (its line and ticks) or the plot's frame. */
  readonly axis: boolean;
  /** What drew it, for messages. */
  readonly what: string;
}

export interface Marker {
  readonly box: Box;
  readonly label: string | null;
  readonly order: number;
}

export interface Geometry {
  readonly width: number;
  readonly height: number;
  readonly texts: readonly PlacedText[];
  /** Each text's words and setting (for the ink check of the model). */
  readonly settings: ReadonlyArray<{ text: string; size: number; bold: boolean; italic: boolean }>;
  readonly segments: readonly Segment[];
  /** White rectangles that hide what was drawn before them. */
  readonly plates: ReadonlyArray<{ readonly box: Box; readonly order: number }>;
  readonly markers: readonly Marker[];
  /** Round marks drawn outside any marker group, r ≥ 3 px (a marker that escaped the checks). */
  readonly strayMarks: readonly Box[];
}

/** An affine transform [a, b, c, d, e, f] (SVG matrix order). */
type Matrix = readonly [number, number, number, number, number, number];
const IDENTITY: Matrix = [1, 0, 0, 1, 0, 0];

function multiply(m: Matrix, n: Matrix): Matrix {
  return [
    m[0] * n[0] + m[2] * n[1],
    m[1] * n[0] + m[3] * n[1],
    m[0] * n[2] + m[2] * n[3],
    m[1] * n[2] + m[3] * n[3],
    m[0] * n[4] + m[2] * n[5] + m[4],
    m[1] * n[4] + m[3] * n[5] + m[5],
  ];
}

function apply(m: Matrix, x: number, y: number): [number, number] {
  return [m[0] * x + m[2] * y + m[4], m[1] * x + m[3] * y + m[5]];
}

/** translate(x y) and rotate(a [cx cy]), the only transforms the writers use; anything else is refused. */
function parseTransform(text: string | null): Matrix {
  if (!text) return IDENTITY;
  let m = IDENTITY;
  const pattern = /(\w+)\(([^)]*)\)/g;
  let consumed = '';
  for (let match = pattern.exec(text); match; match = pattern.exec(text)) {
    consumed += match[0];
    const args = match[2]!
      .split(/[\s,]+/)
      .filter(Boolean)
      .map(Number);
    if (match[1] === 'translate') m = multiply(m, [1, 0, 0, 1, args[0] ?? 0, args[1] ?? 0]);
    else if (match[1] === 'rotate') {
      const t = ((args[0] ?? 0) * Math.PI) / 180;
      const [cx, cy] = [args[1] ?? 0, args[2] ?? 0];
      m = multiply(m, [1, 0, 0, 1, cx, cy]);
      m = multiply(m, [Math.cos(t), Math.sin(t), -Math.sin(t), Math.cos(t), 0, 0]);
      m = multiply(m, [1, 0, 0, 1, -cx, -cy]);
    } else throw new Error(`transform ${match[1]} is not read by the geometry check`);
  }
  if (consumed.replace(/\s/g, '') !== text.replace(/\s/g, '')) throw new Error(`unread transform: ${text}`);
  return m;
}

function boxOf(m: Matrix, points: ReadonlyArray<readonly [number, number]>): Box {
  const moved = points.map(([x, y]) => apply(m, x, y));
  const xs = moved.map((p) => p[0]);
  const ys = moved.map((p) => p[1]);
  return { left: Math.min(...xs), top: Math.min(...ys), right: Math.max(...xs), bottom: Math.max(...ys) };
}

const num = (el: Element, name: string, fallback = 0) => {
  const v = el.getAttribute(name);
  return v === null || v === '' ? fallback : Number(v);
};

/** The points of a path's d with absolute M, L, H, V and Z (what the writers emit); one array per subpath. */
export function pathPoints(d: string): Array<Array<[number, number]>> {
  const tokens = d.match(/[A-Za-z]|-?[\d.]+(?:e-?\d+)?/g) ?? [];
  const runs: Array<Array<[number, number]>> = [];
  let run: Array<[number, number]> = [];
  let [x, y] = [0, 0];
  let command = '';
  for (let i = 0; i < tokens.length;) {
    if (/[A-Za-z]/.test(tokens[i]!)) command = tokens[i++]!;
    const next = () => Number(tokens[i++]);
    switch (command) {
      case 'M':
        if (run.length > 1) runs.push(run);
        [x, y] = [next(), next()];
        run = [[x, y]];
        command = 'L';
        break;
      case 'L':
        [x, y] = [next(), next()];
        run.push([x, y]);
        break;
      case 'H':
        x = next();
        run.push([x, y]);
        break;
      case 'V':
        y = next();
        run.push([x, y]);
        break;
      case 'Z':
        if (run.length > 0) run.push(run[0]!);
        break;
      default:
        throw new Error(`path command ${command} is not read by the geometry check: ${d}`);
    }
  }
  if (run.length > 1) runs.push(run);
  return runs;
}

function pointsAttribute(text: string): Array<[number, number]> {
  const values = text
    .trim()
    .split(/[\s,]+/)
    .map(Number);
  const points: Array<[number, number]> = [];
  for (let i = 0; i + 1 < values.length; i += 2) points.push([values[i]!, values[i + 1]!]);
  return points;
}

interface Inherited {
  readonly m: Matrix;
  readonly fontSize: number;
  readonly bold: boolean;
  readonly italic: boolean;
  readonly anchor: 'start' | 'middle' | 'end';
  readonly stroke: string | null;
  readonly strokeWidth: number;
  readonly classes: readonly string[];
  readonly marker: { points: Array<[number, number]>; label: string | null; order: number } | null;
}

const isWhite = (fill: string | null) => fill === '#fff' || fill === '#ffffff' || fill === 'white';

/**
 * The geometry of an SVG document (see the module comment).
 *
 * @param svg SVG text as the tool writes it
 * @returns texts, segments, plates and markers in the root's user units
 */
export function geometryOf(svg: string): Geometry {
  // Well-formedness is checked by the picture tests (parseSvg, two parsers); here @xmldom/xmldom alone reads the tree.
  const root = rootOf(new DOMParser({ onError: onWarningStopParsing }).parseFromString(svg, 'image/svg+xml'));
  const texts: PlacedText[] = [];
  const segments: Segment[] = [];
  const plates: Array<{ box: Box; order: number }> = [];
  const markers: Marker[] = [];
  const strayMarks: Box[] = [];
  let order = 0;

  const visit = (el: Element, up: Inherited): void => {
    const name = el.localName;
    if (name === 'defs' || name === 'title' || name === 'pattern') return;
    const here = order++;
    const classes = [...up.classes, ...(el.getAttribute('class') ?? '').split(/\s+/).filter(Boolean)];
    const weight = el.getAttribute('font-weight');
    const style = el.getAttribute('font-style');
    const anchor = el.getAttribute('text-anchor');
    const stroke = el.getAttribute('stroke');
    const state: Inherited = {
      m: multiply(up.m, parseTransform(el.getAttribute('transform'))),
      fontSize: num(el, 'font-size', up.fontSize),
      bold: weight === null ? up.bold : weight === 'bold' || Number(weight) >= 600,
      italic: style === null ? up.italic : style === 'italic' || style === 'oblique',
      anchor: anchor === 'start' || anchor === 'middle' || anchor === 'end' ? anchor : up.anchor,
      stroke: stroke ?? up.stroke,
      strokeWidth: num(el, 'stroke-width', up.strokeWidth),
      classes,
      marker: up.marker,
    };
    if (name === 'g' && (el.getAttribute('class') ?? '').split(/\s+/).includes('marker')) {
      const marker = { points: [] as Array<[number, number]>, label: el.getAttribute('data-label'), order: here };
      const inner = { ...state, marker };
      for (let c = el.firstChild; c; c = c.nextSibling) if (c.nodeType === 1) visit(c as Element, inner);
      if (marker.points.length > 0) markers.push({ box: boxOf(IDENTITY, marker.points), label: marker.label, order: here });
      return;
    }
    const stroked = state.stroke !== null && state.stroke !== 'none';
    const half = stroked ? state.strokeWidth / 2 : 0;
    const what = `${name}${classes.length > 0 ? '.' + classes.join('.') : ''}`;
    const addRun = (points: ReadonlyArray<readonly [number, number]>) => {
      if (state.marker) {
        for (const [x, y] of points)
          for (const [dx, dy] of [
            [-half, -half],
            [half, half],
          ] as const)
            state.marker.points.push(apply(state.m, x + dx, y + dy));
        return;
      }
      if (!stroked) return;
      for (let i = 1; i < points.length; i++) {
        const [x1, y1] = apply(state.m, ...points[i - 1]!);
        const [x2, y2] = apply(state.m, ...points[i]!);
        segments.push({
          x1,
          y1,
          x2,
          y2,
          halfWidth: half,
          order: here,
          grid: classes.includes('grid'),
          axis: classes.includes('axis-x') || classes.includes('axis-y') || classes.includes('plot-edge'),
          what,
        });
      }
    };
    switch (name) {
      case 'text': {
        const content = el.textContent ?? '';
        if (content.trim() === '') break;
        const local = textBox(num(el, 'x'), num(el, 'y'), content, state.fontSize, state.anchor, {
          bold: state.bold,
          italic: state.italic,
        });
        const box = boxOf(state.m, [
          [local.left, local.top],
          [local.right, local.bottom],
          [local.left, local.bottom],
          [local.right, local.top],
        ]);
        texts.push({ text: content, box, order: here, size: state.fontSize, bold: state.bold, italic: state.italic });
        return;
      }
      case 'line':
        addRun([
          [num(el, 'x1'), num(el, 'y1')],
          [num(el, 'x2'), num(el, 'y2')],
        ]);
        break;
      case 'path':
        for (const run of pathPoints(el.getAttribute('d') ?? '')) addRun(run);
        break;
      case 'polyline':
        addRun(pointsAttribute(el.getAttribute('points') ?? ''));
        break;
      case 'polygon': {
        const points = pointsAttribute(el.getAttribute('points') ?? '');
        addRun([...points, points[0]!]);
        break;
      }
      case 'rect': {
        const [x, y, w, h] = [num(el, 'x'), num(el, 'y'), num(el, 'width'), num(el, 'height')];
        const corners: Array<[number, number]> = [
          [x, y],
          [x + w, y],
          [x + w, y + h],
          [x, y + h],
          [x, y],
        ];
        if (state.marker) addRun(corners);
        else {
          if (stroked) addRun(corners);
          const opacity = num(el, 'opacity', 1) * num(el, 'fill-opacity', 1);
          if (isWhite(el.getAttribute('fill')) && opacity >= 0.85) plates.push({ box: boxOf(state.m, corners), order: here });
        }
        break;
      }
      case 'circle': {
        const [cx, cy, r] = [num(el, 'cx'), num(el, 'cy'), num(el, 'r')];
        const reach = r + half;
        const corners: Array<[number, number]> = [
          [cx - r, cy - r],
          [cx + r, cy + r],
        ];
        if (state.marker) addRun(corners.map(([x, y]) => [x + Math.sign(x - cx) * half, y + Math.sign(y - cy) * half]));
        else if (reach >= 3) strayMarks.push(boxOf(state.m, corners));
        break;
      }
      case 'svg':
      case 'g':
        break;
      default:
        throw new Error(`element ${name} is not read by the geometry check`);
    }
    for (let c = el.firstChild; c; c = c.nextSibling) if (c.nodeType === 1) visit(c as Element, state);
  };

  const width = num(root, 'width');
  const height = num(root, 'height');
  visit(root, {
    m: IDENTITY,
    fontSize: 16,
    bold: false,
    italic: false,
    anchor: 'start',
    stroke: null,
    strokeWidth: 1,
    classes: [],
    marker: null,
  });
  const settings = texts.map(({ text, size, bold, italic }) => ({ text, size, bold, italic }));
  return { width, height, texts, settings, segments, plates, markers, strayMarks };
}

/** Overlap tolerance, px: boxes or a stroke may touch or graze by this much (anti-aliasing, rounding to 0.01 px). */
const GRAZE = 0.5;

function overlap(a: Box, b: Box): boolean {
  return a.left < b.right - GRAZE && b.left < a.right - GRAZE && a.top < b.bottom - GRAZE && b.top < a.bottom - GRAZE;
}

/** The part of a segment inside a box (Liang–Barsky), or null when it misses. */
function clipToBox(s: Segment, box: Box): [number, number, number, number] | null {
  if (Math.max(s.x1, s.x2) <= box.left || Math.min(s.x1, s.x2) >= box.right) return null;
  if (Math.max(s.y1, s.y2) <= box.top || Math.min(s.y1, s.y2) >= box.bottom) return null;
  const dx = s.x2 - s.x1;
  const dy = s.y2 - s.y1;
  let t0 = 0;
  let t1 = 1;
  const edges: ReadonlyArray<readonly [number, number]> = [
    [-dx, s.x1 - box.left],
    [dx, box.right - s.x1],
    [-dy, s.y1 - box.top],
    [dy, box.bottom - s.y1],
  ];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q <= 0) return null;
    } else {
      const t = q / p;
      if (p < 0) t0 = Math.max(t0, t);
      else t1 = Math.min(t1, t);
    }
  }
  if (t0 >= t1) return null;
  return [s.x1 + t0 * dx, s.y1 + t0 * dy, s.x1 + t1 * dx, s.y1 + t1 * dy];
}

const grow = (b: Box, by: number): Box => ({ left: b.left - by, top: b.top - by, right: b.right + by, bottom: b.bottom + by });
const inside = (b: Box, outer: Box) =>
  b.left >= outer.left - GRAZE && b.right <= outer.right + GRAZE && b.top >= outer.top - GRAZE && b.bottom <= outer.bottom + GRAZE;
const shown = (b: Box) => `[${b.left.toFixed(1)}, ${b.top.toFixed(1)} – ${b.right.toFixed(1)}, ${b.bottom.toFixed(1)}]`;

/**
 * Every collision a reader would see in an SVG the tool writes, one line
 * each (empty when there is none): two texts overlapping; a stroked segment
 * (leader, bracket, axis, curve, outline; light grid lines excepted) through
 * a text, unless a white backing drawn after the segment covers the part
 * inside the text; a marker over a text; a marker cut by an axis line; a
 * text, marker or segment outside the viewBox; a marker that names no label
 * drawn in the picture, or a round mark outside any marker group.
 *
 * @param svg SVG text, or its geometry
 * @returns the collisions, described
 */
export function collisions(svg: string | Geometry): string[] {
  const g = typeof svg === 'string' ? geometryOf(svg) : svg;
  const out: string[] = [];
  const view: Box = { left: 0, top: 0, right: g.width, bottom: g.height };
  for (const t of g.texts) if (!inside(t.box, view)) out.push(`text outside the picture: "${t.text}" ${shown(t.box)}`);
  for (const m of g.markers) if (!inside(m.box, view)) out.push(`marker outside the picture: ${m.label ?? '?'} ${shown(m.box)}`);
  for (const s of g.segments) {
    const box = { left: Math.min(s.x1, s.x2), right: Math.max(s.x1, s.x2), top: Math.min(s.y1, s.y2), bottom: Math.max(s.y1, s.y2) };
    if (!inside(box, view)) out.push(`${s.what} outside the picture: ${shown(box)}`);
  }
  // Texts sorted by left edge: a sweep finds the overlapping pairs without comparing every two.
  const byLeft = [...g.texts].sort((a, b) => a.box.left - b.box.left);
  for (let i = 0; i < byLeft.length; i++)
    for (let j = i + 1; j < byLeft.length && byLeft[j]!.box.left < byLeft[i]!.box.right; j++)
      if (overlap(byLeft[i]!.box, byLeft[j]!.box)) out.push(`texts overlap: "${byLeft[i]!.text}" and "${byLeft[j]!.text}"`);
  for (const s of g.segments) {
    if (s.grid) continue;
    for (const t of g.texts) {
      const part = clipToBox(s, grow(t.box, s.halfWidth - GRAZE));
      if (!part) continue;
      const hidden = g.plates.some(
        (p) =>
          p.order > s.order &&
          inside(
            {
              left: Math.min(part[0], part[2]),
              right: Math.max(part[0], part[2]),
              top: Math.min(part[1], part[3]),
              bottom: Math.max(part[1], part[3]),
            },
            p.box,
          ),
      );
      if (!hidden) out.push(`${s.what} crosses "${t.text}" at (${part[0].toFixed(1)}, ${part[1].toFixed(1)})`);
    }
  }
  for (const m of g.markers) {
    for (const t of g.texts) if (overlap(m.box, t.box)) out.push(`marker ${m.label ?? '?'} over "${t.text}"`);
    for (const s of g.segments.filter((s) => s.axis && !s.grid))
      if (clipToBox(s, grow(m.box, -GRAZE))) out.push(`marker ${m.label ?? '?'} cut by the axis`);
  }
  const words = new Set(g.texts.map((t) => t.text));
  for (const m of g.markers)
    if (m.label === null || !words.has(m.label))
      out.push(`marker ${shown(m.box)} names no label drawn (data-label ${JSON.stringify(m.label)})`);
  for (const b of g.strayMarks) out.push(`round mark outside a marker group at ${shown(b)}`);
  return out;
}
