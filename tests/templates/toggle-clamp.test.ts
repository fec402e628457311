import { describe, expect, it } from 'vitest';
import { solve } from '../../shared/mechanics/solve';
import type { TemplateSpecInput } from '../../shared/spec/template-spec';
import { toggleClamp } from '../../templates/toggle-clamp/spec';
import { D, ok, result } from '../engine/helpers';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/**
 * The clamp's closed form, written independently of the spec's constructions (triangle
 * relations instead of the engine's polar and circle steps):
 *   triangle H–C–D, angle 180° − α at C: HD² = r² + l² + 2 r l cos α; angle at D δ = asin(r sin α / HD).
 *   handle, moments about H (hand force at right angles to the handle, link force along C–D,
 *   whose line passes r sin α from H):  F Lh = S r sin α  →  S = F Lh / (r sin α).
 *   arm, moments about A (link line passes e sin γ from A, γ the angle D→A to D→C; the work
 *   pushes up at P, La cos θ from A, θ the arm's turn from the dead-centre position):
 *   Q La cos θ = S e sin γ  →  MA = Q/F = (Lh/r)(e/La) sin γ / (sin α cos θ).
 */
function toggleClampClosedForm(p: { F: number; alpha: number; Lh: number; r: number; l: number; e: number; La: number }) {
  const { F, alpha, Lh, r, l, e, La } = p;
  const al = alpha * D;
  const HD = Math.sqrt(r * r + l * l + 2 * r * l * Math.cos(al));
  // D on the circle of radius e about A = (0, 0), HD from H = (−(l + r), e): the law of cosines
  // in triangle H–A–D gives the angle at A between A→H and A→D.
  const Hx = -(l + r);
  const Hy = e;
  const HA = Math.hypot(Hx, Hy);
  const atA = Math.acos((HA * HA + e * e - HD * HD) / (2 * HA * e));
  const dirAD = Math.atan2(Hy, Hx) - atA; // D lies clockwise of A→H (towards the top of the arm)
  const Dx = e * Math.cos(dirAD);
  const Dy = e * Math.sin(dirAD);
  const theta = dirAD - Math.PI / 2;
  const delta = Math.asin((r * Math.sin(al)) / HD);
  const dirDC = Math.atan2(Hy - Dy, Hx - Dx) - delta;
  const gamma = dirDC - (dirAD + Math.PI); // angle from D→A to D→C
  const S = (F * Lh) / (r * Math.sin(al));
  const Q = (S * e * Math.abs(Math.sin(gamma))) / (La * Math.cos(theta));
  // Pin forces: the arm carries the link push along C→D and the work's push Q upwards.
  const RA = Math.hypot(S * -Math.cos(dirDC), S * -Math.sin(dirDC) + Q);
  // The handle: hand force along H→C (at right angles to the handle H–G), link push along D→C.
  const dirHC = Math.atan2(Dy - Hy, Dx - Hx) + Math.asin((l * Math.sin(al)) / HD);
  const RH = Math.hypot(F * Math.cos(dirHC) + S * Math.cos(dirDC), F * Math.sin(dirHC) + S * Math.sin(dirDC));
  return { S, Q, MA: Q / F, RA, RH, theta: theta / D, gamma: gamma / D };
}

const defaults = { F: 100, alpha: 5, Lh: 200, r: 40, l: 50, e: 30, La: 60 };

describe('toggle clamp: independent hand check', () => {
  it('equal crank and link, 10° toggle angle, by hand', () => {
    // Lh 150, r = l = 40, e 25, La 50 mm, α = 10°, F = 120 N. By hand:
    //   S = F Lh / (r sin α) = 120 · 150 / (40 · 0.173648) = 18 000 / 6.94593 = 2591.4 N (link compression).
    //   HD = √(2·40²(1 + cos 10°)) = 80 cos 5° = 79.696 mm; the isosceles triangle gives δ = 5°.
    //   H = (−80, 25), |HA| = 83.815 mm; angle at A: cos = (83.815² + 25² − 79.696²)/(2·83.815·25)
    //   = 0.30988 → 71.948°, A→H at 162.646°, so A→D at 90.698° (θ = 0.698°, cos θ = 0.99993).
    //   D = (−0.304, 24.998), D→H at 179.999°, D→C = D→H − 5° = 174.999°; γ = 174.999° − 270.698°
    //   = −95.699°, |sin γ| = 0.99506. Q = S e |sin γ| / (La cos θ) = 2591.4 · 25 · 0.99506 / (50 · 0.99993)
    //   = 1289.4 N, MA = 10.745.
    const cf = toggleClampClosedForm({ F: 120, alpha: 10, Lh: 150, r: 40, l: 40, e: 25, La: 50 });
    expect(cf.S).toBeCloseTo(2591.4, 1);
    expect(cf.theta).toBeCloseTo(0.698, 3);
    expect(cf.Q).toBeCloseTo(1289.4, 1);
    const r = ok(solve(toggleClamp, { F: 120, alpha: 10, Lh: 150, r: 40, l: 40, e: 25, La: 50 }));
    expect(rel(result(r, 'S'), cf.S)).toBeLessThan(1e-9);
    expect(rel(result(r, 'Q'), cf.Q)).toBeLessThan(1e-9);
    expect(rel(result(r, 'MA'), cf.MA)).toBeLessThan(1e-9);
    expect(rel(result(r, 'RA'), cf.RA)).toBeLessThan(1e-9);
    expect(rel(result(r, 'RH'), cf.RH)).toBeLessThan(1e-9);
    expect(r.verification.virtualWork!.relativeDifference).toBeLessThan(1e-6);
  });

  it.each([2, 5, 12, 20, 30])('follows the closed form at α = %d° and virtual work agrees', (alpha) => {
    const cf = toggleClampClosedForm({ ...defaults, alpha });
    const r = ok(solve(toggleClamp, { alpha }));
    expect(rel(result(r, 'Q'), cf.Q)).toBeLessThan(1e-9);
    expect(rel(result(r, 'RA'), cf.RA)).toBeLessThan(1e-9);
    expect(rel(result(r, 'RH'), cf.RH)).toBeLessThan(1e-9);
    expect(r.verification.maxResidual).toBeLessThan(1e-9);
  });

  it('the reference cases in the spec match the closed form', () => {
    for (const ref of toggleClamp.references!) {
      const cf = toggleClampClosedForm({ ...defaults, ...ref.inputs } as typeof defaults);
      for (const [key, expected] of Object.entries(ref.expect)) expect(rel(expected, cf[key as keyof typeof cf]), `${ref.label}: ${key}`).toBeLessThan(1e-6);
    }
  });
});

