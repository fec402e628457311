import type { CompiledTemplate } from './compile-template';
import { EngineError } from './errors';
import { resolveInputs } from './phases';
import { solveCore } from './solve';
import {
  sweepRequestSchema,
  tornadoRequestSchema,
  type SweepOutput,
  type SweepRequest,
  type TornadoOutput,
  type TornadoRequest,
} from './sensitivity-schema';

function resultSlot(t: CompiledTemplate, key: string, field: (string | number)[]): number {
  const r = t.results.find((x) => x.key === key);
  if (!r) {
    throw new EngineError({ kind: 'input', path: field, message: `${key}: this template has no result of that name (results: ${t.results.map((x) => x.key).join(', ')})` });
  }
  return r.slot;
}

function inputIndex(t: CompiledTemplate, key: string, field: (string | number)[]): number {
  const i = t.inputs.findIndex((x) => x.key === key);
  if (i < 0) throw new EngineError({ kind: 'input', path: field, message: `${key}: this template has no input of that name` });
  return i;
}

const finiteOrNull = (v: number) => (Number.isFinite(v) ? v : null);

/**
 * Solves at `steps` evenly spaced values of one input. A step whose mechanism cannot be built
 * or solved is kept, marked with its reason, so a chart can show the gap and say why.
 */
export function sweep(t: CompiledTemplate, given: Record<string, unknown>, request: SweepRequest): SweepOutput {
  const req = sweepRequestSchema.parse(request);
  const base = resolveInputs(t, given);
  const idx = inputIndex(t, req.input, ['input']);
  const inp = t.inputs[idx]!;
  const from = req.from ?? inp.min;
  const to = req.to ?? inp.max;
  for (const [name, v] of [['from', from], ['to', to]] as const) {
    if (v < inp.min || v > inp.max) {
      throw new EngineError({ kind: 'input', path: [name], message: `${name}: ${v} lies outside the range of ${inp.label} (${inp.min} to ${inp.max})` });
    }
  }
  const keys = req.results ?? t.results.map((r) => r.key);
  const slots = keys.map((k, i) => resultSlot(t, k, ['results', i]));
  const series = keys.map((k) => {
    const r = t.results.find((x) => x.key === k)!;
    return { key: k, label: r.label, quantity: r.quantity ?? 'ratio' };
  });
  const steps: SweepOutput['steps'] = [];
  const values = base.slice();
  for (let s = 0; s < req.steps; s++) {
    const value = from + ((to - from) * s) / (req.steps - 1);
    values[idx] = value;
    try {
      const { env } = solveCore(t, values);
      const out: Record<string, number | null> = {};
      keys.forEach((k, i) => (out[k] = finiteOrNull(env.v[slots[i]!]!)));
      steps.push({ value, ok: true, values: out });
    } catch (err) {
      if (!(err instanceof EngineError)) throw err;
      steps.push({ value, ok: false, error: { kind: err.info.kind, message: err.info.message } });
    }
  }
  return { input: { key: inp.key, label: inp.label, quantity: inp.quantity }, series, steps };
}

/**
 * Ranks inputs by how far a ±percent change of each moves one result (the tornado view), with
 * the elasticity at the operating point from a central difference. An input at zero is moved by
 * the percentage of its range instead; a move past a bound stops at the bound and says so.
 */
export function tornado(t: CompiledTemplate, given: Record<string, unknown>, request: TornadoRequest): TornadoOutput {
  const req = tornadoRequestSchema.parse(request);
  const base = resolveInputs(t, given);
  const slot = resultSlot(t, req.result, ['result']);
  const rdef = t.results.find((r) => r.key === req.result)!;
  const evalAt = (values: Float64Array): number | string => {
    try {
      const v = solveCore(t, values).env.v[slot]!;
      return Number.isFinite(v) ? v : 'the result is not finite there';
    } catch (err) {
      if (err instanceof EngineError) return err.info.message;
      throw err;
    }
  };
  const baseValue = evalAt(base);
  if (typeof baseValue === 'string') {
    throw new EngineError({ kind: 'input', path: ['result'], message: `${req.result}: cannot be evaluated at the operating point: ${baseValue}` });
  }
  const keys = req.inputs ?? t.inputs.filter((i) => i.control !== 'choice').map((i) => i.key);
  const bars = keys.map((key, k) => {
    const i = inputIndex(t, key, ['inputs', k]);
    const inp = t.inputs[i]!;
    const x0 = base[i]!;
    const delta = (Math.abs(x0) > 0 ? Math.abs(x0) : inp.max - inp.min) * (req.percent / 100);
    const side = (target: number) => {
      const clamped = Math.min(inp.max, Math.max(inp.min, target));
      const moved = base.slice();
      moved[i] = clamped;
      const v = evalAt(moved);
      const note = clamped !== target ? `stopped at the ${clamped === inp.max ? 'maximum' : 'minimum'} of ${inp.label}` : undefined;
      return typeof v === 'string'
        ? { input: clamped, value: null, note: note ? `${note}; ${v}` : v }
        : { input: clamped, value: v, ...(note ? { note } : {}) };
    };
    const low = side(x0 - delta);
    const high = side(x0 + delta);
    const swing =
      low.value !== null && high.value !== null
        ? Math.abs(high.value - low.value)
        : Math.abs((low.value ?? high.value ?? baseValue) - baseValue);
    let elasticity: number | null = null;
    if (x0 !== 0 && baseValue !== 0) {
      const h = Math.max(Math.abs(x0) * 1e-5, 1e-9);
      const lo = Math.max(inp.min, x0 - h);
      const hi = Math.min(inp.max, x0 + h);
      const a = base.slice();
      const b = base.slice();
      a[i] = lo;
      b[i] = hi;
      const ra = evalAt(a);
      const rb = evalAt(b);
      if (typeof ra === 'number' && typeof rb === 'number' && hi > lo) {
        const e = ((rb - ra) / (hi - lo)) * (x0 / baseValue);
        elasticity = Number.isFinite(e) ? e : null;
      }
    }
    return { input: key, label: inp.label, quantity: inp.quantity, low, high, swing, elasticity };
  });
  bars.sort((p, q) => q.swing - p.swing);
  return { result: { key: rdef.key, label: rdef.label, quantity: rdef.quantity ?? 'ratio' }, base: baseValue, percent: req.percent, bars };
}
