/**
 * Model millimetres (y up) to drawing units (y down): one uniform scale, so the drawing is to
 * scale, fitted to a box with a margin and centred in it.
 */
export interface Vec {
  x: number;
  y: number;
}

export interface View {
  /** Drawing units per model millimetre. */
  scale: number;
  width: number;
  height: number;
  toSvg(p: Vec): Vec;
}

export interface Box {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

export function boundsOf(points: readonly Vec[]): Box {
  if (points.length === 0) return { minX: 0, minY: 0, maxX: 0, maxY: 0 };
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const p of points) {
    minX = Math.min(minX, p.x);
    maxX = Math.max(maxX, p.x);
    minY = Math.min(minY, p.y);
    maxY = Math.max(maxY, p.y);
  }
  return { minX, minY, maxX, maxY };
}

/** Margins in drawing units, clockwise from the top like CSS. */
export interface Margins {
  top: number;
  right: number;
  bottom: number;
  left: number;
}

export function fitView(points: readonly Vec[], width: number, height: number, margin: number | Margins): View {
  const m = typeof margin === 'number' ? { top: margin, right: margin, bottom: margin, left: margin } : margin;
  const b = boundsOf(points);
  const w = b.maxX - b.minX;
  const h = b.maxY - b.minY;
  const room = { x: Math.max(1, width - m.left - m.right), y: Math.max(1, height - m.top - m.bottom) };
  // A mechanism that is a single point (or a line) still needs a scale: fit the other direction.
  const candidates = [w > 0 ? room.x / w : Infinity, h > 0 ? room.y / h : Infinity];
  let scale = Math.min(...candidates);
  if (!Number.isFinite(scale)) scale = 1;
  const cx = (b.minX + b.maxX) / 2;
  const cy = (b.minY + b.maxY) / 2;
  const ox = m.left + room.x / 2;
  const oy = m.top + room.y / 2;
  return {
    scale,
    width,
    height,
    toSvg: (p) => ({ x: ox + (p.x - cx) * scale, y: oy - (p.y - cy) * scale }),
  };
}

export const sub = (a: Vec, b: Vec): Vec => ({ x: a.x - b.x, y: a.y - b.y });
export const add = (a: Vec, b: Vec): Vec => ({ x: a.x + b.x, y: a.y + b.y });
export const times = (a: Vec, k: number): Vec => ({ x: a.x * k, y: a.y * k });
export const length = (a: Vec): number => Math.sqrt(a.x * a.x + a.y * a.y);
export const dot = (a: Vec, b: Vec): number => a.x * b.x + a.y * b.y;
export const unit = (a: Vec): Vec => {
  const l = length(a);
  return l > 0 ? { x: a.x / l, y: a.y / l } : { x: 0, y: 0 };
};
/** A quarter turn anticlockwise on screen (y down). */
export const perp = (a: Vec): Vec => ({ x: a.y, y: -a.x });
export const centroid = (ps: readonly Vec[]): Vec =>
  ps.length === 0 ? { x: 0, y: 0 } : times(ps.reduce(add, { x: 0, y: 0 }), 1 / ps.length);