describe('toggle clamp: near and at dead centre', () => {
  // The same clamp with the toggle angle allowed down to 0: a spec variant, as the built-in keeps
  // the input safely off dead centre.
  const toZero: TemplateSpecInput = { ...toggleClamp, inputs: toggleClamp.inputs.map((i) => (i.key === 'alpha' ? { ...i, min: 0 } : i)) };

  it('the mechanical advantage grows as 1/tan of the toggle angle', () => {
    // MA tan α → (Lh e)/(r La) = 2.5 as α → 0 (sin γ and cos θ differ from 1 only to second order).
    const limit = (defaults.Lh * defaults.e) / (defaults.r * defaults.La);
    const product = [0.05, 0.2, 1, 4].map((alpha) => {
      const r = ok(solve(toZero, { alpha }));
      return result(r, 'MA') * Math.tan(alpha * D);
    });
    expect(rel(product[0]!, limit)).toBeLessThan(1e-5);
    expect(rel(product[1]!, limit)).toBeLessThan(1e-4);
    expect(rel(product[2]!, limit)).toBeLessThan(2e-3);
    expect(rel(product[3]!, limit)).toBeLessThan(2e-2);
    // Halving the angle near dead centre doubles the clamping force.
    const q1 = result(ok(solve(toZero, { alpha: 1 })), 'Q');
    const q05 = result(ok(solve(toZero, { alpha: 0.5 })), 'Q');
    expect(q05 / q1).toBeCloseTo(Math.tan(D) / Math.tan(0.5 * D), 3);
  });

  it('warns close to dead centre and reports a dead centre exactly at it', () => {
    const near = ok(solve(toZero, { alpha: 0.2 }));
    expect(near.warnings.join(' ')).toMatch(/close to a dead centre/);
    const at = solve(toZero, { alpha: 0 });
    expect(at.ok).toBe(false);
    if (at.ok) return;
    expect(at.error.kind).toBe('dead-centre');
    expect(at.error.message).toMatch(/dead centre/);
    expect(at.error.message).toMatch(/grow without bound/);
    const nearby = at.error.details!.nearby as { value: number; largestForce: number }[];
    expect(nearby.length).toBeGreaterThan(0);
    // A little way off, the forces are large but finite and fall as the angle opens.
    const sorted = [...nearby].sort((p, q) => p.value - q.value);
    expect(sorted[0]!.largestForce).toBeGreaterThan(sorted[sorted.length - 1]!.largestForce);
    expect(sorted[0]!.largestForce).toBeGreaterThan(50 * defaults.F);
  });

  it('the built-in refuses an angle below its range, naming the input', () => {
    const r = solve(toggleClamp, { alpha: 0 });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.kind).toBe('input');
    expect(r.error.path).toEqual(['inputs', 'alpha']);
  });
});

describe('toggle clamp: checks', () => {
  it('passes at the defaults and warns at a small toggle angle', () => {
    const d = ok(solve(toggleClamp));
    expect(d.checks.every((c) => c.verdict === 'pass')).toBe(true);
    const small = ok(solve(toggleClamp, { alpha: 3 }));
    expect(small.checks.find((c) => c.key === 'sensitivity')!.verdict).toBe('warn');
    const smaller = ok(solve(toggleClamp, { alpha: 1.5 }));
    expect(smaller.checks.find((c) => c.key === 'sensitivity')!.verdict).toBe('warn');
    expect(smaller.checks.find((c) => c.key === 'linkPush')!.verdict).toBe('pass');
  });
});
