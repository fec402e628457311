import { describe, expect, it } from 'vitest';
import { solve } from '../../shared/mechanics/solve';
import { fourBarLinkage } from '../../templates/four-bar-linkage/spec';
import { D, ok, result } from '../engine/helpers';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

const defaults = { T2: 10000, theta2: 60, d: 300, a: 100, b: 250, c: 200, rOut: 200, branch: 1 };

/**
 * Norton's closed form of the position problem (Design of Machinery, 2nd ed., section 4.5,
 * after Freudenstein), written independently of the engine's circle intersection:
 *   K1 = d/a, K2 = d/c, K3 = (a² − b² + c² + d²)/(2ac), K4 = d/b, K5 = (c² − d² − a² − b²)/(2ab);
 *   A = cos θ2 − K1 − K2 cos θ2 + K3, B = −2 sin θ2, C = K1 − (K2 + 1) cos θ2 + K3,
 *   θ4 = 2 atan((−B ∓ √(B² − 4AC))/(2A)) (− open, + crossed);
 *   D = cos θ2 − K1 + K4 cos θ2 + K5, E = −2 sin θ2, F = K1 + (K4 − 1) cos θ2 + K5,
 *   θ3 = 2 atan((−E ∓ √(E² − 4DF))/(2D)).
 * Virtual power: T2 ω2 = T4 ω4 with ω4/ω2 = a sin(θ2 − θ3)/(c sin(θ4 − θ3)), so the torque
 * delivered T4 = T2 c sin(θ4 − θ3)/(a sin(θ2 − θ3)). Transmission angle, Norton's form:
 * cos μ = (b² + c² − a² − d² + 2ad cos θ2)/(2bc). Crank equilibrium about O2 gives the coupler
 * tension Fc = T2/(a sin(θ2 − θ3)), which is also the crank pivot force.
 */
function fourBarClosedForm(p: typeof defaults) {
  const { T2, d, a, b, c, rOut } = p;
  const t2 = p.theta2 * D;
  const s = p.branch === 1 ? -1 : 1;
  const K1 = d / a, K2 = d / c, K3 = (a * a - b * b + c * c + d * d) / (2 * a * c);
  const K4 = d / b, K5 = (c * c - d * d - a * a - b * b) / (2 * a * b);
  const A = Math.cos(t2) - K1 - K2 * Math.cos(t2) + K3, B = -2 * Math.sin(t2), C = K1 - (K2 + 1) * Math.cos(t2) + K3;
  const Dd = Math.cos(t2) - K1 + K4 * Math.cos(t2) + K5, E = -2 * Math.sin(t2), F = K1 + (K4 - 1) * Math.cos(t2) + K5;
  const t4 = 2 * Math.atan((-B + s * Math.sqrt(B * B - 4 * A * C)) / (2 * A));
  const t3 = 2 * Math.atan((-E + s * Math.sqrt(E * E - 4 * Dd * F)) / (2 * Dd));
  const T4 = (T2 * c * Math.sin(t4 - t3)) / (a * Math.sin(t2 - t3));
  const cosMu = (b * b + c * c - a * a - d * d + 2 * a * d * Math.cos(t2)) / (2 * b * c);
  const Fc = T2 / (a * Math.sin(t2 - t3));
  const wrap = (x: number) => ((((x / D) % 360) + 540) % 360) - 180;
  return { theta4: wrap(t4), theta3: wrap(t3), T4, ratio: Math.abs(T4) / T2, Fout: T4 / rOut, mu: Math.acos(Math.abs(cosMu)) / D, Fc };
}

