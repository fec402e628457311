import { z } from 'zod';
import { sweepOutputSchema, sweepRequestSchema, tornadoOutputSchema, tornadoRequestSchema } from '../mechanics/sensitivity-schema';
import { solveResultSchema } from '../mechanics/solve-result';
import { categorySchema } from '../spec/template-spec';
import { quantitySchema } from '../units/quantities';
import { semverSchema, templateVersionInfoSchema } from './templates';

/**
 * The public API v1 (/api/v1…), declared once: the server validates with these, the OpenAPI
 * document is generated from them, the client and the docs read them. Numbers are in the
 * engine's SI units (mm, N, kg, N·mm, degrees) unless a request asks for `units: 'US'`.
 */

export const apiScopes = ['read', 'solve', 'sweep', 'sensitivity', 'author'] as const;
export type ApiScope = (typeof apiScopes)[number];
export const apiKeyKindSchema = z.enum(['secret', 'publishable']);
export type ApiKeyKindName = z.infer<typeof apiKeyKindSchema>;

/** Limits of the public API, shared with the docs. */
export const v1Limits = {
  sweepSteps: 200,
  tornadoInputs: 40,
  inputKeys: 100,
  specPoints: 300,
  specJoints: 300,
  specMembersAndParts: 300,
  bodyBytes: 64 * 1024,
  specBodyBytes: 48 * 1024,
  specSolveMs: 2000,
} as const;

/** Problem `type` URIs of the key, limit and spec checks (the engine's are in templates.ts). */
export const apiProblemTypes = {
  keyMissing: '/problems/key-missing',
  keyInvalid: '/problems/key-invalid',
  keyRevoked: '/problems/key-revoked',
  keyExpired: '/problems/key-expired',
  outOfScope: '/problems/key-out-of-scope',
  wrongOrigin: '/problems/key-wrong-origin',
  rateLimited: '/problems/rate-limited',
  quotaExceeded: '/problems/quota-exceeded',
  invalidSpec: '/problems/invalid-spec',
  specTooLarge: '/problems/spec-too-large',
  specTooSlow: '/problems/spec-solve-too-long',
  invalidRange: '/problems/invalid-version-range',
} as const;

/** An exact version (1.2.0) or a semver range (^1.0.0, ~1.2, >=1.1 <2); syntax checked by the server. */
export const versionSelectorSchema = z
  .string()
  .min(1, 'must not be empty')
  .max(64, 'must be at most 64 characters')
  .describe('Exact version (1.0.0) or a semver range (^1.0.0); default: the latest published');

export const unitSystemSchema = z.enum(['SI', 'US']).default('SI').describe('Units of the inputs you send and the numbers you get back');

const inputsSchema = z
  .record(z.string().max(60), z.number())
  .refine((r) => Object.keys(r).length <= v1Limits.inputKeys, `must have at most ${v1Limits.inputKeys} keys`)
  .default({})
  .describe('Input values by key; missing keys take their defaults');

export const v1TemplateSummarySchema = z.object({
  slug: z.string(),
  title: z.string(),
  summary: z.string(),
  category: categorySchema,
  latestVersion: semverSchema,
  contentHash: z.string(),
});
export const v1TemplateListSchema = z.object({ templates: z.array(v1TemplateSummarySchema) });
export type V1TemplateList = z.infer<typeof v1TemplateListSchema>;

export const v1TemplateQuerySchema = z.object({ version: versionSelectorSchema.optional() }).strict();

export const v1TemplateDetailSchema = z.object({
  slug: z.string(),
  title: z.string(),
  summary: z.string(),
  category: categorySchema,
  version: semverSchema.describe('The version this detail describes (resolved from ?version=)'),
  contentHash: z.string(),
  versions: z.array(templateVersionInfoSchema),
  inputSchema: z.record(z.string(), z.unknown()).describe('Draft-07 JSON Schema of the inputs, SI units'),
  defaults: z.record(z.string(), z.number()),
  inputs: z.array(z.object({ key: z.string(), label: z.string(), quantity: quantitySchema })),
  results: z.array(z.object({ key: z.string(), label: z.string(), quantity: quantitySchema })),
});
export type V1TemplateDetail = z.infer<typeof v1TemplateDetailSchema>;

const versionField = versionSelectorSchema.optional();

export const v1SolveRequestSchema = z.object({ version: versionField, inputs: inputsSchema, units: unitSystemSchema }).strict();
export type V1SolveRequest = z.input<typeof v1SolveRequestSchema>;

const resolvedFields = {
  slug: z.string(),
  version: semverSchema,
  contentHash: z.string().describe("SHA-256 of the version's spec"),
  units: z.enum(['SI', 'US']),
};
export const v1SolveResponseSchema = z.object({ ...resolvedFields, result: solveResultSchema });
export type V1SolveResponse = z.infer<typeof v1SolveResponseSchema>;

export const v1SweepRequestSchema = z
  .object({
    version: versionField,
    inputs: inputsSchema,
    units: unitSystemSchema,
    sweep: sweepRequestSchema.extend({
      steps: z.number().int().min(2).max(v1Limits.sweepSteps).default(50).describe('Number of values, ends included'),
    }),
  })
  .strict();
