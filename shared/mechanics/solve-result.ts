import { z } from 'zod';
import { quantitySchema } from '../units/quantities';

/**
 * The shape of one solve's output, declared once: the engine builds it, the API returns it,
 * the client reads it and the unit converter walks it. Fixed quantities: coordinates are
 * lengths (mm), force fields are forces (N), moments N·mm; results carry their own quantity.
 */
const point = z.object({ x: z.number(), y: z.number() });

export const forceOnPartSchema = z.object({
  source: z.enum(['joint', 'member', 'load']),
  id: z.string(),
  label: z.string(),
  /** Point name where the force acts. */
  at: z.string(),
  x: z.number(),
  y: z.number(),
  fx: z.number(),
  fy: z.number(),
  magnitude: z.number(),
});

export const freeBodySchema = z.object({
  part: z.string(),
  label: z.string(),
  forces: z.array(forceOnPartSchema),
  couples: z.array(z.object({ id: z.string(), label: z.string(), moment: z.number() })),
});

export const memberForceSchema = z.object({
  id: z.string(),
  label: z.string(),
  ends: z.tuple([z.string(), z.string()]),
  /** Tension positive, N. */
  axial: z.number(),
  state: z.enum(['tension', 'compression', 'unloaded']),
});

export const jointForceSchema = z.object({
  id: z.string(),
  label: z.string(),
  kind: z.enum(['pin', 'roller', 'contact']),
  at: z.string(),
  between: z.tuple([z.string(), z.string()]),
  /** Force on the first part from the second, N. */
  fx: z.number(),
  fy: z.number(),
  resultant: z.number(),
  normal: z.number().optional(),
  friction: z.number().optional(),
  /** Friction coefficient needed to hold; null where the contact would pull apart. */
  muRequired: z.number().nullable().optional(),
});

export const loadForceSchema = z.object({
  id: z.string(),
  label: z.string(),
  kind: z.enum(['force', 'couple']),
  on: z.string(),
  at: z.string().optional(),
  fx: z.number(),
  fy: z.number(),
  /** Signed magnitude along the declared direction (couples: the moment, N·mm). */
  magnitude: z.number(),
  solved: z.boolean(),
});

export const resultValueSchema = z.object({
  key: z.string(),
  label: z.string(),
  quantity: quantitySchema,
  /** null where the value is not a finite number; `note` says why. */
  value: z.number().nullable(),
  note: z.string().optional(),
  help: z.string().optional(),
});

export const checkVerdictSchema = z.object({
  key: z.string(),
  label: z.string(),
  verdict: z.enum(['pass', 'warn', 'fail']),
  advice: z.string(),
  note: z.string().optional(),
});

export const verificationSchema = z.object({
  /** Largest equilibrium residual of any part, relative to the largest force (moments to force × size). */
  maxResidual: z.number(),
  residualPart: z.string().nullable(),
  /** External loads plus ground reactions: the net force and moment, relative as above. */
  globalBalance: z.object({ fx: z.number(), fy: z.number(), moment: z.number(), relative: z.number() }),
  /** Mechanical advantage from equilibrium beside the one from virtual work, where a drive is declared. */
  virtualWork: z
    .object({
      input: z.string(),
      effort: z.string(),
      output: z.string(),
      fromEquilibrium: z.number(),
      fromVirtualWork: z.number(),
      relativeDifference: z.number(),
    })
    .nullable(),
  virtualWorkNote: z.string().optional(),
  /** Reciprocal condition estimate of the equilibrium matrix (1 is ideal, near 0 is singular). */
  conditioning: z.number(),
});

export const solveResultSchema = z.object({
  ok: z.literal(true),
  inputs: z.record(z.string(), z.number()),
  derived: z.array(resultValueSchema),
  points: z.record(z.string(), point),
  freeBodies: z.array(freeBodySchema),
  members: z.array(memberForceSchema),
  joints: z.array(jointForceSchema),
  loads: z.array(loadForceSchema),
  results: z.array(resultValueSchema),
  checks: z.array(checkVerdictSchema),
  cautions: z.array(z.string()),
  warnings: z.array(z.string()),
  verification: verificationSchema,
});

export const engineErrorSchema = z.object({
  kind: z.enum(['input', 'expression', 'geometry', 'parallel', 'indeterminate', 'mechanism', 'dead-centre', 'numeric']),
  message: z.string(),
  path: z.array(z.union([z.string(), z.number()])).optional(),
  details: z.record(z.string(), z.unknown()).optional(),
});

export const solveFailureSchema = z.object({ ok: z.literal(false), error: engineErrorSchema });
export const solveOutcomeSchema = z.discriminatedUnion('ok', [solveResultSchema, solveFailureSchema]);

export type SolveResult = z.infer<typeof solveResultSchema>;
export type SolveFailure = z.infer<typeof solveFailureSchema>;
export type SolveOutcome = z.infer<typeof solveOutcomeSchema>;
export type ResultValue = z.infer<typeof resultValueSchema>;
export type FreeBody = z.infer<typeof freeBodySchema>;
