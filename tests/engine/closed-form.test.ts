import { describe, expect, it } from 'vitest';
import { solve } from '../../shared/mechanics/solve';
import { toggleSpec } from './fixtures/toggle';
import { D, expectBalanced, expectClose, joint, load, makeSpec, member, ok, result } from './helpers';

/**
 * Closed-form cases: each derivation is written out beside its check, one per kind of
 * construction and joint the engine offers. Statics of rigid bodies, weightless members and
 * frictionless pins unless stated (any engineering-mechanics text, e.g. Meriam & Kraige,
 * Engineering Mechanics: Statics, ch. 3 and 4).
 */

describe('symmetric two-link hanger (two-force members meeting at a ring)', () => {
  // Anchors at (±w, 0), ring at (0, −h). Ring equilibrium: 2 T cos θ = W with θ = atan(w/h)
  // the link angle from vertical, so T = W / (2 cos θ), both links in tension.
  const spec = makeSpec({
    inputs: [
      { key: 'w', label: 'Half spread', quantity: 'length', default: 300, min: 1, max: 5000 },
      { key: 'h', label: 'Drop', quantity: 'length', default: 400, min: 1, max: 5000 },
      { key: 'W', label: 'Load', quantity: 'force', default: 1000, min: 0, max: 1e7 },
    ],
    points: { L: { at: ['-w', 0] }, R: { at: ['w', 0] }, K: { at: [0, '-h'] } },
    parts: [{ id: 'ring', label: 'Ring', outline: ['K'] }],
    members: [
      { id: 'left', label: 'Left link', ends: ['L', 'K'], connects: ['ground', 'ring'] },
      { id: 'right', label: 'Right link', ends: ['R', 'K'], connects: ['ground', 'ring'] },
    ],
    loads: [{ id: 'W', label: 'Load', on: 'ring', at: 'K', force: { magnitude: 'W', direction: { angle: -90 } } }],
  });

  it.each([
    [300, 400],
    [100, 1000],
    [800, 150],
  ])('w = %d mm, h = %d mm', (w, h) => {
    const r = ok(solve(spec, { w, h, W: 1000 }));
    const cosTheta = h / Math.hypot(w, h);
    for (const id of ['left', 'right']) {
      expectClose(member(r, id).axial, 1000 / (2 * cosTheta));
      expect(member(r, id).state).toBe('tension');
    }
    expectBalanced(r);
    // The ring is a node: no spurious free rotation is reported for it.
    expect(r.warnings).toEqual([]);
  });
});

describe('three-force body: a ladder pinned at its foot against a smooth wall', () => {
  // Ladder of length L at θ to the floor, weight W at mid-length. Moments about the foot A:
  // N_w L sin θ = W (L/2) cos θ → N_w = W / (2 tan θ); then A_x = N_w, A_y = W.
  // Three forces in equilibrium are concurrent: A's reaction points at the meeting point of the
  // wall reaction's line (y = L sin θ) and the weight's line (x = L cos θ / 2).
  const spec = makeSpec({
    inputs: [
      { key: 'L', label: 'Length', quantity: 'length', default: 3000, min: 100, max: 10000 },
      { key: 'theta', label: 'Angle to floor', quantity: 'angle', default: 60, min: 5, max: 85 },
      { key: 'W', label: 'Weight', quantity: 'force', default: 600, min: 0, max: 1e6 },
    ],
    points: { A: { at: [0, 0] }, B: { polar: { from: 'A', length: 'L', angle: 'theta' } }, M: { along: { from: 'A', to: 'B', fraction: 0.5 } } },
    parts: [{ id: 'ladder', label: 'Ladder', outline: ['A', 'B'] }],
    joints: [
      { id: 'foot', kind: 'pin', at: 'A', between: ['ladder', 'ground'] },
      { id: 'wall', kind: 'roller', at: 'B', between: ['ladder', 'ground'], normal: { angle: 180 } },
    ],
    loads: [{ id: 'W', label: 'Weight', on: 'ladder', at: 'M', force: { magnitude: 'W', direction: { angle: -90 } } }],
  });

  it.each([30, 60, 75])('θ = %d°', (theta) => {
    const r = ok(solve(spec, { theta }));
    const Nw = 600 / (2 * Math.tan(theta * D));
    expectClose(joint(r, 'wall').normal!, Nw);
    expectClose(joint(r, 'foot').fx, Nw);
    expectClose(joint(r, 'foot').fy, 600);
    const meet = { x: (3000 * Math.cos(theta * D)) / 2, y: 3000 * Math.sin(theta * D) };
    const a = joint(r, 'foot');
    // Cross product of the reaction with the direction to the meeting point is zero.
    expectClose(a.fx * meet.y - a.fy * meet.x, 0, 1e-9, a.resultant * Math.hypot(meet.x, meet.y));
    expectBalanced(r);
  });
});

