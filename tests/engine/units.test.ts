import { describe, expect, it } from 'vitest';
import { solve } from '../../shared/mechanics/solve';
import { convertSolveResult } from '../../shared/units/convert-result';
import { fromDisplay, toDisplay, unitOf } from '../../shared/units/unit-systems';
import { toggleSpec } from './fixtures/toggle';
import { ok } from './helpers';

describe('units', () => {
  // Exact definitions (NIST SP 811, 2008 edition, appendix B): 1 in = 25.4 mm,
  // 1 lb = 0.45359237 kg, 1 lbf = 4.4482216152605 N; 1 psi = 6894.757 Pa (rounded there).
  it('convert by the exact definitions', () => {
    expect(toDisplay(25.4, 'length', 'US')).toBeCloseTo(1, 14);
    expect(fromDisplay(1, 'force', 'US')).toBeCloseTo(4.4482216152605, 12);
    expect(fromDisplay(1, 'mass', 'US')).toBeCloseTo(0.45359237, 14);
    expect(fromDisplay(1, 'moment', 'US')).toBeCloseTo(4.4482216152605 * 25.4, 10);
    expect(fromDisplay(1, 'stress', 'US') * 1e6).toBeCloseTo(6894.757, 2);
    expect(toDisplay(30, 'angle', 'US')).toBe(30);
    expect(unitOf('force', 'US')).toBe('lbf');
    expect(unitOf('length', 'SI')).toBe('mm');
  });

  it('give back a value typed in US units exactly, not with a last-digit error from the trip through SI', () => {
    for (const typed of [59, 157.5, 0.1, 12.7, 4409.25, 1e-3]) {
      for (const quantity of ['length', 'force', 'mass', 'moment', 'stress'] as const) {
        expect(toDisplay(fromDisplay(typed, quantity, 'US'), quantity, 'US')).toBe(typed);
      }
    }
  });

  it('round-trip every quantity', () => {
    for (const q of ['length', 'force', 'mass', 'angle', 'moment', 'stress', 'ratio', 'coefficient', 'percent', 'count'] as const) {
      expect(fromDisplay(toDisplay(123.456, q, 'US'), q, 'US')).toBeCloseTo(123.456, 10);
    }
  });

  it('convert a whole solve result consistently: a ratio stays, forces and lengths change', () => {
    const si = ok(solve(toggleSpec, { alpha: 12 }));
    const us = convertSolveResult(si, 'US', { L: 'length', alpha: 'angle', Q: 'force' });
    expect(us.results.find((r) => r.key === 'MA')!.value).toBeCloseTo(si.results.find((r) => r.key === 'MA')!.value!, 12);
    expect(us.results.find((r) => r.key === 'P')!.value! * 4.4482216152605).toBeCloseTo(si.results.find((r) => r.key === 'P')!.value!, 9);
    expect(us.points.B!.x * 25.4).toBeCloseTo(si.points.B!.x, 9);
    expect(us.inputs.L! * 25.4).toBeCloseTo(100, 9);
    expect(us.inputs.alpha).toBe(12);
    expect(us.joints[0]!.resultant * 4.4482216152605).toBeCloseTo(si.joints[0]!.resultant, 9);
    // The converted free body still balances in its own units.
    const body = us.freeBodies[0]!;
    const sum = body.forces.reduce((s, f) => s + f.fx, 0);
    expect(Math.abs(sum)).toBeLessThan(1e-9 * Math.max(...body.forces.map((f) => f.magnitude)));
  });
});
