import type { CompiledTemplate } from './compile-template';
import { buildGeometry, newEnv } from './phases';
import type { CoreSolve } from './solve';
import type { SolveResult } from './solve-result';
import { len } from './vec';

type FreeBodies = SolveResult['freeBodies'];
type Verification = SolveResult['verification'];

/**
 * Checks every solve against itself by routes other than the one that produced it:
 * each part's equilibrium re-summed from its free-body list about the origin (not the
 * centroid the matrix used), the global balance of external loads against ground reactions,
 * and, where a drive is declared, the mechanical advantage from virtual work on a
 * finite-difference motion of the geometry.
 */
export function verify(t: CompiledTemplate, inputs: Float64Array, core: CoreSolve, bodies: FreeBodies): Verification {
  const { env, system } = core;
  let forceScale = 0;
  for (const b of bodies) for (const f of b.forces) forceScale = Math.max(forceScale, f.magnitude);
  for (const b of bodies) for (const c of b.couples) forceScale = Math.max(forceScale, Math.abs(c.moment) / system.length);
  forceScale = forceScale || 1;
  const momentScale = forceScale * system.length;

  let maxResidual = 0;
  let residualPart: string | null = null;
  for (const b of bodies) {
    let fx = 0;
    let fy = 0;
    let mz = 0;
    for (const f of b.forces) {
      fx += f.fx;
      fy += f.fy;
      mz += f.x * f.fy - f.y * f.fx;
    }
    for (const c of b.couples) mz += c.moment;
    const r = Math.max(Math.abs(fx) / forceScale, Math.abs(fy) / forceScale, Math.abs(mz) / momentScale);
    if (r >= maxResidual) {
      maxResidual = r;
      residualPart = b.label;
    }
  }

  // External loads plus what the ground gives: internal pins and members cancel out of this.
  let gx = 0;
  let gy = 0;
  let gm = 0;
  const add = (x: number, y: number, fx: number, fy: number) => {
    gx += fx;
    gy += fy;
    gm += x * fy - y * fx;
  };
  t.loads.forEach((l, i) => {
    if (l.part < 0) return;
    if (l.kind === 'couple') gm += env.lmag[i]!;
    else add(env.px[l.point]!, env.py[l.point]!, env.lfx[i]!, env.lfy[i]!);
  });
  t.joints.forEach((j, i) => {
    const [a, b] = j.parts;
    if (a >= 0 && b < 0) add(env.px[j.point]!, env.py[j.point]!, env.jfx[i]!, env.jfy[i]!);
    if (b >= 0 && a < 0) add(env.px[j.point]!, env.py[j.point]!, -env.jfx[i]!, -env.jfy[i]!);
  });
  t.members.forEach((m, i) => {
    const [a, b] = m.parts;
    const T = env.axial[i]!;
    const ux = system.ux[m.column]!;
    const uy = system.uy[m.column]!;
    if (a >= 0 && b < 0) add(env.px[m.ends[0]]!, env.py[m.ends[0]]!, T * ux, T * uy);
    if (b >= 0 && a < 0) add(env.px[m.ends[1]]!, env.py[m.ends[1]]!, -T * ux, -T * uy);
  });
  const relative = Math.max(Math.abs(gx) / forceScale, Math.abs(gy) / forceScale, Math.abs(gm) / momentScale);

  const vw = virtualWork(t, inputs, core);
  return {
    maxResidual,
    residualPart,
    globalBalance: { fx: gx, fy: gy, moment: gm, relative },
    virtualWork: vw.result,
    ...(vw.note ? { virtualWorkNote: vw.note } : {}),
    conditioning: core.rcond,
  };
}

/**
 * Virtual work for an ideal (frictionless) mechanism: Σ F·δr + Σ M·δθ = 0 over the loads, the
 * ground reactions doing no work. δr comes from rebuilding the geometry with the drive input
 * moved ±h (central difference, error of order h²). When effort or output is the one load of
 * unknown magnitude, virtual work gives that magnitude independently of the equilibrium solve.
 */
