import { EngineError } from './errors';
import type { Evaluator } from './expressions/compile';
import type { SolveEnv } from './solve-env';
import { len } from './vec';

/** One constructive step, with point names resolved to indices and parameters compiled. */
export type PointOp =
  | { kind: 'at'; target: number; x: Evaluator<SolveEnv>; y: Evaluator<SolveEnv> }
  | { kind: 'polar'; target: number; from: number; length: Evaluator<SolveEnv>; angle: Evaluator<SolveEnv> }
  | { kind: 'offset'; target: number; from: number; dx: Evaluator<SolveEnv>; dy: Evaluator<SolveEnv> }
  | {
      kind: 'fromTwo';
      target: number;
      a: number;
      b: number;
      ra: Evaluator<SolveEnv>;
      rb: Evaluator<SolveEnv>;
      left: boolean;
    }
  | { kind: 'mirror'; target: number; of: number; p: number; q: number }
  | { kind: 'along'; target: number; from: number; to: number; fraction?: Evaluator<SolveEnv>; distance?: Evaluator<SolveEnv> }
  | { kind: 'intersect'; target: number; a: number; b: number; c: number; d: number };

const D = Math.PI / 180;

/** A length for a message: mm with up to four significant figures. */
export function mm(v: number): string {
  return `${Number(v.toPrecision(4))} mm`;
}

function finite(name: string, what: string, v: number): number {
  if (!Number.isFinite(v)) {
    throw new EngineError({ kind: 'expression', message: `${name}: the ${what} is not a finite number (${v})`, path: ['points', name] });
  }
  return v;
}

