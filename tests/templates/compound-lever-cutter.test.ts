import { describe, expect, it } from 'vitest';
import { solve } from '../../shared/mechanics/solve';
import { compoundLeverCutter } from '../../templates/compound-lever-cutter/spec';
import { D, ok, result } from '../engine/helpers';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

const defaults = { P: 200, gap: 8, a: 400, b: 50, c: 60, d: 15, Lk: 16, hH: 8 };

/**
 * The upper half by moment arms, independent of the spec's constructions. Jaw pivot
 * J = (0, hJ), hJ = hH + Lk; handle pivot H = (−(b + c), hH). The jaw turns φ open so that its
 * blade contact rises to gap/2: hJ + rK sin(φ − ψ) = gap/2 with rK = √(d² + hJ²), tan ψ = hJ/d.
 * Jaw tail E = J + c(−cos φ, −sin φ). Link pin C: |CE| = Lk, |CH| = b, on the side of the
 * closed position. First stage, moments about H: P a = S · (distance of line C–E from H).
 * Second stage, moments about J: S · (distance of line C–E from J) = Q · (x_K − x_J).
 */
function cutterClosedForm(p: typeof defaults) {
  const { P, gap, a, b, c, d, Lk, hH } = p;
  const hJ = hH + Lk;
  const rK = Math.hypot(d, hJ);
  const psi = Math.atan(hJ / d);
  const phi = psi + Math.asin((gap / 2 - hJ) / rK);
  const E = [-c * Math.cos(phi), hJ - c * Math.sin(phi)] as const;
  const H = [-(b + c), hH] as const;
  // Circle intersection by the cosine rule in triangle E–H–C, C turned clockwise from E→H
  // by the angle at E (the closed position has C straight below E).
  const EH = Math.hypot(H[0] - E[0], H[1] - E[1]);
  const atE = Math.acos((EH * EH + Lk * Lk - b * b) / (2 * EH * Lk));
  const dirEH = Math.atan2(H[1] - E[1], H[0] - E[0]);
  const dirEC = dirEH + atE;
  const C = [E[0] + Lk * Math.cos(dirEC), E[1] + Lk * Math.sin(dirEC)] as const;
  const u = [Math.cos(dirEC), Math.sin(dirEC)] as const; // E→C
  const dist = (q: readonly [number, number]) => Math.abs((q[0] - E[0]) * u[1] - (q[1] - E[1]) * u[0]);
  const armH = dist(H);
  const armJ = dist([0, hJ]);
  const armK = rK * Math.cos(phi - psi);
  const S = (P * a) / armH;
  const Q = (S * armJ) / armK;
  // Pin forces. Handle: hand force at right angles to the handle (which points from H away
  // from C), link push along E→C at C. Jaw: link push along C→E at E, bolt push up at K.
  const dirHC = Math.atan2(C[1] - H[1], C[0] - H[0]);
  const hand = [P * Math.cos(dirHC - Math.PI / 2), P * Math.sin(dirHC - Math.PI / 2)];
  const RH = Math.hypot(hand[0]! + S * u[0], hand[1]! + S * u[1]);
  const RJ = Math.hypot(-S * u[0], -S * u[1] + Q);
  return { S, Q, MA: Q / P, RH, RJ, phi: phi / D, armH, armJ, armK };
}

