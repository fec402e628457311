import { describe, expect, it } from 'vitest';
import { solve } from '../../shared/mechanics/solve';
import { wallJibTieRod } from '../../templates/wall-jib-tie-rod/spec';
import { result } from '../engine/helpers';

const g = 9.80665;

describe('wall jib with a tie rod: independent hand check', () => {
  it('tie attached part-way along the boom, load beyond it', () => {
    // Hand check (ours): L = 5 m, tie at 60 % (b = 3 m) to an anchor h = 2 m up, 1500 kg at 90 %
    // (a = 4.5 m), boom 300 kg at 2.5 m. Moments about the pin A:
    //   T sin β · b = W a + W_b L/2, with sin β = 2/√13 = 0.55470:
    //   T = (1500·4.5 + 300·2.5)·g / (3 · 0.55470) = 7500 g / 1.66410 = 44 199 N.
    // ΣFx: C = T cos β = T · 3/√13 = 36 774 N. ΣFy: V = (1500 + 300) g − T sin β = 17 652 − 24 517 = −6 865 N
    // (the pin pulls the boom down: the load beyond the tie levers the boom about the tie point).
    const r = solve(wallJibTieRod, { L: 5000, tieAt: 60, h: 2000, m: 1500, trolley: 90, mb: 300 });
    const sinB = 2 / Math.sqrt(13);
    const T = (7500 * g) / (3 * sinB);
    expect(result(r, 'T')).toBeCloseTo(T, 6);
    expect(result(r, 'T')).toBeCloseTo(44199, -1);
    expect(result(r, 'C')).toBeCloseTo((T * 3) / Math.sqrt(13), 6);
    expect(result(r, 'V')).toBeCloseTo(1800 * g - T * sinB, 6);
    expect(result(r, 'V')).toBeLessThan(0);
    expect(result(r, 'Tdesign')).toBeCloseTo(3 * T, 6);
  });

  it('warns about a shallow tie and fails a tie that would be compressed', () => {
    const shallow = solve(wallJibTieRod, { L: 12000, h: 1500 });
    if (!shallow.ok) throw new Error(shallow.error.message);
    expect(shallow.checks.find((c) => c.key === 'tieAngle')!.verdict).toBe('warn');
    const ok = solve(wallJibTieRod, {});
    if (!ok.ok) throw new Error(ok.error.message);
    expect(ok.checks.every((c) => c.verdict === 'pass')).toBe(true);
  });
});
