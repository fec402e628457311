import { describe, expect, it } from 'vitest';
import { solve } from '../../shared/mechanics/solve';
import type { TemplateSpecInput } from '../../shared/spec/template-spec';
import { expectClose, makeSpec, ok } from './helpers';

/**
 * Constructions checked against coordinate geometry written out here. A single bar pinned at
 * A and resting on a roller at B carries a token load, so each spec solves; only the points
 * matter.
 */
function withPoints(points: TemplateSpecInput['points'], inputs: TemplateSpecInput['inputs'] = [{ key: 'k', label: 'k', quantity: 'ratio', default: 1, min: 0, max: 10 }]) {
  return makeSpec({
    inputs,
    points: { A: { at: [0, 0] }, B: { at: [1000, 0] }, ...points },
    parts: [{ id: 'bar', label: 'Bar', outline: ['A', 'B'] }],
    joints: [
      { id: 'A', kind: 'pin', at: 'A', between: ['bar', 'ground'] },
      { id: 'B', kind: 'roller', at: 'B', between: ['bar', 'ground'], normal: { angle: 90 } },
    ],
    loads: [{ id: 'P', label: 'Token load', on: 'bar', at: 'A', force: { x: 0, y: -1 } }],
  });
}
const pointsOf = (spec: TemplateSpecInput, inputs = {}) => ok(solve(spec, inputs)).points;

describe('constructions', () => {
  it('polar offset and plain offset', () => {
    const p = pointsOf(withPoints({ P: { polar: { from: 'B', length: 200, angle: 120 } }, Q: { offset: { from: 'P', dx: 10, dy: -5 } } }));
    expectClose(p.P!.x, 1000 + 200 * Math.cos((120 * Math.PI) / 180));
    expectClose(p.P!.y, 200 * Math.sin((120 * Math.PI) / 180));
    expectClose(p.Q!.x, p.P!.x + 10);
    expectClose(p.Q!.y, p.P!.y - 5);
  });

  it('the dyad: the point at given distances from two others, on the named side', () => {
    // A 3-4-5 triangle on A–B scaled to 1000: distances 600 and 800 meet at a right angle,
    // at x = 600² / 1000 = 360, y = ±600·800 / 1000 = ±480.
    const p = pointsOf(withPoints({
      L: { fromTwo: { centres: ['A', 'B'], radii: [600, 800], side: 'left' } },
      R: { fromTwo: { centres: ['A', 'B'], radii: [600, 800], side: 'right' } },
      S: { fromTwo: { centres: ['B', 'A'], radii: [800, 600], side: 'left' } },
    }));
    expectClose(p.L!.x, 360);
    expectClose(p.L!.y, 480);
    expectClose(p.R!.x, 360);
    expectClose(p.R!.y, -480);
    // Swapping the centres swaps which side is left.
    expectClose(p.S!.y, -480);
  });

  it('mirror about a line and a point along a segment', () => {
    const p = pointsOf(withPoints({
      C: { at: [300, 700] },
      M: { mirror: { of: 'C', line: ['A', 'D'] } },
      D: { at: [1000, 1000] },
      F: { along: { from: 'A', to: 'C', fraction: 0.25 } },
      G: { along: { from: 'A', to: 'C', distance: 'k * 100' } },
    }), { k: 2 });
    // Mirror in y = x swaps the coordinates.
    expectClose(p.M!.x, 700);
    expectClose(p.M!.y, 300);
    expectClose(p.F!.x, 75);
    expectClose(p.F!.y, 175);
    const len = Math.hypot(300, 700);
    expectClose(p.G!.x, (300 * 200) / len);
    expectClose(p.G!.y, (700 * 200) / len);
  });

  it('intersection of two lines', () => {
    // A–C: y = x; B–E: from (1000, 0) to (0, 500): y = 500 − x/2 → meet at x = y = 1000/3.
    const p = pointsOf(withPoints({ C: { at: [10, 10] }, E: { at: [0, 500] }, X: { intersect: { lines: [['A', 'C'], ['B', 'E']] } } }));
    expectClose(p.X!.x, 1000 / 3);
    expectClose(p.X!.y, 1000 / 3);
  });
});

describe('constructions that cannot close', () => {
  const dyad = (ra: number, rb: number) => withPoints({ D: { fromTwo: { centres: ['A', 'B'], radii: [ra, rb], side: 'left' } } });

  it('names the point, the lengths and the shortfall when links are too short', () => {
    const r = solve(dyad(300, 420));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.kind).toBe('geometry');
    expect(r.error.path).toEqual(['points', 'D']);
    expect(r.error.message).toBe('D: links of 300 mm and 420 mm cannot reach 1000 mm apart (A to B), 280 mm short');
    expect(r.error.details).toMatchObject({ shortfall: 280 });
  });

  it('says by how much one link overshoots when the centres are too close', () => {
    const r = solve(dyad(1500, 200));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toMatch(/D: A and B are only 1000 mm apart, so the link of 1500 mm from A overshoots the other by 300 mm/);
  });

  it('reports parallel lines', () => {
    const r = solve(withPoints({ C: { at: [0, 100] }, E: { at: [1000, 100] }, X: { intersect: { lines: [['A', 'B'], ['C', 'E']] } } }));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.kind).toBe('parallel');
    expect(r.error.message).toBe('X: lines A–B and C–E are parallel, so they do not meet');
  });

  it('reports coincident points for a mirror line and a member', () => {
    const r = solve(withPoints({ C: { at: [0, 0] }, M: { mirror: { of: 'B', line: ['A', 'C'] } } }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toMatch(/M: the mirror line A–C has no length/);
  });

  it('reports a coordinate that is not a finite number', () => {
    const r = solve(withPoints({ C: { at: ['sqrt(k - 5)', 0] } }), { k: 1 });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.kind).toBe('expression');
    expect(r.error.message).toMatch(/C: the x coordinate is not a finite number/);
  });
});
