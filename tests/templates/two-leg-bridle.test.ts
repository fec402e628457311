import { describe, expect, it } from 'vitest';
import { solve } from '../../shared/mechanics/solve';
import { twoLegBridle } from '../../templates/two-leg-bridle/spec';
import { ok, result, verdict } from '../engine/helpers';

const g = 9.80665;

describe('two-leg sling bridle: independent hand check', () => {
  it('spreader bar under a load with its centre of gravity 70 % along', () => {
    // Hand check (ours): 8000 kg (W = 78 453.2 N), lifting points 6 m apart, CG 4.2 m from A
    // (1.8 m from B), spreader with 0.8 m drop lines, hook 1.5 m above the bar, above the CG.
    // Load, moments about B and A: V_A = W·1.8/6 = 23 536 N, V_B = W·4.2/6 = 54 917 N (the drop lines).
    // Bar ends: each leg's vertical part equals its drop line, its horizontal part loads the bar.
    //   Leg A: 4.2 m across, 1.5 m up, length 4.4598 m: T_A = V_A·4.4598/1.5 = 69 978 N, θ_A = 19.65°.
    //   Leg B: 1.8 m across, 1.5 m up, length 2.3431 m: T_B = V_B·2.3431/1.5 = 85 784 N, θ_B = 39.81°.
    //   Bar compression = V_A·4.2/1.5 = V_B·1.8/1.5 = 65 901 N. Hook 2.3 m above the lifting points.
    const r = solve(twoLegBridle, { m: 8000, D: 6000, cg: 70, h: 1500, spreader: 1, drop: 800 });
    const W = 8000 * g;
    const VA = (W * 1.8) / 6;
    const VB = (W * 4.2) / 6;
    expect(result(r, 'TA')).toBeCloseTo((VA * Math.hypot(4.2, 1.5)) / 1.5, 6);
    expect(result(r, 'TB')).toBeCloseTo((VB * Math.hypot(1.8, 1.5)) / 1.5, 6);
    expect(result(r, 'TA')).toBeCloseTo(69978, -1);
    expect(result(r, 'TB')).toBeCloseTo(85784, -1);
    expect(result(r, 'barC')).toBeCloseTo((VA * 4.2) / 1.5, 6);
    expect(result(r, 'barC')).toBeCloseTo((VB * 1.8) / 1.5, 6);
    expect(result(r, 'dropA')).toBeCloseTo(VA, 6);
    expect(result(r, 'dropB')).toBeCloseTo(VB, 6);
    expect(result(r, 'squeezeLoad')).toBe(0);
    expect(result(r, 'thetaA')).toBeCloseTo(19.654, 3);
    expect(result(r, 'headroom')).toBeCloseTo(2300, 9);
    expect(result(r, 'barCDesign')).toBeCloseTo(3 * result(r, 'barC'), 6);
    expect(verdict(r, 'slingAngle')).toBe('warn');
    expect(verdict(r, 'legShare')).toBe('pass');
  });

  it('the spreader moves the horizontal pull from the load into the bar', () => {
    const bare = solve(twoLegBridle, { spreader: 0 });
    const bar = solve(twoLegBridle, { spreader: 1 });
    // Same hook height above the leg ends: same legs, same tensions; only where the pull goes differs.
    expect(result(bar, 'TA')).toBeCloseTo(result(bare, 'TA'), 9);
    expect(result(bare, 'squeezeLoad')).toBeGreaterThan(0);
    expect(result(bare, 'barC')).toBe(0);
    expect(result(bar, 'barC')).toBeCloseTo(result(bare, 'squeezeLoad'), 9);
    expect(result(bar, 'headroom') - result(bare, 'headroom')).toBeCloseTo(1000, 9);
    // The hook hangs above the centre of gravity in both.
    expect(ok(bar).points.H!.x).toBeCloseTo(ok(bar).points.G!.x, 9);
  });

  it('the symmetric rule of thumb underestimates the leg nearer an offset centre of gravity', () => {
    const r = solve(twoLegBridle, {});
    // Defaults: CG at 60 %, so leg B (nearer the CG, steeper) carries 60 % of the load.
    expect(result(r, 'VB') / (5000 * g)).toBeCloseTo(0.6, 12);
    expect(result(r, 'TB')).toBeGreaterThan(result(r, 'Trule'));
    const centred = solve(twoLegBridle, { cg: 50 });
    expect(result(centred, 'TA')).toBeCloseTo(result(centred, 'Trule'), 9);
  });

  it('passes steep legs, warns flat legs and a lopsided share', () => {
    const r = solve(twoLegBridle, {});
    expect(verdict(r, 'slingAngle')).toBe('pass');
    expect(verdict(r, 'legShare')).toBe('pass');
    expect(verdict(solve(twoLegBridle, { h: 1000 }), 'slingAngle')).toBe('warn');
    expect(verdict(solve(twoLegBridle, { cg: 80 }), 'legShare')).toBe('warn');
  });
});
