import type { CompiledTemplate, DirectionPlan } from '../compile-template';
import { EngineError } from '../errors';
import type { SolveEnv } from '../solve-env';
import { len } from '../vec';

/**
 * The equilibrium system A x = b of one configuration: three rows per rigid part (ΣFx, ΣFy,
 * ΣM about the part's centroid, the moment row divided by a length scale so that every
 * entry is of order one and pivot sizes can be compared), one column per unknown.
 */
export interface Assembled {
  m: number;
  n: number;
  a: Float64Array;
  b: Float64Array;
  /** Unit force direction of each column (for slipping contacts: n + sμt, not unit). */
  ux: Float64Array;
  uy: Float64Array;
  /** Unit normal of each joint (roller, contact), NaN for pins. */
  nx: Float64Array;
  ny: Float64Array;
  /** Friction coefficient at slipping per joint, 0 otherwise. */
  mu: Float64Array;
  /** Length scale used for the moment rows, mm. */
  length: number;
  /** Largest known load, N (or N·mm / length for couples): the scale for residuals. */
  loadScale: number;
  /** The part each row belongs to (a part whose forces all meet in one point has no moment row). */
  rowPart: Int32Array;
  /** Reference point per part (the moment centre of its third row). */
  rx: Float64Array;
  ry: Float64Array;
  /** Known load components per load (couples: moment in fx). */
  kfx: Float64Array;
  kfy: Float64Array;
  /** Unit direction of loads of unknown magnitude. */
  dx: Float64Array;
  dy: Float64Array;
}

/** x and y of the last direction read by readDirection (one pair, reused: no allocation per call). */
const dir = { x: 0, y: 0 };

/**
 * Reads a direction into `dir`. Returns an error message instead of throwing, so the caller
 * builds the path and the wording only when something is wrong.
 */
function readDirection(d: DirectionPlan, env: SolveEnv): string | null {
  if ('angle' in d) {
    const a = (d.angle(env) * Math.PI) / 180;
    if (!Number.isFinite(a)) return 'the direction angle is not a finite number';
    dir.x = Math.cos(a);
    dir.y = Math.sin(a);
    return null;
  }
  const vx = env.px[d.to]! - env.px[d.from]!;
  const vy = env.py[d.to]! - env.py[d.from]!;
  const l = len(vx, vy);
  if (!(l > 0)) return 'the two points that give its direction coincide';
  dir.x = vx / l;
  dir.y = vy / l;
  return null;
}

function direction(d: DirectionPlan, env: SolveEnv, what: () => string, path: () => (string | number)[]): void {
  const problem = readDirection(d, env);
  if (problem) throw new EngineError({ kind: problem.startsWith('the direction angle') ? 'expression' : 'geometry', path: path(), message: `${what()}: ${problem}` });
}

