import type { CompiledTemplate } from '../compile-template';
import { EngineError } from '../errors';
import { luFactor, luSolve } from '../linear/lu';
import { leastSquares, nullSpace, pivotedQr, transpose } from '../linear/qr';
import type { Assembled } from './assemble';

/**
 * Reciprocal-condition thresholds on the LU pivots of the scaled system (entries of order
 * one). Below SINGULAR the matrix is treated as rank-deficient and explained by a pivoted QR;
 * below DEAD_CENTRE the configuration is reported as singular rather than printing forces ten
 * thousand times the load; below CLOSE a warning says the forces are very geometry-sensitive.
 * For the plain toggle the pivot ratio is close to 2·sin α (α the link angle from straight),
 * so DEAD_CENTRE stops it at about 0.003° (a ratio near 10⁴) and CLOSE warns below 0.3°; set
 * from that scale (tests/engine cover both sides of each threshold).
 */
export const SINGULAR = 1e-10;
export const DEAD_CENTRE = 1e-4;
export const CLOSE = 1e-2;

export interface LinearOutcome {
  x: Float64Array;
  rcond: number;
  warnings: string[];
}

/** Free motion of a singular system: which parts move and whether the loads work on it. */
export interface FreeMotion {
  parts: string[];
  loadsDoWork: boolean;
}

function freeMotions(t: CompiledTemplate, s: Assembled, relTol: number): FreeMotion[] {
  const qt = pivotedQr(transpose(s.a, s.m, s.n), s.n, s.m, relTol);
  const bNorm = Math.hypot(...s.b) || 1;
  return nullSpace(qt).map((y) => {
    const moves = new Float64Array(t.parts.length);
    for (let r = 0; r < s.m; r++) moves[s.rowPart[r]!] = Math.max(moves[s.rowPart[r]!]!, Math.abs(y[r]!));
    const parts = t.parts.filter((_, p) => moves[p]! > 1e-6).map((p) => p.label);
    let work = 0;
    for (let i = 0; i < s.m; i++) work += y[i]! * s.b[i]!;
    return { parts, loadsDoWork: Math.abs(work) > 1e-9 * bNorm };
  });
}

function redundantUnknowns(t: CompiledTemplate, s: Assembled, relTol: number): string[][] {
  const q = pivotedQr(s.a, s.m, s.n, relTol);
  return nullSpace(q).map((z) => t.columns.filter((_, k) => Math.abs(z[k]!) > 1e-6).map((c) => c.label));
}

const list = (xs: string[]) => (xs.length <= 1 ? xs.join('') : `${xs.slice(0, -1).join(', ')} and ${xs[xs.length - 1]}`);

/**
 * Solves the equilibrium system or explains why it cannot be solved. `structurallySingular`
 * is asked only for a square singular system: whether it stays singular when the geometry is
 * moved a little (then the spec itself lacks or repeats a support, rather than sitting at a
 * dead centre).
 */
export function solveEquilibrium(t: CompiledTemplate, s: Assembled, structurallySingular: () => boolean): LinearOutcome {
  const { m, n } = s;
  const warnings: string[] = [];
  if (m === n && n > 0) {
    const f = luFactor(s.a.slice(), n);
    const rcond = f.maxPivot > 0 ? f.minPivot / f.maxPivot : 0;
    if (rcond >= DEAD_CENTRE) {
      if (rcond < CLOSE) {
        warnings.push(
          'This configuration is close to a dead centre (members nearly in line): the forces change strongly with small changes of geometry, so tolerances and wear matter here.',
        );
      }
      return { x: luSolve(f, s.b), rcond, warnings };
    }
    if (rcond >= SINGULAR || !structurallySingular()) {
      const motions = freeMotions(t, s, Math.max(rcond * 10, SINGULAR));
      const moving = list([...new Set(motions.flatMap((mo) => mo.parts))]);
      const work = motions.some((mo) => mo.loadsDoWork);
      throw new EngineError({
        kind: 'dead-centre',
        message:
          `The mechanism is at or very near a dead centre: ${moving || 'its parts'} can move a little without any member changing length, so statics cannot hold the load here. ` +
          (work
            ? 'As the configuration approaches this position the forces grow without bound, roughly in inverse proportion to the remaining angle; move away from it (or add a stop) to get finite forces.'
            : 'The loads do no work on that small motion, so the forces stay finite but are not fixed by statics alone at this exact position.'),
        details: { rcond, movingParts: motions.flatMap((mo) => mo.parts), loadsDoWork: work },
      });
    }
  }
  // Not square, or singular for every nearby geometry: explain through rank.
  const q = pivotedQr(s.a, m, n, SINGULAR);
  const redundant = n - q.rank;
  const free = m - q.rank;
  if (redundant > 0) {
    const groups = redundantUnknowns(t, s, SINGULAR);
    const freeNote =
      free > 0 ? ` It also leaves ${free} free motion(s) (${list([...new Set(freeMotions(t, s, SINGULAR).flatMap((mo) => mo.parts))])}).` : '';
    throw new EngineError({
      kind: 'indeterminate',
      message:
        `Statically indeterminate: ${n} unknowns but only ${q.rank} independent equilibrium equations, so ${redundant} unknown(s) are redundant. ` +
        `Statics alone cannot share the load among ${list(groups[0] ?? [])}.${freeNote} Release a support or replace a pin by a roller, or model the stiffness.`,
      details: { unknowns: n, equations: m, rank: q.rank, redundant, groups },
    });
  }
  const { x, residual } = leastSquares(q, s.b);
  const bNorm = Math.hypot(...s.b);
  if (residual <= 1e-9 * Math.max(bNorm, 1e-300) || bNorm === 0) {
    warnings.push(
      `The assembly can move freely in ${free} way(s), but these loads happen to balance on it: any change in load position or direction would set it in motion.`,
    );
    return { x, rcond: 0, warnings };
  }
  const motions = freeMotions(t, s, SINGULAR);
  const moving = list([...new Set(motions.filter((mo) => mo.loadsDoWork).flatMap((mo) => mo.parts))]);
  throw new EngineError({
    kind: 'mechanism',
    message: `Not in equilibrium: ${moving || 'the parts'} can move (${free} free motion(s)) and the loads drive that motion. Add a support, a link or a load of unknown magnitude that holds it.`,
    details: { unknowns: n, equations: m, rank: q.rank, freeMotions: free, movingParts: motions.flatMap((mo) => mo.parts) },
  });
}
