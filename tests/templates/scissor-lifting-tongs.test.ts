import { describe, expect, it } from 'vitest';
import { solve } from '../../shared/mechanics/solve';
import { scissorLiftingTongs } from '../../templates/scissor-lifting-tongs/spec';
import { ok, result, verdict } from '../engine/helpers';

const g = 9.80665;

describe('scissor lifting tongs: independent hand check', () => {
  it('bent arms on a narrow load, links at 30° from vertical', () => {
    // Hand check (ours): 2000 kg (W = 19 613.3 N), grip 200 mm, lower arm 250 mm, upper arm 500 mm,
    // included angle 170°, links 30° from vertical.
    //   Jaw contact from the pin: b_x = 100, b_y = √(250² − 100²) = 229.129 mm, direction −66.422°.
    //   Upper eye direction −66.422° + 170° = 103.578°: a_x = 500·|cos| = 117.386, a_y = 500·sin = 486.025 mm.
    // Shackle: 2 T cos φ = W, so T = W / (2 cos 30°) = 11 323.7 N, horizontal pull T sin φ = (W/2) tan 30°.
    // Arm A, moments about the centre pin (friction W/2 down at the jaw, normal N outwards):
    //   N b_y = (W/2)(a_x + b_x + a_y tan φ) = 9806.65 · (117.386 + 100 + 280.607) → N = 21 314 N.
    //   μ = (W/2)/N = 0.4601; squeeze N/W = 1.0867. ΣFx on arm A: pin force = N + (W/2) tan φ = 26 976 N.
    const r = solve(scissorLiftingTongs, { m: 2000, w: 200, rj: 250, ru: 500, gamma: 170, phi: 30 });
    const W = 2000 * g;
    const by = Math.sqrt(250 ** 2 - 100 ** 2);
    const up = Math.atan2(-by, 100) + (170 * Math.PI) / 180;
    const ax = -500 * Math.cos(up);
    const ay = 500 * Math.sin(up);
    const t30 = Math.tan(Math.PI / 6);
    const N = ((W / 2) * (ax + 100 + ay * t30)) / by;
    expect(result(r, 'N')).toBeCloseTo(N, 6);
    expect(result(r, 'N')).toBeCloseTo(21314, -1);
    expect(result(r, 'muReq')).toBeCloseTo(0.4601, 4);
    expect(result(r, 'squeeze')).toBeCloseTo(1.0867, 4);
    expect(result(r, 'F')).toBeCloseTo(W / 2, 6);
    expect(result(r, 'T')).toBeCloseTo(W / (2 * Math.cos(Math.PI / 6)), 6);
    expect(result(r, 'Rpin')).toBeCloseTo(N + (W / 2) * t30, 6);
    expect(result(r, 'L')).toBeCloseTo(ax / Math.sin(Math.PI / 6), 6);
    expect(result(r, 'Ndesign')).toBeCloseTo(3 * N, 6);
    // The left jaw mirrors the right one: same squeeze, friction upwards on the load from both.
    const jaws = ok(r).joints;
    const A = jaws.find((j) => j.id === 'jawA')!;
    const B = jaws.find((j) => j.id === 'jawB')!;
    expect(B.normal).toBeCloseTo(A.normal!, 6);
    expect(A.fy).toBeCloseTo(-W / 2, 6);
    expect(B.fy).toBeCloseTo(-W / 2, 6);
    // That needs μ = 0.46 against 0.35 available: the friction check fails.
    expect(verdict(r, 'friction')).toBe('fail');
  });

  it('the friction needed depends on the geometry only, not on the load', () => {
    const light = solve(scissorLiftingTongs, { m: 50 });
    const heavy = solve(scissorLiftingTongs, { m: 20000 });
    expect(result(light, 'muReq')).toBeCloseTo(result(heavy, 'muReq'), 12);
    expect(result(heavy, 'N') / result(light, 'N')).toBeCloseTo(400, 9);
  });

  it('passes with the margin, warns inside it and fails without friction enough', () => {
    // Defaults: μ required 0.199 against 0.35 / 1.5 = 0.233.
    expect(verdict(solve(scissorLiftingTongs, {}), 'friction')).toBe('pass');
    // The reference geometry needs 0.3077: above 0.233, below 0.35.
    const ref = scissorLiftingTongs.references![0]!.inputs;
    expect(verdict(solve(scissorLiftingTongs, ref), 'friction')).toBe('warn');
    expect(verdict(solve(scissorLiftingTongs, { ...ref, muAvail: 0.3 }), 'friction')).toBe('fail');
    expect(verdict(solve(scissorLiftingTongs, { ...ref, muAvail: 0.47 }), 'friction')).toBe('pass');
  });

  it('flatter links squeeze harder and pull harder', () => {
    const steep = solve(scissorLiftingTongs, { phi: 20 });
    const flat = solve(scissorLiftingTongs, { phi: 60 });
    expect(result(flat, 'squeeze')).toBeGreaterThan(result(steep, 'squeeze'));
    expect(result(flat, 'T')).toBeGreaterThan(result(steep, 'T'));
    expect(result(flat, 'muReq')).toBeLessThan(result(steep, 'muReq'));
  });
});
