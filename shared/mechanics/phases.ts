import type { CompiledTemplate } from './compile-template';
import { EngineError } from './errors';
import { buildPoints } from './geometry';
import { SolveEnv } from './solve-env';

/** The phases before statics: inputs resolved, derived values evaluated, points built. */
export function newEnv(t: CompiledTemplate): SolveEnv {
  return new SolveEnv({
    values: t.valueCount,
    points: t.pointNames.length,
    joints: t.joints.length,
    members: t.members.length,
    loads: t.loads.length,
  });
}

/** Input values in spec order, defaults for those not given; an EngineError names a bad field. */
export function resolveInputs(t: CompiledTemplate, given: Record<string, unknown> = {}): Float64Array {
  const values = new Float64Array(t.inputs.length);
  for (const key of Object.keys(given)) {
    if (!t.inputs.some((i) => i.key === key)) {
      throw new EngineError({ kind: 'input', path: ['inputs', key], message: `${key}: this template has no input of that name` });
    }
  }
  t.inputs.forEach((inp, i) => {
    const raw = Object.prototype.hasOwnProperty.call(given, inp.key) ? given[inp.key] : inp.default;
    if (typeof raw !== 'number' || !Number.isFinite(raw)) {
      throw new EngineError({ kind: 'input', path: ['inputs', inp.key], message: `${inp.label}: must be a finite number` });
    }
    if (raw < inp.min || raw > inp.max) {
      throw new EngineError({ kind: 'input', path: ['inputs', inp.key], message: `${inp.label}: ${raw} is outside the allowed range ${inp.min} to ${inp.max}` });
    }
    if (inp.control === 'choice' && inp.choices && !inp.choices.some((c) => c.value === raw)) {
      throw new EngineError({ kind: 'input', path: ['inputs', inp.key], message: `${inp.label}: ${raw} is not one of ${inp.choices.map((c) => c.value).join(', ')}` });
    }
    values[i] = raw;
  });
  return values;
}

/** Derived values and points for given inputs: the geometry phase alone (virtual work reuses it). */
export function buildGeometry(t: CompiledTemplate, inputs: Float64Array, env: SolveEnv): void {
  env.v.set(inputs);
  for (const d of t.derived) {
    const v = d.evaluate(env);
    if (!Number.isFinite(v)) {
      throw new EngineError({ kind: 'expression', path: ['derived', d.key], message: `${d.label}: evaluates to ${v}, not a finite number` });
    }
    env.v[d.slot] = v;
  }
  buildPoints(t.pointOps, t.pointNames, env);
}

