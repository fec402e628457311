import type { TemplateSpecInput } from '../../shared/spec/template-spec';
import { LIFTING_CAUTIONS } from '../common/cautions';
import { designFactorInput, ratedLoadInput } from '../common/inputs';

/**
 * Wall jib: a horizontal boom pinned to a wall at A, held by a tie rod from a point along the
 * boom to an anchor above A, with a trolley load anywhere along the boom. See README.md.
 */
export const wallJibTieRod: TemplateSpecInput = {
  specVersion: 1,
  slug: 'wall-jib-tie-rod',
  title: 'Wall jib with a tie rod',
  summary: 'Tie tension, boom compression and wall pin reactions of a tied wall jib, with the trolley anywhere along the boom.',
  category: 'frames',
  inputs: [
    ratedLoadInput(2000, 20000),
    { key: 'L', label: 'Boom length', quantity: 'length', default: 4000, min: 500, max: 12000, step: 50, help: 'From the wall pin to the boom tip.' },
    { key: 'h', label: 'Tie anchor height', quantity: 'length', default: 1500, min: 200, max: 8000, step: 50, help: 'Height of the tie anchor above the boom pin.' },
    { key: 'tieAt', label: 'Tie attachment', quantity: 'percent', default: 100, min: 30, max: 100, step: 1, control: 'slider', help: 'Where the tie meets the boom, as a share of the boom length from the wall.' },
    { key: 'trolley', label: 'Trolley position', quantity: 'percent', default: 87.5, min: 0, max: 100, step: 0.5, control: 'slider', help: 'Where the load hangs, as a share of the boom length from the wall.' },
    { key: 'mb', label: 'Boom mass', quantity: 'mass', default: 200, min: 0, max: 5000, step: 5, help: 'Self-weight of the boom, taken at mid-length. Add the trolley and hoist to the rated load.' },
    designFactorInput,
  ],
  derived: [
    { key: 'W', label: 'Rated load weight', quantity: 'force', expr: 'm * g' },
    { key: 'Wb', label: 'Boom weight', quantity: 'force', expr: 'mb * g' },
    { key: 'a', label: 'Trolley distance from wall', quantity: 'length', expr: 'L * trolley / 100' },
    { key: 'b', label: 'Tie attachment from wall', quantity: 'length', expr: 'L * tieAt / 100' },
  ],
  points: {
    A: { at: [0, 0] },
    D: { at: [0, 'h'] },
    B: { at: ['b', 0] },
    E: { at: ['L', 0] },
    T: { at: ['a', 0] },
    M: { at: ['L / 2', 0] },
  },
  parts: [{ id: 'boom', label: 'Boom', outline: ['A', 'E'] }],
  members: [{ id: 'tie', label: 'Tie rod', ends: ['B', 'D'], connects: ['boom', 'ground'] }],
  joints: [{ id: 'wall', label: 'Wall pin', kind: 'pin', at: 'A', between: ['boom', 'ground'] }],
  loads: [
    { id: 'W', label: 'Trolley load', on: 'boom', at: 'T', force: { magnitude: 'W', direction: { angle: -90 } } },
    { id: 'Wb', label: 'Boom weight', on: 'boom', at: 'M', force: { magnitude: 'Wb', direction: { angle: -90 } } },
  ],
  results: [
    { key: 'T', label: 'Tie tension', quantity: 'force', expr: "member('tie')" },
    { key: 'Tdesign', label: 'Tie tension × design factor', quantity: 'force', expr: 'T * Nd' },
    { key: 'C', label: 'Boom compression', quantity: 'force', expr: "jointX('wall')", help: 'The horizontal push of the wall pin, which the boom carries as axial compression between the pin and the tie.' },
    { key: 'V', label: 'Wall pin vertical force', quantity: 'force', expr: "jointY('wall')", help: 'Upwards on the boom when positive.' },
    { key: 'R', label: 'Wall pin resultant', quantity: 'force', expr: "joint('wall')" },
    { key: 'Rdesign', label: 'Wall pin resultant × design factor', quantity: 'force', expr: 'R * Nd' },
    { key: 'tieAngle', label: 'Tie angle to the boom', quantity: 'angle', expr: "atand(h / b)" },
  ],
  checks: [
    {
      key: 'tieAngle',
      label: 'Tie angle is not too shallow',
      pass: 'tieAngle >= 10',
      warn: 'tieAngle < 20',
      severity: 'warn',
      advice: 'The tie tension grows as 1/sin of its angle: below about 20° small changes of anchor height change the tension a lot, and below 10° it becomes very large. Raise the anchor (common practice, no standard cited).',
    },
    {
      key: 'tieTension',
      label: 'Tie rod stays in tension',
      pass: 'T > 0',
      advice: 'A tie rod cannot take compression: with this geometry the boom would have to be propped instead.',
    },
  ],
  cautions: [
    ...LIFTING_CAUTIONS,
    'The wall and its anchors take the tie pull and the pin reactions: have the supporting structure checked for them, with the design factor.',
  ],
  references: [
    {
      label: 'Worked example: 20 kN at 3.5 m on a 4 m boom',
      source: 'Derived by moments about the boom pin: W = 20 kN at a = 3.5 m, boom 2 kN, L = b = 4.0 m, h = 1.5 m gives T = 52.69 kN, boom compression 49.33 kN, vertical pin force 3.500 kN.',
      kind: 'closed-form',
      inputs: { m: 20000 / 9.80665, mb: 2000 / 9.80665, L: 4000, h: 1500, tieAt: 100, trolley: 87.5 },
      expect: { T: 52690, C: 49330, V: 3500 },
      tolerance: 0.0005,
    },
    {
      label: 'Load at the tip, weightless boom, 45° tie',
      source: 'Closed form: moments about the pin, T b sin 45° = W L with b = L, so T = √2 W; C = W, V = 0 (written out in tests/templates/wall-jib-tie-rod.test.ts).',
      kind: 'closed-form',
      inputs: { m: 1000, mb: 0, L: 3000, h: 3000, tieAt: 100, trolley: 100 },
      expect: { T: Math.SQRT2 * 1000 * 9.80665, C: 1000 * 9.80665 },
      tolerance: 1e-9,
    },
  ],
  dimensions: [
    { input: 'L', between: ['A', 'E'] },
    { input: 'h', between: ['A', 'D'] },
  ],
};
