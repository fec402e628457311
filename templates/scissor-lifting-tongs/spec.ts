import type { TemplateSpecInput } from '../../shared/spec/template-spec';
import { FRICTION_GRIP, LIFTING_CAUTIONS } from '../common/cautions';
import { designFactorInput, ratedLoadInput } from '../common/inputs';

/**
 * Scissor lifting tongs: two arms crossing at a centre pin, each pulled at its upper eye by a
 * link from the shackle, squeezing a box-shaped load between their jaws. The load is the fixed
 * frame of the free body (the hook pulls the shackle up with the load's weight), which keeps
 * the equilibrium square: shackle 2 + two arms 3 + 3 = 8 equations for 2 links, 2 pin
 * components and 2 × (normal, friction) at the jaws. See README.md.
 */
export const scissorLiftingTongs: TemplateSpecInput = {
  specVersion: 1,
  slug: 'scissor-lifting-tongs',
  title: 'Scissor lifting tongs',
  summary: 'Link forces, centre pin force, jaw squeeze and the friction coefficient a pair of scissor tongs needs to hold a box-shaped load.',
  category: 'lifting',
  inputs: [
    // A friction grip has no squeeze ratio at zero load, so the rated load starts at 1 kg.
    { ...ratedLoadInput(1000, 20000), min: 1 },
    { key: 'w', label: 'Grip width', quantity: 'length', default: 300, min: 100, max: 400, step: 5, help: 'Width of the load between the two jaw faces.' },
    { key: 'rj', label: 'Lower arm length', quantity: 'length', default: 250, min: 210, max: 400, step: 5, help: 'From the centre pin to the jaw contact, measured in a straight line.' },
    { key: 'ru', label: 'Upper arm length', quantity: 'length', default: 600, min: 300, max: 800, step: 5, help: 'From the centre pin to the upper eye where the link is pinned.' },
    { key: 'gamma', label: 'Arm included angle', quantity: 'angle', default: 180, min: 160, max: 190, step: 0.5, help: 'Angle at the centre pin between the line to the jaw contact and the line to the upper eye: 180° is a straight arm; less turns the upper arm towards the upright.' },
    { key: 'phi', label: 'Upper link angle from vertical', quantity: 'angle', default: 46, min: 15, max: 70, step: 0.5, help: 'Angle of each upper link from the vertical at this grip width; the link length follows. Flatter links squeeze harder but pull harder on the eyes and the shackle.' },
    { key: 'muAvail', label: 'Available jaw friction coefficient', quantity: 'coefficient', default: 0.35, min: 0.05, max: 1, step: 0.01, help: 'Static friction coefficient you can rely on between jaw and load: take the low end of test data for the real surfaces.' },
    designFactorInput,
  ],
  derived: [
    { key: 'W', label: 'Rated load weight', quantity: 'force', expr: 'm * g' },
    { key: 'bx', label: 'Jaw contact, horizontal from the pin', quantity: 'length', expr: 'w / 2' },
    { key: 'by', label: 'Jaw contact, depth below the pin', quantity: 'length', expr: 'sqrt(rj^2 - bx^2)' },
    { key: 'thetaU', label: 'Direction of the upper arm', quantity: 'angle', expr: 'atan2d(-by, bx) + gamma' },
  ],
  points: {
    P: { at: [0, 0] },
    JR: { at: ['bx', '-by'] },
    JL: { at: ['-bx', '-by'] },
    UL: { polar: { from: 'P', length: 'ru', angle: 'thetaU' } },
    UR: { at: ["-x('UL')", "y('UL')"] },
    S: { at: [0, "y('UL') - x('UL') / tand(phi)"] },
  },
  parts: [
    { id: 'shackle', label: 'Shackle', outline: ['S'] },
    { id: 'armA', label: 'Arm A (right jaw)', outline: ['UL', 'P', 'JR'] },
    { id: 'armB', label: 'Arm B (left jaw)', outline: ['UR', 'P', 'JL'] },
  ],
  members: [
    { id: 'linkA', label: 'Upper link to arm A', ends: ['S', 'UL'], connects: ['shackle', 'armA'] },
    { id: 'linkB', label: 'Upper link to arm B', ends: ['S', 'UR'], connects: ['shackle', 'armB'] },
  ],
  joints: [
    { id: 'pivot', label: 'Centre pin', kind: 'pin', at: 'P', between: ['armA', 'armB'] },
    { id: 'jawA', label: 'Right jaw on the load', kind: 'contact', at: 'JR', between: ['armA', 'ground'], normal: { angle: 0 }, friction: 'required' },
    { id: 'jawB', label: 'Left jaw on the load', kind: 'contact', at: 'JL', between: ['armB', 'ground'], normal: { angle: 180 }, friction: 'required' },
  ],
  loads: [{ id: 'hook', label: 'Hook pull (load weight)', on: 'shackle', at: 'S', force: { magnitude: 'W', direction: { angle: 90 } } }],
  results: [
    { key: 'T', label: 'Upper link tension (each)', quantity: 'force', expr: "member('linkA')" },
    { key: 'Tdesign', label: 'Upper link tension × design factor', quantity: 'force', expr: 'T * Nd' },
    { key: 'L', label: 'Upper link length (pin to pin)', quantity: 'length', expr: "dist('S', 'UL')" },
    { key: 'Rpin', label: 'Centre pin force', quantity: 'force', expr: "joint('pivot')", help: 'Between the two arms; horizontal for a symmetric pair.' },
    { key: 'RpinDesign', label: 'Centre pin force × design factor', quantity: 'force', expr: 'Rpin * Nd' },
    { key: 'N', label: 'Jaw normal force (each)', quantity: 'force', expr: "normal('jawA')" },
    { key: 'Ndesign', label: 'Jaw normal force × design factor', quantity: 'force', expr: 'N * Nd' },
    { key: 'F', label: 'Jaw friction force (each)', quantity: 'force', expr: "abs(friction('jawA'))", help: 'The share of the load weight each jaw must hold by friction.' },
    { key: 'Fdesign', label: 'Jaw friction force × design factor', quantity: 'force', expr: 'F * Nd' },
    { key: 'muReq', label: 'Friction coefficient required to hold', quantity: 'coefficient', expr: "max(muRequired('jawA'), muRequired('jawB'))", help: 'Friction force ÷ normal force at the jaw; independent of the load for a given geometry.' },
    { key: 'squeeze', label: 'Squeeze ratio (jaw normal force ÷ load weight)', quantity: 'ratio', expr: 'N / W', help: 'What ASME B30.20 calls the grip ratio for pressure-gripping lifters: horizontal force on one side ÷ load.' },
    { key: 'frictionMargin', label: 'Available ÷ required friction', quantity: 'ratio', expr: 'muAvail / muReq' },
  ],
  checks: [
    {
      key: 'friction',
      label: 'Jaw friction holds the load with a margin',
      pass: 'muReq <= muAvail',
      warn: 'muReq > muAvail / 1.5',
      severity: 'fail',
      advice: 'The jaws need more friction than is available: the load would slip out. Increase the squeeze (longer upper arms, flatter upper links, less jaw depth below the pin) or use jaws with a higher proven friction. A margin of 1.5 on friction is common practice, not a quoted clause.',
    },
    {
      key: 'jawsPress',
      label: 'Both jaws press on the load',
      pass: "normal('jawA') > 0 && normal('jawB') > 0",
      advice: 'With this geometry the jaws would pull away from the load instead of squeezing it: the tongs cannot hold anything.',
    },
  ],
  cautions: [
    ...LIFTING_CAUTIONS,
    FRICTION_GRIP,
    'The squeeze grows with the load, so a light load is held with the same friction margin as a heavy one, but only while the jaws stay in contact: a load narrower or wider than the grip range, or a soft load that crushes, changes the geometry.',
  ],
  references: [
    {
      label: 'Derived example: W = 10 kN, eye (0.20, 0.30) m, jaw (0.15, 0.20) m, links at 45°',
      source: 'Friction-grip tongs, moments about the centre pin (derived): N = (W/2)(a_x + b_x + a_y tan φ)/b_y = 1.625e4 N, μ = W/(2N) = 0.3077; re-derived in README.md; pin force N + (W/2) tan φ, link (W/2)/cos φ.',
      kind: 'closed-form',
      inputs: {
        m: 10000 / 9.80665,
        w: 300,
        rj: 250,
        ru: Math.hypot(200, 300),
        gamma: (Math.atan2(300, -200) - Math.atan2(-200, 150)) * (180 / Math.PI),
        phi: 45,
      },
      expect: { N: 16250, muReq: 10000 / (2 * 16250), Rpin: 16250 + 5000, T: 5000 * Math.SQRT2, squeeze: 1.625 },
      tolerance: 1e-6,
    },
    {
      label: 'Straight arms, 1000 kg, 3-4-5 links',
      source: 'Closed form, moments about the centre pin: eye (300, 400) mm, jaw (150, 200) mm, tan φ = 0.75, so N = (W/2)(300 + 150 + 300)/200 = 1.875 W, μ = 1/3.75, pin 2.25 W, link 0.625 W.',
      kind: 'closed-form',
      inputs: { m: 1000, w: 300, rj: 250, ru: 500, gamma: 180, phi: (Math.asin(0.6) * 180) / Math.PI },
      expect: { N: 1.875 * 1000 * 9.80665, muReq: 1 / 3.75, Rpin: 2.25 * 1000 * 9.80665, T: 0.625 * 1000 * 9.80665 },
      tolerance: 1e-9,
    },
  ],
  dimensions: [
    { input: 'w', between: ['JL', 'JR'] },
    { input: 'rj', between: ['P', 'JR'] },
    { input: 'ru', between: ['P', 'UL'] },
  ],
};
