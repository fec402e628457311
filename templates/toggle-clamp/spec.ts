import type { TemplateSpecInput } from '../../shared/spec/template-spec';
import { CLAMPING, DESIGN_AID, IDEAL_MODEL, STRUCTURE } from '../common/cautions';

/**
 * Hold-down toggle clamp: a handle pivoted on the base at H drives a link C–D that pushes the
 * tail D of a clamp arm pivoted on the base at A; the spindle at P presses the work. The toggle
 * angle is the angle between the handle crank H–C and the link C–D, zero at dead centre. The
 * ground pivots H and A stay put as the toggle angle changes, so the toggle angle is a true
 * driving coordinate (virtual work cross-checks the mechanical advantage). See README.md.
 */
export const toggleClamp: TemplateSpecInput = {
  specVersion: 1,
  slug: 'toggle-clamp',
  title: 'Hold-down toggle clamp',
  summary: 'Clamping force, mechanical advantage, link and pivot forces of a hold-down toggle clamp for a given hand force, with the toggle angle from dead centre as an input.',
  category: 'workholding',
  inputs: [
    { key: 'F', label: 'Hand force', quantity: 'force', default: 100, min: 10, max: 500, step: 5, help: 'Force of the hand on the grip, perpendicular to the handle.' },
    { key: 'alpha', label: 'Toggle angle', quantity: 'angle', default: 5, min: 1, max: 30, step: 0.5, control: 'slider', help: 'Angle between the handle crank (handle pivot to link pin) and the link when the spindle meets the work; 0° is dead centre. Kept at 1° or more: at dead centre statics cannot hold the load.' },
    { key: 'Lh', label: 'Handle length', quantity: 'length', default: 200, min: 60, max: 500, step: 5, help: 'From the handle pivot to the grip, where the hand force acts.' },
    { key: 'r', label: 'Handle crank', quantity: 'length', default: 40, min: 15, max: 100, step: 1, help: 'From the handle pivot to the link pin on the handle.' },
    { key: 'l', label: 'Link length', quantity: 'length', default: 50, min: 20, max: 150, step: 1, help: 'Between the link pins (on the handle and on the arm tail).' },
    { key: 'e', label: 'Arm tail', quantity: 'length', default: 30, min: 10, max: 100, step: 1, help: 'From the arm pivot to the link pin on the arm.' },
    { key: 'La', label: 'Arm reach', quantity: 'length', default: 60, min: 20, max: 300, step: 1, help: 'From the arm pivot to the spindle (the clamping point), at right angles to the arm tail.' },
  ],
  derived: [
    // Triangle H–C–D with the angle 180° − alpha at the link pin C.
    { key: 'HD', label: 'Handle pivot to arm link pin', quantity: 'length', expr: 'sqrt(r * r + l * l + 2 * r * l * cosd(alpha))' },
    { key: 'phiH', label: 'Crank angle off the line H–D', quantity: 'angle', expr: 'asind(l * sind(alpha) / HD)' },
  ],
  points: {
    // Ground layout: at dead centre H, C and D lie on one horizontal line, the arm tail A–D is
    // vertical and the arm reach A–P horizontal.
    A: { at: [0, 0] },
    H: { at: ['-(l + r)', 'e'] },
    D: { fromTwo: { centres: ['H', 'A'], radii: ['HD', 'e'], side: 'left' } },
    C: { polar: { from: 'H', length: 'r', angle: "dir('H', 'D') + phiH" } },
    G: { polar: { from: 'H', length: 'Lh', angle: "dir('H', 'C') + 90" } },
    P: { polar: { from: 'A', length: 'La', angle: "dir('A', 'D') - 90" } },
  },
  parts: [
    { id: 'handle', label: 'Handle', outline: ['H', 'C', 'G'] },
    { id: 'arm', label: 'Clamp arm', outline: ['A', 'D', 'P'] },
  ],
  members: [{ id: 'link', label: 'Link', ends: ['C', 'D'], connects: ['handle', 'arm'] }],
  joints: [
    { id: 'H', label: 'Handle pivot', kind: 'pin', at: 'H', between: ['handle', 'ground'] },
    { id: 'A', label: 'Arm pivot', kind: 'pin', at: 'A', between: ['arm', 'ground'] },
  ],
  loads: [
    { id: 'F', label: 'Hand force', on: 'handle', at: 'G', force: { magnitude: 'F', direction: { angle: "dir('H', 'G') - 90" } } },
    { id: 'Q', label: 'Clamping force', on: 'arm', at: 'P', force: { unknown: true, direction: { angle: 90 } } },
  ],
  results: [
    { key: 'Q', label: 'Clamping force', quantity: 'force', expr: "load('Q')", help: 'The force of the spindle on the work (the work pushes back on the arm by as much).' },
    { key: 'MA', label: 'Mechanical advantage', quantity: 'ratio', expr: 'Q / F', help: 'Clamping force per unit hand force; grows as 1/tan of the toggle angle near dead centre.' },
    { key: 'S', label: 'Link compression', quantity: 'force', expr: "-member('link')" },
    { key: 'RH', label: 'Handle pivot force', quantity: 'force', expr: "joint('H')" },
    { key: 'RA', label: 'Arm pivot force', quantity: 'force', expr: "joint('A')" },
    { key: 'RAx', label: 'Arm pivot force, horizontal', quantity: 'force', expr: "jointX('A')" },
    { key: 'RAy', label: 'Arm pivot force, vertical', quantity: 'force', expr: "jointY('A')", help: 'On the arm, upwards positive: the base holds the arm down against the work.' },
    { key: 'MAlimit', label: 'Lever ratio of the toggle', quantity: 'ratio', expr: '(Lh * e) / (r * La)', help: 'Handle ratio times arm ratio; the mechanical advantage is close to this divided by sin of the toggle angle.' },
  ],
  checks: [
    {
      key: 'sensitivity',
      label: 'Toggle angle not so small that the force depends on tolerances',
      pass: 'alpha >= 2',
      warn: 'alpha < 4',
      severity: 'warn',
      advice: 'Below a few degrees the clamping force changes strongly with workpiece thickness, spindle setting and pin wear (the force grows as 1/tan of the angle). Set the spindle so the clamp closes past dead centre against its stop, and measure the force on the real fixture (common practice).',
    },
    {
      key: 'linkPush',
      label: 'Link pushes the arm onto the work',
      pass: 'S > 0 && Q > 0',
      advice: 'With this geometry the link would pull, so the hand force would lift the arm off the work: check the pin positions.',
    },
  ],
  cautions: [DESIGN_AID, CLAMPING, IDEAL_MODEL, STRUCTURE, 'This is the clamping force before dead centre. Past dead centre the clamp locks against its stop and holds by the stop, not by the hand: the holding capacity then comes from the clamp maker’s rating or a test, not from this calculation.'],
  references: [
    {
      label: 'Derived example: 100 N at 3° toggle angle',
      source: 'Closed form (README): MA = (Lh/r)·(e sin γ)/(La cos θ)/sin α, moments about the handle pivot, the two-force link, moments about the arm pivot; Lh 200, r 40, l 50, e 30, La 60 mm, α = 3°.',
      kind: 'closed-form',
      inputs: { F: 100, alpha: 3, Lh: 200, r: 40, l: 50, e: 30, La: 60 },
      expect: { Q: 4775.424, MA: 47.75424, S: 9553.661 },
      tolerance: 1e-6,
    },
    {
      label: 'Equal crank and link, 10° toggle angle',
      source: 'Closed form as above with Lh 150, r = l = 40, e 25, La 50 mm, α = 10°, F = 120 N (written out in tests/templates/toggle-clamp.test.ts).',
      kind: 'closed-form',
      inputs: { F: 120, alpha: 10, Lh: 150, r: 40, l: 40, e: 25, La: 50 },
      expect: { Q: 1289.415, MA: 10.74512, S: 2591.447 },
      tolerance: 1e-6,
    },
  ],
  drive: { input: 'alpha', effort: 'F', output: 'Q' },
  dimensions: [
    { input: 'Lh', between: ['H', 'G'] },
    { input: 'r', between: ['H', 'C'] },
    { input: 'l', between: ['C', 'D'] },
    { input: 'e', between: ['A', 'D'] },
    { input: 'La', between: ['A', 'P'] },
  ],
};