describe('toggle: output-to-input ratio as a function of link angle', () => {
  // Two equal links at α to the line A–C, knee force Q perpendicular to it. Knee equilibrium:
  // each link carries Q / (2 sin α); its component along A–C at the slide is
  // Q cos α / (2 sin α), so P = Q / (2 tan α).
  it.each([45, 20, 10, 5, 2, 1, 0.5])('α = %d°', (alpha) => {
    const r = ok(solve(toggleSpec, { alpha, Q: 150, L: 100 }));
    expectClose(result(r, 'P'), 150 / (2 * Math.tan(alpha * D)));
    expectBalanced(r);
    // Virtual work on the same geometry, moved by finite differences, agrees.
    expect(r.verification.virtualWork!.relativeDifference).toBeLessThan(1e-6);
  });

  it('virtual work keeps its accuracy at the ends of the drive range (one-sided differences)', () => {
    for (const alpha of [80, 0.5]) {
      const spec = { ...toggleSpec, inputs: toggleSpec.inputs.map((i) => (i.key === 'alpha' ? { ...i, min: 0.5 } : i)) };
      const r = ok(solve(spec, { alpha }));
      expect(r.verification.virtualWork!.relativeDifference).toBeLessThan(1e-7);
    }
  });

  it('the ratio does not depend on link length (dimensionless statics)', () => {
    const a = result(ok(solve(toggleSpec, { alpha: 7, L: 50 })), 'MA');
    const b = result(ok(solve(toggleSpec, { alpha: 7, L: 900 })), 'MA');
    expectClose(a, b, 1e-12);
  });
});

describe('A-frame with a crossbar on a smooth floor', () => {
  // Legs of length L at half-angle α pinned at apex A; left foot B pinned (its horizontal
  // reaction comes out zero, as on a smooth floor), right foot C on a roller; crossbar (a tie)
  // joining the legs at distance s from the apex. Whole frame, moments about B:
  // N_C (2 L sin α) = P (d sin α) → N_C = P d / (2 L). Right leg, moments about A:
  // N_C L sin α = T s cos α → T = P d tan α / (2 s). Load at the apex (d = L): T = (P/2)(L/s) tan α.
  const spec = makeSpec({
    inputs: [
      { key: 'L', label: 'Leg length', quantity: 'length', default: 2000, min: 100, max: 10000 },
      { key: 'alpha', label: 'Half-angle', quantity: 'angle', default: 20, min: 2, max: 80 },
      { key: 's', label: 'Tie from apex', quantity: 'length', default: 1000, min: 1, max: 10000 },
      { key: 'd', label: 'Load from foot along leg', quantity: 'length', default: 2000, min: 0, max: 10000 },
      { key: 'P', label: 'Load', quantity: 'force', default: 1000, min: 0, max: 1e7 },
    ],
    points: {
      A: { at: [0, 'L * cosd(alpha)'] },
      B: { at: ['-L * sind(alpha)', 0] },
      C: { mirror: { of: 'B', line: ['A', 'O'] } },
      O: { at: [0, 0] },
      E: { along: { from: 'A', to: 'B', distance: 's' } },
      F: { mirror: { of: 'E', line: ['A', 'O'] } },
      G: { along: { from: 'B', to: 'A', distance: 'd' } },
    },
    parts: [
      { id: 'left', label: 'Left leg', outline: ['A', 'B'] },
      { id: 'right', label: 'Right leg', outline: ['A', 'C'] },
    ],
    members: [{ id: 'tie', label: 'Crossbar', ends: ['E', 'F'], connects: ['left', 'right'] }],
    joints: [
      { id: 'apex', kind: 'pin', at: 'A', between: ['left', 'right'] },
      { id: 'footB', kind: 'pin', at: 'B', between: ['left', 'ground'] },
      { id: 'footC', kind: 'roller', at: 'C', between: ['right', 'ground'], normal: { angle: 90 } },
    ],
    loads: [{ id: 'P', label: 'Load', on: 'left', at: 'G', force: { magnitude: 'P', direction: { angle: -90 } } }],
  });

  it('central load at the apex', () => {
    const r = ok(solve(spec, { d: 2000 }));
    expectClose(member(r, 'tie').axial, (1000 / 2) * (2000 / 1000) * Math.tan(20 * D));
    expectClose(joint(r, 'footC').normal!, 500);
    expectClose(joint(r, 'footB').fy, 500);
    expectClose(joint(r, 'footB').fx, 0, 1e-9, 1000);
    expectBalanced(r);
  });

  it('off-centre load on one leg', () => {
    for (const d of [300, 1200, 1700]) {
      const r = ok(solve(spec, { d }));
      expectClose(member(r, 'tie').axial, (1000 * d * Math.tan(20 * D)) / (2 * 1000));
      expect(member(r, 'tie').state).toBe('tension');
      expectClose(joint(r, 'footC').normal!, (1000 * d) / (2 * 2000));
      expectClose(joint(r, 'footB').fy, 1000 - (1000 * d) / (2 * 2000));
      expectBalanced(r);
    }
  });
});