describe('four-bar linkage: independent hand check', () => {
  it('the derived example: θ4 = 97.56°, μ = 71.03°, torque ratio 3.429', () => {
    // By hand, θ2 = 60°: K1 = 3, K2 = 1.5, K3 = (100² − 250² + 200² + 300²)/(2·100·200) = 1.9375;
    // A = 0.5 − 3 − 0.75 + 1.9375 = −1.3125, B = −1.7321, C = 3 − 2.5·0.5 + 1.9375 = 3.6875;
    // B² − 4AC = 3.0 + 19.359 = 22.359, √ = 4.7285; open: θ4 = 2 atan((1.7321 − 4.7285)/(−2.625))
    // = 2 atan(1.14148) = 97.56°. cos μ = (250² + 200² − 100² − 300² + 2·100·300·0.5)/(2·250·200)
    // = 32 500/100 000 = 0.325 → μ = 71.03°.
    const cf = fourBarClosedForm(defaults);
    expect(cf.theta4).toBeCloseTo(97.56, 2);
    expect(cf.mu).toBeCloseTo(71.03, 2);
    expect(cf.ratio).toBeCloseTo(3.429, 3);
    const r = ok(solve(fourBarLinkage));
    expect(rel(result(r, 'theta4'), cf.theta4)).toBeLessThan(1e-9);
    expect(rel(result(r, 'mu'), cf.mu)).toBeLessThan(1e-9);
    expect(rel(result(r, 'T4'), cf.T4)).toBeLessThan(1e-9);
    expect(rel(result(r, 'Fout'), cf.Fout)).toBeLessThan(1e-9);
    expect(rel(result(r, 'Fc'), cf.Fc)).toBeLessThan(1e-9);
    expect(rel(result(r, 'R2'), Math.abs(cf.Fc))).toBeLessThan(1e-9);
    expect(r.verification.virtualWork!.relativeDifference).toBeLessThan(1e-6);
  });

  it.each([
    [0, 1], [45, 1], [100, 1], [180, 1], [250, 1], [330, 1],
    [20, 2], [100, 2], [200, 2], [300, 2],
  ])('follows Norton’s closed form at θ2 = %d° on branch %d', (theta2, branch) => {
    const cf = fourBarClosedForm({ ...defaults, theta2, branch });
    const r = ok(solve(fourBarLinkage, { theta2, branch }));
    expect(rel(result(r, 'theta4'), cf.theta4)).toBeLessThan(1e-9);
    expect(rel(result(r, 'T4'), cf.T4)).toBeLessThan(1e-8);
    expect(rel(result(r, 'mu'), cf.mu)).toBeLessThan(1e-9);
    expect(rel(result(r, 'Fc'), cf.Fc)).toBeLessThan(1e-8);
  });

  it('the reference cases in the spec match the closed form', () => {
    for (const ref of fourBarLinkage.references!) {
      const cf = fourBarClosedForm({ ...defaults, ...ref.inputs } as typeof defaults);
      for (const [key, expected] of Object.entries(ref.expect)) expect(rel(expected, cf[key as keyof typeof cf]), `${ref.label}: ${key}`).toBeLessThan(5e-4);
    }
  });
});

describe('four-bar linkage: across the crank angle', () => {
  it('solves a full revolution of the crank in 1° steps for the default lengths', () => {
    const failures: string[] = [];
    for (let theta2 = 0; theta2 <= 360; theta2 += 1) {
      const r = solve(fourBarLinkage, { theta2 });
      if (!r.ok) failures.push(`${theta2}: ${r.error.message}`);
    }
    expect(failures).toEqual([]);
  });

  it('at a limit position of the rocker (crank and coupler in line) the engine reports a dead centre', () => {
    // Extended: |O2B| = a + b = 350, triangle O2–O4–B: cos θ2 = (350² + 300² − 200²)/(2·350·300)
    // = 172 500/210 000 → θ2 = 34.7711°. There the coupler line passes through O2: no finite
    // rocker force balances the crank torque.
    const limit = Math.acos(172500 / 210000) / D;
    const r = solve(fourBarLinkage, { theta2: limit });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.kind).toBe('dead-centre');
    expect(r.error.message).toMatch(/grow without bound/);
    // Two degrees away it solves, warns through the check and the ratio is large.
    const near = ok(solve(fourBarLinkage, { theta2: limit - 2 }));
    expect(result(near, 'ratio')).toBeGreaterThan(20);
    expect(near.checks.find((c) => c.key === 'limitPosition')!.verdict).toBe('warn');
  });
});

describe('four-bar linkage: checks', () => {
  it('passes at the defaults, warns and fails on poor transmission', () => {
    const d = ok(solve(fourBarLinkage));
    expect(d.checks.every((c) => c.verdict === 'pass')).toBe(true);
    // A long coupler and short rocker: cos μ at θ2 = 0 is (300² + 160² − 100² − 300² + 2·100·300)/(2·300·160) = 75 600/96 000 = 0.7875 → μ = 38.05°.
    const poor = ok(solve(fourBarLinkage, { b: 300, c: 160, theta2: 0 }));
    expect(result(poor, 'mu')).toBeCloseTo(Math.acos(0.7875) / D, 6);
    expect(poor.checks.find((c) => c.key === 'transmission')!.verdict).toBe('warn');
    const bad = ok(solve(fourBarLinkage, { b: 300, c: 160, d: 290, a: 140, theta2: 0 }));
    // cos μ = (300² + 160² − 150²)/(2·300·160) = 93 100/96 000 = 0.96979 → μ = 14.1°.
    expect(result(bad, 'mu')).toBeCloseTo(Math.acos(93100 / 96000) / D, 6);
    expect(bad.checks.find((c) => c.key === 'transmission')!.verdict).toBe('fail');
  });

  it('flags a crank that cannot turn a full circle', () => {
    const r = ok(solve(fourBarLinkage, { a: 140, d: 340, theta2: 60 }));
    expect(r.checks.find((c) => c.key === 'grashof')!.verdict).toBe('warn');
  });
});
