import type { SolveResult } from '../mechanics/solve-result';
import type { Direction, JointDef, TemplateSpec, TemplateSpecInput } from '../spec/template-spec';
import { centroid, sub, unit, type Vec } from './view-transform';

/** The drawings read a spec as written or with its defaults applied. */
export type DrawingSpec = TemplateSpecInput | TemplateSpec;

export type Points = SolveResult['points'];

export function pointOf(result: SolveResult, name: string): Vec | undefined {
  return result.points[name];
}

/** Outline points of a part that the solve placed. */
export function partOutline(spec: DrawingSpec, result: SolveResult, partId: string): Vec[] {
  const part = spec.parts.find((p) => p.id === partId);
  if (!part) return [];
  return part.outline.map((n) => result.points[n]).filter((p): p is Vec => p !== undefined);
}

export function partCentroid(spec: DrawingSpec, result: SolveResult, partId: string): Vec | undefined {
  const ps = partOutline(spec, result, partId);
  return ps.length ? centroid(ps) : undefined;
}

/** A number the solve knows by name (an input or a derived value), or a literal. */
function valueOf(expr: number | string, result: SolveResult): number | undefined {
  if (typeof expr === 'number') return expr;
  if (expr in result.inputs) return result.inputs[expr];
  const d = result.derived.find((v) => v.key === expr);
  if (d && d.value !== null) return d.value;
  const n = Number(expr);
  return Number.isFinite(n) ? n : undefined;
}

/** A declared direction as a model unit vector, where the drawing can tell it without evaluating expressions. */
export function directionOf(dir: Direction | undefined, result: SolveResult): Vec | undefined {
  if (!dir) return undefined;
  if ('towards' in dir) {
    const [p, q] = dir.towards;
    const a = result.points[p];
    const b = result.points[q];
    if (!a || !b) return undefined;
    const u = unit(sub(b, a));
    return u.x === 0 && u.y === 0 ? undefined : u;
  }
  const deg = valueOf(dir.angle, result);
  if (deg === undefined) return undefined;
  const r = (deg * Math.PI) / 180;
  return { x: Math.cos(r), y: Math.sin(r) };
}

/**
 * The positive normal of a roller or contact (model, unit): from the spec where it is a
 * literal, a name or two points; otherwise from the solved force, which lies along it.
 */
export function jointNormal(joint: JointDef, result: SolveResult): Vec | undefined {
  const declared = directionOf(joint.normal, result);
  if (declared) return declared;
  const solved = result.joints.find((j) => j.id === joint.id);
  if (solved && solved.normal !== undefined && Math.abs(solved.normal) > 1e-9 * Math.max(1, solved.resultant)) {
    return unit({ x: solved.fx / solved.normal, y: solved.fy / solved.normal });
  }
  return undefined;
}

/** The nearest of the four axis directions, for supports that read best square to the sheet. */
export function nearestAxis(v: Vec): Vec {
  if (v.x === 0 && v.y === 0) return { x: 0, y: -1 };
  return Math.abs(v.x) > Math.abs(v.y) * 1.05 ? { x: Math.sign(v.x), y: 0 } : { x: 0, y: Math.sign(v.y) || -1 };
}

export interface GroundAttachment {
  /** Joint id, or `member:<id>` for a member end pinned to the ground. */
  id: string;
  kind: 'pin' | 'roller' | 'contact';
  point: string;
  /** Model unit vector from the point towards the ground. */
  groundSide: Vec;
}

/**
 * Every place the mechanism meets the ground, with the side the ground lies on. A roller or
 * contact bears against the ground across its normal; a pin's ground is put on the side away
 * from what it holds, squared to the sheet.
 */
export function groundAttachments(spec: DrawingSpec, result: SolveResult): GroundAttachment[] {
  const out: GroundAttachment[] = [];
  const seen = new Set<string>();
  for (const j of spec.joints ?? []) {
    const groundIndex = j.between.indexOf('ground');
    if (groundIndex < 0) continue;
    const p = result.points[j.at];
    if (!p) continue;
    const partId = j.between[1 - groundIndex]!;
    let side: Vec | undefined;
    if (j.kind !== 'pin') {
      const n = jointNormal(j, result);
      // The normal is the force on the first part: the ground pushes the part along +n, so it
      // lies on the -n side; when the ground is listed first the part pushes it the other way.
      if (n) side = groundIndex === 1 ? { x: -n.x, y: -n.y } : n;
    }
    if (!side) {
      const c = partCentroid(spec, result, partId);
      side = nearestAxis(c ? sub(p, c) : { x: 0, y: -1 });
      if (j.kind === 'pin' && side.x === 0 && side.y === 0) side = { x: 0, y: -1 };
    }
    out.push({ id: j.id, kind: j.kind, point: j.at, groundSide: side });
    seen.add(j.at);
  }
  for (const m of spec.members ?? []) {
    m.connects.forEach((c, i) => {
      if (c !== 'ground') return;
      const at = m.ends[i]!;
      if (seen.has(at)) return;
      const p = result.points[at];
      const q = result.points[m.ends[1 - i]!];
      if (!p || !q) return;
      out.push({ id: `member:${m.id}`, kind: 'pin', point: at, groundSide: nearestAxis(sub(p, q)) });
      seen.add(at);
    });
  }
  return out;
}

/** The direction a load acts in (model, unit): the solved force, or the declared direction when it is zero. */
export function loadDirection(spec: DrawingSpec, result: SolveResult, loadId: string): Vec | undefined {
  const solved = result.loads.find((l) => l.id === loadId);
  if (solved && Math.hypot(solved.fx, solved.fy) > 0) return unit({ x: solved.fx, y: solved.fy });
  const def = spec.loads.find((l) => l.id === loadId);
  if (!def || def.kind === 'couple') return undefined;
  const f = def.force;
  if ('x' in f) {
    const x = valueOf(f.x, result);
    const y = valueOf(f.y, result);
    return x === undefined || y === undefined ? undefined : unit({ x, y });
  }
  return directionOf(f.direction, result);
}

export function allPoints(result: SolveResult): Vec[] {
  return Object.values(result.points);
}
