import { FONT_FAMILY, PALETTE } from './palette';
import { el, num, text, type Attrs } from './svg-markup';
import { add, length, sub, times, unit, type Vec } from './view-transform';

/**
 * The drawing's vocabulary in screen units (y down): arrows, pins, supports, bars, labels.
 * Supports are drawn in a local frame with the ground below (+y) and turned into place, so
 * one symbol serves a floor, a wall or a ceiling.
 */

const pts = (ps: readonly Vec[]) => ps.map((p) => `${num(p.x)},${num(p.y)}`).join(' ');

export interface ArrowStyle {
  colour?: string;
  width?: number;
  head?: number;
  dashed?: boolean;
  data?: Attrs;
}

/** A straight arrow: the shaft stops at the head's base; the head's first point is the tip. */
export function arrow(tail: Vec, tip: Vec, style: ArrowStyle = {}): string {
  const colour = style.colour ?? PALETTE.signal;
  const width = style.width ?? 2.25;
  const len = length(sub(tip, tail));
  if (len === 0) return '';
  const head = Math.min(style.head ?? 11, len * 0.6);
  const d = unit(sub(tip, tail));
  const n = { x: -d.y, y: d.x };
  const base = sub(tip, times(d, head));
  const half = head * 0.38;
  return el('g', { ...style.data }, [
    el('line', {
      x1: tail.x, y1: tail.y, x2: base.x, y2: base.y,
      stroke: colour, 'stroke-width': width, 'stroke-linecap': 'round',
      'stroke-dasharray': style.dashed ? '5 3.5' : undefined,
    }),
    el('polygon', { points: pts([tip, add(base, times(n, half)), add(base, times(n, -half))]), fill: colour }),
  ]);
}

/** Rotation (degrees, SVG sense) that turns the local "ground below" frame to ground along g. */
export function turnTowards(g: Vec): number {
  return (Math.atan2(-g.x, g.y) * 180) / Math.PI;
}

function hatch(y: number, from: number, to: number): string[] {
  const lines: string[] = [el('line', { x1: from, y1: y, x2: to, y2: y, stroke: PALETTE.ink, 'stroke-width': 2, 'stroke-linecap': 'round' })];
  for (let x = from + 4; x <= to + 0.1; x += 5.5) {
    lines.push(el('line', { x1: x, y1: y, x2: x - 5.5, y2: y + 6.5, stroke: PALETTE.inkSoft, 'stroke-width': 1.1 }));
  }
  return lines;
}

function placed(at: Vec, ground: Vec, body: string[], data: Attrs): string {
  return el('g', { ...data, transform: `translate(${num(at.x)} ${num(at.y)}) rotate(${num(turnTowards(ground))})` }, body);
}

const triangle = (depth: number, half: number) =>
  el('polygon', {
    points: pts([{ x: 0, y: 0 }, { x: -half, y: depth }, { x: half, y: depth }]),
    fill: PALETTE.paperShade, stroke: PALETTE.ink, 'stroke-width': 1.6, 'stroke-linejoin': 'round',
  });

/** A pinned support: a triangle on hatched ground. */
export function pinnedSupport(at: Vec, ground: Vec, data: Attrs = {}, size = 1): string {
  const k = size;
  return placed(at, ground, [triangle(17 * k, 11 * k), ...hatch(17 * k, -17 * k, 17 * k)], data);
}

/** A roller: a triangle on rollers on hatched ground. */
export function rollerSupport(at: Vec, ground: Vec, data: Attrs = {}, size = 1): string {
  const k = size;
  const rollers = [-6.5, 0, 6.5].map((x) =>
    el('circle', { cx: x * k, cy: 15.5 * k, r: 3 * k, fill: PALETTE.paper, stroke: PALETTE.ink, 'stroke-width': 1.3 }),
  );
  return placed(at, ground, [triangle(12 * k, 10 * k), ...rollers, ...hatch(18.5 * k, -17 * k, 17 * k)], data);
}

/** A contact with the ground: a pad the part bears on, hatched behind. */
export function contactPad(at: Vec, ground: Vec, data: Attrs = {}, size = 1): string {
  const k = size;
  return placed(
    at,
    ground,
    [
      el('rect', { x: -15 * k, y: 0, width: 30 * k, height: 4.5 * k, rx: 1, fill: PALETTE.highlight, stroke: PALETTE.ink, 'stroke-width': 1.3 }),
      ...hatch(4.5 * k, -15 * k, 15 * k),
    ],
    data,
  );
}

/** A contact between two parts: the touching point and its common tangent. */
export function contactMark(at: Vec, normal: Vec, data: Attrs = {}): string {
  return placed(
    at,
    normal,
    [
      el('line', { x1: -10, y1: 0, x2: 10, y2: 0, stroke: PALETTE.inkStrong, 'stroke-width': 1.6, 'stroke-linecap': 'round' }),
      el('circle', { cx: 0, cy: 0, r: 3.2, fill: PALETTE.inkStrong }),
    ],
    data,
  );
}

/** A pin: a ring with a dark centre, drawn over the parts it joins. */
export function pinMark(at: Vec, data: Attrs = {}, r = 5.2): string {
  return el('g', data, [
    el('circle', { cx: at.x, cy: at.y, r, fill: PALETTE.paper, stroke: PALETTE.inkStrong, 'stroke-width': Math.max(1, r * 0.36) }),
    el('circle', { cx: at.x, cy: at.y, r: r * 0.3, fill: PALETTE.inkStrong }),
  ]);
}

