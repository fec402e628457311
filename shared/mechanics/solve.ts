import { templateSpecSchema, type TemplateSpec, type TemplateSpecInput } from '../spec/template-spec';
import { compileTemplate, type CompiledTemplate } from './compile-template';
import { EngineError, type EngineErrorInfo } from './errors';
import { luFactor } from './linear/lu';
import { assemble, type Assembled } from './statics/assemble';
import { SINGULAR, solveEquilibrium } from './statics/classify';
import type { SolveEnv } from './solve-env';
import { buildGeometry, newEnv, resolveInputs } from './phases';
import type { ResultValue, SolveOutcome, SolveResult } from './solve-result';
import { verify } from './verify';
import { len } from './vec';

const compiledCache = new WeakMap<object, CompiledTemplate>();

/**
 * Validates and compiles a spec once; later calls with the same object reuse the plan.
 * Throws SpecError (every problem with its path) or a ZodError for a malformed spec.
 */
export function prepare(spec: TemplateSpecInput | TemplateSpec): CompiledTemplate {
  const hit = compiledCache.get(spec);
  if (hit) return hit;
  const compiled = compileTemplate(templateSpecSchema.parse(spec));
  compiledCache.set(spec, compiled);
  return compiled;
}

/** True when the system stays singular after small moves of every input: a fault of the spec, not a dead centre. */
function staysSingular(t: CompiledTemplate, inputs: Float64Array): boolean {
  for (const [up, down] of [
    [0.013, -0.007],
    [-0.011, 0.017],
  ] as const) {
    const moved = Float64Array.from(inputs, (v, i) => {
      const inp = t.inputs[i]!;
      const span = inp.max - inp.min || Math.abs(v) || 1;
      return Math.min(inp.max, Math.max(inp.min, v + span * (i % 2 ? up : down)));
    });
    try {
      const env = newEnv(t);
      buildGeometry(t, moved, env);
      const s = assemble(t, env);
      const f = luFactor(s.a.slice(), s.n);
      if (f.maxPivot > 0 && f.minPivot / f.maxPivot >= SINGULAR) return false;
    } catch {
      // A neighbour that cannot be built says nothing either way; try the next.
    }
  }
  return true;
}

export interface CoreSolve {
  env: SolveEnv;
  system: Assembled;
  x: Float64Array;
  rcond: number;
  warnings: string[];
}

/** Geometry, equilibrium and results for resolved inputs. Throws EngineError. */
export function solveCore(t: CompiledTemplate, inputs: Float64Array): CoreSolve {
  const env = newEnv(t);
  buildGeometry(t, inputs, env);
  const system = assemble(t, env);
  const { x, rcond, warnings } = solveEquilibrium(t, system, () => staysSingular(t, inputs));
  distribute(t, system, x, env);
  for (const r of t.results) env.v[r.slot] = r.evaluate(env);
  return { env, system, x, rcond, warnings };
}

/** Copies the solved unknowns into per-joint, per-member and per-load forces. */
function distribute(t: CompiledTemplate, s: Assembled, x: Float64Array, env: SolveEnv): void {
  t.joints.forEach((j, i) => {
    const [c0, c1] = j.columns as [number, number | undefined];
    if (j.kind === 'pin') {
      env.jfx[i] = x[c0]!;
      env.jfy[i] = x[c1!]!;
      env.jn[i] = 0;
      env.jt[i] = 0;
      return;
    }
    const nx = s.nx[i]!;
    const ny = s.ny[i]!;
    const n = x[c0]!;
    const f = j.friction === 'required' ? x[c1!]! : n * s.mu[i]!;
    env.jn[i] = n;
    env.jt[i] = f;
    env.jfx[i] = n * nx - f * ny;
    env.jfy[i] = n * ny + f * nx;
  });
  t.members.forEach((m, i) => {
    env.axial[i] = x[m.column]!;
  });
  t.loads.forEach((l, i) => {
    if (l.kind === 'couple') {
      env.lmag[i] = l.unknownColumn !== undefined ? x[l.unknownColumn]! * s.length : s.kfx[i]!;
      env.lfx[i] = 0;
      env.lfy[i] = 0;
    } else if (l.unknown) {
      const mag = x[l.unknown.column]!;
      env.lmag[i] = mag;
      env.lfx[i] = mag * s.dx[i]!;
      env.lfy[i] = mag * s.dy[i]!;
    } else {
      env.lfx[i] = s.kfx[i]!;
      env.lfy[i] = s.kfy[i]!;
      env.lmag[i] = len(s.kfx[i]!, s.kfy[i]!);
    }
  });
}

