import { describe, expect, it } from 'vitest';
import { EngineError } from '../../shared/mechanics/errors';
import { sweep, tornado } from '../../shared/mechanics/sensitivity';
import { prepare } from '../../shared/mechanics/solve';
import { toggleSpec } from './fixtures/toggle';
import { D, expectClose } from './helpers';

const t = prepare(toggleSpec);

describe('sweep', () => {
  it('follows the closed form P = Q / (2 tan α) step by step', () => {
    const out = sweep(t, { Q: 150 }, { input: 'alpha', from: 5, to: 45, steps: 9, results: ['P'] });
    expect(out.steps).toHaveLength(9);
    expect(out.series).toEqual([{ key: 'P', label: 'Clamping force', quantity: 'force' }]);
    out.steps.forEach((s, i) => {
      expectClose(s.value, 5 + 5 * i);
      expect(s.ok).toBe(true);
      if (s.ok) expectClose(s.values.P!, 150 / (2 * Math.tan(s.value * D)));
    });
  });

  it('keeps steps that cannot be solved, marked with their reason, instead of dropping them', () => {
    const out = sweep(t, {}, { input: 'alpha', from: 0, to: 10, steps: 11 });
    expect(out.steps).toHaveLength(11);
    const first = out.steps[0]!;
    expect(first.ok).toBe(false);
    if (!first.ok) expect(first.error.kind).toBe('dead-centre');
    expect(out.steps.slice(1).every((s) => s.ok)).toBe(true);
  });

  it('refuses a range outside the input bounds and an unknown result, naming the field', () => {
    expect(() => sweep(t, {}, { input: 'alpha', from: -5, to: 10, steps: 3 })).toThrow(/from: -5 lies outside the range of Link angle/);
    expect(() => sweep(t, {}, { input: 'alpha', steps: 3, results: ['nope'] })).toThrow(EngineError);
    expect(() => sweep(t, {}, { input: 'beta', steps: 3 })).toThrow(/beta: this template has no input/);
  });
});

describe('tornado', () => {
  // Elasticities of P = Q / (2 tan α): ∂lnP/∂lnQ = 1; ∂lnP/∂lnL = 0; ∂lnP/∂lnα = −2α/sin 2α
  // (α in radians), from differentiating ln P = ln Q − ln 2 − ln tan α.
  it('ranks inputs by swing and gives elasticities that match the closed form', () => {
    const out = tornado(t, { alpha: 10, Q: 150, L: 100 }, { result: 'P', percent: 10 });
    const byKey = Object.fromEntries(out.bars.map((b) => [b.input, b]));
    expectClose(byKey.Q!.elasticity!, 1, 1e-6);
    expect(Math.abs(byKey.L!.elasticity!)).toBeLessThan(1e-6);
    const a = 10 * D;
    expectClose(byKey.alpha!.elasticity!, (-2 * a) / Math.sin(2 * a), 1e-6);
    // The swing of Q is exactly 20 % of the base; α moves P more than Q does; L not at all.
    expectClose(byKey.Q!.swing, 0.2 * out.base, 1e-9);
    expect(out.bars.map((b) => b.input)).toEqual(['alpha', 'Q', 'L']);
    expectClose(out.base, 150 / (2 * Math.tan(a)));
  });

  it('stops at a bound and says so, and moves an input at zero by a share of its range', () => {
    const out = tornado(t, { alpha: 78, Q: 150 }, { result: 'MA', percent: 10 });
    const alpha = out.bars.find((b) => b.input === 'alpha')!;
    expect(alpha.high.input).toBe(80);
    expect(alpha.high.note).toMatch(/stopped at the maximum of Link angle/);
    // Q at zero: ±10 % of its 0…1e6 range, the low side stopped at 0; P is zero there, so no
    // elasticity is defined.
    const atZero = tornado(t, { alpha: 20, Q: 0 }, { result: 'P', percent: 10 });
    const q = atZero.bars.find((b) => b.input === 'Q')!;
    expect(q.high.input).toBe(1e5);
    expect(q.low.input).toBe(0);
    expect(q.elasticity).toBeNull();
    expect(q.high.value).toBeCloseTo(1e5 / (2 * Math.tan(20 * D)), 6);
  });
});
