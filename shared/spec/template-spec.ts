import { z } from 'zod';
import { quantitySchema } from '../units/quantities';

/**
 * The template spec: a parametric mechanism as data. One schema gives the TypeScript type,
 * the structural validation and (through z.toJSONSchema) the JSON Schema published to
 * authors. Semantic rules that need the whole spec (names that must exist, cycles) live in
 * ./validate-spec.ts.
 *
 * Conventions: lengths in mm, forces in N, masses in kg, angles in degrees measured
 * anticlockwise from +x, y upwards. Every numeric field that depends on inputs is an
 * expression string (see shared/mechanics/expressions).
 */

const KEY = /^[A-Za-z][A-Za-z0-9_]{0,39}$/;
const keySchema = z
  .string()
  .regex(KEY, 'must start with a letter and hold only letters, digits and _ (at most 40)');
export const expressionSchema = z
  .string()
  .min(1, 'must not be empty')
  .max(400, 'is longer than 400 characters')
  .describe('An expression over inputs, derived values and solved quantities');
const pointRef = keySchema.describe('Name of a point');
const partRef = keySchema.describe("Id of a rigid part, or 'ground'");
const numberOrExpr = z.union([z.number(), expressionSchema]);

export const categorySchema = z.enum(['lifting', 'workholding', 'frames', 'linkages', 'machines']);

export const inputSchema = z.object({
  key: keySchema,
  label: z.string().min(1).max(80),
  quantity: quantitySchema,
  default: z.number(),
  min: z.number(),
  max: z.number(),
  step: z.number().positive().optional(),
  help: z.string().max(400).default(''),
  control: z.enum(['number', 'slider', 'choice']).default('number'),
  /** For control 'choice': the allowed values with their labels. */
  choices: z.array(z.object({ value: z.number(), label: z.string().min(1).max(60) })).optional(),
});

export const derivedSchema = z.object({
  key: keySchema,
  label: z.string().max(80).optional(),
  quantity: quantitySchema.optional(),
  expr: expressionSchema,
});

const at = z.object({ at: z.tuple([numberOrExpr, numberOrExpr]) }).strict();
const polar = z
  .object({ polar: z.object({ from: pointRef, length: numberOrExpr, angle: numberOrExpr }).strict() })
  .strict();
const offset = z
  .object({ offset: z.object({ from: pointRef, dx: numberOrExpr, dy: numberOrExpr }).strict() })
  .strict();
const fromTwo = z
  .object({
    fromTwo: z
      .object({
        centres: z.tuple([pointRef, pointRef]),
        radii: z.tuple([numberOrExpr, numberOrExpr]),
        /** Which of the two intersections: left or right of the direction from centre 1 to centre 2. */
        side: z.enum(['left', 'right']),
      })
      .strict(),
  })
  .strict();
const mirror = z
  .object({ mirror: z.object({ of: pointRef, line: z.tuple([pointRef, pointRef]) }).strict() })
  .strict();
const along = z
  .object({
    along: z
      .object({
        from: pointRef,
        to: pointRef,
        /** Fraction of the way from `from` to `to` (may lie outside 0…1). */
        fraction: numberOrExpr.optional(),
        /** Distance from `from` towards `to`, mm. */
        distance: numberOrExpr.optional(),
      })
      .strict()
      .refine((a) => (a.fraction === undefined) !== (a.distance === undefined), {
        message: 'give exactly one of fraction or distance',
      }),
  })
  .strict();
const intersect = z
  .object({
    intersect: z.object({ lines: z.tuple([z.tuple([pointRef, pointRef]), z.tuple([pointRef, pointRef])]) }).strict(),
  })
  .strict();

export const pointDefSchema = z.union([at, polar, offset, fromTwo, mirror, along, intersect]);

export const partSchema = z.object({
  id: keySchema.refine((id) => id !== 'ground', "'ground' is reserved for the fixed frame"),
  label: z.string().min(1).max(80),
  /** Points drawn as the part's outline, in order. */
  outline: z.array(pointRef).min(1),
});

export const memberSchema = z.object({
  id: keySchema,
  label: z.string().min(1).max(80),
  /** The two pin points of the member. */
  ends: z.tuple([pointRef, pointRef]),
  /** The parts (or 'ground') each end is pinned to, in the order of `ends`. */
  connects: z.tuple([partRef, partRef]),
});

const direction = z
  .union([
    z.object({ angle: numberOrExpr }).strict(),
    z.object({ towards: z.tuple([pointRef, pointRef]) }).strict(),
  ])
  .describe('A direction: an angle in degrees from +x, or from one point towards another');

