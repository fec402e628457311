import type { AuthoredInput, TemplateSpecInput } from '../../shared/spec/template-spec';
import { DESIGN_AID, IDEAL_MODEL, STRUCTURE } from '../common/cautions';
import { ratedLoadInput } from '../common/inputs';

/**
 * Lift tables are machines, not below-the-hook devices, so the BTH-1 design-factor input does
 * not fit: this one names no category and leaves the factor to the standard that applies.
 */
const liftTableDesignFactor: AuthoredInput = {
  key: 'Nd',
  label: 'Design factor',
  quantity: 'ratio',
  default: 2,
  min: 1,
  max: 6,
  step: 0.05,
  help: 'Factor on the forces for sizing the cylinder, pins and arms. Take it from the standard that applies to lift tables where the table is used (for example EN 1570-1 in Europe); 2.00 is a placeholder, not a quoted value.',
};

/**
 * One-stage scissor lift table: arm 1 from the fixed base pin O to a roller under the
 * platform at D, arm 2 from the fixed platform pin E to a roller on the base at G, crossed at
 * their mid-points M. A hydraulic cylinder pushes from a base pin Q (a distance b from O) on a
 * point P a distance a along arm 1. The base is the fixed frame. See README.md.
 */
export const scissorLiftTable: TemplateSpecInput = {
  specVersion: 1,
  slug: 'scissor-lift-table',
  title: 'Scissor lift table, one stage',
  summary: 'Cylinder force and pin forces of a one-stage scissor lift table against the arm angle, with the cylinder between a base pin and a point on the lower arm.',
  category: 'machines',
  inputs: [
    ratedLoadInput(1000, 10000),
    { key: 'theta', label: 'Arm angle from horizontal', quantity: 'angle', default: 15, min: 4, max: 60, step: 0.5, control: 'slider', help: 'Sets the platform height (L sin θ between the pin lines). Sweep it down to the lowest position: that is where the cylinder force peaks.' },
    { key: 'L', label: 'Arm length', quantity: 'length', default: 1500, min: 600, max: 4000, step: 10, help: 'Between the end pins of each arm; the arms cross at their mid-points.' },
    { key: 'a', label: 'Cylinder pin on the arm', quantity: 'length', default: 500, min: 100, max: 1400, step: 5, help: 'Distance along the lower arm from its fixed base pin to the cylinder rod-end pin.' },
    { key: 'b', label: 'Cylinder pin on the base', quantity: 'length', default: 1200, min: 100, max: 3000, step: 5, help: 'Distance along the base from the fixed arm pin to the cylinder base pin, towards the rollers.' },
    { key: 'Lp', label: 'Platform length', quantity: 'length', default: 1600, min: 600, max: 4000, step: 10, help: 'From the platform hinge (fixed pin) end to the free end.' },
    { key: 'loadAt', label: 'Load position on the platform', quantity: 'percent', default: 50, min: 0, max: 100, step: 1, control: 'slider', help: 'Centre of the load as a share of the platform length from the hinge end.' },
    { key: 'mp', label: 'Platform mass', quantity: 'mass', default: 120, min: 0, max: 3000, step: 5, help: 'Self-weight of the platform, taken at its mid-length.' },
    { key: 'mArm', label: 'Mass of each arm', quantity: 'mass', default: 40, min: 0, max: 1000, step: 1, help: 'Self-weight of the lower arm (or the upper arm), both side members of it together, taken at the centre pin.' },
    { key: 'bore', label: 'Cylinder bore', quantity: 'length', default: 80, min: 20, max: 250, step: 1, help: 'Piston diameter; the cylinder pushes on the full bore area.' },
    { key: 'pMax', label: 'Working pressure available', quantity: 'stress', default: 20, min: 1, max: 70, step: 0.5, help: 'Pressure the hydraulic supply can hold at the cylinder (relief setting less losses), MPa.' },
    liftTableDesignFactor,
  ],
  derived: [
    { key: 'W', label: 'Rated load weight', quantity: 'force', expr: 'm * g' },
    { key: 'Wp', label: 'Platform weight', quantity: 'force', expr: 'mp * g' },
    { key: 'Wa', label: 'Weight of each arm', quantity: 'force', expr: 'mArm * g' },
    { key: 'h', label: 'Platform height (pin lines)', quantity: 'length', expr: 'L * sind(theta)' },
    { key: 'span', label: 'Pin-to-roller span', quantity: 'length', expr: 'L * cosd(theta)' },
  ],
  points: {
    O: { at: [0, 0] },
    D: { polar: { from: 'O', length: 'L', angle: 'theta' } },
    E: { at: [0, 'h'] },
    G: { at: ['span', 0] },
    M: { along: { from: 'O', to: 'D', fraction: 0.5 } },
    P: { along: { from: 'O', to: 'D', distance: 'a' } },
    Q: { at: ['b', 0] },
    K: { at: ['Lp', 'h'] },
    X: { at: ['Lp * loadAt / 100', 'h'] },
    Y: { at: ['Lp / 2', 'h'] },
  },
  parts: [
    { id: 'arm1', label: 'Lower arm (base pin to platform roller)', outline: ['O', 'D'] },
    { id: 'arm2', label: 'Upper arm (platform pin to base roller)', outline: ['E', 'G'] },
    { id: 'platform', label: 'Platform', outline: ['E', 'K'] },
  ],
  joints: [
    { id: 'basePin', label: 'Fixed base pin', kind: 'pin', at: 'O', between: ['arm1', 'ground'] },
    { id: 'centre', label: 'Centre pin', kind: 'pin', at: 'M', between: ['arm1', 'arm2'] },
    { id: 'platformPin', label: 'Fixed platform pin', kind: 'pin', at: 'E', between: ['arm2', 'platform'] },
    { id: 'platformRoller', label: 'Platform roller', kind: 'roller', at: 'D', between: ['platform', 'arm1'], normal: { angle: 90 } },
    { id: 'baseRoller', label: 'Base roller', kind: 'roller', at: 'G', between: ['arm2', 'ground'], normal: { angle: 90 } },
  ],
  loads: [
    // The cylinder as a push of unknown magnitude on the arm along Q→P; its reaction goes into
    // the base (the fixed frame), so this is statically the same as a two-force member, and it
    // lets the engine check the cylinder force against virtual work at every solve.
    { id: 'F', label: 'Cylinder push', on: 'arm1', at: 'P', force: { unknown: true, direction: { towards: ['Q', 'P'] } } },
    { id: 'W', label: 'Rated load', on: 'platform', at: 'X', force: { magnitude: 'W', direction: { angle: -90 } } },
    { id: 'Wp', label: 'Platform weight', on: 'platform', at: 'Y', force: { magnitude: 'Wp', direction: { angle: -90 } } },
    { id: 'Wa1', label: 'Lower arm weight', on: 'arm1', at: 'M', force: { magnitude: 'Wa', direction: { angle: -90 } } },
    { id: 'Wa2', label: 'Upper arm weight', on: 'arm2', at: 'M', force: { magnitude: 'Wa', direction: { angle: -90 } } },
  ],
  results: [
    { key: 'F', label: 'Cylinder force (push)', quantity: 'force', expr: "load('F')" },
    { key: 'Fdesign', label: 'Cylinder force × design factor', quantity: 'force', expr: 'F * Nd' },
    { key: 'p', label: 'Cylinder pressure needed', quantity: 'stress', expr: 'F / (pi * bore^2 / 4)' },
    { key: 'c', label: 'Cylinder length (pin to pin)', quantity: 'length', expr: "dist('Q', 'P')" },
    { key: 'H', label: 'Platform height (pin lines)', quantity: 'length', expr: 'h' },
    { key: 'Rbase', label: 'Fixed base pin force', quantity: 'force', expr: "joint('basePin')" },
    { key: 'Rcentre', label: 'Centre pin force', quantity: 'force', expr: "joint('centre')" },
    { key: 'RcentreDesign', label: 'Centre pin force × design factor', quantity: 'force', expr: 'Rcentre * Nd' },
    { key: 'Rplatform', label: 'Fixed platform pin force', quantity: 'force', expr: "joint('platformPin')" },
    { key: 'Nplatform', label: 'Platform roller force', quantity: 'force', expr: "normal('platformRoller')", help: 'Upwards on the platform. With downward loads anywhere on the platform it stays positive; a load beyond the roller makes the hinge pin hold the platform down instead.' },
    { key: 'Nbase', label: 'Base roller force', quantity: 'force', expr: "normal('baseRoller')", help: 'Upwards on the upper arm. Often negative: the upper arm is a lever about the centre pin, so the platform pushing its top end down lifts its roller end; the roller must then run in a guide that holds it down.' },
  ],
  checks: [
    {
      key: 'pressure',
      label: 'The cylinder can lift the rated load here',
      pass: 'p <= pMax',
      warn: 'p > 0.8 * pMax',
      severity: 'fail',
      advice: 'The pressure needed exceeds (or comes within 20 % of) the supply. Sweep the arm angle: the force peaks at the lowest position. Move the cylinder pins (a larger a·b/c ratio, a base pin further out), fit a larger bore, or start the lift from a higher angle.',
    },
    {
      key: 'rollerOnPlatform',
      label: 'The platform reaches over its roller',
      pass: 'Lp >= span',
      severity: 'fail',
      advice: 'At this arm angle the roller end of the lower arm lies beyond the end of the platform: lengthen the platform or limit the travel.',
    },
  ],
  cautions: [
    DESIGN_AID,
    'Lift tables: design, stability, overload and fall protection (velocity fuses, pipe-burst valves), toe guards and marking follow the standard that applies, for example EN 1570-1 in Europe or ANSI MH29.1 in the USA (from memory; confirm the edition), and local regulations.',
    IDEAL_MODEL,
    STRUCTURE,
    'The cylinder force is highest near the lowest position and rises without bound as the arms close: never drive the table below the lowest angle the design was checked for.',
  ],
  references: [
    {
      label: 'Spackman relation, one stage: W = 10 kN, arms 2 kN, L = 1.5 m, θ = 15°',
      source: 'Virtual work (H. M. Spackman, NOSC TD 1550, 1989, relation as given there): F = (W + W_arms/2) L cos θ · c/(a b sin θ), a = 0.5, b = 1.2 m, c = 0.7286 m; n = 1 gives half the two-stage 1.496e5 N: 74 779.4 N.',
      kind: 'closed-form',
      inputs: { m: 10000 / 9.80665, mp: 0, mArm: 1000 / 9.80665, L: 1500, theta: 15, a: 500, b: 1200 },
      expect: { F: 74779.42, c: 728.6213 },
      tolerance: 0.00001,
    },
    {
      label: 'Cylinder pins a = b = L/2 at 30°, weightless arms',
      source: 'Closed form: c = 2a sin(θ/2) and F = W L cos θ c/(a² sin θ) = 2W cos θ/cos(θ/2) with L = 2a; at 30°: F = 1.7932 W (written out in tests/templates/scissor-lift-table.test.ts).',
      kind: 'closed-form',
      inputs: { m: 800, mp: 0, mArm: 0, L: 1200, theta: 30, a: 600, b: 600 },
      expect: { F: ((2 * Math.cos(Math.PI / 6)) / Math.cos(Math.PI / 12)) * 800 * 9.80665 },
      tolerance: 1e-8,
    },
  ],
  drive: { input: 'theta', effort: 'F', output: 'W' },
  dimensions: [
    { input: 'L', between: ['O', 'D'] },
    { input: 'a', between: ['O', 'P'] },
    { input: 'b', between: ['O', 'Q'] },
  ],
};
