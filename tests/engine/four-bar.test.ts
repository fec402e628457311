import { describe, expect, it } from 'vitest';
import { solve } from '../../shared/mechanics/solve';
import { D, expectBalanced, expectClose, load, makeSpec, ok } from './helpers';

/**
 * A crank–rocker four-bar driven by a torque on the crank, the output torque on the rocker
 * solved as a couple of unknown moment (the coupler is a two-force member).
 * Independent derivation, written out: loop closure gives θ3, θ4 (circle intersection); by
 * virtual power T2 ω2 = T4 ω4, and the velocity relation ω4/ω2 = a sin(θ2 − θ3) / (c sin(θ4 − θ3))
 * (from the coupler's rigid length: the velocities of A and B along A–B are equal). So
 * T4/T2 = c sin(θ4 − θ3) / (a sin(θ2 − θ3)). Transmission angle μ = |θ4 − θ3| folded to ≤ 90°.
 * Example in ../shared/REFERENCES.md (derived, in the form of R. L. Norton, Design of Machinery,
 * 2nd ed., McGraw-Hill 1999, after Freudenstein, Trans. ASME 77 (1955) 853–861): ground 0.30,
 * crank 0.10, coupler 0.25, rocker 0.20 m, θ2 = 60°, open branch → θ4 = 97.56°, μ = 71.03°,
 * torque ratio 3.429.
 */
const spec = makeSpec({
  category: 'linkages',
  inputs: [
    { key: 'd', label: 'Ground', quantity: 'length', default: 300, min: 50, max: 2000 },
    { key: 'a', label: 'Crank', quantity: 'length', default: 100, min: 10, max: 2000 },
    { key: 'b', label: 'Coupler', quantity: 'length', default: 250, min: 10, max: 2000 },
    { key: 'c', label: 'Rocker', quantity: 'length', default: 200, min: 10, max: 2000 },
    { key: 'theta2', label: 'Crank angle', quantity: 'angle', default: 60, min: 0, max: 360 },
    { key: 'T2', label: 'Input torque', quantity: 'moment', default: 10000, min: 0, max: 1e8 },
  ],
  points: {
    O2: { at: [0, 0] },
    O4: { at: ['d', 0] },
    A: { polar: { from: 'O2', length: 'a', angle: 'theta2' } },
    B: { fromTwo: { centres: ['A', 'O4'], radii: ['b', 'c'], side: 'left' } },
  },
  parts: [
    { id: 'crank', label: 'Crank', outline: ['O2', 'A'] },
    { id: 'rocker', label: 'Rocker', outline: ['O4', 'B'] },
  ],
  members: [{ id: 'coupler', label: 'Coupler', ends: ['A', 'B'], connects: ['crank', 'rocker'] }],
  joints: [
    { id: 'O2', kind: 'pin', at: 'O2', between: ['crank', 'ground'] },
    { id: 'O4', kind: 'pin', at: 'O4', between: ['rocker', 'ground'] },
  ],
  loads: [
    { id: 'T2', label: 'Input torque', kind: 'couple', on: 'crank', moment: 'T2' },
    { id: 'T4', label: 'Output torque', kind: 'couple', on: 'rocker', moment: { unknown: true } },
  ],
  results: [
    { key: 'ratio', label: 'Torque ratio', quantity: 'ratio', expr: "abs(load('T4')) / T2" },
    { key: 'theta4', label: 'Rocker angle', quantity: 'angle', expr: "dir('O4', 'B')" },
    { key: 'mu', label: 'Transmission angle', quantity: 'angle', expr: "acosd(abs(cosd(dir('A', 'B') - dir('O4', 'B'))))" },
  ],
  drive: { input: 'theta2', effort: 'T2', output: 'T4' },
});

function closedForm(d: number, a: number, b: number, c: number, t2: number) {
  const Ax = a * Math.cos(t2 * D);
  const Ay = a * Math.sin(t2 * D);
  const ex = d - Ax;
  const ey = -Ay;
  const dist = Math.hypot(ex, ey);
  const along = (dist * dist + b * b - c * c) / (2 * dist);
  const off = Math.sqrt(b * b - along * along);
  const Bx = Ax + (along * ex) / dist - (off * ey) / dist;
  const By = Ay + (along * ey) / dist + (off * ex) / dist;
  const t3 = Math.atan2(By - Ay, Bx - Ax);
  const t4 = Math.atan2(By, Bx - d);
  return { t3, t4, ratio: Math.abs((c * Math.sin(t4 - t3)) / (a * Math.sin(t2 * D - t3))) };
}

describe('four-bar linkage with an output couple of unknown moment', () => {
  it('matches the derived example: θ4 = 97.56°, μ = 71.03°, torque ratio 3.429', () => {
    const r = ok(solve(spec));
    const v = (k: string) => r.results.find((x) => x.key === k)!.value!;
    expect(v('theta4')).toBeCloseTo(97.56, 2);
    expect(v('mu')).toBeCloseTo(71.03, 2);
    expect(v('ratio')).toBeCloseTo(3.429, 3);
    expect(load(r, 'T4').solved).toBe(true);
    expectBalanced(r);
    // The unknown couple's column is scaled like the force columns: a well-conditioned system,
    // no false "close to a dead centre" warning.
    expect(r.verification.conditioning).toBeGreaterThan(0.05);
    expect(r.warnings).toEqual([]);
  });

  it.each([20, 60, 110, 200, 300])('follows loop closure and virtual power at θ2 = %d°', (theta2) => {
    const r = ok(solve(spec, { theta2 }));
    const cf = closedForm(300, 100, 250, 200, theta2);
    expectClose(r.results.find((x) => x.key === 'ratio')!.value!, cf.ratio, 1e-9);
    // The engine's own virtual-work check, on finite differences of its geometry, agrees too.
    expect(r.verification.virtualWork!.relativeDifference).toBeLessThan(1e-6);
  });
});