export const jointSchema = z.object({
  id: keySchema,
  label: z.string().max(80).optional(),
  at: pointRef,
  /** pin: any force in the plane. roller: force along `normal` only. contact: a normal force, optionally with friction. */
  kind: z.enum(['pin', 'roller', 'contact']),
  /** Forces are reported as acting on the first part, from the second. */
  between: z.tuple([partRef, partRef]),
  /** For roller and contact: the direction of a positive (pressing) force on the first part. */
  normal: direction.optional(),
  /**
   * For contact: 'required' solves the tangential force and reports the friction coefficient
   * needed to hold; a coefficient with a sense models the point of slipping, with the friction
   * force on the first part along +sense × (normal turned 90° anticlockwise).
   */
  friction: z
    .union([
      z.literal('required'),
      z.object({ coefficient: numberOrExpr, sense: z.union([z.literal(1), z.literal(-1)]) }).strict(),
    ])
    .optional(),
});

export const loadSchema = z.union([
  z
    .object({
      id: keySchema,
      label: z.string().min(1).max(80),
      kind: z.literal('force').default('force'),
      on: partRef,
      at: pointRef,
      /** Known force: components, or a magnitude with a direction. Unknown: a direction only. */
      force: z.union([
        z.object({ x: numberOrExpr, y: numberOrExpr }).strict(),
        z.object({ magnitude: numberOrExpr, direction }).strict(),
        z.object({ unknown: z.literal(true), direction }).strict(),
      ]),
    })
    .strict(),
  z
    .object({
      id: keySchema,
      label: z.string().min(1).max(80),
      kind: z.literal('couple'),
      on: partRef,
      /** Anticlockwise positive, N·mm; { unknown: true } for a couple the solve finds (an output torque). */
      moment: z.union([numberOrExpr, z.object({ unknown: z.literal(true) }).strict()]),
    })
    .strict(),
]);

export const resultSchema = z.object({
  key: keySchema,
  label: z.string().min(1).max(80),
  quantity: quantitySchema,
  expr: expressionSchema,
  help: z.string().max(400).optional(),
});

export const checkSchema = z.object({
  key: keySchema,
  label: z.string().min(1).max(120),
  /** True when the design passes. */
  pass: expressionSchema,
  /** Optional: true when a passing design is close enough to the limit to warrant a warning. */
  warn: expressionSchema.optional(),
  /** What happens when `pass` is false. */
  severity: z.enum(['fail', 'warn']).default('fail'),
  advice: z.string().min(1).max(400),
});

export const referenceSchema = z.object({
  label: z.string().min(1).max(120),
  source: z.string().min(1).max(400),
  kind: z.enum(['published', 'closed-form', 'trade-practice', 'from-memory']),
  inputs: z.record(z.string(), z.number()),
  expect: z.record(z.string(), z.number()),
  /** Relative tolerance on each expected value. */
  tolerance: z.number().positive().max(0.5),
});

export const driveSchema = z.object({
  /** The input that moves the mechanism (a driving coordinate). */
  input: keySchema,
  /** The load the user applies and the load the mechanism delivers. */
  effort: keySchema,
  output: keySchema,
});

export const templateSpecSchema = z.object({
  specVersion: z.literal(1),
  slug: z.string().regex(/^[a-z][a-z0-9-]{1,59}$/, 'lower-case letters, digits and hyphens'),
  title: z.string().min(1).max(100),
  summary: z.string().min(1).max(300),
  category: categorySchema,
  inputs: z.array(inputSchema).min(1).max(60),
  derived: z.array(derivedSchema).max(100).default([]),
  points: z.record(keySchema, pointDefSchema),
  parts: z.array(partSchema).min(1).max(60),
  members: z.array(memberSchema).max(200).default([]),
  joints: z.array(jointSchema).max(200).default([]),
  loads: z.array(loadSchema).min(1).max(100),
  results: z.array(resultSchema).max(100).default([]),
  checks: z.array(checkSchema).max(50).default([]),
  cautions: z.array(z.string().min(1).max(600)).default([]),
  references: z.array(referenceSchema).default([]),
  drive: driveSchema.optional(),
  /** Inputs whose dimension lines the drawing shows: input key → the two points it spans. */
  dimensions: z.array(z.object({ input: keySchema, between: z.tuple([pointRef, pointRef]) })).default([]),
});

export type TemplateSpec = z.infer<typeof templateSpecSchema>;
/** A spec as an author writes it (defaults not yet applied). */
export type TemplateSpecInput = z.input<typeof templateSpecSchema>;
export type InputDef = z.infer<typeof inputSchema>;
export type PointDef = z.infer<typeof pointDefSchema>;
export type JointDef = z.infer<typeof jointSchema>;
export type LoadDef = z.infer<typeof loadSchema>;
export type MemberDef = z.infer<typeof memberSchema>;
export type Direction = z.infer<typeof direction>;
export type NumberOrExpr = z.infer<typeof numberOrExpr>;
export type ReferenceCase = z.infer<typeof referenceSchema>;
/** An input as an author writes it (help and control may be left out). */
export type AuthoredInput = z.input<typeof inputSchema>;
