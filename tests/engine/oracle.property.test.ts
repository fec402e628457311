import fc from 'fast-check';
import { Matrix, SingularValueDecomposition, solve as mlSolve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { solve } from '../../shared/mechanics/solve';
import type { TemplateSpecInput } from '../../shared/spec/template-spec';
import { makeSpec } from './helpers';

/**
 * Independent oracle: random determinate frames. The test writes its own equilibrium
 * equations (about the origin, in its own unknown order, with its own sign bookkeeping) and
 * solves them with ml-matrix, a general-purpose linear-algebra library from the registry.
 * The engine's joint and member forces must match, and every part and the whole must balance.
 *
 * Frame recipe (determinate by counting, generically non-singular): part 0 is pinned to
 * ground and rests on a roller; each further part is pinned to an earlier part and held by a
 * roller or a two-force member to ground: 3 unknowns and 3 equations per part.
 */

interface Frame {
  spec: TemplateSpecInput;
  /** Per unknown: which part(s) it acts on and how, for the oracle's own equations. */
  columns: { id: string; acts: { part: number; x: number; y: number; ux: number; uy: number; sign: 1 | -1 }[] }[];
  loads: { part: number; x: number; y: number; fx: number; fy: number }[];
  parts: number;
}

const coord = fc.integer({ min: -1000, max: 1000 });
const pt = fc.tuple(coord, coord);
const angle = fc.integer({ min: 0, max: 359 });

const frameArb = fc
  .record({
    parts: fc.array(
      fc.record({ a: pt, b: pt, parentPick: fc.nat(), support: fc.constantFrom('roller', 'member'), normal: angle, anchor: pt }),
      { minLength: 1, maxLength: 4 },
    ),
    loads: fc.array(fc.record({ partPick: fc.nat(), at: pt, fx: fc.integer({ min: -5000, max: 5000 }), fy: fc.integer({ min: -5000, max: 5000 }) }), { minLength: 1, maxLength: 4 }),
  })
  .map(({ parts, loads }): Frame | null => {
    const points: Record<string, { at: [number, number] }> = {};
    const specParts: NonNullable<TemplateSpecInput['parts']> = [];
    const joints: NonNullable<TemplateSpecInput['joints']> = [];
    const members: NonNullable<TemplateSpecInput['members']> = [];
    const columns: Frame['columns'] = [];
    const rad = Math.PI / 180;
    for (const [k, p] of parts.entries()) {
      if (Math.hypot(p.a[0] - p.b[0], p.a[1] - p.b[1]) < 50) return null;
      points[`A${k}`] = { at: p.a };
      points[`B${k}`] = { at: p.b };
      specParts.push({ id: `p${k}`, label: `Part ${k}`, outline: [`A${k}`, `B${k}`] });
      const other = k === 0 ? 'ground' : `p${p.parentPick % k}`;
      const otherIdx = k === 0 ? -1 : p.parentPick % k;
      joints.push({ id: `pin${k}`, kind: 'pin', at: `A${k}`, between: [`p${k}`, other] });
      const pinActs = (ux: number, uy: number) => [
        { part: k, x: p.a[0], y: p.a[1], ux, uy, sign: 1 as const },
        ...(otherIdx >= 0 ? [{ part: otherIdx, x: p.a[0], y: p.a[1], ux, uy, sign: -1 as const }] : []),
      ];
      columns.push({ id: `pin${k}.x`, acts: pinActs(1, 0) }, { id: `pin${k}.y`, acts: pinActs(0, 1) });
      if (k === 0 || p.support === 'roller') {
        joints.push({ id: `sup${k}`, kind: 'roller', at: `B${k}`, between: [`p${k}`, 'ground'], normal: { angle: p.normal } });
        columns.push({ id: `sup${k}`, acts: [{ part: k, x: p.b[0], y: p.b[1], ux: Math.cos(p.normal * rad), uy: Math.sin(p.normal * rad), sign: 1 }] });
      } else {
        const len = Math.hypot(p.anchor[0] - p.b[0], p.anchor[1] - p.b[1]);
        if (len < 50) return null;
        points[`G${k}`] = { at: p.anchor };
        members.push({ id: `m${k}`, label: `Member ${k}`, ends: [`B${k}`, `G${k}`], connects: [`p${k}`, 'ground'] });
        // Tension pulls the part towards the anchor.
        columns.push({ id: `m${k}`, acts: [{ part: k, x: p.b[0], y: p.b[1], ux: (p.anchor[0] - p.b[0]) / len, uy: (p.anchor[1] - p.b[1]) / len, sign: 1 }] });
      }
    }
    const frameLoads = loads.map((l, i) => {
      const part = l.partPick % parts.length;
      points[`L${i}`] = { at: l.at };
      return { part, x: l.at[0], y: l.at[1], fx: l.fx, fy: l.fy, id: `F${i}` };
    });
    if (frameLoads.every((l) => l.fx === 0 && l.fy === 0)) return null;
    const spec = makeSpec({
      inputs: [{ key: 'k', label: 'unused', quantity: 'ratio', default: 1, min: 0, max: 2 }],
      points,
      parts: specParts,
      joints,
      members,
      loads: frameLoads.map((l) => ({ id: l.id, label: l.id, on: `p${l.part}`, at: `L${l.id.slice(1)}`, force: { x: l.fx, y: l.fy } })),
    });
    return { spec, columns, loads: frameLoads, parts: parts.length };
  })
  .filter((f): f is Frame => f !== null);

/** The oracle's own system: ΣFx, ΣFy, ΣM about the origin per part; moments in kN·m-like scale. */
function oracle(f: Frame): { x: number[]; condition: number } {
  const m = 3 * f.parts;
  const n = f.columns.length;
  const A = Matrix.zeros(m, n);
  const b = Matrix.zeros(m, 1);
  const s = 1e-3; // moment rows in N·m, to keep the matrix balanced
  f.columns.forEach((c, j) => {
    for (const a of c.acts) {
      A.set(3 * a.part, j, A.get(3 * a.part, j) + a.sign * a.ux);
      A.set(3 * a.part + 1, j, A.get(3 * a.part + 1, j) + a.sign * a.uy);
      A.set(3 * a.part + 2, j, A.get(3 * a.part + 2, j) + a.sign * (a.x * a.uy - a.y * a.ux) * s);
    }
  });
  for (const l of f.loads) {
    b.set(3 * l.part, 0, b.get(3 * l.part, 0) - l.fx);
    b.set(3 * l.part + 1, 0, b.get(3 * l.part + 1, 0) - l.fy);
    b.set(3 * l.part + 2, 0, b.get(3 * l.part + 2, 0) - (l.x * l.fy - l.y * l.fx) * s);
  }
  const condition = new SingularValueDecomposition(A, { computeLeftSingularVectors: false, computeRightSingularVectors: false }).condition;
  return { x: mlSolve(A, b).to1DArray(), condition };
}

describe('random determinate frames against an independent oracle (fast-check + ml-matrix)', () => {
  it('match the oracle, balance every part and balance globally to 1e-9', () => {
    let compared = 0;
    fc.assert(
      fc.property(frameArb, (frame) => {
        const { x, condition } = oracle(frame);
        const r = solve(frame.spec);
        if (!r.ok) {
          // Only a configuration the oracle also finds ill-conditioned may be refused.
          expect(condition, r.error.message).toBeGreaterThan(1e3);
          return;
        }
        fc.pre(condition < 1e7);
        compared++;
        const scale = Math.max(...x.map(Math.abs), 1);
        const engineValue = (id: string): number => {
          const [jid, comp] = id.split('.');
          const j = r.joints.find((q) => q.id === jid);
          if (j) return comp === 'x' ? j.fx : comp === 'y' ? j.fy : j.normal!;
          return r.members.find((q) => q.id === id)!.axial;
        };
        frame.columns.forEach((c, k) => {
          expect(Math.abs(engineValue(c.id) - x[k]!), c.id).toBeLessThanOrEqual(1e-9 * scale * Math.max(1, condition / 1e3));
        });
        expect(r.verification.maxResidual).toBeLessThan(1e-9);
        expect(r.verification.globalBalance.relative).toBeLessThan(1e-9);
        // Global equilibrium recomputed here from the engine's own reactions and the loads.
        let gx = 0;
        let gy = 0;
        let gm = 0;
        for (const l of frame.loads) {
          gx += l.fx;
          gy += l.fy;
          gm += l.x * l.fy - l.y * l.fx;
        }
        for (const body of r.freeBodies) {
          for (const f of body.forces) {
            const fromGround = f.source === 'member' || r.joints.some((j) => j.id === f.id && j.between[1] === 'ground');
            if (f.source !== 'load' && fromGround) {
              gx += f.fx;
              gy += f.fy;
              gm += f.x * f.fy - f.y * f.fx;
            }
          }
        }
        expect(Math.abs(gx) / scale).toBeLessThan(1e-9);
        expect(Math.abs(gy) / scale).toBeLessThan(1e-9);
        expect(Math.abs(gm) / (scale * 2000)).toBeLessThan(1e-9);
      }),
      { numRuns: 300, seed: 20261201 },
    );
    expect(compared).toBeGreaterThan(200);
  });
});