/** Builds every point in dependency order, writing env.px / env.py. */
export function buildPoints(ops: readonly PointOp[], names: readonly string[], env: SolveEnv): void {
  const { px, py } = env;
  for (const op of ops) {
    const name = names[op.target]!;
    switch (op.kind) {
      case 'at':
        px[op.target] = finite(name, 'x coordinate', op.x(env));
        py[op.target] = finite(name, 'y coordinate', op.y(env));
        break;
      case 'polar': {
        const len = finite(name, 'length', op.length(env));
        const ang = finite(name, 'angle', op.angle(env)) * D;
        px[op.target] = px[op.from]! + len * Math.cos(ang);
        py[op.target] = py[op.from]! + len * Math.sin(ang);
        break;
      }
      case 'offset':
        px[op.target] = px[op.from]! + finite(name, 'dx', op.dx(env));
        py[op.target] = py[op.from]! + finite(name, 'dy', op.dy(env));
        break;
      case 'fromTwo': {
        const ra = finite(name, 'first radius', op.ra(env));
        const rb = finite(name, 'second radius', op.rb(env));
        const ax = px[op.a]!;
        const ay = py[op.a]!;
        const dx = px[op.b]! - ax;
        const dy = py[op.b]! - ay;
        const d = len(dx, dy);
        const an = names[op.a]!;
        const bn = names[op.b]!;
        const path = ['points', name];
        if (ra <= 0 || rb <= 0) {
          throw new EngineError({ kind: 'geometry', path, message: `${name}: the distances from ${an} and ${bn} must be positive (got ${mm(ra)} and ${mm(rb)})` });
        }
        if (d < 1e-9 * (ra + rb)) {
          throw new EngineError({ kind: 'geometry', path, message: `${name}: ${an} and ${bn} coincide, so the point at ${mm(ra)} from one and ${mm(rb)} from the other is not defined` });
        }
        if (d > ra + rb) {
          throw new EngineError({
            kind: 'geometry',
            path,
            message: `${name}: links of ${mm(ra)} and ${mm(rb)} cannot reach ${mm(d)} apart (${an} to ${bn}), ${mm(d - ra - rb)} short`,
            details: { radii: [ra, rb], distance: d, shortfall: d - ra - rb },
          });
        }
        if (d < Math.abs(ra - rb)) {
          const longer = ra > rb ? `${mm(ra)} from ${an}` : `${mm(rb)} from ${bn}`;
          throw new EngineError({
            kind: 'geometry',
            path,
            message: `${name}: ${an} and ${bn} are only ${mm(d)} apart, so the link of ${longer} overshoots the other by ${mm(Math.abs(ra - rb) - d)}`,
            details: { radii: [ra, rb], distance: d, excess: Math.abs(ra - rb) - d },
          });
        }
        // Circle–circle intersection: the foot of the chord lies `t` along A→B, `h` off it.
        const t = (d * d + ra * ra - rb * rb) / (2 * d);
        const h = Math.sqrt(Math.max(0, ra * ra - t * t));
        const ux = dx / d;
        const uy = dy / d;
        const s = op.left ? 1 : -1; // left of A→B is the anticlockwise normal (−uy, ux)
        px[op.target] = ax + t * ux - s * h * uy;
        py[op.target] = ay + t * uy + s * h * ux;
        break;
      }
      case 'mirror': {
        const qx = px[op.q]! - px[op.p]!;
        const qy = py[op.q]! - py[op.p]!;
        const l2 = qx * qx + qy * qy;
        if (l2 === 0) {
          throw new EngineError({ kind: 'geometry', path: ['points', name], message: `${name}: the mirror line ${names[op.p]}–${names[op.q]} has no length (the points coincide)` });
        }
        const rx = px[op.of]! - px[op.p]!;
        const ry = py[op.of]! - py[op.p]!;
        const k = (rx * qx + ry * qy) / l2;
        px[op.target] = px[op.p]! + 2 * k * qx - rx;
        py[op.target] = py[op.p]! + 2 * k * qy - ry;
        break;
      }
      case 'along': {
        const fx = px[op.from]!;
        const fy = py[op.from]!;
        const dx = px[op.to]! - fx;
        const dy = py[op.to]! - fy;
        let f: number;
        if (op.fraction) f = finite(name, 'fraction', op.fraction(env));
        else {
          const span = len(dx, dy);
          if (span === 0) {
            throw new EngineError({ kind: 'geometry', path: ['points', name], message: `${name}: ${names[op.from]} and ${names[op.to]} coincide, so no direction runs from one to the other` });
          }
          f = finite(name, 'distance', op.distance!(env)) / span;
        }
        px[op.target] = fx + f * dx;
        py[op.target] = fy + f * dy;
        break;
      }
      case 'intersect': {
        const [ax, ay, bx, by] = [px[op.a]!, py[op.a]!, px[op.b]!, py[op.b]!];
        const [cx, cy, dx, dy] = [px[op.c]!, py[op.c]!, px[op.d]!, py[op.d]!];
        const rx = bx - ax;
        const ry = by - ay;
        const sx = dx - cx;
        const sy = dy - cy;
        const denom = rx * sy - ry * sx;
        const lr = len(rx, ry);
        const ls = len(sx, sy);
        const l1 = `${names[op.a]}–${names[op.b]}`;
        const l2 = `${names[op.c]}–${names[op.d]}`;
        if (lr === 0 || ls === 0) {
          throw new EngineError({ kind: 'geometry', path: ['points', name], message: `${name}: line ${lr === 0 ? l1 : l2} has no length (its points coincide)` });
        }
        const sinAngle = denom / (lr * ls);
        if (Math.abs(sinAngle) < 1e-9) {
          throw new EngineError({
            kind: 'parallel',
            path: ['points', name],
            message: `${name}: lines ${l1} and ${l2} are parallel, so they do not meet`,
            details: { angleDeg: Math.asin(Math.min(1, Math.abs(sinAngle))) / D },
          });
        }
        const t = ((cx - ax) * sy - (cy - ay) * sx) / denom;
        px[op.target] = ax + t * rx;
        py[op.target] = ay + t * ry;
        break;
      }
    }
  }
}