/** `what` and `name` are joined only on failure: building the message on every call would cost more than the solve. */
function finite(v: number, what: string, name = ''): number {
  if (!Number.isFinite(v)) {
    throw new EngineError({ kind: 'numeric', message: `${what}${name} is not a finite number (${v}); the configuration cannot be evaluated` });
  }
  return v === 0 ? 0 : v;
}

function valueOut(key: string, label: string, quantity: ResultValue['quantity'], v: number, help?: string): ResultValue {
  const out: ResultValue = Number.isFinite(v)
    ? { key, label, quantity, value: v === 0 ? 0 : v }
    : { key, label, quantity, value: null, note: Number.isNaN(v) ? 'not defined for this configuration' : 'unbounded here (for a friction result: the contact would pull apart, so no friction can hold it)' };
  if (help) out.help = help;
  return out;
}

/** One full solve: every point, free body, member, joint, result, check and the verification block. */
export function solve(specOrCompiled: TemplateSpecInput | TemplateSpec | CompiledTemplate, inputs: Record<string, unknown> = {}): SolveOutcome {
  const t = 'pointOps' in specOrCompiled ? (specOrCompiled as CompiledTemplate) : prepare(specOrCompiled);
  let values: Float64Array;
  try {
    values = resolveInputs(t, inputs);
    return buildResult(t, values, solveCore(t, values));
  } catch (err) {
    if (err instanceof EngineError) return { ok: false, error: withLimitBehaviour(t, err.info, inputs) };
    throw err;
  }
}

