import { describe, expect, it } from 'vitest';
import { solve } from '../../shared/mechanics/solve';
import type { TemplateSpecInput } from '../../shared/spec/template-spec';
import { scissorLiftTable } from '../../templates/scissor-lift-table/spec';
import { D, ok, result, verdict } from '../engine/helpers';

const g = 9.80665;

/** The same table driven instead by a horizontal push on the base roller foot, towards the fixed pin. */
const footDriven: TemplateSpecInput = {
  ...scissorLiftTable,
  loads: [{ id: 'F', label: 'Foot push', on: 'arm2', at: 'G', force: { unknown: true, direction: { angle: 180 } } }, ...scissorLiftTable.loads.slice(1)],
  checks: [],
  references: [],
};

describe('scissor lift table: independent hand check', () => {
  // Hand check (ours), by virtual work: L = 2 m arms at θ = 30°, cylinder pins a = 0.8 m up the
  // lower arm and b = 1.5 m along the base, 2000 kg centred on a 2.2 m platform of 200 kg,
  // arms 50 kg each. Platform height h = L sin θ, so δh = L cos θ δθ; each arm's weight sits at
  // the centre pin, at h/2, so both arms together count half: W_eff = (2000 + 200 + 2·50/2) g
  // = 2250 g = 22 064.96 N. Cylinder length c² = a² + b² − 2ab cos θ = 811 539 mm², c = 900.85 mm,
  // δc = (a b sin θ / c) δθ. Work balance F δc = W_eff δh:
  //   F = W_eff L cos θ c / (a b sin θ) = 22 064.96 × 1732.05 × 900.85 / 600 000 = 57 380.9 N.
  // Pressure on an 90 mm bore: 57 380.9 / 6361.7 = 9.020 MPa.
  // Platform, moments about its pin E: N_D × L cos θ = 2200 g × 1100 → N_D = 13 701.7 N; pin
  // E takes 2200 g − N_D = 7872.9 N. The upper arm is a lever about the centre pin with
  // vertical forces at its two ends only, so its base roller pulls down as hard: N_G = −7872.9 N.
  const inputs = { m: 2000, mp: 200, mArm: 50, L: 2000, theta: 30, a: 800, b: 1500, Lp: 2200, loadAt: 50, bore: 90 };

  it('cylinder force, pressure and the roller forces', () => {
    const r = ok(solve(scissorLiftTable, inputs));
    const Weff = 2250 * g;
    const c = Math.sqrt(800 ** 2 + 1500 ** 2 - 2 * 800 * 1500 * Math.cos(30 * D));
    const F = (Weff * 2000 * Math.cos(30 * D) * c) / (800 * 1500 * Math.sin(30 * D));
    expect(result(r, 'c')).toBeCloseTo(c, 6);
    expect(result(r, 'F')).toBeCloseTo(F, 4);
    expect(result(r, 'F')).toBeCloseTo(57380.9, 0);
    expect(result(r, 'p')).toBeCloseTo(9.020, 3);
    expect(result(r, 'Fdesign')).toBeCloseTo(2 * F, 4);
    expect(result(r, 'H')).toBeCloseTo(1000, 9);
    const ND = (2200 * g * 1100) / (2000 * Math.cos(30 * D));
    expect(result(r, 'Nplatform')).toBeCloseTo(ND, 6);
    expect(result(r, 'Nplatform')).toBeCloseTo(13701.7, 0);
    expect(result(r, 'Rplatform')).toBeCloseTo(2200 * g - ND, 6);
    expect(result(r, 'Nbase')).toBeCloseTo(-(2200 * g - ND), 6);
    // The engine's own virtual-work cross-check (drive: θ moves, cylinder effort, load output).
    expect(r.verification.virtualWork!.relativeDifference).toBeLessThan(1e-6);
  });

  it('the load position moves the pin forces but not the cylinder force', () => {
    const F = result(solve(scissorLiftTable, inputs), 'F');
    const near = solve(scissorLiftTable, { ...inputs, loadAt: 10 });
    expect(result(near, 'F')).toBeCloseTo(F, 6);
    expect(result(near, 'Nplatform')).not.toBeCloseTo(result(solve(scissorLiftTable, inputs), 'Nplatform'), 0);
  });

  it('a horizontal push at the base roller needs F = (W + W_arms/2) / tan θ (one stage)', () => {
    // ../shared/REFERENCES.md gives n (W + W_arms/2)/tan θ; with n = 1 and the 10 kN, 2 kN, 15°
    // example that is 11 000 / tan 15° = 41 052.6 N (half the two-stage 8.211e4 N).
    const r = ok(solve(footDriven, { m: 10000 / g, mp: 0, mArm: 1000 / g, L: 1500, theta: 15 }));
    expect(result(r, 'F')).toBeCloseTo(11000 / Math.tan(15 * D), 4);
    expect(result(r, 'F')).toBeCloseTo(41052.6, 0);
    expect(Math.abs(result(r, 'F') * 2 - 8.211e4) / 8.211e4).toBeLessThan(1e-4);
  });

  it('the force peaks at the lowest position: it falls steadily as the arms open', () => {
    const angles = [4, 6, 8, 10, 15, 20, 30, 40, 50, 60];
    const forces = angles.map((theta) => result(solve(scissorLiftTable, { theta }), 'F'));
    for (let i = 1; i < forces.length; i++) expect(forces[i]!).toBeLessThan(forces[i - 1]!);
    // Near the bottom F grows like 1/θ: from 8° down to 4° it nearly doubles.
    expect(forces[0]! / forces[2]!).toBeGreaterThan(1.8);
  });

  it('explains the closed position (θ = 0) as a dead centre', () => {
    const open: TemplateSpecInput = { ...scissorLiftTable, inputs: scissorLiftTable.inputs.map((i) => (i.key === 'theta' ? { ...i, min: 0 } : i)) };
    const r = solve(open, { theta: 0 });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.kind).toBe('dead-centre');
    expect(r.error.message).toMatch(/grow without bound/);
    expect(solve(scissorLiftTable, { theta: 3.9 }).ok).toBe(false);
  });

  it('checks: cylinder pressure passes, warns and fails; the platform must reach over its roller', () => {
    expect(verdict(solve(scissorLiftTable, {}), 'pressure')).toBe('pass');
    expect(verdict(solve(scissorLiftTable, { bore: 75 }), 'pressure')).toBe('warn');
    expect(verdict(solve(scissorLiftTable, { bore: 68 }), 'pressure')).toBe('fail');
    expect(verdict(solve(scissorLiftTable, { theta: 6 }), 'pressure')).toBe('fail');
    expect(verdict(solve(scissorLiftTable, {}), 'rollerOnPlatform')).toBe('pass');
    // A load beyond the roller: the hinge pin holds the platform down, and the base roller,
    // usually lifted, now presses on the base.
    const overhung = solve(scissorLiftTable, { Lp: 4000, loadAt: 100, mp: 0 });
    expect(result(overhung, 'Nbase')).toBeGreaterThan(0);
    expect(result(solve(scissorLiftTable, {}), 'Nbase')).toBeLessThan(0);
    expect(verdict(solve(scissorLiftTable, { Lp: 1200 }), 'rollerOnPlatform')).toBe('fail');
  });
});
