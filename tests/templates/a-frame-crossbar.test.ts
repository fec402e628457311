import { describe, expect, it } from 'vitest';
import { solve } from '../../shared/mechanics/solve';
import type { TemplateSpecInput } from '../../shared/spec/template-spec';
import { aFrameCrossbar } from '../../templates/a-frame-crossbar/spec';
import { D, ok, result, verdict } from '../engine/helpers';

const g = 9.80665;

/** The same frame without the crossbar, both feet on the floor with the friction they need. */
const withoutBar: TemplateSpecInput = {
  ...aFrameCrossbar,
  members: [],
  joints: [
    { id: 'apex', kind: 'pin', at: 'A', between: ['left', 'right'] },
    { id: 'footB', kind: 'contact', at: 'B', between: ['left', 'ground'], normal: { angle: 90 }, friction: 'required' },
    { id: 'footC', kind: 'contact', at: 'C', between: ['right', 'ground'], normal: { angle: 90 }, friction: 'required' },
  ],
  results: [
    { key: 'muB', label: 'mu B', quantity: 'coefficient', expr: "muRequired('footB')" },
    { key: 'muC', label: 'mu C', quantity: 'coefficient', expr: "muRequired('footC')" },
    { key: 'HC', label: 'H C', quantity: 'force', expr: "abs(friction('footC'))" },
  ],
  checks: [],
  references: [],
  dimensions: [],
};

describe('A-frame with a crossbar: independent hand check', () => {
  // Hand check (ours): L = 2 m legs at α = 30° from vertical, crossbar s = 0.8 m from the apex
  // (40 %), 200 kg hung d = 1.2 m up the left leg (60 %), legs 10 kg each at mid-length.
  // P = 1961.33 N, W_l = 98.0665 N.
  // Whole frame, moments about the pinned foot B (feet 2 L sin α apart, load at d sin α, leg
  // weights at L sin α / 2 and 3 L sin α / 2):
  //   N_C = P d / (2L) + W_l = 1961.33 × 0.3 + 98.07 = 686.47 N; N_B = P + 2 W_l − N_C = 1471.00 N.
  // Right leg about the apex A: N_C L sin α − W_l (L/2) sin α − T s cos α = 0
  //   T = (N_C − W_l/2) L tan α / s = (P d + W_l L) tan α / (2 s) = 2 549 729 × 0.57735 / 1600 = 920.05 N.
  // Apex pin on the left leg from the right: (−T, N_C − W_l) → √(920.05² + 588.40²) = 1092.11 N.
  // Without the bar the right leg, about A, needs a foot thrust H = (N_C − W_l/2) tan α
  //   = 637.43 × 0.57735 = 368.02 N, the same at both feet; μ at C = 368.02 / 686.47 = 0.5361,
  //   at B = 368.02 / 1471.00 = 0.2502, so C is the critical foot.
  const inputs = { m: 200, mLeg: 10, L: 2000, alpha: 30, barAt: 40, loadAt: 60 };

  it('crossbar, apex pin and feet', () => {
    const r = solve(aFrameCrossbar, inputs);
    const P = 200 * g;
    const Wl = 10 * g;
    const NC = (P * 1200) / 4000 + Wl;
    const T = ((P * 1200 + Wl * 2000) * Math.tan(30 * D)) / 1600;
    expect(result(r, 'NC')).toBeCloseTo(NC, 6);
    expect(result(r, 'NC')).toBeCloseTo(686.47, 1);
    expect(result(r, 'NB')).toBeCloseTo(P + 2 * Wl - NC, 6);
    expect(result(r, 'NB')).toBeCloseTo(1471.0, 1);
    expect(result(r, 'T')).toBeCloseTo(T, 6);
    expect(result(r, 'T')).toBeCloseTo(920.05, 1);
    expect(result(r, 'Rapex')).toBeCloseTo(Math.hypot(T, NC - Wl), 6);
    expect(result(r, 'Rapex')).toBeCloseTo(1092.11, 1);
    expect(Math.abs(result(r, 'HB'))).toBeLessThan(1e-9 * P);
    expect(result(r, 'Tdesign')).toBeCloseTo(3 * T, 6);
    expect(result(r, 'spread')).toBeCloseTo(2000, 6);
  });

  it('friction needed without the crossbar, against the engine solving the frame without it', () => {
    const r = solve(aFrameCrossbar, inputs);
    const free = solve(withoutBar, inputs);
    expect(result(r, 'Hfree')).toBeCloseTo(368.02, 1);
    expect(result(r, 'muNoBar')).toBeCloseTo(0.5361, 4);
    // The three-hinged frame solved by the engine gives the same thrust and the same critical foot.
    expect(result(free, 'HC')).toBeCloseTo(result(r, 'Hfree'), 6);
    expect(result(free, 'muC')).toBeCloseTo(result(r, 'muNoBar'), 9);
    expect(result(free, 'muB')).toBeCloseTo(0.2502, 4);
    expect(result(free, 'muB')).toBeLessThan(result(free, 'muC'));
    // Weightless legs: tan α at the critical foot wherever the load sits above the foot.
    for (const loadAt of [10, 50, 100]) {
      const w = solve(aFrameCrossbar, { ...inputs, mLeg: 0, loadAt });
      expect(result(w, 'muNoBar')).toBeCloseTo(Math.tan(30 * D), 9);
      expect(result(solve(withoutBar, { ...inputs, mLeg: 0, loadAt }), 'muC')).toBeCloseTo(Math.tan(30 * D), 9);
    }
  });

  it('the crossbar tension follows T = P d tan α / (2 s) as the load moves up the leg', () => {
    for (const loadAt of [0, 25, 75, 100]) {
      const r = solve(aFrameCrossbar, { ...inputs, mLeg: 0, loadAt });
      const d = (2000 * loadAt) / 100;
      expect(result(r, 'T')).toBeCloseTo((200 * g * d * Math.tan(30 * D)) / 1600, 6);
    }
  });

  it('passes the no-crossbar check on a grippy floor, warns near the limit and when the feet would slide', () => {
    // Weightless legs, α = 20°: μ needed without the bar is tan 20° = 0.364.
    const base = { ...inputs, mLeg: 0, alpha: 20 };
    expect(verdict(solve(aFrameCrossbar, { ...base, muFloor: 0.8 }), 'noBar')).toBe('pass');
    expect(verdict(solve(aFrameCrossbar, { ...base, muFloor: 0.5 }), 'noBar')).toBe('warn');
    const sliding = ok(solve(aFrameCrossbar, { ...base, muFloor: 0.3 }));
    expect(sliding.checks.find((c) => c.key === 'noBar')!.verdict).toBe('warn');
    expect(result(sliding, 'muNoBar')).toBeGreaterThan(0.3);
  });
});