export type V1SweepRequest = z.input<typeof v1SweepRequestSchema>;
export const v1SweepResponseSchema = z.object({ ...resolvedFields, sweep: sweepOutputSchema });

export const v1SensitivityRequestSchema = z
  .object({
    version: versionField,
    inputs: inputsSchema,
    units: unitSystemSchema,
    tornado: tornadoRequestSchema.extend({ inputs: z.array(z.string().min(1)).max(v1Limits.tornadoInputs).optional() }),
  })
  .strict();
export type V1SensitivityRequest = z.input<typeof v1SensitivityRequestSchema>;
export const v1SensitivityResponseSchema = z.object({ ...resolvedFields, tornado: tornadoOutputSchema });

export const v1SpecRequestSchema = z
  .object({
    spec: z.unknown().describe('A whole template spec (see GET /api/v1/spec-schema)'),
    inputs: inputsSchema,
  })
  .strict();
export type V1SpecRequest = z.input<typeof v1SpecRequestSchema>;

export const specIssueSchema = z.object({ path: z.string().describe('JSON Pointer into the spec'), message: z.string() });
export const v1SpecValidationSchema = z.object({
  valid: z.boolean(),
  contentHash: z.string().nullable(),
  issues: z.array(specIssueSchema),
});
export type V1SpecValidation = z.infer<typeof v1SpecValidationSchema>;
export const v1SpecSolveResponseSchema = z.object({ contentHash: z.string(), result: solveResultSchema });

// ---- key management and usage (first-party, session-authenticated) ----

const originSchema = z
  .string()
  .max(200)
  .regex(/^https?:\/\/[a-z0-9.-]+(:\d{1,5})?$/i, 'must be an origin such as https://shop.example.com (scheme, host, optional port, no path)');

export const createApiKeyRequestSchema = z
  .object({
    name: z.string().trim().min(1, 'must not be empty').max(80, 'must be at most 80 characters'),
    kind: apiKeyKindSchema,
    scopes: z.array(z.enum(apiScopes)).min(1, 'must name at least one scope').max(apiScopes.length),
    allowedOrigins: z.array(originSchema).max(20).default([]),
    expiresAt: z.iso.datetime({ offset: true }).optional().describe('ISO 8601; default: never'),
    ratePerMinute: z.number().int().min(1).max(100_000).optional(),
  })
  .strict()
  .superRefine((v, ctx) => {
    if (v.kind === 'publishable' && v.allowedOrigins.length === 0)
      ctx.addIssue({ code: 'custom', path: ['allowedOrigins'], message: 'a publishable key needs at least one allowed origin' });
    if (v.kind === 'publishable' && v.scopes.includes('author'))
      ctx.addIssue({ code: 'custom', path: ['scopes'], message: 'a publishable key is visible in browsers and cannot have the author scope' });
    if (v.kind === 'secret' && v.allowedOrigins.length > 0)
      ctx.addIssue({ code: 'custom', path: ['allowedOrigins'], message: 'only publishable keys are bound to origins' });
    if (v.expiresAt && Date.parse(v.expiresAt) <= Date.now()) ctx.addIssue({ code: 'custom', path: ['expiresAt'], message: 'must be in the future' });
  });
export type CreateApiKeyRequest = z.input<typeof createApiKeyRequestSchema>;

export const rotateApiKeyRequestSchema = z
  .object({
    graceSeconds: z.number().int().min(0).max(30 * 86_400).default(86_400).describe('How long the old key keeps working'),
  })
  .strict();

export const apiKeyInfoSchema = z.object({
  id: z.string(),
  organisationId: z.string().nullable(),
  name: z.string(),
  prefix: z.string().describe('The visible start of the key'),
  kind: apiKeyKindSchema,
  scopes: z.array(z.enum(apiScopes)),
  allowedOrigins: z.array(z.string()),
  createdAt: z.string(),
  expiresAt: z.string().nullable(),
  revokedAt: z.string().nullable(),
  lastUsedAt: z.string().nullable(),
  ratePerMinute: z.number().nullable(),
  rotatedFromId: z.string().nullable(),
});
export type ApiKeyInfo = z.infer<typeof apiKeyInfoSchema>;
export const apiKeyListSchema = z.object({
  items: z.array(apiKeyInfoSchema),
  /** Admin list only: the name of each organisation that owns a listed key, by its id. */
  organisationNames: z.record(z.string(), z.string()).optional(),
});
/** Creation and rotation: the only time the whole key is ever shown. */
export const createdApiKeySchema = z.object({ key: z.string(), info: apiKeyInfoSchema });
export type CreatedApiKey = z.infer<typeof createdApiKeySchema>;

const dayString = z.iso.date();
export const usageQuerySchema = z
  .object({ from: dayString.optional(), to: dayString.optional() })
  .strict()
  .refine((q) => !q.from || !q.to || q.from <= q.to, { path: ['to'], message: 'must not be before from' });
export const usageReportSchema = z.object({
  from: z.string(),
  to: z.string(),
  rows: z.array(z.object({ apiKeyId: z.string(), keyName: z.string(), prefix: z.string(), endpoint: z.string(), day: z.string(), count: z.number() })),
  monthly: z.object({ used: z.number(), quota: z.number().nullable() }).nullable(),
});
export type UsageReport = z.infer<typeof usageReportSchema>;
