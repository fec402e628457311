import type { SolveResult } from '../mechanics/solve-result';
import type { Quantity } from './quantities';
import { toDisplay, type UnitSystem } from './unit-systems';

/**
 * A solve result in another unit system, by the one conversion table. The field quantities
 * are fixed by the result's schema: coordinates are lengths, force fields forces, couples
 * moments; results and derived values carry their own. Input values need the spec's
 * quantities, passed in by key.
 */
export function convertSolveResult(r: SolveResult, system: UnitSystem, inputQuantities: Record<string, Quantity>): SolveResult {
  if (system === 'SI') return r;
  const L = (v: number) => toDisplay(v, 'length', system);
  const F = (v: number) => toDisplay(v, 'force', system);
  const M = (v: number) => toDisplay(v, 'moment', system);
  const val = <T extends { value: number | null; quantity: Quantity }>(x: T): T => ({ ...x, value: x.value === null ? null : toDisplay(x.value, x.quantity, system) });
  return {
    ...r,
    inputs: Object.fromEntries(Object.entries(r.inputs).map(([k, v]) => [k, toDisplay(v, inputQuantities[k] ?? 'ratio', system)])),
    derived: r.derived.map(val),
    results: r.results.map(val),
    points: Object.fromEntries(Object.entries(r.points).map(([k, p]) => [k, { x: L(p.x), y: L(p.y) }])),
    freeBodies: r.freeBodies.map((b) => ({
      ...b,
      forces: b.forces.map((f) => ({ ...f, x: L(f.x), y: L(f.y), fx: F(f.fx), fy: F(f.fy), magnitude: F(f.magnitude) })),
      couples: b.couples.map((c) => ({ ...c, moment: M(c.moment) })),
    })),
    members: r.members.map((m) => ({ ...m, axial: F(m.axial) })),
    joints: r.joints.map((j) => ({
      ...j,
      fx: F(j.fx),
      fy: F(j.fy),
      resultant: F(j.resultant),
      ...(j.normal !== undefined ? { normal: F(j.normal) } : {}),
      ...(j.friction !== undefined ? { friction: F(j.friction) } : {}),
    })),
    loads: r.loads.map((l) => (l.kind === 'couple' ? { ...l, magnitude: M(l.magnitude) } : { ...l, fx: F(l.fx), fy: F(l.fy), magnitude: F(l.magnitude) })),
    verification: {
      ...r.verification,
      globalBalance: { ...r.verification.globalBalance, fx: F(r.verification.globalBalance.fx), fy: F(r.verification.globalBalance.fy), moment: M(r.verification.globalBalance.moment) },
    },
  };
}