describe('wall jib with a tie rod', () => {
  // Boom A–B pinned to the wall at A, tie B–D to a wall point h above A, load W at a along the
  // boom, boom weight W_b at mid-length. Moments about A: T b sin β = W a + W_b L/2 with
  // β = atan(h/b); horizontal pin force T cos β; vertical W + W_b − T sin β.
  // Example from ../shared/REFERENCES.md (derived): W = 20 kN at a = 3.5 m, W_b = 2 kN,
  // L = b = 4.0 m, h = 1.5 m → T = 52.69 kN, 49.33 kN, 3.500 kN.
  const spec = makeSpec({
    inputs: [
      { key: 'L', label: 'Boom length', quantity: 'length', default: 4000, min: 100, max: 20000 },
      { key: 'h', label: 'Tie height', quantity: 'length', default: 1500, min: 10, max: 20000 },
      { key: 'a', label: 'Trolley position', quantity: 'length', default: 3500, min: 0, max: 20000 },
      { key: 'W', label: 'Load', quantity: 'force', default: 20000, min: 0, max: 1e7 },
      { key: 'Wb', label: 'Boom weight', quantity: 'force', default: 2000, min: 0, max: 1e7 },
    ],
    points: { A: { at: [0, 0] }, B: { at: ['L', 0] }, D: { at: [0, 'h'] }, T: { at: ['a', 0] }, M: { at: ['L / 2', 0] } },
    parts: [{ id: 'boom', label: 'Boom', outline: ['A', 'B'] }],
    members: [{ id: 'tie', label: 'Tie rod', ends: ['B', 'D'], connects: ['boom', 'ground'] }],
    joints: [{ id: 'wall', kind: 'pin', at: 'A', between: ['boom', 'ground'] }],
    loads: [
      { id: 'W', label: 'Trolley load', on: 'boom', at: 'T', force: { magnitude: 'W', direction: { angle: -90 } } },
      { id: 'Wb', label: 'Boom weight', on: 'boom', at: 'M', force: { magnitude: 'Wb', direction: { angle: -90 } } },
    ],
  });

  it('matches the worked numbers', () => {
    const r = ok(solve(spec));
    expect(member(r, 'tie').axial / 1000).toBeCloseTo(52.69, 2);
    expect(joint(r, 'wall').fx / 1000).toBeCloseTo(49.33, 2); // the wall pushes the boom out (+x): compression
    expect(joint(r, 'wall').fy / 1000).toBeCloseTo(3.5, 3);
  });

  it('follows the closed form along the boom', () => {
    for (const a of [0, 1000, 2500, 4000]) {
      const r = ok(solve(spec, { a }));
      const beta = Math.atan2(1500, 4000);
      const T = (20000 * a + 2000 * 2000) / (4000 * Math.sin(beta));
      expectClose(member(r, 'tie').axial, T);
      expectClose(joint(r, 'wall').fx, T * Math.cos(beta));
      expectClose(joint(r, 'wall').fy, 22000 - T * Math.sin(beta), 1e-9, T);
      expectBalanced(r);
    }
  });
});

describe('frame with a roller on an inclined support', () => {
  // Beam A–B of span L pinned at A, roller at B on a surface whose normal leans φ from vertical
  // (towards −x). Vertical load P at a from A. Moments about A: N cos φ L = P a → N = P a /(L cos φ);
  // ΣFx: A_x = N sin φ; ΣFy: A_y = P − N cos φ = P (1 − a/L).
  const spec = makeSpec({
    inputs: [
      { key: 'phi', label: 'Incline', quantity: 'angle', default: 30, min: 0, max: 60 },
      { key: 'a', label: 'Load position', quantity: 'length', default: 700, min: 0, max: 2000 },
    ],
    points: { A: { at: [0, 0] }, B: { at: [2000, 0] }, C: { at: ['a', 0] } },
    parts: [{ id: 'beam', label: 'Beam', outline: ['A', 'B'] }],
    joints: [
      { id: 'A', kind: 'pin', at: 'A', between: ['beam', 'ground'] },
      { id: 'B', kind: 'roller', at: 'B', between: ['beam', 'ground'], normal: { angle: '90 + phi' } },
    ],
    loads: [{ id: 'P', label: 'Load', on: 'beam', at: 'C', force: { x: 0, y: -5000 } }],
  });

  it.each([0, 15, 45])('φ = %d°', (phi) => {
    const r = ok(solve(spec, { phi, a: 700 }));
    const N = (5000 * 700) / (2000 * Math.cos(phi * D));
    expectClose(joint(r, 'B').normal!, N);
    expectClose(joint(r, 'A').fx, N * Math.sin(phi * D), 1e-9, N);
    expectClose(joint(r, 'A').fy, 5000 * (1 - 700 / 2000));
    expectBalanced(r);
  });
});

