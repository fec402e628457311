import { FONT_FAMILY, PALETTE } from './palette';
import { el, num, text } from './svg-markup';
import { add, length, sub, times, unit, type Vec } from './view-transform';

export interface DimensionStyle {
  /** Unit vector (screen) towards the side the dimension line stands off to. */
  side: Vec;
  offset: number;
  highlighted: boolean;
  title: string;
  input: string;
  /** Where along the line the value sits, 0…1; the middle unless told. */
  at?: number;
}

const tick = (tip: Vec, d: Vec, colour: string) => {
  const n = { x: -d.y, y: d.x };
  const base = sub(tip, times(d, 7));
  return el('polygon', {
    points: [tip, add(base, times(n, 2.4)), add(base, times(n, -2.4))].map((p) => `${num(p.x)},${num(p.y)}`).join(' '),
    fill: colour,
  });
};

/**
 * An aligned dimension between two points: extension lines, a line with a head at each end
 * and the value on it (lettered along the line, never upside down). A highlighted one (the
 * input being varied) is drawn heavier and in bold, not only in another tint.
 */
export function dimensionLine(p: Vec, q: Vec, value: string, s: DimensionStyle): string {
  const along = unit(sub(q, p));
  if (length(sub(q, p)) < 1) return '';
  const colour = s.highlighted ? PALETTE.inkStrong : PALETTE.inkSoft;
  const w = s.highlighted ? 1.6 : 1;
  const a = add(p, times(s.side, s.offset));
  const b = add(q, times(s.side, s.offset));
  const ext = (from: Vec, to: Vec) => {
    const start = add(from, times(s.side, 5));
    const end = add(to, times(s.side, 5));
    return el('line', { x1: start.x, y1: start.y, x2: end.x, y2: end.y, stroke: colour, 'stroke-width': 0.8 });
  };
  const mid = add(a, times(sub(b, a), s.at ?? 0.5));
  let angle = (Math.atan2(along.y, along.x) * 180) / Math.PI;
  if (angle > 90.01) angle -= 180;
  if (angle <= -90.01) angle += 180;
  const size = s.highlighted ? 12 : 11;
  const chipW = value.length * size * 0.68 + 12;
  const chipH = size + 6;
  const rotate = `rotate(${num(angle)} ${num(mid.x)} ${num(mid.y)})`;
  return el('g', { 'data-dimension': s.input, 'data-highlighted': s.highlighted ? 'true' : undefined }, [
    el('title', {}, text(s.title)),
    ext(p, a),
    ext(q, b),
    el('line', { x1: a.x, y1: a.y, x2: b.x, y2: b.y, stroke: colour, 'stroke-width': w }),
    tick(a, times(along, -1), colour),
    tick(b, along, colour),
    el('rect', {
      x: mid.x - chipW / 2, y: mid.y - chipH / 2, width: chipW, height: chipH, rx: chipH / 2,
      fill: s.highlighted ? PALETTE.highlight : PALETTE.paper, stroke: s.highlighted ? PALETTE.inkStrong : 'none',
      'stroke-width': s.highlighted ? 1 : undefined, transform: rotate,
    }),
    el('text', {
      x: mid.x, y: mid.y + size * 0.36, 'text-anchor': 'middle', 'font-family': FONT_FAMILY, 'font-size': size,
      'font-weight': s.highlighted ? 700 : 500, fill: colour, transform: rotate,
    }, text(value)),
  ]);
}
