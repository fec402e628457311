import type { TemplateSpecInput } from '../../shared/spec/template-spec';
import { DESIGN_AID, IDEAL_MODEL, STRUCTURE } from '../common/cautions';

/**
 * Four-bar linkage driven by a torque on the crank O2–A, the coupler A–B a two-force member,
 * the output a force of unknown magnitude at right angles to the rocker O4–B at the output
 * radius (what the rocker pushes against); the output torque is that force times the radius.
 * The output is a force rather than a couple of unknown moment because the engine's
 * conditioning measure is far smaller with an unknown couple (about 1e-3 in good positions),
 * which would report a dead centre several degrees away from the real one. The assembly
 * branch (open or crossed) is a choice: both circle intersections are built and the chosen
 * one becomes B. See README.md.
 */
export const fourBarLinkage: TemplateSpecInput = {
  specVersion: 1,
  slug: 'four-bar-linkage',
  title: 'Four-bar linkage',
  summary: 'Output torque (or force at a rocker point) of a crank-driven four-bar across the crank angle, with the transmission angle and a warning where transmission is poor.',
  category: 'linkages',
  inputs: [
    { key: 'T2', label: 'Input torque', quantity: 'moment', default: 10000, min: 100, max: 1e7, step: 100, help: 'Torque on the crank, anticlockwise positive as drawn.' },
    { key: 'theta2', label: 'Crank angle', quantity: 'angle', default: 60, min: 0, max: 360, step: 1, control: 'slider', help: 'Crank O2–A from the line of centres O2→O4, anticlockwise.' },
    { key: 'd', label: 'Ground link', quantity: 'length', default: 300, min: 260, max: 340, step: 1, help: 'Distance between the fixed pivots O2 and O4.' },
    { key: 'a', label: 'Crank', quantity: 'length', default: 100, min: 40, max: 140, step: 1, help: 'Input link, fixed pivot O2 to the coupler pin A.' },
    { key: 'b', label: 'Coupler', quantity: 'length', default: 250, min: 210, max: 300, step: 1, help: 'Link between the crank pin A and the rocker pin B.' },
    { key: 'c', label: 'Rocker', quantity: 'length', default: 200, min: 160, max: 260, step: 1, help: 'Output link, fixed pivot O4 to the coupler pin B.' },
    { key: 'rOut', label: 'Output radius on the rocker', quantity: 'length', default: 200, min: 50, max: 1000, step: 5, help: 'Distance from O4, along the rocker, of the point where the output force is taken, at right angles to the rocker.' },
    {
      key: 'branch',
      label: 'Assembly branch',
      quantity: 'count',
      default: 1,
      min: 1,
      max: 2,
      control: 'choice',
      choices: [
        { value: 1, label: 'Open (B above the line A–O4)' },
        { value: 2, label: 'Crossed (B below the line A–O4)' },
      ],
      help: 'Which of the two ways the coupler and rocker close the loop for this crank angle.',
    },
  ],
  derived: [
    { key: 'lmax', label: 'Longest link', quantity: 'length', expr: 'max(a, b, c, d)' },
    { key: 'lmin', label: 'Shortest link', quantity: 'length', expr: 'min(a, b, c, d)' },
    // Grashof: s + l ≤ p + q, i.e. 2(s + l) ≤ a + b + c + d.
    { key: 'grashofMargin', label: 'Grashof margin p + q − s − l', quantity: 'length', expr: 'a + b + c + d - 2 * (lmax + lmin)' },
  ],
  points: {
    O2: { at: [0, 0] },
    O4: { at: ['d', 0] },
    A: { polar: { from: 'O2', length: 'a', angle: 'theta2' } },
    Bopen: { fromTwo: { centres: ['A', 'O4'], radii: ['b', 'c'], side: 'left' } },
    Bcrossed: { fromTwo: { centres: ['A', 'O4'], radii: ['b', 'c'], side: 'right' } },
    B: { at: ["branch == 1 ? x('Bopen') : x('Bcrossed')", "branch == 1 ? y('Bopen') : y('Bcrossed')"] },
    R: { polar: { from: 'O4', length: 'rOut', angle: "dir('O4', 'B')" } },
  },
  parts: [
    { id: 'crank', label: 'Crank', outline: ['O2', 'A'] },
    { id: 'rocker', label: 'Rocker', outline: ['O4', 'B', 'R'] },
  ],
  members: [{ id: 'coupler', label: 'Coupler', ends: ['A', 'B'], connects: ['crank', 'rocker'] }],
  joints: [
    { id: 'O2', label: 'Crank pivot', kind: 'pin', at: 'O2', between: ['crank', 'ground'] },
    { id: 'O4', label: 'Rocker pivot', kind: 'pin', at: 'O4', between: ['rocker', 'ground'] },
  ],
  loads: [
    { id: 'T2', label: 'Input torque', kind: 'couple', on: 'crank', moment: 'T2' },
    // The reaction of the driven machine on the rocker, clockwise tangent: positive when the
    // rocker pushes anticlockwise.
    { id: 'Fout', label: 'Output force', on: 'rocker', at: 'R', force: { unknown: true, direction: { angle: "dir('O4', 'B') - 90" } } },
  ],
  results: [
    { key: 'Fout', label: 'Output force', quantity: 'force', expr: "load('Fout')", help: 'Force the rocker delivers at the output radius, at right angles to the rocker; positive anticlockwise about O4.' },
    { key: 'T4', label: 'Output torque', quantity: 'moment', expr: 'Fout * rOut', help: 'Torque the rocker delivers to what it drives, anticlockwise positive.' },
    { key: 'ratio', label: 'Torque ratio', quantity: 'ratio', expr: 'abs(T4) / T2', help: 'Output over input torque; equal to the crank speed over the rocker speed (virtual power).' },
    { key: 'theta4', label: 'Rocker angle', quantity: 'angle', expr: "dir('O4', 'B')" },
    { key: 'mu', label: 'Transmission angle', quantity: 'angle', expr: "acosd(abs(cosd(dir('A', 'B') - dir('O4', 'B'))))", help: 'Angle between coupler and rocker, folded to 0–90°; 90° transmits best.' },
    { key: 'Fc', label: 'Coupler force', quantity: 'force', expr: "member('coupler')", help: 'Tension positive.' },
    { key: 'R2', label: 'Crank pivot force', quantity: 'force', expr: "joint('O2')" },
    { key: 'R4', label: 'Rocker pivot force', quantity: 'force', expr: "joint('O4')" },
    { key: 'crankCoupler', label: 'Crank–coupler angle', quantity: 'angle', expr: "acosd(abs(cosd(dir('O2', 'A') - dir('A', 'B'))))", help: 'Zero at the limit positions of the rocker, where a crank torque cannot be balanced by a finite rocker torque.' },
  ],
  checks: [
    {
      key: 'transmission',
      label: 'Transmission angle',
      pass: 'mu >= 20',
      warn: 'mu < 40',
      severity: 'fail',
      advice: 'Below about 40° the coupler mostly pulls along the rocker instead of turning it: the pin forces grow, friction and play take over and the linkage may jam. Change the link lengths so the transmission angle stays above 40° over the working range (R. L. Norton, Design of Machinery, from memory).',
    },
    {
      key: 'limitPosition',
      label: 'Not near a limit position of the rocker',
      pass: 'crankCoupler >= 2',
      warn: 'crankCoupler < 10',
      severity: 'warn',
      advice: 'Crank and coupler are nearly in line: the rocker is at the end of its swing, its speed goes to zero and the torque ratio and pin forces grow without bound. Read the output away from this crank angle.',
    },
    {
      key: 'grashof',
      label: 'Crank turns a full revolution (Grashof crank-rocker)',
      pass: 'grashofMargin >= 0 && a == lmin',
      severity: 'warn',
      advice: 'With these lengths the crank is not the shortest link of a Grashof linkage, so it cannot turn a full circle: some crank angles cannot be assembled.',
    },
  ],
  cautions: [DESIGN_AID, IDEAL_MODEL, STRUCTURE, 'Speeds are assumed low: inertia forces of the links, which grow with the square of the speed, are not included.'],
  references: [
    {
      label: 'Derived example: ground 300, crank 100, coupler 250, rocker 200 mm, θ2 = 60°',
      source: 'Derived example after Freudenstein, Trans. ASME 77 (1955) 853–861, in the form of R. L. Norton, Design of Machinery, 2nd ed. (McGraw-Hill 1999); open branch → θ4 = 97.56°, μ = 71.03°, torque ratio 3.429 (rounded as printed there).',
      kind: 'closed-form',
      inputs: { d: 300, a: 100, b: 250, c: 200, theta2: 60, T2: 10000, branch: 1 },
      expect: { theta4: 97.56, mu: 71.03, ratio: 3.429 },
      tolerance: 0.0005,
    },
    {
      label: 'Crossed branch, θ2 = 100°',
      source: 'Loop closure (circle intersection, the other side) and virtual power T4/T2 = c sin(θ4 − θ3)/(a sin(θ2 − θ3)) (written out in tests/templates/four-bar-linkage.test.ts).',
      kind: 'closed-form',
      inputs: { theta2: 100, branch: 2 },
      expect: { theta4: -148.6505, mu: 85.45805, T4: -45657.58, Fout: -228.2879 },
      tolerance: 1e-6,
    },
  ],
  drive: { input: 'theta2', effort: 'T2', output: 'Fout' },
  dimensions: [
    { input: 'd', between: ['O2', 'O4'] },
    { input: 'a', between: ['O2', 'A'] },
    { input: 'b', between: ['A', 'B'] },
    { input: 'c', between: ['O4', 'B'] },
  ],
};
