import type { z } from 'zod';
import {
  v1SensitivityRequestSchema,
  v1SensitivityResponseSchema,
  v1SolveRequestSchema,
  v1SolveResponseSchema,
  v1SpecRequestSchema,
  v1SpecSolveResponseSchema,
  v1SpecValidationSchema,
  v1SweepRequestSchema,
  v1SweepResponseSchema,
  v1TemplateDetailSchema,
  v1TemplateListSchema,
  type ApiScope,
} from '../../shared/api/v1';
import { toggleExampleSpec } from './v1-example-spec';

/**
 * Every operation of the public API v1 in one list: the router registers from it, the OpenAPI
 * document is generated from it, and the tests run each example against the app.
 */
export interface V1Operation {
  id: string;
  method: 'get' | 'post';
  /** OpenAPI path (braces); Express paths are derived from it. */
  path: string;
  summary: string;
  /** null: no key needed (documentation). */
  scope: ApiScope | null;
  /** Deterministic for a published version: ETag and 304 on If-None-Match. */
  etag: boolean;
  query?: z.ZodObject;
  body?: z.ZodType;
  response: z.ZodType | null;
  /** A request that succeeds on a fresh server with the built-in templates. */
  example: { path: string; body?: unknown };
  /** With `Accept: image/svg+xml` the same request answers a ready chart (chart-svg.ts). */
  chart?: 'sweep' | 'tornado';
}

const slugExample = 'wall-jib-tie-rod';

export const v1Operations: V1Operation[] = [
  {
    id: 'listTemplates',
    method: 'get',
    path: '/templates',
    summary: 'Published templates with their latest version',
    scope: 'read',
    etag: false,
    response: v1TemplateListSchema,
    example: { path: '/templates' },
  },
  {
    id: 'getTemplate',
    method: 'get',
    path: '/templates/{slug}',
    summary: 'One template: versions, and for the chosen version its input schema, defaults and results',
    scope: 'read',
    etag: false,
    response: v1TemplateDetailSchema,
    example: { path: `/templates/${slugExample}?version=%5E1.0.0` },
  },
  {
    id: 'solveTemplate',
    method: 'post',
    path: '/templates/{slug}/solve',
    summary: 'Solve a template: results, checks, member and joint forces, verification',
    scope: 'solve',
    etag: true,
    body: v1SolveRequestSchema,
    response: v1SolveResponseSchema,
    example: { path: `/templates/${slugExample}/solve`, body: { version: '^1.0.0', inputs: { L: 4000, h: 1500 }, units: 'SI' } },
  },
  {
    id: 'sweepTemplate',
    method: 'post',
    path: '/templates/{slug}/sweep',
    summary: 'Sweep one input across a range and return the chosen results at each step',
    scope: 'sweep',
    etag: true,
    body: v1SweepRequestSchema,
    response: v1SweepResponseSchema,
    chart: 'sweep',
    example: { path: `/templates/${slugExample}/sweep`, body: { inputs: {}, sweep: { input: 'L', from: 2000, to: 6000, steps: 5 } } },
  },
  {
    id: 'sensitivityTemplate',
    method: 'post',
    path: '/templates/{slug}/sensitivity',
    summary: 'Rank how much each input moves one result (± a percentage), with elasticities',
    scope: 'sensitivity',
    etag: true,
    body: v1SensitivityRequestSchema,
    response: v1SensitivityResponseSchema,
    chart: 'tornado',
    example: { path: `/templates/${slugExample}/sensitivity`, body: { inputs: {}, tornado: { result: 'T', percent: 10 } } },
  },
  {
    id: 'specSchema',
    method: 'get',
    path: '/spec-schema',
    summary: 'JSON Schema (draft-07) of a template spec',
    scope: null,
    etag: false,
    response: null,
    example: { path: '/spec-schema' },
  },
  {
    id: 'validateSpec',
    method: 'post',
    path: '/specs/validate',
    summary: 'Validate a whole template spec that is not stored: every problem with its path',
    scope: 'author',
    etag: false,
    body: v1SpecRequestSchema,
    response: v1SpecValidationSchema,
    example: { path: '/specs/validate', body: { spec: toggleExampleSpec } },
  },
  {
    id: 'solveSpec',
    method: 'post',
    path: '/specs/solve',
    summary: 'Validate and solve a template spec that is not stored',
    scope: 'author',
    etag: false,
    body: v1SpecRequestSchema,
    response: v1SpecSolveResponseSchema,
    example: { path: '/specs/solve', body: { spec: toggleExampleSpec, inputs: {} } },
  },
  {
    id: 'openapi',
    method: 'get',
    path: '/openapi.json',
    summary: 'This document',
    scope: null,
    etag: false,
    response: null,
    example: { path: '/openapi.json' },
  },
];

export const expressPath = (openApiPath: string) => openApiPath.replace(/\{(\w+)\}/g, ':$1');
