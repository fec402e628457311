import type { TemplateSpecInput } from '../../shared/spec/template-spec';
import { DESIGN_AID, IDEAL_MODEL, STRUCTURE } from '../common/cautions';

/**
 * Compound-lever cutter (bolt-cutter type), both halves modelled. The head is the frame
 * (ground): each handle pivots on it at H and drives, through a link C–E, the tail E of a jaw
 * that pivots on the head at J; the blade edge K bears on the bolt. The lower half is the
 * mirror image of the upper about the centre line. With the jaws closed the links stand at
 * right angles to the centre line and the moment arms are exactly a, b, c and d, so
 * Q = P (a/b)(c/d). The jaw gap (the bolt size where the cut starts) moves the mechanism and
 * is the driving coordinate. See README.md.
 */
export const compoundLeverCutter: TemplateSpecInput = {
  specVersion: 1,
  slug: 'compound-lever-cutter',
  title: 'Compound-lever cutter',
  summary: 'Jaw force and every pin force of a two-stage lever cutter (bolt-cutter type): handles drive the jaws through links.',
  category: 'machines',
  inputs: [
    { key: 'P', label: 'Hand force per handle', quantity: 'force', default: 200, min: 10, max: 600, step: 5, help: 'Squeeze of one hand on one handle, perpendicular to the handle; the other hand applies the same on the other handle.' },
    { key: 'gap', label: 'Jaw gap', quantity: 'length', default: 8, min: 0, max: 16, step: 0.5, control: 'slider', help: 'Opening between the blade edges where they bear on the bolt: the bolt size at the start of the cut, 0 at the end.' },
    { key: 'a', label: 'Handle reach', quantity: 'length', default: 400, min: 150, max: 800, step: 10, help: 'From the handle pivot to the middle of the grip.' },
    { key: 'b', label: 'Handle crank', quantity: 'length', default: 50, min: 20, max: 120, step: 1, help: 'From the handle pivot to the link pin, along the centre line (the link stands at right angles to it with the jaws closed).' },
    { key: 'c', label: 'Jaw tail', quantity: 'length', default: 60, min: 20, max: 150, step: 1, help: 'From the jaw pivot back to the link pin on the jaw.' },
    { key: 'd', label: 'Blade reach', quantity: 'length', default: 15, min: 8, max: 50, step: 1, help: 'From the jaw pivot forward to where the blade bears on the bolt, along the centre line.' },
    { key: 'Lk', label: 'Link length', quantity: 'length', default: 16, min: 8, max: 40, step: 1, help: 'Between the link pins.' },
    { key: 'hH', label: 'Handle pivot offset', quantity: 'length', default: 8, min: 3, max: 30, step: 1, help: 'Distance of each handle pivot from the centre line.' },
  ],
  derived: [
    { key: 'hJ', label: 'Jaw pivot offset from the centre line', quantity: 'length', expr: 'hH + Lk' },
    { key: 'rK', label: 'Jaw pivot to blade contact', quantity: 'length', expr: 'sqrt(d * d + hJ * hJ)' },
    { key: 'psi', label: 'Blade contact below the jaw pivot', quantity: 'angle', expr: 'atand(hJ / d)' },
    // Blade contact height y_K = hJ + rK sin(phi - psi) = gap / 2: the jaw's opening angle.
    { key: 'phi', label: 'Jaw opening angle', quantity: 'angle', expr: 'psi + asind((gap / 2 - hJ) / rK)' },
  ],
  points: {
    O: { at: [0, 0] },
    X: { at: [1, 0] },
    J1: { at: [0, 'hJ'] },
    H1: { at: ['-(b + c)', 'hH'] },
    K1: { polar: { from: 'J1', length: 'rK', angle: 'phi - psi' } },
    E1: { polar: { from: 'J1', length: 'c', angle: '180 + phi' } },
    C1: { fromTwo: { centres: ['E1', 'H1'], radii: ['Lk', 'b'], side: 'left' } },
    G1: { polar: { from: 'H1', length: 'a', angle: "dir('H1', 'C1') + 180" } },
    J2: { mirror: { of: 'J1', line: ['O', 'X'] } },
    H2: { mirror: { of: 'H1', line: ['O', 'X'] } },
    K2: { mirror: { of: 'K1', line: ['O', 'X'] } },
    E2: { mirror: { of: 'E1', line: ['O', 'X'] } },
    C2: { mirror: { of: 'C1', line: ['O', 'X'] } },
    G2: { mirror: { of: 'G1', line: ['O', 'X'] } },
  },
  parts: [
    { id: 'handle1', label: 'Upper handle', outline: ['H1', 'C1', 'G1'] },
    { id: 'jaw1', label: 'Upper jaw', outline: ['J1', 'E1', 'K1'] },
    { id: 'handle2', label: 'Lower handle', outline: ['H2', 'C2', 'G2'] },
    { id: 'jaw2', label: 'Lower jaw', outline: ['J2', 'E2', 'K2'] },
  ],
  members: [
    { id: 'link1', label: 'Upper link', ends: ['C1', 'E1'], connects: ['handle1', 'jaw1'] },
    { id: 'link2', label: 'Lower link', ends: ['C2', 'E2'], connects: ['handle2', 'jaw2'] },
  ],
  joints: [
    { id: 'H1', label: 'Upper handle pivot', kind: 'pin', at: 'H1', between: ['handle1', 'ground'] },
    { id: 'J1', label: 'Upper jaw pivot', kind: 'pin', at: 'J1', between: ['jaw1', 'ground'] },
    { id: 'H2', label: 'Lower handle pivot', kind: 'pin', at: 'H2', between: ['handle2', 'ground'] },
    { id: 'J2', label: 'Lower jaw pivot', kind: 'pin', at: 'J2', between: ['jaw2', 'ground'] },
  ],
  loads: [
    { id: 'P1', label: 'Hand force, upper handle', on: 'handle1', at: 'G1', force: { magnitude: 'P', direction: { angle: "dir('H1', 'G1') + 90" } } },
    { id: 'P2', label: 'Hand force, lower handle', on: 'handle2', at: 'G2', force: { magnitude: 'P', direction: { angle: "dir('H2', 'G2') - 90" } } },
    { id: 'Q1', label: 'Bolt on the upper jaw', on: 'jaw1', at: 'K1', force: { unknown: true, direction: { angle: 90 } } },
    { id: 'Q2', label: 'Bolt on the lower jaw', on: 'jaw2', at: 'K2', force: { unknown: true, direction: { angle: -90 } } },
  ],
  results: [
    { key: 'Q', label: 'Jaw force on the bolt', quantity: 'force', expr: "load('Q1')", help: 'Force of each blade on the bolt, at right angles to the centre line.' },
    { key: 'MA', label: 'Mechanical advantage', quantity: 'ratio', expr: 'Q / P', help: 'Jaw force per unit hand force on one handle.' },
    { key: 'Qlower', label: 'Jaw force, lower jaw', quantity: 'force', expr: "load('Q2')", help: 'Solved independently of the upper jaw; equal to it by symmetry.' },
    { key: 'S', label: 'Link compression', quantity: 'force', expr: "-member('link1')" },
    { key: 'RH', label: 'Handle pivot force', quantity: 'force', expr: "joint('H1')" },
    { key: 'RJ', label: 'Jaw pivot force', quantity: 'force', expr: "joint('J1')" },
    { key: 'stage1', label: 'First stage ratio (handle)', quantity: 'ratio', expr: 'S / P', help: 'Link force per unit hand force.' },
    { key: 'stage2', label: 'Second stage ratio (jaw)', quantity: 'ratio', expr: 'Q / S', help: 'Jaw force per unit link force.' },
    { key: 'ideal', label: 'Closed-jaw ratio (a/b)(c/d)', quantity: 'ratio', expr: '(a / b) * (c / d)' },
    { key: 'crankLinkAngle', label: 'Angle between handle crank and link', quantity: 'angle', expr: "acosd(abs(cosd(dir('H1', 'C1') - dir('C1', 'E1'))))" },
  ],
  checks: [
    {
      key: 'linkPush',
      label: 'Links push the jaws closed',
      pass: 'S > 0 && Q > 0',
      advice: 'With this geometry squeezing the handles would open the jaws: check the pin positions.',
    },
    {
      key: 'crankLink',
      label: 'Handle crank well away from a toggle with the link',
      pass: 'crankLinkAngle >= 20',
      warn: 'crankLinkAngle < 45',
      severity: 'warn',
      advice: 'The handle crank and the link are approaching a straight line: the ratio rises steeply but the handles then travel little and the pin forces grow. Keep the angle between them near 90° over the cut (common practice).',
    },
  ],
  cautions: [
    DESIGN_AID,
    IDEAL_MODEL,
    STRUCTURE,
    'The jaw force is what the blades deliver, not what a given bolt needs: the force to cut a bar depends on its material, hardness, size and the blade edge. Hardened bars (chains, locks, rebar of high grade) may need far more than the rating of the tool; wear eye protection, as cut ends can fly.',
  ],
  references: [
    {
      label: 'Derived example: 200 N per handle, a 400, b 50, c 60, d 15 mm',
      source: 'Compound-lever relation (derived, moments about each pivot): Q = P·(a/b)·(c/d) with perpendicular moment arms, P = 200 N → Q = 6400 N; exact here with the jaws closed (links at right angles to the centre line).',
      kind: 'closed-form',
      inputs: { P: 200, gap: 0, a: 400, b: 50, c: 60, d: 15 },
      expect: { Q: 6400, S: 1600, MA: 32 },
      tolerance: 1e-9,
    },
    {
      label: 'Jaws open 10 mm, defaults otherwise',
      source: 'Closed form with the moment arms of the open position: Q = P·a/(b·sin β1)·(c sin β2)/(rK cos(φ − ψ)), β1, β2 the link angles to the handle crank and the jaw tail (written out in tests/templates/compound-lever-cutter.test.ts).',
      kind: 'closed-form',
      inputs: { gap: 10 },
      expect: { Q: 3829.638, S: 1600.170, MA: 19.14819 },
      tolerance: 1e-6,
    },
  ],
  drive: { input: 'gap', effort: 'P1', output: 'Q1' },
  dimensions: [
    { input: 'a', between: ['H1', 'G1'] },
    { input: 'b', between: ['H1', 'C1'] },
    { input: 'c', between: ['J1', 'E1'] },
    { input: 'Lk', between: ['C1', 'E1'] },
  ],
};