/** A rigid part: a thick rounded outline, filled, with a darker edge. */
export function partShape(points: readonly Vec[], width: number, data: Attrs = {}, fill: string = PALETTE.partFill): string {
  const common = { 'stroke-linejoin': 'round', 'stroke-linecap': 'round' } as const;
  if (points.length === 1) {
    const p = points[0]!;
    return el('g', data, [el('circle', { cx: p.x, cy: p.y, r: width * 0.75, fill, stroke: PALETTE.partEdge, 'stroke-width': 1.6 })]);
  }
  if (points.length === 2) {
    const [a, b] = points as [Vec, Vec];
    const line = (stroke: string, w: number) => el('line', { x1: a.x, y1: a.y, x2: b.x, y2: b.y, stroke, 'stroke-width': w, ...common });
    return el('g', data, [line(PALETTE.partEdge, width + 3), line(fill, width)]);
  }
  const poly = (stroke: string, w: number) => el('polygon', { points: pts(points), fill, stroke, 'stroke-width': w, ...common });
  return el('g', data, [poly(PALETTE.partEdge, width + 3), poly(fill, width)]);
}

/** A two-force member: a slim bar. */
export function memberBar(a: Vec, b: Vec, width: number, data: Attrs = {}): string {
  const line = (stroke: string, w: number, extra: Attrs = {}) =>
    el('line', { x1: a.x, y1: a.y, x2: b.x, y2: b.y, stroke, 'stroke-width': w, 'stroke-linecap': 'round', ...extra });
  return el('g', data, [line(PALETTE.ink, width + 2.5), line(PALETTE.memberFill, width)]);
}

/** A small boxed letter on a member: T tension, C compression, 0 unloaded. */
export function stateBadge(at: Vec, letter: string, size = 1): string {
  const w = 13 * size;
  return el('g', {}, [
    el('rect', { x: at.x - w / 2, y: at.y - w / 2, width: w, height: w, rx: 2.5 * size, fill: PALETTE.paper, stroke: PALETTE.ink, 'stroke-width': 1.2 }),
    el('text', {
      x: at.x, y: at.y + 3.6 * size, 'text-anchor': 'middle', 'font-family': FONT_FAMILY, 'font-size': 10 * size,
      'font-weight': 700, fill: PALETTE.inkStrong,
    }, text(letter)),
  ]);
}

export interface LabelStyle {
  anchor?: 'start' | 'middle' | 'end';
  size?: number;
  weight?: number;
  fill?: string;
  /** A paper-coloured outline behind the letters, so labels stay legible over lines. */
  halo?: boolean;
  data?: Attrs;
}

/** One or more lines of text; `at` is the baseline of the first line. */
export function label(at: Vec, lines: readonly string[], style: LabelStyle = {}): string {
  const size = style.size ?? 11;
  const spans = lines.map((line, i) => el('tspan', { x: at.x, dy: i === 0 ? 0 : size * 1.25 }, text(line)));
  return el(
    'text',
    {
      ...style.data,
      x: at.x, y: at.y, 'text-anchor': style.anchor ?? 'start', 'font-family': FONT_FAMILY, 'font-size': size,
      'font-weight': style.weight ?? 500, fill: style.fill ?? PALETTE.ink,
      stroke: style.halo === false ? undefined : PALETTE.paper,
      'stroke-width': style.halo === false ? undefined : 3,
      'stroke-linejoin': style.halo === false ? undefined : 'round',
      'paint-order': style.halo === false ? undefined : 'stroke',
    },
    spans,
  );
}

/**
 * Where to put a block of `lines` just beyond `at` in direction `dir` (screen), so the block
 * sits clear of the thing it names: anchor by the horizontal sense, baseline by the vertical.
 */
export function labelBeyond(at: Vec, dir: Vec, lines: number, gap = 6, size = 11): { at: Vec; anchor: 'start' | 'middle' | 'end' } {
  const d = unit(dir);
  const anchor = d.x > 0.38 ? 'start' : d.x < -0.38 ? 'end' : 'middle';
  const block = size * (1 + 1.25 * (lines - 1));
  const p = add(at, times(d, gap));
  // Baseline of the first line: below the point when heading down, above when heading up.
  const y = d.y > 0.38 ? p.y + size * 0.85 : d.y < -0.38 ? p.y - block + size * 0.85 : p.y - block / 2 + size * 0.8;
  return { at: { x: p.x, y }, anchor };
}

/**
 * A couple: three quarters of a circle with a head. Anticlockwise in the model is
 * anticlockwise on screen too (the y flip is already in the centre's placement).
 */
export function coupleArrow(centre: Vec, radius: number, anticlockwise: boolean, style: ArrowStyle = {}): string {
  const colour = style.colour ?? PALETTE.signal;
  const width = style.width ?? 2.25;
  const s = anticlockwise ? -1 : 1; // screen angle grows clockwise
  const a0 = (135 * Math.PI) / 180;
  const a1 = a0 + s * ((250 * Math.PI) / 180);
  const at = (a: number) => ({ x: centre.x + radius * Math.cos(a), y: centre.y + radius * Math.sin(a) });
  const start = at(a0);
  const end = at(a1);
  const tangent = { x: -Math.sin(a1) * s, y: Math.cos(a1) * s };
  const head = style.head ?? 10;
  const tip = add(end, times(tangent, head * 0.75));
  const n = { x: -tangent.y, y: tangent.x };
  return el('g', { ...style.data }, [
    el('path', {
      d: `M ${num(start.x)} ${num(start.y)} A ${num(radius)} ${num(radius)} 0 1 ${anticlockwise ? 0 : 1} ${num(end.x)} ${num(end.y)}`,
      fill: 'none', stroke: colour, 'stroke-width': width, 'stroke-linecap': 'round',
      'stroke-dasharray': style.dashed ? '5 3.5' : undefined,
    }),
    el('polygon', { points: pts([tip, add(end, times(n, head * 0.38)), add(end, times(n, -head * 0.38))]), fill: colour }),
  ]);
}
