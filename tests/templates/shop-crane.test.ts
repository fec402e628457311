import { describe, expect, it } from 'vitest';
import { solve } from '../../shared/mechanics/solve';
import { shopCrane } from '../../templates/shop-crane/spec';
import { D, ok, result, verdict } from '../engine/helpers';

const g = 9.80665;

describe('shop crane: independent hand check', () => {
  // Hand check (ours): 800 kg on a 1.2 m boom pulled out 0.1 m (L_t = 1.3 m) at φ = 10°, pivot
  // H_m = 1.4 m up, ram from Q = (100, 250) to a pin r = 0.6 m along the boom, front wheels
  // 1.3 m ahead of the mast, rear castors 0.3 m behind, base and mast 90 kg at x_g = 0.4 m,
  // boom 30 kg. W = 7845.32 N, W_boom = 294.20 N, W_base = 882.60 N.
  // Ram pin B = P + 600 (cos 10°, sin 10°) = (590.88, 1504.19); c = |B − Q| = 1346.83 mm.
  // Boom, moments about the pivot P: load moment (W + W_boom/2) L_t cos φ = 10 232 296 N·mm;
  // ram lever arm r ((H_m − h_q) cos φ + d_q sin φ)/c = 600 × (1132.53 + 17.36)/1346.83 = 512.27 mm;
  //   C = 10 232 296 / 512.27 = 19 974.6 N (compression).
  // Pivot force on the boom: −C u − (0, −W − W_boom), u = (B − Q)/c = (0.3645, 0.9312):
  //   (−7280.2, −10 461.1) → 12 745.0 N.
  // Whole crane, moments about the front wheels (hook at x = 1300 cos 10° = 1280.25, inside them):
  //   N_rear × 1600 = W_base (1300 − 400) + W_boom (1300 − 640.13) + W (1300 − 1280.25)
  //   = 794 339 + 194 136 + 154 943 = 1 143 418 → N_rear = 714.64 N; N_front = 9022.12 − 714.64
  //   = 8307.48 N; rear share 714.64 / 9022.12 = 7.92 % (below 10 %: the check warns).
  const inputs = { m: 800, ext: 100, phi: 10, Lb: 1200, Hm: 1400, rAt: 600, hq: 250, dq: 100, xF: 1300, xR: 300, mBase: 90, xg: 400, mBoom: 30 };

  it('ram force, pivot force, wheel reactions and the tipping margin', () => {
    const r = solve(shopCrane, inputs);
    const W = 800 * g;
    const Wb = 30 * g;
    const Wbase = 90 * g;
    const Bx = 600 * Math.cos(10 * D);
    const By = 1400 + 600 * Math.sin(10 * D);
    const c = Math.hypot(Bx - 100, By - 250);
    const C = ((W + Wb / 2) * 1300 * Math.cos(10 * D) * c) / (600 * (1150 * Math.cos(10 * D) + 100 * Math.sin(10 * D)));
    const Nrear = (Wbase * 900 + Wb * (1300 - 650 * Math.cos(10 * D)) + W * (1300 - 1300 * Math.cos(10 * D))) / 1600;
    expect(result(r, 'ramLength')).toBeCloseTo(c, 6);
    expect(result(r, 'C')).toBeCloseTo(C, 5);
    expect(result(r, 'C')).toBeCloseTo(19974.6, 0);
    expect(result(r, 'Cdesign')).toBeCloseTo(3 * C, 5);
    expect(result(r, 'Rpivot')).toBeCloseTo(Math.hypot((C * (Bx - 100)) / c, W + Wb - (C * (By - 250)) / c), 5);
    expect(result(r, 'Rpivot')).toBeCloseTo(12745.0, 0);
    expect(result(r, 'Nrear')).toBeCloseTo(Nrear, 6);
    expect(result(r, 'Nrear')).toBeCloseTo(714.64, 1);
    expect(result(r, 'Nfront')).toBeCloseTo(W + Wb + Wbase - Nrear, 6);
    expect(result(r, 'rearShare')).toBeCloseTo((100 * Nrear) / (W + Wb + Wbase), 6);
    expect(result(r, 'rearShare')).toBeCloseTo(7.92, 2);
    expect(verdict(r, 'tipping')).toBe('warn');
    // Front wheels pinned only to fix the frame: with vertical loads they take no horizontal force.
    const front = ok(r).joints.find((j) => j.id === 'front')!;
    expect(Math.abs(front.fx)).toBeLessThan(1e-9 * W);
  });

  it('the ram force is set by the boom alone: moving the wheels or the base weight leaves it unchanged', () => {
    const C = result(solve(shopCrane, inputs), 'C');
    expect(result(solve(shopCrane, { ...inputs, xF: 1800, mBase: 200 }), 'C')).toBeCloseTo(C, 6);
  });

  it('tipping: passes retracted, fails with the boom pulled out under the full load', () => {
    const retracted = solve(shopCrane, {});
    expect(verdict(retracted, 'tipping')).toBe('pass');
    expect(result(retracted, 'rearShare')).toBeGreaterThan(10);
    const extended = solve(shopCrane, { ext: 900 });
    expect(result(extended, 'Nrear')).toBeLessThan(0);
    expect(verdict(extended, 'tipping')).toBe('fail');
    // Each extra millimetre of hook overhang takes W/wheelbase off the rear castors.
    const a = result(solve(shopCrane, { ext: 400, mBoom: 0 }), 'Nrear');
    const b = result(solve(shopCrane, { ext: 500, mBoom: 0 }), 'Nrear');
    expect(a - b).toBeCloseTo((1000 * g * 100 * Math.cos(20 * D)) / 1400, 6);
  });

  it('warns when the ram acts flat to the boom', () => {
    expect(verdict(solve(shopCrane, {}), 'ramAngle')).toBe('pass');
    // Boom raised to 65° with the ram pin far out: the ram lies nearly along the boom.
    const flat = solve(shopCrane, { phi: 65, rAt: 1200, hq: 700, dq: -200 });
    expect(result(flat, 'ramAngle')).toBeLessThan(20);
    expect(verdict(flat, 'ramAngle')).toBe('warn');
  });
});