describe('compound-lever cutter: independent hand check', () => {
  it('closed jaws: the perpendicular-arm product, by hand', () => {
    // Jaws closed (gap 0): φ = 0, the links stand at right angles to the centre line, so the
    // arms are exactly a = 400, b = 50 (first stage) and c = 60, d = 15 mm (second stage).
    // Hand 200 N: link S = 200 · 400/50 = 1600 N; jaw Q = 1600 · 60/15 = 6400 N; MA = 32.
    // Handle pivot: hand force 200 N down (at right angles to the handle) and link push 1600 N
    // up at C: RH = 1800 N. Jaw pivot: link 1600 N down at E, bolt 6400 N up: RJ = 8000 N.
    const r = ok(solve(compoundLeverCutter, { gap: 0 }));
    expect(rel(result(r, 'S'), 1600)).toBeLessThan(1e-9);
    expect(rel(result(r, 'Q'), 6400)).toBeLessThan(1e-9);
    expect(rel(result(r, 'RH'), 1800)).toBeLessThan(1e-9);
    expect(rel(result(r, 'RJ'), 8000)).toBeLessThan(1e-9);
    expect(rel(result(r, 'Qlower'), 6400)).toBeLessThan(1e-9);
  });

  it('jaws open 10 mm: moment arms of the open position', () => {
    // Defaults, gap 10: hJ = 24, rK = √(15² + 24²) = 28.302, ψ = 57.995°,
    // φ = 57.995° + asin((5 − 24)/28.302) = 57.995° − 42.170° = 15.825°.
    // The first-stage arm stays near b (the handle crank stays near 90° to the link),
    // the blade arm grows to rK cos(φ − ψ) = 28.302 cos 42.170° = 20.976 mm, so Q falls
    // well below the closed-jaw 6400 N.
    const cf = cutterClosedForm({ ...defaults, gap: 10 });
    expect(cf.phi).toBeCloseTo(15.825, 3);
    expect(cf.armK).toBeCloseTo(20.976, 3);
    const r = ok(solve(compoundLeverCutter, { gap: 10 }));
    for (const k of ['S', 'Q', 'MA', 'RH', 'RJ'] as const) expect(rel(result(r, k), cf[k]), k).toBeLessThan(1e-9);
    expect(result(r, 'Q')).toBeLessThan(6400);
  });

  it.each([0, 4, 8, 12, 16])('both halves solved independently agree, and virtual work, at gap %d mm', (gap) => {
    const r = ok(solve(compoundLeverCutter, { gap }));
    const cf = cutterClosedForm({ ...defaults, gap });
    expect(rel(result(r, 'Q'), cf.Q)).toBeLessThan(1e-9);
    expect(rel(result(r, 'Qlower'), result(r, 'Q'))).toBeLessThan(1e-9);
    const j = (id: string) => r.joints.find((x) => x.id === id)!;
    // Mirror images: the lower pins carry the mirrored forces.
    expect(j('H2').fx).toBeCloseTo(j('H1').fx, 6);
    expect(j('H2').fy).toBeCloseTo(-j('H1').fy, 6);
    // Whole tool: the head feels no net force from the hands and the bolt.
    const net = ['H1', 'H2', 'J1', 'J2'].reduce((s, id) => s + j(id).fy, 0);
    expect(Math.abs(net)).toBeLessThan(1e-6 * cf.Q);
    expect(r.verification.virtualWork!.relativeDifference).toBeLessThan(2e-5);
  });

  it('the reference cases in the spec match the closed form', () => {
    for (const ref of compoundLeverCutter.references!) {
      const cf = cutterClosedForm({ ...defaults, ...ref.inputs } as typeof defaults);
      for (const [key, expected] of Object.entries(ref.expect)) expect(rel(expected, cf[key as keyof typeof cf]), `${ref.label}: ${key}`).toBeLessThan(1e-6);
    }
  });
});

describe('compound-lever cutter: checks', () => {
  it('passes at the defaults; warns near a toggle and fails when the jaw would open', () => {
    const d = ok(solve(compoundLeverCutter));
    expect(d.checks.every((c) => c.verdict === 'pass')).toBe(true);
    // A long jaw tail opened wide: the handle turns so far that crank and link close to 40°, and
    // the link line has swung past the jaw pivot, so the link would turn the jaw open.
    const r = ok(solve(compoundLeverCutter, { gap: 16, c: 100 }));
    expect(result(r, 'crankLinkAngle')).toBeLessThan(45);
    expect(r.checks.find((c) => c.key === 'crankLink')!.verdict).toBe('warn');
    expect(result(r, 'Q')).toBeLessThan(0);
    expect(r.checks.find((c) => c.key === 'linkPush')!.verdict).toBe('fail');
  });
});