describe('contact with friction', () => {
  // A block of weight W on a slope at θ, pushed by a horizontal force P, on the point of
  // slipping up the slope: resolving along and across the slope with friction μN against the
  // motion gives P = W (sin θ + μ cos θ)/(cos θ − μ sin θ) = W tan(θ + φ), φ = atan μ; on the
  // point of slipping down, P = W tan(θ − φ) (any statics text on dry friction).
  const spec = makeSpec({
    inputs: [
      { key: 'theta', label: 'Slope', quantity: 'angle', default: 20, min: 0, max: 60 },
      { key: 'mu', label: 'Friction coefficient', quantity: 'coefficient', default: 0.25, min: 0, max: 1 },
    ],
    points: { K: { at: [0, 0] } },
    parts: [{ id: 'block', label: 'Block', outline: ['K'] }],
    joints: [
      // Tangent = normal turned +90° = down the slope; slipping up, friction acts down it.
      { id: 'slope', kind: 'contact', at: 'K', between: ['block', 'ground'], normal: { angle: '90 + theta' }, friction: { coefficient: 'mu', sense: 1 } },
    ],
    loads: [
      { id: 'W', label: 'Weight', on: 'block', at: 'K', force: { magnitude: 1000, direction: { angle: -90 } } },
      { id: 'P', label: 'Push', on: 'block', at: 'K', force: { unknown: true, direction: { angle: 0 } } },
    ],
    results: [{ key: 'P', label: 'Push', quantity: 'force', expr: "load('P')" }],
  });
  const slipDown = { ...spec, joints: [{ ...spec.joints![0]!, friction: { coefficient: 'mu', sense: -1 as const } }] };

  it.each([
    [20, 0.25],
    [35, 0.1],
    [10, 0.5],
  ])('θ = %d°, μ = %d: on the point of slipping up and down', (theta, mu) => {
    const up = ok(solve(spec, { theta, mu }));
    expectClose(result(up, 'P'), 1000 * Math.tan(theta * D + Math.atan(mu)));
    expectClose(joint(up, 'slope').friction!, mu * joint(up, 'slope').normal!);
    expectBalanced(up);
    const down = ok(solve(slipDown, { theta, mu }));
    expectClose(result(down, 'P'), 1000 * Math.tan(theta * D - Math.atan(mu)), 1e-9, 1000);
  });

  it('reports the friction coefficient a ladder needs at a rough floor', () => {
    // Ladder at θ, smooth wall, weight W at mid-length: floor friction F = N_w = W/(2 tan θ),
    // floor normal W, so μ_required = 1/(2 tan θ).
    const ladder = makeSpec({
      inputs: [{ key: 'theta', label: 'Angle', quantity: 'angle', default: 65, min: 10, max: 85 }],
      points: { A: { at: [0, 0] }, B: { polar: { from: 'A', length: 4000, angle: 'theta' } }, M: { along: { from: 'A', to: 'B', fraction: 0.5 } } },
      parts: [{ id: 'ladder', label: 'Ladder', outline: ['A', 'B'] }],
      joints: [
        { id: 'floor', kind: 'contact', at: 'A', between: ['ladder', 'ground'], normal: { angle: 90 }, friction: 'required' },
        { id: 'wall', kind: 'roller', at: 'B', between: ['ladder', 'ground'], normal: { angle: 180 } },
      ],
      loads: [{ id: 'W', label: 'Weight', on: 'ladder', at: 'M', force: { magnitude: 800, direction: { angle: -90 } } }],
      results: [{ key: 'mu', label: 'Friction needed', quantity: 'coefficient', expr: "muRequired('floor')" }],
    });
    for (const theta of [50, 65, 80]) {
      const r = ok(solve(ladder, { theta }));
      expectClose(result(r, 'mu'), 1 / (2 * Math.tan(theta * D)));
      expectClose(joint(r, 'floor').muRequired!, 1 / (2 * Math.tan(theta * D)));
      expectClose(load(r, 'W').magnitude, 800);
    }
  });
});