function virtualWork(t: CompiledTemplate, inputs: Float64Array, core: CoreSolve): { result: Verification['virtualWork']; note?: string } {
  if (!t.drive) return { result: null };
  if (t.dissipative) return { result: null, note: 'Not applicable: a contact slips with friction, which dissipates work.' };
  const { input, effort, output } = t.drive;
  const inp = t.inputs[input]!;
  const span = inp.max - inp.min || Math.abs(inputs[input]!) || 1;
  const h = 1e-5 * span;
  const v0 = inputs[input]!;
  const positions = (v: number) => {
    const moved = inputs.slice();
    moved[input] = v;
    const env = newEnv(t);
    buildGeometry(t, moved, env);
    return env;
  };
  // Central difference inside the range; at an end, the second-order one-sided difference
  // (−3 f0 + 4 f1 − f2) / 2h, so the check keeps its O(h²) accuracy there too.
  let drx: (p: number) => number;
  let dry: (p: number) => number;
  try {
    if (v0 - h >= inp.min && v0 + h <= inp.max) {
      const plus = positions(v0 + h);
      const minus = positions(v0 - h);
      drx = (p) => (plus.px[p]! - minus.px[p]!) / (2 * h);
      dry = (p) => (plus.py[p]! - minus.py[p]!) / (2 * h);
    } else {
      const s = v0 - h < inp.min ? 1 : -1;
      const f1 = positions(v0 + s * h);
      const f2 = positions(v0 + 2 * s * h);
      const f0 = core.env;
      drx = (p) => (s * (-3 * f0.px[p]! + 4 * f1.px[p]! - f2.px[p]!)) / (2 * h);
      dry = (p) => (s * (-3 * f0.py[p]! + 4 * f1.py[p]! - f2.py[p]!)) / (2 * h);
    }
  } catch {
    return { result: null, note: 'Not available: the geometry cannot be built a small step away from this configuration.' };
  }
  const partRotation = (part: number): number => {
    const outline = t.parts[part]!.outline;
    const a = outline[0]!;
    const b = outline.find((k) => len(core.env.px[k]! - core.env.px[a]!, core.env.py[k]! - core.env.py[a]!) > 0);
    if (b === undefined) return 0;
    const rx = core.env.px[b]! - core.env.px[a]!;
    const ry = core.env.py[b]! - core.env.py[a]!;
    return (rx * (dry(b) - dry(a)) - ry * (drx(b) - drx(a))) / (rx * rx + ry * ry);
  };
  const env = core.env;
  const rate = (i: number): number => {
    const l = t.loads[i]!;
    if (l.part < 0) return 0;
    if (l.kind === 'couple') return env.lmag[i]! * partRotation(l.part);
    return env.lfx[i]! * drx(l.point) + env.lfy[i]! * dry(l.point);
  };
  const dirRate = (i: number): number => {
    const l = t.loads[i]!;
    if (l.part < 0) return 0;
    const m = env.lmag[i]!;
    return m !== 0 ? rate(i) / m : 0;
  };
  const magnitude = (i: number) => Math.abs(env.lmag[i]!);
  const fromEquilibrium = magnitude(output) / (magnitude(effort) || Number.MIN_VALUE);
  const unknownLoads = t.loads.map((l, i) => ((l.kind === 'force' && l.unknown) || (l.kind === 'couple' && l.unknownColumn !== undefined) ? i : -1)).filter((i) => i >= 0);

  let fromVirtualWork: number;
  if (unknownLoads.length === 1 && (unknownLoads[0] === output || unknownLoads[0] === effort)) {
    const u = unknownLoads[0]!;
    const ul = t.loads[u]!;
    // Work per unit magnitude of the unknown load: its direction along its point's motion, or
    // for a couple its part's rotation.
    const along = ul.kind === 'couple' ? partRotation(ul.part) : core.system.dx[u]! * drx(ul.point) + core.system.dy[u]! * dry(ul.point);
    let others = 0;
    t.loads.forEach((_, i) => {
      if (i !== u) others += rate(i);
    });
    if (Math.abs(along) < 1e-12) return { result: null, note: 'Not available: the loaded point does not move along its load in this motion.' };
    const solvedByWork = -others / along;
    fromVirtualWork = u === output ? Math.abs(solvedByWork) / (magnitude(effort) || Number.MIN_VALUE) : magnitude(output) / (Math.abs(solvedByWork) || Number.MIN_VALUE);
  } else {
    // Both loads known: the ideal ratio from kinematics alone (valid when only these two work).
    const re = dirRate(effort);
    const ro = dirRate(output);
    if (ro === 0) return { result: null, note: 'Not available: the output point does not move along its load in this motion.' };
    fromVirtualWork = Math.abs(re / ro);
  }
  const relativeDifference = Math.abs(fromVirtualWork - fromEquilibrium) / Math.max(Math.abs(fromEquilibrium), 1e-300);
  return {
    result: {
      input: inp.key,
      effort: t.loads[effort]!.id,
      output: t.loads[output]!.id,
      fromEquilibrium,
      fromVirtualWork,
      relativeDifference,
    },
  };
}