function buildResult(t: CompiledTemplate, values: Float64Array, core: CoreSolve): SolveResult {
  const { env, system: s } = core;
  const pn = t.pointNames;
  const points: SolveResult['points'] = {};
  pn.forEach((name, i) => {
    points[name] = { x: finite(env.px[i]!, 'x of ', name), y: finite(env.py[i]!, 'y of ', name) };
  });
  type Force = SolveResult['freeBodies'][number]['forces'][number];
  const force = (source: Force['source'], id: string, label: string, point: number, fx: number, fy: number): Force => ({
    source,
    id,
    label,
    at: pn[point]!,
    x: env.px[point]!,
    y: env.py[point]!,
    fx: finite(fx, label),
    fy: finite(fy, label),
    magnitude: len(fx, fy),
  });
  const freeBodies: SolveResult['freeBodies'] = [];
  for (let pi = 0; pi < t.parts.length; pi++) {
    const p = t.parts[pi]!;
    freeBodies.push({ part: p.id, label: p.label, forces: [], couples: [] });
  }
  for (let i = 0; i < t.joints.length; i++) {
    const j = t.joints[i]!;
    const [a, b] = j.parts;
    if (a >= 0) freeBodies[a]!.forces.push(force('joint', j.id, j.sideLabels[0], j.point, env.jfx[i]!, env.jfy[i]!));
    if (b >= 0) freeBodies[b]!.forces.push(force('joint', j.id, j.sideLabels[1], j.point, -env.jfx[i]!, -env.jfy[i]!));
  }
  for (let i = 0; i < t.members.length; i++) {
    const m = t.members[i]!;
    const T = env.axial[i]!;
    const fx = T * s.ux[m.column]!;
    const fy = T * s.uy[m.column]!;
    if (m.parts[0] >= 0) freeBodies[m.parts[0]]!.forces.push(force('member', m.id, m.label, m.ends[0], fx, fy));
    if (m.parts[1] >= 0) freeBodies[m.parts[1]]!.forces.push(force('member', m.id, m.label, m.ends[1], -fx, -fy));
  }
  for (let i = 0; i < t.loads.length; i++) {
    const l = t.loads[i]!;
    if (l.part < 0) continue;
    if (l.kind === 'couple') freeBodies[l.part]!.couples.push({ id: l.id, label: l.label, moment: finite(env.lmag[i]!, l.label) });
    else freeBodies[l.part]!.forces.push(force('load', l.id, l.label, l.point, env.lfx[i]!, env.lfy[i]!));
  }

  const scale = Math.max(s.loadScale, 1e-300);
  const members: SolveResult['members'] = t.members.map((m, i) => {
    const T = finite(env.axial[i]!, 'axial force of ', m.label);
    return {
      id: m.id,
      label: m.label,
      ends: [pn[m.ends[0]]!, pn[m.ends[1]]!],
      axial: T,
      state: Math.abs(T) <= 1e-9 * scale ? 'unloaded' : T > 0 ? 'tension' : 'compression',
    };
  });
  const joints: SolveResult['joints'] = t.joints.map((j, i) => {
    const fx = finite(env.jfx[i]!, 'force at ', j.label);
    const fy = finite(env.jfy[i]!, 'force at ', j.label);
    const out: SolveResult['joints'][number] = { id: j.id, label: j.label, kind: j.kind, at: pn[j.point]!, between: j.partIds, fx, fy, resultant: len(fx, fy) };
    if (j.kind !== 'pin') {
      out.normal = env.jn[i]!;
      out.friction = env.jt[i]!;
      out.muRequired = env.jn[i]! > 0 ? Math.abs(env.jt[i]!) / env.jn[i]! : null;
    }
    return out;
  });
  const loads: SolveResult['loads'] = t.loads.map((l, i) => {
    const out: SolveResult['loads'][number] = {
      id: l.id,
      label: l.label,
      kind: l.kind,
      on: l.partId,
      fx: finite(env.lfx[i]!, 'load ', l.label),
      fy: finite(env.lfy[i]!, 'load ', l.label),
      magnitude: finite(env.lmag[i]!, 'load ', l.label),
      solved: l.kind === 'force' ? !!l.unknown : l.unknownColumn !== undefined,
    };
    if (l.kind === 'force') out.at = pn[l.point]!;
    return out;
  });

  const results = t.results.map((r) => valueOut(r.key, r.label, r.quantity ?? 'ratio', env.v[r.slot]!, r.help));
  const checks: SolveResult['checks'] = t.checks.map((c) => {
    const p = c.pass(env);
    const w = c.warn ? c.warn(env) : 0;
    if (Number.isNaN(p) || Number.isNaN(w)) {
      return { key: c.key, label: c.label, verdict: 'fail', advice: c.advice, note: 'could not be evaluated for this configuration' };
    }
    return { key: c.key, label: c.label, verdict: !p ? c.severity : w ? 'warn' : 'pass', advice: c.advice };
  });
  const inputsOut: Record<string, number> = {};
  t.inputs.forEach((inp, i) => (inputsOut[inp.key] = values[i]!));

  return {
    ok: true,
    inputs: inputsOut,
    derived: t.derived.map((d) => valueOut(d.key, d.label, d.quantity ?? 'ratio', env.v[d.slot]!)),
    points,
    freeBodies,
    members,
    joints,
    loads,
    results,
    checks,
    cautions: t.spec.cautions,
    warnings: core.warnings,
    verification: verify(t, values, core, freeBodies),
  };
}

/** At a dead centre, say how large the forces become a little way off it, along the drive input. */
function withLimitBehaviour(t: CompiledTemplate, info: EngineErrorInfo, given: Record<string, unknown>): EngineErrorInfo {
  if (info.kind !== 'dead-centre') return info;
  const idx = t.drive ? t.drive.input : t.inputs.findIndex((i) => i.quantity === 'angle');
  if (idx < 0) return info;
  const inp = t.inputs[idx]!;
  let base: Float64Array;
  try {
    base = resolveInputs(t, given);
  } catch {
    return info;
  }
  const nearby: { value: number; largestForce: number }[] = [];
  for (const frac of [-0.02, -0.01, 0.01, 0.02]) {
    const v = base[idx]! + frac * (inp.max - inp.min);
    if (v < inp.min || v > inp.max) continue;
    const moved = base.slice();
    moved[idx] = v;
    try {
      const { env } = solveCore(t, moved);
      let largest = 0;
      for (let i = 0; i < env.jfx.length; i++) largest = Math.max(largest, len(env.jfx[i]!, env.jfy[i]!));
      for (const a of env.axial) largest = Math.max(largest, Math.abs(a));
      nearby.push({ value: v, largestForce: largest });
    } catch {
      // Also singular or unbuildable there: leave that neighbour out.
    }
  }
  return { ...info, details: { ...info.details, input: inp.key, nearby } };
}
