import { describe, expect, it } from 'vitest';
import { solve } from '../../shared/mechanics/solve';
import { toggleSpec } from './fixtures/toggle';
import { makeSpec, ok } from './helpers';

/** Every way a system can fail to be determinate reaches the user as a reason, never a number. */

const beam = (joints: NonNullable<Parameters<typeof makeSpec>[0]['joints']>, extra: Partial<Parameters<typeof makeSpec>[0]> = {}) =>
  makeSpec({
    inputs: [{ key: 'P', label: 'Load', quantity: 'force', default: 1000, min: 0, max: 1e6 }],
    points: { A: { at: [0, 0] }, B: { at: [1000, 0] }, C: { at: [400, 0] } },
    parts: [{ id: 'beam', label: 'Beam', outline: ['A', 'B'] }],
    joints,
    loads: [{ id: 'P', label: 'Load', on: 'beam', at: 'C', force: { magnitude: 'P', direction: { angle: -90 } } }],
    ...extra,
  });

describe('classification', () => {
  it('a beam pinned at both ends is statically indeterminate, with the redundant unknowns named', () => {
    const r = solve(beam([
      { id: 'A', label: 'Pin A', kind: 'pin', at: 'A', between: ['beam', 'ground'] },
      { id: 'B', label: 'Pin B', kind: 'pin', at: 'B', between: ['beam', 'ground'] },
    ]));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.kind).toBe('indeterminate');
    expect(r.error.message).toMatch(/4 unknowns but only 3 independent/);
    // The horizontal components fight each other: those are what statics cannot share.
    expect(r.error.message).toMatch(/Pin A \(x\) and Pin B \(x\)/);
    expect(r.error.details).toMatchObject({ redundant: 1, rank: 3 });
  });

  it('a bar on one pin under an off-pin load is a mechanism that the load drives', () => {
    const r = solve(beam([{ id: 'A', kind: 'pin', at: 'A', between: ['beam', 'ground'] }]));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.kind).toBe('mechanism');
    expect(r.error.message).toMatch(/Beam can move/);
  });

  it('the same bar loaded through its pin balances, and the engine warns that it is free', () => {
    const spec = beam([{ id: 'A', kind: 'pin', at: 'A', between: ['beam', 'ground'] }]);
    const throughPin = { ...spec, loads: [{ ...spec.loads[0]!, at: 'A' }] };
    const r = ok(solve(throughPin));
    expect(r.warnings.join(' ')).toMatch(/can move freely in 1 way/);
    expect(r.joints[0]!.fy).toBeCloseTo(1000, 9);
  });

  it('rollers whose normals all meet in one point leave a free rotation: a mechanism', () => {
    const r = solve(beam([
      { id: 'A', kind: 'roller', at: 'A', between: ['beam', 'ground'], normal: { angle: 90 } },
      { id: 'B', kind: 'roller', at: 'B', between: ['beam', 'ground'], normal: { angle: 90 } },
      { id: 'C', kind: 'roller', at: 'C', between: ['beam', 'ground'], normal: { angle: 90 } },
    ]));
    // Three parallel normals: no horizontal restraint at all, and one of them is redundant.
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(['indeterminate', 'mechanism']).toContain(r.error.kind);
    expect(r.error.message).toMatch(/free motion|redundant/);
  });

  it('a toggle exactly straight is reported as a dead centre with its limit behaviour', () => {
    const r = solve(toggleSpec, { alpha: 0 });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.kind).toBe('dead-centre');
    expect(r.error.message).toMatch(/dead centre/);
    expect(r.error.message).toMatch(/grow without bound/);
    const nearby = (r.error.details as { nearby: { value: number; largestForce: number }[] }).nearby;
    // A little way off, the forces are finite and shrink as the angle opens: 1/(2 tan α) scaling.
    expect(nearby.length).toBeGreaterThanOrEqual(2);
    const [first, second] = nearby;
    expect(first!.largestForce).toBeGreaterThan(second!.largestForce);
    expect(first!.largestForce * first!.value).toBeCloseTo(second!.largestForce * second!.value, -1);
  });

  it('a toggle a few thousandths of a degree from straight is also a dead centre, never a huge number', () => {
    const r = solve(toggleSpec, { alpha: 0.002 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.kind).toBe('dead-centre');
  });

  it('a toggle a tenth of a degree from straight solves, with a warning about sensitivity', () => {
    const r = ok(solve(toggleSpec, { alpha: 0.1 }));
    expect(r.warnings.join(' ')).toMatch(/close to a dead centre/);
    expect(r.verification.conditioning).toBeLessThan(1e-2);
  });

  it('at ordinary angles there is no warning', () => {
    const r = ok(solve(toggleSpec, { alpha: 10 }));
    expect(r.warnings).toEqual([]);
  });

  it('no NaN or Infinity leaves the engine: a friction result at a separating contact is null with a note', () => {
    const spec = makeSpec({
      inputs: [{ key: 'P', label: 'Lift', quantity: 'force', default: 500, min: 0, max: 1e5 }],
      points: { A: { at: [0, 0] }, B: { at: [1000, 400] } },
      parts: [{ id: 'bar', label: 'Bar', outline: ['A', 'B'] }],
      joints: [
        { id: 'A', kind: 'roller', at: 'A', between: ['bar', 'ground'], normal: { angle: 0 } },
        { id: 'B', kind: 'contact', at: 'B', between: ['bar', 'ground'], normal: { angle: 90 }, friction: 'required' },
      ],
      // An upward pull at B: the contact would have to pull down, so it separates.
      loads: [{ id: 'P', label: 'Lift', on: 'bar', at: 'B', force: { magnitude: 'P', direction: { angle: 80 } } }],
      results: [{ key: 'mu', label: 'Friction needed', quantity: 'coefficient', expr: "muRequired('B')" }],
      checks: [{ key: 'grip', label: 'Friction holds', pass: "muRequired('B') < 0.3", advice: 'Add a stop.' }],
    });
    const r = ok(solve(spec));
    expect(r.results[0]!.value).toBeNull();
    expect(r.results[0]!.note).toMatch(/pull apart/);
    expect(r.joints[1]!.muRequired).toBeNull();
    expect(r.checks[0]!.verdict).toBe('fail');
    expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity/);
  });
});
