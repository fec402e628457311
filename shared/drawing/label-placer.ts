import type { Vec } from './view-transform';

/**
 * Puts labels where they hide the least: each label offers a few candidate places, each
 * place is scored by what its text box would cover (drawn lines, pins, earlier labels, the
 * sheet's edge) and the best one wins. Greedy and approximate on purpose: it keeps a sketch
 * legible, it does not typeset a map.
 */
export interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

export interface Candidate {
  /** Baseline of the first line. */
  at: Vec;
  anchor: 'start' | 'middle' | 'end';
  /** Added to the score: lets a caller prefer its natural place. */
  cost?: number;
}

const CHAR_WIDTH = 0.58;
const LINE_HEIGHT = 1.25;

export function textBox(c: Candidate, lines: readonly string[], size: number): Box {
  const w = Math.max(...lines.map((l) => l.length), 1) * size * CHAR_WIDTH;
  const x0 = c.anchor === 'start' ? c.at.x : c.anchor === 'end' ? c.at.x - w : c.at.x - w / 2;
  const y0 = c.at.y - size * 0.8;
  return { x0, y0, x1: x0 + w, y1: y0 + size * (1 + LINE_HEIGHT * (lines.length - 1)) + size * 0.1 };
}

function overlapArea(a: Box, b: Box): number {
  const w = Math.min(a.x1, b.x1) - Math.max(a.x0, b.x0);
  const h = Math.min(a.y1, b.y1) - Math.max(a.y0, b.y0);
  return w > 0 && h > 0 ? w * h : 0;
}

/** Length of the part of segment p–q (widened by `pad`) inside the box, by Liang–Barsky clipping. */
function segmentInside(p: Vec, q: Vec, pad: number, b: Box): number {
  const box = { x0: b.x0 - pad, y0: b.y0 - pad, x1: b.x1 + pad, y1: b.y1 + pad };
  const dx = q.x - p.x;
  const dy = q.y - p.y;
  let t0 = 0;
  let t1 = 1;
  // Liang–Barsky: the segment is p + t (q - p); each edge keeps the t where pe·t <= qe.
  const clip = (pe: number, qe: number) => {
    if (pe === 0) return qe >= 0;
    const t = qe / pe;
    if (pe < 0) {
      if (t > t1) return false;
      if (t > t0) t0 = t;
    } else {
      if (t < t0) return false;
      if (t < t1) t1 = t;
    }
    return true;
  };
  if (clip(-dx, p.x - box.x0) && clip(dx, box.x1 - p.x) && clip(-dy, p.y - box.y0) && clip(dy, box.y1 - p.y)) {
    return Math.max(0, t1 - t0) * Math.hypot(dx, dy);
  }
  return 0;
}

export class LabelPlacer {
  private readonly segments: { p: Vec; q: Vec; pad: number }[] = [];
  private readonly boxes: Box[] = [];

  constructor(private readonly sheet: Box) {}

  addSegment(p: Vec, q: Vec, width: number): void {
    this.segments.push({ p, q, pad: width / 2 });
  }

  addBox(b: Box): void {
    this.boxes.push(b);
  }

  addCircle(c: Vec, r: number): void {
    this.boxes.push({ x0: c.x - r, y0: c.y - r, x1: c.x + r, y1: c.y + r });
  }

  /** How much a box would hide: lines crossed, boxes covered, and any part off the sheet. */
  score(box: Box, weight = 11): number {
    let score = 0;
    for (const s of this.segments) score += segmentInside(s.p, s.q, s.pad, box) * weight;
    for (const b of this.boxes) score += overlapArea(box, b) * 1.5;
    const outside =
      Math.max(0, this.sheet.x0 - box.x0) + Math.max(0, box.x1 - this.sheet.x1) + Math.max(0, this.sheet.y0 - box.y0) + Math.max(0, box.y1 - this.sheet.y1);
    return score + outside * weight * 40;
  }

  /** The best candidate for these lines; its box becomes an obstacle for later labels. */
  place(candidates: readonly Candidate[], lines: readonly string[], size: number): Candidate {
    let best = candidates[0]!;
    let bestScore = Infinity;
    for (const c of candidates) {
      const score = (c.cost ?? 0) + this.score(textBox(c, lines, size), size);
      if (score < bestScore) {
        bestScore = score;
        best = c;
      }
    }
    this.boxes.push(textBox(best, lines, size));
    return best;
  }
}

/** Eight places around a point at distance `gap`, the preferred direction first. */
export function aroundPoint(p: Vec, gap: number, size: number, lines: number, prefer: Vec = { x: 1, y: -1 }): Candidate[] {
  const block = size * (1 + LINE_HEIGHT * (lines - 1));
  const dirs: Vec[] = [];
  for (let k = 0; k < 8; k++) {
    const a = (k * Math.PI) / 4;
    dirs.push({ x: Math.cos(a), y: Math.sin(a) });
  }
  const pl = Math.hypot(prefer.x, prefer.y) || 1;
  return dirs.map((d) => {
    const anchor: Candidate['anchor'] = d.x > 0.3 ? 'start' : d.x < -0.3 ? 'end' : 'middle';
    const x = p.x + d.x * gap;
    const yc = p.y + d.y * gap;
    const y = d.y > 0.3 ? yc + size * 0.8 : d.y < -0.3 ? yc - block + size * 0.8 : yc - block / 2 + size * 0.8;
    const alignment = (d.x * prefer.x + d.y * prefer.y) / pl;
    return { at: { x, y }, anchor, cost: (1 - alignment) * size * 1.5 };
  });
}
