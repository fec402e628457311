import { describe, expect, it } from 'vitest';
import { solve } from '../../shared/mechanics/solve';
import { plateLiftingClamp } from '../../templates/plate-lifting-clamp/spec';
import { result, verdict } from '../engine/helpers';

const g = 9.80665;

describe('plate lifting clamp with a lever jaw: independent hand check', () => {
  it('pad 2 mm above the jaw on a 12 mm plate', () => {
    // Hand check (ours): 1500 kg (W = 14 709.975 N), t = 12, pivot e = 25 out and d = 8 up from the
    // jaw contact, pad p = 2 above it. Plate mid-plane at x = 0: J = (6, 0), A = (−6, 2), O = (31, 8),
    // eye pull W straight up at x = 0.
    // Body: forces only at A and O, so the pad force lies along A→O: F_pad/N = (8 − 2)/(31 + 6) = 6/37.
    // Plate, ΣF_x: both faces carry the same normal N; ΣF_y: F_jaw + F_pad = W.
    // Lever, moments about O: W·31 (clockwise) = N·8 + F_jaw·25 (anticlockwise), with F_jaw = W − 6N/37:
    //   31 W − 25 W = N (8 − 150/37) → 6 W = N · 146/37 → N = 222/146 W = 1.52055 W = 22 367 N.
    //   F_pad = 36/146 W = 3627.1 N, F_jaw = 110/146 W = 11 082.9 N, μ_jaw = 110/222 = 0.4955.
    //   Pivot force on the body = (N, F_pad): |R| = W √(222² + 36²)/146 = 1.54041 W.
    const r = solve(plateLiftingClamp, { m: 1500, t: 12, e: 25, d: 8, p: 2 });
    const W = 1500 * g;
    expect(result(r, 'N')).toBeCloseTo((222 / 146) * W, 6);
    expect(result(r, 'N')).toBeCloseTo(22367, -1);
    expect(result(r, 'Fpad')).toBeCloseTo((36 / 146) * W, 6);
    expect(result(r, 'Fjaw')).toBeCloseTo((110 / 146) * W, 6);
    expect(result(r, 'muPad')).toBeCloseTo(6 / 37, 9);
    expect(result(r, 'muJaw')).toBeCloseTo(0.4955, 4);
    expect(result(r, 'muReq')).toBeCloseTo(110 / 222, 9);
    expect(result(r, 'Rpin')).toBeCloseTo((W * Math.hypot(222, 36)) / 146, 6);
    expect(result(r, 'Tlink')).toBeCloseTo(W, 9);
    expect(result(r, 'Ndesign')).toBeCloseTo(3 * result(r, 'N'), 6);
    expect(verdict(r, 'friction')).toBe('fail');
    expect(verdict(r, 'grips')).toBe('pass');
  });

  it('passes with the margin, warns inside it, fails beyond the available friction', () => {
    // Defaults need μ = 0.2 on both faces.
    expect(verdict(solve(plateLiftingClamp, {}), 'friction')).toBe('pass'); // 0.2 ≤ 0.35/1.5
    expect(verdict(solve(plateLiftingClamp, { muAvail: 0.25 }), 'friction')).toBe('warn'); // 0.167 < 0.2 ≤ 0.25
    expect(verdict(solve(plateLiftingClamp, { muAvail: 0.19 }), 'friction')).toBe('fail');
  });

  it('the pull is vertical: the eye height changes nothing, the load scales everything', () => {
    const low = solve(plateLiftingClamp, { hc: 30 });
    const high = solve(plateLiftingClamp, { hc: 300 });
    expect(result(high, 'N')).toBeCloseTo(result(low, 'N'), 9);
    expect(result(solve(plateLiftingClamp, { m: 10 }), 'muReq')).toBeCloseTo(result(low, 'muReq'), 12);
  });

  it('explains the dead centre when pad, jaw contact and pivot come into line', () => {
    // Collinear when d t + e p = 0: 10·20 + 30 p = 0 at p = −20/3, just below the allowed −4.
    const wide = { ...plateLiftingClamp, inputs: plateLiftingClamp.inputs.map((i) => (i.key === 'p' ? { ...i, min: -10 } : i)) };
    const near = solve(wide, { p: -6 });
    expect(result(near, 'squeeze')).toBeCloseTo((10 * 50) / (200 - 180), 6);
    const at = solve(wide, { p: -20 / 3 });
    expect(at.ok).toBe(false);
    if (at.ok) return;
    expect(at.error.kind).toBe('dead-centre');
    expect(at.error.message).toMatch(/dead centre/);
    expect(solve(plateLiftingClamp, { p: -20 / 3 }).ok).toBe(false);
  });
});