export function assemble(t: CompiledTemplate, env: SolveEnv): Assembled {
  const np = t.parts.length;
  const { rowOf, rowPart } = t;
  const m = rowPart.length;
  const n = t.columns.length;
  const { px, py } = env;

  // Length scale: the largest distance of any point from the centroid of all points.
  let cx = 0;
  let cy = 0;
  const pc = px.length;
  for (let i = 0; i < pc; i++) {
    cx += px[i]!;
    cy += py[i]!;
  }
  cx /= pc || 1;
  cy /= pc || 1;
  let length = 0;
  for (let i = 0; i < pc; i++) length = Math.max(length, len(px[i]! - cx, py[i]! - cy));
  if (!(length > 0)) length = 1;
  const invL = 1 / length;

  const rx = new Float64Array(np);
  const ry = new Float64Array(np);
  for (let i = 0; i < np; i++) {
    const outline = t.parts[i]!.outline;
    let sx = 0;
    let sy = 0;
    for (let k = 0; k < outline.length; k++) {
      sx += px[outline[k]!]!;
      sy += py[outline[k]!]!;
    }
    rx[i] = sx / outline.length;
    ry[i] = sy / outline.length;
  }

  const nj = t.joints.length;
  const nx = new Float64Array(nj).fill(NaN);
  const ny = new Float64Array(nj).fill(NaN);
  const mu = new Float64Array(nj);
  const ux = new Float64Array(n);
  const uy = new Float64Array(n);
  for (let i = 0; i < nj; i++) {
    const j = t.joints[i]!;
    if (j.normal) {
      direction(j.normal, env, () => `joint ${j.id}`, () => ['joints', i, 'normal']);
      nx[i] = dir.x;
      ny[i] = dir.y;
    }
    if (typeof j.friction === 'object') {
      const c = j.friction.coefficient(env);
      if (!Number.isFinite(c) || c < 0) {
        throw new EngineError({ kind: 'expression', path: ['joints', i, 'friction'], message: `joint ${j.id}: the friction coefficient must be a finite number ≥ 0 (got ${c})` });
      }
      mu[i] = c * j.friction.sense;
    }
  }
  for (let i = 0; i < t.members.length; i++) {
    const mp = t.members[i]!;
    const [e0, e1] = mp.ends;
    const vx = px[e1]! - px[e0]!;
    const vy = py[e1]! - py[e0]!;
    const l = len(vx, vy);
    if (!(l > 1e-12 * length)) {
      throw new EngineError({ kind: 'geometry', path: ['members', i], message: `member ${mp.id}: its ends ${t.pointNames[e0]} and ${t.pointNames[e1]} coincide, so its line of action is not defined` });
    }
    ux[mp.column] = vx / l;
    uy[mp.column] = vy / l;
  }

  const nl = t.loads.length;
  const kfx = new Float64Array(nl);
  const kfy = new Float64Array(nl);
  const dx = new Float64Array(nl);
  const dy = new Float64Array(nl);
  const b = new Float64Array(m);
  let loadScale = 0;
  for (let i = 0; i < nl; i++) {
    const l = t.loads[i]!;
    if (l.kind === 'couple') {
      if (!l.moment) continue; // unknown: a column of its own, filled below
      const mom = l.moment(env);
      if (!Number.isFinite(mom)) throw new EngineError({ kind: 'expression', path: ['loads', i, 'moment'], message: `load ${l.id}: the moment is not a finite number` });
      kfx[i] = mom;
      loadScale = Math.max(loadScale, Math.abs(mom) * invL);
      if (l.part >= 0) {
        const mr = rowOf[3 * l.part + 2]!;
        b[mr] = b[mr]! - mom * invL;
      }
      continue;
    }
    if (l.unknown) {
      direction(l.unknown.direction, env, () => `load ${l.id}`, () => ['loads', i, 'force', 'direction']);
      dx[i] = dir.x;
      dy[i] = dir.y;
      ux[l.unknown.column] = dir.x;
      uy[l.unknown.column] = dir.y;
      continue;
    }
    const k = l.known!;
    let fx: number;
    let fy: number;
    if ('x' in k) {
      fx = k.x(env);
      fy = k.y(env);
    } else {
      const mag = k.magnitude(env);
      direction(k.direction, env, () => `load ${l.id}`, () => ['loads', i, 'force', 'direction']);
      fx = mag * dir.x;
      fy = mag * dir.y;
    }
    if (!Number.isFinite(fx) || !Number.isFinite(fy)) {
      throw new EngineError({ kind: 'expression', path: ['loads', i, 'force'], message: `load ${l.id}: the force is not a finite number` });
    }
    kfx[i] = fx;
    kfy[i] = fy;
    loadScale = Math.max(loadScale, len(fx, fy));
    if (l.part >= 0) {
      const p = l.part;
      const r0 = rowOf[3 * p]!;
      const r1 = rowOf[3 * p + 1]!;
      b[r0] = b[r0]! - fx;
      b[r1] = b[r1]! - fy;
      const mr = rowOf[3 * p + 2]!;
      if (mr >= 0) b[mr] = b[mr]! - ((px[l.point]! - rx[p]!) * fy - (py[l.point]! - ry[p]!) * fx) * invL;
    }
  }

  const columns = t.columns;
  for (let k = 0; k < n; k++) {
    const c = columns[k]!;
    switch (c.kind) {
      case 'pin-x':
        ux[k] = 1;
        uy[k] = 0;
        break;
      case 'pin-y':
        ux[k] = 0;
        uy[k] = 1;
        break;
      case 'normal':
        ux[k] = nx[c.joint]!;
        uy[k] = ny[c.joint]!;
        break;
      case 'tangent': // the normal turned 90° anticlockwise
        ux[k] = -ny[c.joint]!;
        uy[k] = nx[c.joint]!;
        break;
      case 'slip':
        ux[k] = nx[c.joint]! - mu[c.joint]! * ny[c.joint]!;
        uy[k] = ny[c.joint]! + mu[c.joint]! * nx[c.joint]!;
        break;
      default:
        break;
    }
  }

  const a = new Float64Array(m * n);
  const apps = t.applications;
  for (let q = 0; q < apps.length; q++) {
    const ap = apps[q]!;
    const p = ap.part;
    if (p < 0) continue;
    const col = ap.column;
    const fx = ap.sign * ux[col]!;
    const fy = ap.sign * uy[col]!;
    const i0 = rowOf[3 * p]! * n + col;
    const i1 = rowOf[3 * p + 1]! * n + col;
    a[i0] = a[i0]! + fx;
    a[i1] = a[i1]! + fy;
    const mr = rowOf[3 * p + 2]!;
    if (mr >= 0) {
      const i2 = mr * n + col;
      a[i2] = a[i2]! + ((px[ap.point]! - rx[p]!) * fy - (py[ap.point]! - ry[p]!) * fx) * invL;
    }
  }
  for (let i = 0; i < nl; i++) {
    const l = t.loads[i]!;
    if (l.kind !== 'couple' || l.unknownColumn === undefined) continue;
    // The unknown is the moment divided by the length scale, so its column is of order one like
    // the others (a column of 1/L would look like a near-singular system); distribute() scales back.
    const mr = rowOf[3 * l.part + 2]!;
    a[mr * n + l.unknownColumn] = 1;
  }
  return { m, n, a, b, ux, uy, nx, ny, mu, length, loadScale, rowPart, rx, ry, kfx, kfy, dx, dy };
}
