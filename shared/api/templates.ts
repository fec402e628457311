import { z } from 'zod';
import { sweepOutputSchema, sweepRequestSchema, tornadoOutputSchema, tornadoRequestSchema } from '../mechanics/sensitivity-schema';
import { solveResultSchema } from '../mechanics/solve-result';
import { categorySchema, templateSpecSchema } from '../spec/template-spec';
import { quantitySchema } from '../units/quantities';

/**
 * Request and response shapes of the first-party template routes (/api/templates…), declared
 * once and used by the server (validation), the client (parsing) and the API docs. Numbers
 * are in the engine's units (mm, N, kg, N·mm, degrees); the client converts for display.
 */

export const semverSchema = z
  .string()
  .regex(/^\d+\.\d+\.\d+(-[0-9A-Za-z.-]+)?$/, 'must be a version like 1.0.0')
  // An example, so generated documentation shows a version rather than a string made from the pattern.
  .meta({ examples: ['1.0.0'] });

export const templateSummarySchema = z.object({
  slug: z.string(),
  title: z.string(),
  summary: z.string(),
  category: categorySchema,
  version: semverSchema,
  contentHash: z.string(),
  /** A small drawing of the mechanism at its default inputs, as SVG markup made by shared/drawing. */
  thumbnailSvg: z.string(),
});
export type TemplateSummary = z.infer<typeof templateSummarySchema>;

export const templateListSchema = z.object({ templates: z.array(templateSummarySchema) });
export type TemplateList = z.infer<typeof templateListSchema>;

export const templateVersionInfoSchema = z.object({
  version: semverSchema,
  status: z.enum(['draft', 'published', 'deprecated']),
  publishedAt: z.string().nullable(),
  changelog: z.string(),
});

export const templateDetailSchema = z.object({
  slug: z.string(),
  title: z.string(),
  summary: z.string(),
  category: categorySchema,
  version: semverSchema,
  contentHash: z.string(),
  versions: z.array(templateVersionInfoSchema),
  /** The whole spec: the engine is isomorphic, so the client can draw and preview with it. */
  spec: templateSpecSchema,
  /** Draft-07 JSON Schema of the inputs (engine units), for the form and the API docs. */
  inputSchema: z.record(z.string(), z.unknown()),
  defaults: z.record(z.string(), z.number()),
  results: z.array(z.object({ key: z.string(), label: z.string(), quantity: quantitySchema })),
  /** Where the precompiled input validator for this version is served (a cacheable script). */
  validatorUrl: z.string(),
});
export type TemplateDetail = z.infer<typeof templateDetailSchema>;

const inputsSchema = z.record(z.string(), z.number()).default({}).describe('Input values by key; missing keys take their defaults');
const versionField = semverSchema.optional().describe('Exact version; default: the latest published');

export const solveRequestSchema = z.object({ version: versionField, inputs: inputsSchema }).strict();
export type SolveRequest = z.input<typeof solveRequestSchema>;

export const solveResponseSchema = z.object({
  slug: z.string(),
  version: semverSchema,
  contentHash: z.string(),
  result: solveResultSchema,
});
export type SolveResponse = z.infer<typeof solveResponseSchema>;

export const sweepRouteRequestSchema = z.object({ version: versionField, inputs: inputsSchema, sweep: sweepRequestSchema }).strict();
export type SweepRouteRequest = z.input<typeof sweepRouteRequestSchema>;
export const sweepResponseSchema = z.object({ slug: z.string(), version: semverSchema, contentHash: z.string(), sweep: sweepOutputSchema });
export type SweepResponse = z.infer<typeof sweepResponseSchema>;

export const sensitivityRouteRequestSchema = z.object({ version: versionField, inputs: inputsSchema, tornado: tornadoRequestSchema }).strict();
export type SensitivityRouteRequest = z.input<typeof sensitivityRouteRequestSchema>;
export const sensitivityResponseSchema = z.object({ slug: z.string(), version: semverSchema, contentHash: z.string(), tornado: tornadoOutputSchema });
export type SensitivityResponse = z.infer<typeof sensitivityResponseSchema>;

/**
 * Problem types of the engine, as RFC 9457 `type` URIs. A solve that cannot be carried out for
 * the given inputs is a 422 with one of these, its message in `detail`, and `errors` pointing at
 * the inputs to change where the engine names them.
 */
export const engineProblemTypes = {
  input: '/problems/invalid-input',
  expression: '/problems/expression',
  geometry: '/problems/geometry-cannot-close',
  parallel: '/problems/geometry-cannot-close',
  indeterminate: '/problems/statically-indeterminate',
  mechanism: '/problems/not-in-equilibrium',
  'dead-centre': '/problems/dead-centre',
  numeric: '/problems/not-finite',
  unknownTemplate: '/problems/unknown-template',
  unknownVersion: '/problems/unknown-version',
} as const;
