import type { TemplateSpecInput } from '../../shared/spec/template-spec';
import { LIFTING_CAUTIONS } from '../common/cautions';
import { designFactorInput, ratedLoadInput } from '../common/inputs';

/**
 * Shop crane (floor crane): base legs and mast as one rigid frame on front wheels F and rear
 * castors R, a boom pinned at the mast top P, a hydraulic ram from a pin Q low on the frame to
 * a pin B on the boom, the load at the hook T of the (extended) boom. See README.md.
 */
export const shopCrane: TemplateSpecInput = {
  specVersion: 1,
  slug: 'shop-crane',
  title: 'Shop crane (floor crane)',
  summary: 'Ram force, boom pivot force, wheel reactions and the margin against tipping over the front wheels of a floor crane, with the boom extension as an input.',
  category: 'lifting',
  inputs: [
    ratedLoadInput(1000, 3000),
    { key: 'ext', label: 'Boom extension', quantity: 'length', default: 0, min: 0, max: 900, step: 10, control: 'slider', help: 'How far the inner boom is pulled out beyond the shortest position. Rated loads fall as it grows: check the tipping margin at each setting.' },
    { key: 'phi', label: 'Boom angle above horizontal', quantity: 'angle', default: 20, min: -30, max: 65, step: 0.5, control: 'slider', help: 'Set by the ram stroke; negative when the boom points down.' },
    { key: 'Lb', label: 'Boom length, retracted', quantity: 'length', default: 1000, min: 500, max: 2500, step: 10, help: 'From the boom pivot to the hook pin with the extension fully in.' },
    { key: 'Hm', label: 'Boom pivot height', quantity: 'length', default: 1500, min: 900, max: 2500, step: 10, help: 'Height of the mast-top pivot above the floor.' },
    { key: 'rAt', label: 'Ram pin on the boom', quantity: 'length', default: 500, min: 200, max: 1200, step: 10, help: 'Distance along the boom from its pivot to the ram upper pin.' },
    { key: 'hq', label: 'Ram base pin height', quantity: 'length', default: 300, min: 100, max: 700, step: 10, help: 'Height of the ram lower pin above the floor.' },
    { key: 'dq', label: 'Ram base pin ahead of the mast', quantity: 'length', default: 150, min: -200, max: 600, step: 10, help: 'Horizontal distance of the ram lower pin in front of the mast centre line (negative behind it).' },
    { key: 'xF', label: 'Front wheels ahead of the mast', quantity: 'length', default: 1150, min: 400, max: 2000, step: 10, help: 'From the mast centre line to the front wheel axle, measured on the floor. The crane tips about this line.' },
    { key: 'xR', label: 'Rear castors behind the mast', quantity: 'length', default: 250, min: 0, max: 800, step: 10, help: 'From the mast centre line back to the rear castor axle.' },
    { key: 'mBase', label: 'Base and mast mass', quantity: 'mass', default: 70, min: 0, max: 600, step: 1, help: 'Self-weight of the legs, mast and ram cylinder together.' },
    { key: 'xg', label: 'Base and mast centre of gravity ahead of the mast', quantity: 'length', default: 350, min: -500, max: 1500, step: 10, help: 'Horizontal position of that weight (legs reach forward, so usually ahead of the mast).' },
    { key: 'mBoom', label: 'Boom mass', quantity: 'mass', default: 25, min: 0, max: 300, step: 1, help: 'Self-weight of the boom with its extension, taken at the middle of the current boom length.' },
    designFactorInput,
  ],
  derived: [
    { key: 'W', label: 'Rated load weight', quantity: 'force', expr: 'm * g' },
    { key: 'Wbase', label: 'Base and mast weight', quantity: 'force', expr: 'mBase * g' },
    { key: 'Wboom', label: 'Boom weight', quantity: 'force', expr: 'mBoom * g' },
    { key: 'Lt', label: 'Pivot to hook', quantity: 'length', expr: 'Lb + ext' },
    { key: 'Wtotal', label: 'Total weight on the wheels', quantity: 'force', expr: 'W + Wbase + Wboom' },
  ],
  points: {
    S: { at: [0, 0] },
    F: { at: ['xF', 0] },
    R: { at: ['-xR', 0] },
    P: { at: [0, 'Hm'] },
    Q: { at: ['dq', 'hq'] },
    B: { polar: { from: 'P', length: 'rAt', angle: 'phi' } },
    T: { polar: { from: 'P', length: 'Lt', angle: 'phi' } },
    BM: { along: { from: 'P', to: 'T', fraction: 0.5 } },
    GB: { at: ['xg', 'Hm / 4'] },
  },
  parts: [
    { id: 'frame', label: 'Base and mast', outline: ['R', 'F', 'S', 'P'] },
    { id: 'boom', label: 'Boom', outline: ['P', 'T'] },
  ],
  members: [{ id: 'ram', label: 'Hydraulic ram', ends: ['Q', 'B'], connects: ['frame', 'boom'] }],
  joints: [
    { id: 'pivot', label: 'Boom pivot', kind: 'pin', at: 'P', between: ['boom', 'frame'] },
    // The loads are vertical, so the floor's horizontal force is zero; pinning the front wheels
    // only fixes the frame on the floor instead of leaving it free to roll.
    { id: 'front', label: 'Front wheels', kind: 'pin', at: 'F', between: ['frame', 'ground'] },
    { id: 'rear', label: 'Rear castors', kind: 'roller', at: 'R', between: ['frame', 'ground'], normal: { angle: 90 } },
  ],
  loads: [
    { id: 'W', label: 'Hook load', on: 'boom', at: 'T', force: { magnitude: 'W', direction: { angle: -90 } } },
    { id: 'Wboom', label: 'Boom weight', on: 'boom', at: 'BM', force: { magnitude: 'Wboom', direction: { angle: -90 } } },
    { id: 'Wbase', label: 'Base and mast weight', on: 'frame', at: 'GB', force: { magnitude: 'Wbase', direction: { angle: -90 } } },
  ],
  results: [
    { key: 'C', label: 'Ram force (compression)', quantity: 'force', expr: "-member('ram')" },
    { key: 'Cdesign', label: 'Ram force × design factor', quantity: 'force', expr: 'C * Nd' },
    { key: 'Rpivot', label: 'Boom pivot force', quantity: 'force', expr: "joint('pivot')" },
    { key: 'RpivotDesign', label: 'Boom pivot force × design factor', quantity: 'force', expr: 'Rpivot * Nd' },
    { key: 'Nfront', label: 'Front wheel reaction', quantity: 'force', expr: "jointY('front')", help: 'Both front wheels together.' },
    { key: 'Nrear', label: 'Rear castor reaction', quantity: 'force', expr: "normal('rear')", help: 'Both rear castors together; negative means the crane tips forward over its front wheels.' },
    {
      key: 'rearShare',
      label: 'Counter-tipping margin (rear castor share)',
      quantity: 'percent',
      expr: 'Wtotal > 0 ? 100 * Nrear / Wtotal : 100',
      help: 'The share of the total weight still on the rear castors: (stabilising − overturning moment about the front wheels) ÷ (total weight × wheelbase). 0 % is the point of tipping.',
    },
    { key: 'reach', label: 'Hook reach ahead of the mast', quantity: 'length', expr: "x('T')" },
    { key: 'overhang', label: 'Hook beyond the front wheels', quantity: 'length', expr: "x('T') - x('F')", help: 'Negative while the hook is inside the wheel base.' },
    { key: 'hookHeight', label: 'Hook pin height', quantity: 'length', expr: "y('T')" },
    { key: 'ramAngle', label: 'Ram angle to the boom', quantity: 'angle', expr: "abs(dir('Q', 'B') - phi)" },
    { key: 'ramLength', label: 'Ram length (pin to pin)', quantity: 'length', expr: "dist('Q', 'B')" },
  ],
  checks: [
    {
      key: 'tipping',
      label: 'The crane stays on its rear castors',
      pass: 'Nrear > 0',
      warn: 'rearShare < 10',
      severity: 'fail',
      advice: 'The hook load tips the crane over its front wheels (or leaves under 10 % of the weight on the rear castors, a margin of our own choosing): shorten the extension, lower the load rating for this setting, or lengthen the legs.',
    },
    {
      key: 'ramAngle',
      label: 'The ram does not act too flat to the boom',
      pass: 'ramAngle >= 10',
      warn: 'ramAngle < 20',
      severity: 'warn',
      advice: 'The ram force grows as 1/sin of its angle to the boom: below about 20° small changes of angle change it a lot. Move the ram pins further apart across the boom (common practice, no standard cited).',
    },
  ],
  cautions: [
    ...LIFTING_CAUTIONS,
    'Shop cranes (floor cranes) in the USA fall under ASME PALD, Portable Automotive Lifting Devices (from memory; confirm the edition and its rated-load, proof-load and marking clauses), and elsewhere under the machinery rules that apply.',
    'The tipping margin is for a level, hard floor with the load hanging still: a slope, soft ground, a swinging load or rolling the crane with the load raised take most of it away. Move the crane with the load low and close to the mast.',
  ],
  references: [
    {
      label: 'Horizontal boom, ram base pin under the pivot (3-4-5 triangle)',
      source: 'Closed form, moments about the boom pivot: C = W L_t c / (r (H_m − h_q)) = 2.5 W with r = 750, H_m − h_q = 1000, c = 1250, L_t = 1500 mm; about the front wheels: N_rear = W (x_F − L_t)/(x_F + x_R) = 0.05 W.',
      kind: 'closed-form',
      inputs: { m: 500, mBase: 0, mBoom: 0, phi: 0, ext: 500, Lb: 1000, rAt: 750, Hm: 1500, hq: 500, dq: 0, xF: 1600, xR: 400 },
      expect: { C: 2.5 * 500 * 9.80665, Rpivot: Math.sqrt(3.25) * 500 * 9.80665, Nrear: 0.05 * 500 * 9.80665, Nfront: 0.95 * 500 * 9.80665, rearShare: 5 },
      tolerance: 1e-9,
    },
    {
      label: 'Default crane: 1000 kg at 20°, boom and base weights included',
      source: 'Closed form: C = (W + W_boom/2) L_t cos φ · c / (r ((H_m − h_q) cos φ + d_q sin φ)); N_rear (x_F + x_R) = W_base (x_F − x_g) + W_boom (x_F − L_t cos φ / 2) + W (x_F − L_t cos φ). Numbers in tests/templates/shop-crane.test.ts.',
      kind: 'closed-form',
      inputs: { m: 1000, ext: 0, phi: 20, Lb: 1000, Hm: 1500, rAt: 500, hq: 300, dq: 150, xF: 1150, xR: 250, mBase: 70, xg: 350, mBoom: 25 },
      expect: { C: 22283.866, Nrear: 1984.5243, rearShare: 18.480836 },
      tolerance: 0.000001,
    },
  ],
  dimensions: [
    { input: 'Hm', between: ['S', 'P'] },
    { input: 'xF', between: ['S', 'F'] },
    { input: 'xR', between: ['R', 'S'] },
    { input: 'rAt', between: ['P', 'B'] },
  ],
};
