import type { TemplateSpecInput } from '../../shared/spec/template-spec';
import { LIFTING_CAUTIONS } from '../common/cautions';
import { designFactorInput, ratedLoadInput } from '../common/inputs';

/**
 * A-frame: two legs pinned at the apex A, a crossbar (a tie) between them part-way down, the
 * left foot B pinned to the floor and the right foot C on a roller, the load on the left leg
 * anywhere from its foot to the apex. See README.md.
 */
export const aFrameCrossbar: TemplateSpecInput = {
  specVersion: 1,
  slug: 'a-frame-crossbar',
  title: 'A-frame with a crossbar',
  summary: 'Crossbar tension, apex pin force and foot reactions of an A-frame, with the load anywhere on one leg, and the floor friction the feet would need without the crossbar.',
  category: 'frames',
  inputs: [
    ratedLoadInput(500, 10000),
    { key: 'L', label: 'Leg length', quantity: 'length', default: 2500, min: 500, max: 8000, step: 50, help: 'From the foot pin to the apex pin, the same for both legs.' },
    { key: 'alpha', label: 'Leg angle from vertical', quantity: 'angle', default: 20, min: 5, max: 60, step: 0.5, control: 'slider', help: 'Half the opening angle at the apex. The spread of the feet is 2 L sin of this angle.' },
    { key: 'barAt', label: 'Crossbar position', quantity: 'percent', default: 50, min: 10, max: 100, step: 1, control: 'slider', help: 'Where the crossbar joins each leg, as a share of the leg length measured from the apex (100 % joins the feet).' },
    { key: 'loadAt', label: 'Load position on the left leg', quantity: 'percent', default: 100, min: 0, max: 100, step: 1, control: 'slider', help: 'Where the load acts on the left leg, as a share of the leg length from its foot (0 %) to the apex (100 %).' },
    { key: 'mLeg', label: 'Mass of each leg', quantity: 'mass', default: 20, min: 0, max: 2000, step: 1, help: 'Self-weight of one leg, taken at its mid-length.' },
    { key: 'muFloor', label: 'Floor friction available', quantity: 'coefficient', default: 0.3, min: 0, max: 1, step: 0.01, help: 'Static friction coefficient you can count on between the feet and the floor, used only for the check without the crossbar. Take the low end of the range for the surfaces.' },
    designFactorInput,
  ],
  derived: [
    { key: 'P', label: 'Rated load weight', quantity: 'force', expr: 'm * g' },
    { key: 'Wl', label: 'Weight of each leg', quantity: 'force', expr: 'mLeg * g' },
    { key: 's', label: 'Crossbar distance from the apex', quantity: 'length', expr: 'L * barAt / 100' },
    { key: 'd', label: 'Load distance from the foot', quantity: 'length', expr: 'L * loadAt / 100' },
  ],
  points: {
    A: { at: [0, 'L * cosd(alpha)'] },
    O: { at: [0, 0] },
    B: { at: ['-L * sind(alpha)', 0] },
    C: { mirror: { of: 'B', line: ['A', 'O'] } },
    E: { along: { from: 'A', to: 'B', distance: 's' } },
    F: { mirror: { of: 'E', line: ['A', 'O'] } },
    G: { along: { from: 'B', to: 'A', distance: 'd' } },
    ML: { along: { from: 'B', to: 'A', fraction: 0.5 } },
    MR: { along: { from: 'C', to: 'A', fraction: 0.5 } },
  },
  parts: [
    { id: 'left', label: 'Left (loaded) leg', outline: ['B', 'A'] },
    { id: 'right', label: 'Right leg', outline: ['C', 'A'] },
  ],
  members: [{ id: 'bar', label: 'Crossbar', ends: ['E', 'F'], connects: ['left', 'right'] }],
  joints: [
    { id: 'apex', label: 'Apex pin', kind: 'pin', at: 'A', between: ['left', 'right'] },
    { id: 'footB', label: 'Left foot (pinned)', kind: 'pin', at: 'B', between: ['left', 'ground'] },
    { id: 'footC', label: 'Right foot (roller)', kind: 'roller', at: 'C', between: ['right', 'ground'], normal: { angle: 90 } },
  ],
  loads: [
    { id: 'P', label: 'Load', on: 'left', at: 'G', force: { magnitude: 'P', direction: { angle: -90 } } },
    { id: 'WL', label: 'Left leg weight', on: 'left', at: 'ML', force: { magnitude: 'Wl', direction: { angle: -90 } } },
    { id: 'WR', label: 'Right leg weight', on: 'right', at: 'MR', force: { magnitude: 'Wl', direction: { angle: -90 } } },
  ],
  results: [
    { key: 'T', label: 'Crossbar tension', quantity: 'force', expr: "member('bar')" },
    { key: 'Tdesign', label: 'Crossbar tension × design factor', quantity: 'force', expr: 'T * Nd' },
    { key: 'Rapex', label: 'Apex pin force', quantity: 'force', expr: "joint('apex')" },
    { key: 'RapexDesign', label: 'Apex pin force × design factor', quantity: 'force', expr: 'Rapex * Nd' },
    { key: 'NB', label: 'Left foot reaction', quantity: 'force', expr: "jointY('footB')", help: 'Upwards on the loaded leg.' },
    { key: 'HB', label: 'Left foot horizontal force', quantity: 'force', expr: "jointX('footB')", help: 'Zero with the crossbar fitted and vertical loads: the pinned foot is only there to fix the frame on the floor.' },
    { key: 'NC', label: 'Right foot reaction', quantity: 'force', expr: "normal('footC')" },
    { key: 'spread', label: 'Spread of the feet', quantity: 'length', expr: "dist('B', 'C')" },
    {
      key: 'Hfree',
      label: 'Foot thrust without the crossbar',
      quantity: 'force',
      expr: '(NC - Wl / 2) * tand(alpha)',
      help: 'The horizontal friction force each foot would need if the crossbar were missing: the unloaded leg, taken about the apex, gives H = (N_C − W_leg/2) tan α.',
    },
    {
      key: 'muNoBar',
      label: 'Friction needed without the crossbar',
      quantity: 'coefficient',
      expr: 'NC > 0 ? Hfree / NC : 0',
      help: 'At the critical foot, the one under the unloaded leg, which carries the smaller vertical reaction: μ = H / N_C (tan α when the legs are weightless).',
    },
  ],
  checks: [
    {
      key: 'noBar',
      label: 'The feet would hold on friction alone, with a margin of 2, if the crossbar failed',
      pass: 'muNoBar <= muFloor',
      warn: 'muNoBar > muFloor / 2',
      severity: 'warn',
      advice: 'Without the crossbar the feet would slide apart on this floor: the crossbar and its pins carry the frame. Inspect them before use, never lift with the bar removed, and consider chaining or blocking the feet as well (common practice, no standard cited).',
    },
  ],
  cautions: [
    ...LIFTING_CAUTIONS,
    'A load applied part-way along a leg bends the leg: check the leg for combined bending and compression, and the crossbar end connections for the tension shown.',
  ],
  references: [
    {
      label: 'NCERT Physics XI, exercise 7.22: step ladder with a rope',
      source: 'NCERT Physics class XI part I, ch. 7, ex. 7.22 (source seen): 1.6 m sides, 0.5 m rope halfway up, 40 kg hung 1.2 m from the foot, smooth floor, g = 9.8 (mass entered as 40 × 9.8 / 9.80665 kg): T = 96.72 N (printed ≈ 96.8 N, from memory), floor 245.0 N and 147.0 N.',
      kind: 'published',
      inputs: { m: (40 * 9.8) / 9.80665, mLeg: 0, L: 1600, alpha: (Math.asin(0.25 / 0.8) * 180) / Math.PI, barAt: 50, loadAt: 75 },
      expect: { T: 96.72, NB: 245.0, NC: 147.0 },
      tolerance: 0.0005,
    },
    {
      label: 'Load at the apex, weightless legs: T = (P/2)(L/s) tan α',
      source: 'Closed form (derived, tests/engine/closed-form.test.ts): 1000 kg at the apex, L = 3 m, α = 30°, bar at s = 1 m from the apex: T = (P/2)(3) tan 30° = 8492.9 N, N_B = N_C = P/2, μ without the bar = tan 30°.',
      kind: 'closed-form',
      inputs: { m: 1000, mLeg: 0, L: 3000, alpha: 30, barAt: 100 / 3, loadAt: 100 },
      expect: { T: ((1000 * 9.80665) / 2) * 3 * Math.tan(Math.PI / 6), NB: 4903.325, NC: 4903.325, muNoBar: Math.tan(Math.PI / 6) },
      tolerance: 1e-9,
    },
  ],
  dimensions: [
    { input: 'L', between: ['B', 'A'] },
    { input: 'barAt', between: ['A', 'E'] },
  ],
};
