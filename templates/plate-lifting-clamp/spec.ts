import type { TemplateSpecInput } from '../../shared/spec/template-spec';
import { FRICTION_GRIP, LIFTING_CAUTIONS } from '../common/cautions';
import { designFactorInput, ratedLoadInput } from '../common/inputs';

/**
 * Vertical plate lifting clamp with a lever jaw: the plate is squeezed between a fixed pad on
 * the clamp body and a lever jaw pivoted in the body; the lifting link pulls the lever's eye,
 * which sits above the plate's mid-plane when the plate hangs. The plate is the fixed frame of
 * the free body: lever 3 + body 3 = 6 equations for the pivot pin (2) and a normal and a
 * friction force at each face (4). See README.md.
 */
export const plateLiftingClamp: TemplateSpecInput = {
  specVersion: 1,
  slug: 'plate-lifting-clamp',
  title: 'Plate lifting clamp with a lever jaw',
  summary: 'Grip force, friction needed on both faces, squeeze ratio and pin force of a vertical plate clamp whose lever jaw is pulled closed by the lifting link.',
  category: 'lifting',
  inputs: [
    // A friction grip has no squeeze ratio at zero load, so the rated load starts at 1 kg.
    { ...ratedLoadInput(2000, 10000), min: 1 },
    { key: 't', label: 'Plate thickness', quantity: 'length', default: 20, min: 6, max: 100, step: 1, help: 'Thickness of the plate in the jaw.' },
    { key: 'e', label: 'Pivot offset from the plate face', quantity: 'length', default: 30, min: 15, max: 60, step: 0.5, help: 'Horizontal distance from the plate face the lever jaw touches to the lever pivot pin, in the gripping position.' },
    { key: 'd', label: 'Pivot height above the jaw contact', quantity: 'length', default: 10, min: 3, max: 40, step: 0.5, help: 'How far the lever pivot sits above the point where the lever jaw touches the plate, in the gripping position. Smaller squeezes harder.' },
    { key: 'p', label: 'Pad height above the jaw contact', quantity: 'length', default: 0, min: -4, max: 8, step: 0.5, help: 'Height of the fixed pad contact relative to the lever jaw contact; 0 when they face each other. Below the jaw the squeeze rises steeply: pad, jaw and pivot come into line (a dead centre).' },
    { key: 'hc', label: 'Eye height above the pivot', quantity: 'length', default: 90, min: 30, max: 300, step: 5, help: 'Where the lifting link pins to the lever. Only the drawing uses it: the pull is vertical, so its height does not change the forces.' },
    { key: 'muAvail', label: 'Available friction coefficient', quantity: 'coefficient', default: 0.35, min: 0.05, max: 1, step: 0.01, help: 'Static friction coefficient you can rely on between the jaws and the plate: take the low end of test data for the real surfaces.' },
    designFactorInput,
  ],
  derived: [
    { key: 'W', label: 'Rated load weight', quantity: 'force', expr: 'm * g' },
    { key: 'xJ', label: 'Jaw face position', quantity: 'length', expr: 't / 2' },
  ],
  points: {
    // Plate mid-plane at x = 0, lever jaw contact at the origin height.
    J: { at: ['xJ', 0] },
    A: { at: ['-xJ', 'p'] },
    O: { at: ['xJ + e', 'd'] },
    C: { at: [0, 'd + hc'] },
    K1: { at: ['-xJ - 25', 'p - 15'] },
    K2: { at: ['-xJ - 25', 'd + 40'] },
    K3: { at: ['xJ + e + 20', 'd + 40'] },
  },
  parts: [
    { id: 'lever', label: 'Lever jaw', outline: ['J', 'O', 'C'] },
    { id: 'body', label: 'Clamp body', outline: ['A', 'K1', 'K2', 'K3', 'O'] },
  ],
  joints: [
    { id: 'pivot', label: 'Lever pivot pin', kind: 'pin', at: 'O', between: ['lever', 'body'] },
    { id: 'jaw', label: 'Lever jaw on the plate', kind: 'contact', at: 'J', between: ['lever', 'ground'], normal: { angle: 0 }, friction: 'required' },
    { id: 'pad', label: 'Fixed pad on the plate', kind: 'contact', at: 'A', between: ['body', 'ground'], normal: { angle: 180 }, friction: 'required' },
  ],
  loads: [{ id: 'hook', label: 'Lifting link pull (load weight)', on: 'lever', at: 'C', force: { magnitude: 'W', direction: { angle: 90 } } }],
  results: [
    { key: 'N', label: 'Grip force (normal force on each face)', quantity: 'force', expr: "normal('jaw')" },
    { key: 'Ndesign', label: 'Grip force × design factor', quantity: 'force', expr: 'N * Nd' },
    { key: 'squeeze', label: 'Squeeze ratio (grip force ÷ load weight)', quantity: 'ratio', expr: 'N / W', help: 'What ASME B30.20 calls the grip ratio for pressure-gripping lifters: horizontal force on one side ÷ load.' },
    { key: 'Fjaw', label: 'Friction force at the lever jaw', quantity: 'force', expr: "abs(friction('jaw'))" },
    { key: 'Fpad', label: 'Friction force at the fixed pad', quantity: 'force', expr: "abs(friction('pad'))" },
    { key: 'muJaw', label: 'Friction coefficient required at the lever jaw', quantity: 'coefficient', expr: "muRequired('jaw')" },
    { key: 'muPad', label: 'Friction coefficient required at the fixed pad', quantity: 'coefficient', expr: "muRequired('pad')", help: 'The body is a two-force member between the pad and the pivot, so this is the slope of the line from the pad contact to the pivot.' },
    { key: 'muReq', label: 'Friction coefficient required to hold', quantity: 'coefficient', expr: 'max(muJaw, muPad)' },
    { key: 'Rpin', label: 'Lever pivot pin force', quantity: 'force', expr: "joint('pivot')" },
    { key: 'RpinDesign', label: 'Lever pivot pin force × design factor', quantity: 'force', expr: 'Rpin * Nd' },
    { key: 'Tlink', label: 'Lifting link tension', quantity: 'force', expr: "load('hook')" },
    { key: 'TlinkDesign', label: 'Lifting link tension × design factor', quantity: 'force', expr: 'Tlink * Nd' },
  ],
  checks: [
    {
      key: 'friction',
      label: 'Friction holds the plate on both faces with a margin',
      pass: 'muReq <= muAvail',
      warn: 'muReq > muAvail / 1.5',
      severity: 'fail',
      advice: 'One face needs more friction than is available: the plate would slip out. Bring the pivot closer to the jaw contact height or further from the plate face, or use jaws with a higher proven friction. A margin of 1.5 on friction is common practice, not a quoted clause.',
    },
    {
      key: 'grips',
      label: 'Both faces are pressed and hold the plate up',
      pass: "N > 0 && friction('jaw') < 0 && friction('pad') > 0",
      advice: 'With this geometry one face would have to push the plate down or pull away from it: the lever does not grip. Move the pad contact up towards the jaw contact height.',
    },
  ],
  cautions: [
    ...LIFTING_CAUTIONS,
    FRICTION_GRIP,
    'A plate clamp lifts one plate at a time, in the direction and plate-thickness range it is made for, with the jaw fully home on the plate; a side pull or a plate swinging against an obstacle can open the lever jaw.',
  ],
  references: [
    {
      label: 'Pad facing the jaw: 2000 kg, 20 mm plate, pivot 30 mm out and 10 mm up',
      source: 'Closed form by moments about the lever pivot with the body as a two-force member (README.md): N = W (t + e)/(2 d) = 2.5 W, μ = d/(t + e) = 0.2 on both faces, friction W/2 on each.',
      kind: 'closed-form',
      inputs: { m: 2000, t: 20, e: 30, d: 10, p: 0 },
      expect: { N: 2.5 * 2000 * 9.80665, muJaw: 0.2, muPad: 0.2, Fjaw: 1000 * 9.80665, Fpad: 1000 * 9.80665 },
      tolerance: 1e-9,
    },
    {
      label: 'Pad 5 mm above the jaw: 1000 kg, 30 mm plate, pivot 40 mm out and 15 mm up',
      source: 'Closed form (README.md): N = (t/2)(t + e) W/(d t + e p) = 1050/650 W, μ_pad = (d − p)/(t + e) = 1/7, μ_jaw = (d t + 2 e p + p t)/(t (t + e)) = 10/21.',
      kind: 'closed-form',
      inputs: { m: 1000, t: 30, e: 40, d: 15, p: 5 },
      expect: { N: (1050 / 650) * 1000 * 9.80665, muPad: 1 / 7, muJaw: 10 / 21, muReq: 10 / 21 },
      tolerance: 1e-9,
    },
  ],
  dimensions: [
    { input: 't', between: ['A', 'J'] },
    { input: 'e', between: ['J', 'O'] },
    { input: 'hc', between: ['O', 'C'] },
  ],
};
