import type { TemplateSpecInput } from '../../shared/spec/template-spec';
import { LIFTING_CAUTIONS } from '../common/cautions';
import { designFactorInput, ratedLoadInput } from '../common/inputs';

/**
 * Two-leg sling bridle from a hook to two lifting points on a load whose centre of gravity is
 * off-centre, with or without a spreader bar. The geometry is the hung position: the hook is
 * vertically above the centre of gravity (where any freely hung load comes to rest). The
 * engine solves the hook (master link) node: 2 equations, 2 leg tensions. With the spreader
 * the legs end at the bar ends right above the lifting points, vertical drop lines carry the
 * load down, and the bar compression and drop tensions follow from each bar end's balance
 * (results below). See README.md.
 */
export const twoLegBridle: TemplateSpecInput = {
  specVersion: 1,
  slug: 'two-leg-bridle',
  title: 'Two-leg sling bridle with a spreader option',
  summary: 'Leg tensions and sling angles of a two-leg bridle on a load with an offset centre of gravity, with or without a spreader bar (bar compression and drop lines).',
  category: 'lifting',
  inputs: [
    ratedLoadInput(5000, 50000),
    { key: 'D', label: 'Lifting point spacing', quantity: 'length', default: 4000, min: 500, max: 12000, step: 50, help: 'Horizontal distance between the two lifting points A and B on the load.' },
    { key: 'cg', label: 'Centre of gravity from lifting point A', quantity: 'percent', default: 60, min: 10, max: 90, step: 1, control: 'slider', help: 'Horizontal position of the load’s centre of gravity, as a share of the spacing from A towards B. 50 % is a centred load.' },
    { key: 'h', label: 'Hook height above the leg ends', quantity: 'length', default: 2500, min: 300, max: 10000, step: 50, help: 'Vertical distance from the lower ends of the legs (the lifting points, or the spreader bar ends with a spreader) up to the hook.' },
    {
      key: 'spreader',
      label: 'Spreader bar',
      quantity: 'count',
      default: 0,
      min: 0,
      max: 1,
      step: 1,
      control: 'choice',
      choices: [
        { value: 0, label: 'No spreader: legs to the lifting points' },
        { value: 1, label: 'Spreader bar with vertical drop lines' },
      ],
      help: 'With a spreader the legs end at a bar as long as the lifting point spacing, and vertical drop lines hang the load from its ends.',
    },
    { key: 'drop', label: 'Drop line length', quantity: 'length', default: 1000, min: 200, max: 5000, step: 50, help: 'With a spreader: from the bar down to the lifting points. Not used without a spreader.' },
    designFactorInput,
  ],
  derived: [
    { key: 'W', label: 'Rated load weight', quantity: 'force', expr: 'm * g' },
    { key: 'a', label: 'Centre of gravity from A', quantity: 'length', expr: 'D * cg / 100' },
    { key: 'barY', label: 'Height of the leg ends above the lifting points', quantity: 'length', expr: 'spreader * drop' },
  ],
  points: {
    A: { at: [0, 0] },
    B: { at: ['D', 0] },
    G: { at: ['a', 0] },
    EA: { at: [0, 'barY'] },
    EB: { at: ['D', 'barY'] },
    H: { at: ['a', 'barY + h'] },
  },
  parts: [{ id: 'hook', label: 'Hook and master link', outline: ['H'] }],
  members: [
    { id: 'legA', label: 'Leg to the A side', ends: ['H', 'EA'], connects: ['hook', 'ground'] },
    { id: 'legB', label: 'Leg to the B side', ends: ['H', 'EB'], connects: ['hook', 'ground'] },
  ],
  loads: [{ id: 'hook', label: 'Hook pull (load weight)', on: 'hook', at: 'H', force: { magnitude: 'W', direction: { angle: 90 } } }],
  results: [
    { key: 'TA', label: 'Leg tension, A side', quantity: 'force', expr: "member('legA')" },
    { key: 'TB', label: 'Leg tension, B side', quantity: 'force', expr: "member('legB')" },
    { key: 'Tmax', label: 'Larger leg tension', quantity: 'force', expr: 'max(TA, TB)' },
    { key: 'TmaxDesign', label: 'Larger leg tension × design factor', quantity: 'force', expr: 'Tmax * Nd', help: 'For a spreader bar and its fittings designed to ASME BTH-1. Slings themselves are chosen by their rated load at the sling angle (see the cautions).' },
    { key: 'thetaA', label: 'Leg angle to horizontal, A side', quantity: 'angle', expr: "atan2d(h, a)" },
    { key: 'thetaB', label: 'Leg angle to horizontal, B side', quantity: 'angle', expr: "atan2d(h, D - a)" },
    { key: 'LA', label: 'Leg length, A side', quantity: 'length', expr: "dist('H', 'EA')" },
    { key: 'LB', label: 'Leg length, B side', quantity: 'length', expr: "dist('H', 'EB')" },
    { key: 'VA', label: 'Load carried at lifting point A', quantity: 'force', expr: "TA * sind(thetaA)" },
    { key: 'VB', label: 'Load carried at lifting point B', quantity: 'force', expr: "TB * sind(thetaB)" },
    { key: 'Hc', label: 'Horizontal pull of each leg', quantity: 'force', expr: "TA * cosd(thetaA)" },
    { key: 'squeezeLoad', label: 'Horizontal squeeze on the load between the lifting points', quantity: 'force', expr: '(1 - spreader) * Hc', help: 'Without a spreader the load itself carries the legs’ inward pull; with one it is zero.' },
    { key: 'barC', label: 'Spreader bar compression', quantity: 'force', expr: 'spreader * Hc', help: 'Zero without a spreader. Balance of a bar end: the leg’s horizontal pull is taken by the bar, its vertical pull by the drop line.' },
    { key: 'barCDesign', label: 'Spreader bar compression × design factor', quantity: 'force', expr: 'barC * Nd' },
    { key: 'dropA', label: 'Drop line tension, A side', quantity: 'force', expr: 'spreader * VA', help: 'Zero without a spreader.' },
    { key: 'dropB', label: 'Drop line tension, B side', quantity: 'force', expr: 'spreader * VB', help: 'Zero without a spreader.' },
    { key: 'Trule', label: 'Rule of thumb W / (2 sin θ) at the flatter leg', quantity: 'force', expr: 'W / (2 * sind(min(thetaA, thetaB)))', help: 'The symmetric-bridle rule. With an offset centre of gravity the leg nearer to it can carry more than this: use the leg tensions above.' },
    { key: 'headroom', label: 'Hook height above the lifting points', quantity: 'length', expr: 'barY + h' },
  ],
  checks: [
    {
      key: 'slingAngle',
      label: 'Leg angles are at least 30° to the horizontal',
      pass: 'min(thetaA, thetaB) >= 30',
      severity: 'warn',
      advice: 'A leg flatter than 30° to the horizontal carries at least the full load it supports and grows fast with a flatter angle. Raise the hook (longer legs) or use a spreader bar. Common rigging practice; see ASME B30.9 for slings (source to confirm).',
    },
    {
      key: 'legShare',
      label: 'No leg carries more than 3/4 of the load vertically',
      pass: 'max(VA, VB) <= 0.75 * W',
      severity: 'warn',
      advice: 'The centre of gravity is close to one lifting point, so that side carries most of the load: check that lifting point and its leg for it, not for half the load (our own threshold, no standard cited).',
    },
  ],
  cautions: [
    ...LIFTING_CAUTIONS,
    'Slings, shackles and hooks are chosen by their rated load (working load limit) at the sling angle, following the standards for slings (for example ASME B30.9, EN 13414) and the maker’s data; the design factor input applies to a spreader bar designed as a below-the-hook device.',
    'The centre of gravity must be known, not guessed: a load lifted with the hook off its centre of gravity tilts until the centre of gravity is under the hook, which changes every leg angle and tension.',
  ],
  references: [
    {
      label: 'Symmetric bridle, legs at 60°: T = W / (2 sin θ)',
      source: 'Sling-angle rule of thumb T = W/(2 sin θ) for a symmetric two-leg bridle, common rigging practice (also in ASME B30.9 sling tables, source to confirm): 5000 kg at 60° → 28 309 N per leg.',
      kind: 'trade-practice',
      inputs: { m: 5000, D: 4000, cg: 50, h: 2000 * Math.sqrt(3), spreader: 0 },
      expect: { TA: (5000 * 9.80665) / Math.sqrt(3), TB: (5000 * 9.80665) / Math.sqrt(3), Trule: (5000 * 9.80665) / Math.sqrt(3) },
      tolerance: 1e-9,
    },
    {
      label: 'Offset centre of gravity: W = 10 kN, 4 m spacing, CG 1.5 m from A, hook 2 m up',
      source: 'Closed form (README.md; the unequal-leg rule T_A = W D_B L_A / (D H) of rigging handbooks, from memory): V_A = 6.25 kN, T_A = 7.8125 kN, T_B = 6.0030 kN, horizontal 4.6875 kN.',
      kind: 'closed-form',
      inputs: { m: 10000 / 9.80665, D: 4000, cg: 37.5, h: 2000, spreader: 0 },
      expect: { TA: 7812.5, TB: (3750 * Math.hypot(2500, 2000)) / 2000, VA: 6250, squeezeLoad: 4687.5 },
      tolerance: 1e-9,
    },
    {
      label: 'The same load on a spreader bar with 1 m drop lines',
      source: 'Closed form (README.md): the legs end at the bar ends above the lifting points; bar compression = leg horizontal pull 4.6875 kN, drop lines 6.25 and 3.75 kN, nothing squeezes the load.',
      kind: 'closed-form',
      inputs: { m: 10000 / 9.80665, D: 4000, cg: 37.5, h: 2000, spreader: 1, drop: 1000 },
      expect: { TA: 7812.5, barC: 4687.5, dropA: 6250, dropB: 3750, headroom: 3000 },
      tolerance: 1e-9,
    },
  ],
  dimensions: [
    { input: 'D', between: ['A', 'B'] },
    { input: 'h', between: ['EA', 'H'] },
    { input: 'drop', between: ['A', 'EA'] },
  ],
};
