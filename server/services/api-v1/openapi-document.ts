import { z } from 'zod';
import { problemSchema, problemTypes } from '../../../shared/api/problem';
import { engineProblemTypes } from '../../../shared/api/templates';
import { apiProblemTypes, apiScopes, v1Limits } from '../../../shared/api/v1';
import type { V1Operation } from '../../routes/v1-operations';

type JsonObject = Record<string, unknown>;

/** zod → JSON Schema 2020-12 (OpenAPI 3.1's dialect), without the per-schema `$schema` marker. */
function schemaOf(schema: z.ZodType, io: 'input' | 'output'): JsonObject {
  const { $schema: _ignored, ...rest } = z.toJSONSchema(schema, { target: 'draft-2020-12', io, unrepresentable: 'any' }) as JsonObject;
  return rest;
}

const problemResponse = (description: string) => ({
  description,
  content: { 'application/problem+json': { schema: { $ref: '#/components/schemas/Problem' } } },
});

const chartHeaders = {
  Vary: { schema: { type: 'string' }, description: 'Accept: JSON and SVG answers of one request are cached apart (their ETags differ too)' },
};

function chartContent(kind: 'sweep' | 'tornado'): JsonObject {
  const what =
    kind === 'sweep'
      ? 'the chosen results as lines against the swept input; steps that cannot be built are a shaded gap with the reason below'
      : 'one bar per input between the result with that input moved down and up, and the value as set';
  return {
    schema: {
      type: 'string',
      contentMediaType: 'image/svg+xml',
      description: `A standalone SVG 1.1 document (800 px wide) drawn with the app's chart: title, axes with units in the request's unit system, legend, ${what}; the footer names the template, version and spec hash. No scripts, fonts or other external references.`,
    },
  };
}

/**
 * The OpenAPI 3.1 document of the public API, built from the operation list and its zod
 * shapes, so the document cannot drift from what the server validates.
 */
export function openApiDocument(operations: readonly V1Operation[], version: string): JsonObject {
  const paths: Record<string, JsonObject> = {};
  for (const op of operations) {
    const parameters: JsonObject[] = [];
    for (const [, name] of op.path.matchAll(/\{(\w+)\}/g)) {
      parameters.push({ name, in: 'path', required: true, schema: { type: 'string', pattern: '^[a-z0-9]+(-[a-z0-9]+)*$' }, example: 'wall-jib-tie-rod' });
    }
    if (op.query) {
      for (const [name, field] of Object.entries(op.query.shape)) {
        parameters.push({ name, in: 'query', required: false, schema: schemaOf(field as z.ZodType, 'input') });
      }
    }
    if (op.etag) parameters.push({ name: 'If-None-Match', in: 'header', required: false, schema: { type: 'string' }, description: 'An ETag from an earlier identical request' });
    const responses: JsonObject = {
      '200': {
        description: op.chart ? 'OK: the data as JSON, or with `Accept: image/svg+xml` a ready chart' : 'OK',
        ...(op.etag || op.chart ? { headers: { ...(op.etag ? { ETag: { schema: { type: 'string' }, description: 'Hash of the spec and the request' } } : {}), ...(op.chart ? chartHeaders : {}) } } : {}),
        content: {
          'application/json': { schema: op.response ? schemaOf(op.response, 'output') : { type: 'object' } },
          ...(op.chart ? { 'image/svg+xml': chartContent(op.chart) } : {}),
        },
      },
    };
    if (op.chart) responses['406'] = problemResponse('The Accept header allows neither application/json nor image/svg+xml');
    if (op.etag) responses['304'] = { description: 'Not modified: the ETag in If-None-Match still holds' };
    if (op.scope) {
      responses['401'] = problemResponse('Key missing, invalid, revoked or expired');
      responses['403'] = problemResponse('Key lacks the scope, or a publishable key from another origin');
      responses['429'] = problemResponse('Rate limit or monthly quota reached (see Retry-After)');
    }
    if (op.path.includes('{slug}')) responses['404'] = problemResponse('Unknown template or version');
    if (op.body || op.query) responses['422'] = problemResponse('Invalid input (errors name each field), or an engine outcome such as a geometry that cannot close');
    if (op.body) {
      responses['400'] = problemResponse('Malformed JSON');
      responses['413'] = problemResponse('Body too large');
    }
    const operation: JsonObject = {
      operationId: op.id,
      summary: op.summary,
      ...(op.scope ? { security: [{ apiKey: [] }], description: `Needs a key with the scope \`${op.scope}\`.` } : { security: [] }),
      ...(parameters.length ? { parameters } : {}),
      ...(op.body
        ? { requestBody: { required: true, content: { 'application/json': { schema: schemaOf(op.body, 'input'), example: op.example.body } } } }
        : {}),
      responses,
    };
    (paths[op.path] ??= {})[op.method] = operation;
  }
  const types = { ...engineProblemTypes, ...apiProblemTypes, notAcceptable: problemTypes.notAcceptable };
  return {
    openapi: '3.1.0',
    info: {
      title: 'Pinwork API',
      version,
      description: [
        'Results and sensitivity data of Pinwork templates for API-key holders. Numbers are SI (mm, N, kg, N·mm, degrees) unless a request asks for US customary units.',
        `Limits: sweeps up to ${v1Limits.sweepSteps} steps, tornado up to ${v1Limits.tornadoInputs} inputs, bodies up to ${v1Limits.bodyBytes} bytes (${v1Limits.specBodyBytes} for specs), specs up to ${v1Limits.specPoints} points and ${v1Limits.specJoints} joints and ${v1Limits.specSolveMs} ms.`,
        `Scopes: ${apiScopes.join(', ')}. Every error is RFC 9457 problem details; its \`type\` is one of: ${[...new Set(Object.values(types))].join(', ')}.`,
        'Results are a design aid for a qualified person: rated loads, design factors, proof tests and inspection follow the standards that apply (for example ASME B30.20 with ASME BTH-1, or EN 13155).',
      ].join('\n\n'),
    },
    servers: [{ url: '/api/v1' }],
    paths,
    components: {
      securitySchemes: { apiKey: { type: 'http', scheme: 'bearer', description: 'A secret key (pw_sk_…) or, from a browser on an allowed origin, a publishable key (pw_pk_…)' } },
      schemas: { Problem: schemaOf(problemSchema, 'output') },
    },
  };
}
