import { Matrix, solve as mlSolve } from 'ml-matrix';
import { luFactor, luSolve } from '../shared/mechanics/linear/lu';
import { buildPoints } from '../shared/mechanics/geometry';
import { newEnv, resolveInputs } from '../shared/mechanics/phases';
import { sweep, tornado } from '../shared/mechanics/sensitivity';
import { prepare, solve, solveCore } from '../shared/mechanics/solve';
import { assemble } from '../shared/mechanics/statics/assemble';
import { solveEquilibrium } from '../shared/mechanics/statics/classify';
import { fivePartFrame } from './fixtures/five-part-frame';
import { fmt, measure } from './measure';
import { plainLuSolve } from './plain-lu';

/** The engine section of `npm run bench`: every figure measured in this run, ratios against baselines measured beside it. */
export function benchEngine(): { rows: string[][]; pass: boolean } {
  const t = prepare(fivePartFrame);
  const inputs = resolveInputs(t, {});
  const full = measure(() => solve(t, {}));
  const core = measure(() => solveCore(t, inputs));

  // Where a solve's time goes: each phase alone, on state prepared by the phases before it.
  const env = newEnv(t);
  env.v.set(inputs);
  const expressions = measure(() => {
    for (const d of t.derived) env.v[d.slot] = d.evaluate(env);
  });
  const geometry = measure(() => buildPoints(t.pointOps, t.pointNames, env));
  const assembly = measure(() => assemble(t, env));
  const system = assemble(t, env);
  const factorisation = measure(() => solveEquilibrium(t, system, () => false));
  const solved = solveCore(t, inputs);
  const results = measure(() => {
    for (const r of t.results) solved.env.v[r.slot] = r.evaluate(solved.env);
  });

  // The same linear system three ways.
  const n = system.n;
  const engineLinear = measure(() => luSolve(luFactor(Float64Array.from(system.a), n), system.b));
  const plain = measure(() => plainLuSolve(system.a, system.b, n));
  const rows2d = Array.from({ length: n }, (_, i) => Array.from(system.a.subarray(i * n, (i + 1) * n)));
  const library = measure(() => mlSolve(new Matrix(rows2d), Matrix.columnVector(Array.from(system.b))));

  const sweep200 = measure(() => sweep(t, {}, { input: 'P1', steps: 200 }), { batches: 15, batchMs: 40 });
  const tornadoInputs = t.inputs.slice(0, 10).map((i) => i.key);
  const tornado10 = measure(() => tornado(t, {}, { result: 'T1', inputs: tornadoInputs }), { batches: 15, batchMs: 40 });

  const goal = (ok: boolean) => (ok ? 'met' : 'MISSED');
  const rows = [
    ['figure', 'median', 'ratio', 'goal'],
    [`one full solve (${t.parts.length} parts, ${n} unknowns, with free bodies and verification)`, fmt(full), `${(full / plain).toFixed(1)}× plain LU`, `< 20 µs: ${goal(full < 20)}`],
    ['  core solve (geometry, statics, results)', fmt(core), `${(core / full * 100).toFixed(0)} % of full`, ''],
    ['  expressions (derived values)', fmt(expressions), '', ''],
    ['  geometry (points)', fmt(geometry), '', ''],
    ['  assembly (matrix and loads)', fmt(assembly), '', ''],
    ['  factorisation and classification', fmt(factorisation), '', ''],
    ['  results (result expressions)', fmt(results), '', ''],
    ['  output and verification', fmt(Math.max(0, full - core)), '', ''],
    [`200-step sweep`, fmt(sweep200), `${(sweep200 / full).toFixed(0)}× one solve`, `< 5 ms: ${goal(sweep200 < 5000)}`],
    [`tornado over ${tornadoInputs.length} inputs (±10 % and elasticities: ${tornadoInputs.length * 4 + 1} solves)`, fmt(tornado10), `${(tornado10 / full).toFixed(0)}× one solve`, `< 2 ms: ${goal(tornado10 < 2000)}`],
    [`linear solve ${n}×${n}: engine LU`, fmt(engineLinear), `${(engineLinear / plain).toFixed(2)}× plain LU`, `within 3×: ${goal(engineLinear < 3 * plain)}`],
    [`linear solve ${n}×${n}: plain hand-written LU (baseline)`, fmt(plain), '1.00×', ''],
    [`linear solve ${n}×${n}: ml-matrix solve (baseline)`, fmt(library), `${(library / plain).toFixed(1)}× plain LU`, ''],
  ];
  const pass = full < 20 && sweep200 < 5000 && tornado10 < 2000 && engineLinear < 3 * plain;
  return { rows, pass };
}
