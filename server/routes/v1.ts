import { hash } from 'node:crypto';
import express, { type Request, type RequestHandler, type Response } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { Logger } from 'pino';
import { z } from 'zod';
import { problemTypes } from '../../shared/api/problem';
import {
  apiProblemTypes,
  v1Limits,
  v1SensitivityRequestSchema,
  v1SolveRequestSchema,
  v1SpecRequestSchema,
  v1SweepRequestSchema,
  v1TemplateQuerySchema,
} from '../../shared/api/v1';
import { specJsonSchema } from '../../shared/spec/spec-json-schema';
import { canonicalJson } from '../../shared/util/canonical-json';
import type { Database } from '../db/database';
import { apiCors, apiKeyOf, requireApiKey, requireQuota, requireScope } from '../middleware/api-key-auth';
import { methodNotAllowed } from '../middleware/error-handler';
import { HttpProblem, sendProblem } from '../middleware/http-problem';
import { parseOrThrow } from '../middleware/validate';
import type { ApiKeyService } from '../services/api-keys/api-keys';
import type { UsageRecorder } from '../services/api-keys/usage-recorder';
import { chartFormat, chartIdentity, chartTagPart, sendSvg } from '../services/api-v1/chart-negotiation';
import { chartRenderer } from '../services/api-v1/chart-renderer';
import { AnswerCache } from '../services/api-v1/answer-cache';
import { openApiDocument } from '../services/api-v1/openapi-document';
import { defaultSpecCheckLimits, solveSpecForApi, validateSpecForApi, type SpecCheckLimits } from '../services/api-v1/spec-check';
import type { V1Catalogue } from '../services/api-v1/v1-catalogue';
import { BatchedRateLimitStore } from '../services/batched-rate-limit-store';
import { expressPath, v1Operations, type V1Operation } from './v1-operations';

export interface V1Limits {
  /** The rate-limit window (a minute unless a test shortens it). */
  windowMs: number;
  /** Requests per window for a key without its own figure. */
  perWindow: number;
  /** How often each instance adds its rate-limit counts to the shared ones (see BatchedRateLimitStore). */
  rateSyncMs: number;
  spec: SpecCheckLimits;
}

export const defaultV1Limits: V1Limits = { windowMs: 60_000, perWindow: 600, rateSyncMs: 100, spec: defaultSpecCheckLimits };

export interface V1Deps {
  db: Database;
  logger: Logger;
  keys: ApiKeyService;
  usage: UsageRecorder;
  catalogue: V1Catalogue;
  version: string;
  limits?: Partial<V1Limits>;
  /** The per-key counters, when the caller stops them at shutdown (see stopAppWork). */
  rateLimitStore?: BatchedRateLimitStore;
}

const slugParam = z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'must be a template slug such as wall-jib-tie-rod').max(60);
const slugOf = (req: Request) => parseOrThrow(slugParam, req.params.slug);

/**
 * An ETag for a deterministic answer: the published spec's content hash with the request as
 * parsed (defaults filled), so equal questions about an immutable version share a tag.
 */
function etagFor(contentHash: string, request: unknown): string {
  return `"${hash('sha256', contentHash + canonicalJson(request), 'base64url')}"`;
}

function notModified(req: Request, res: Response, tag: string): boolean {
  res.setHeader('ETag', tag);
  res.setHeader('Cache-Control', 'private, no-cache');
  const asked = req.headers['if-none-match'];
  if (!asked) return false;
  const tags = asked.split(',').map((t) => t.trim().replace(/^W\//, ''));
  if (!tags.includes(tag) && !tags.includes('*')) return false;
  res.status(304).end();
  return true;
}

/** The public API v1: key, rate limit, quota, scope, then a thin handler per operation. */
export function v1Router(deps: V1Deps): express.Router {
  const limits = { ...defaultV1Limits, ...deps.limits, spec: { ...defaultV1Limits.spec, ...deps.limits?.spec } };
  const { catalogue, keys, usage } = deps;
  const router = express.Router();
  const document = openApiDocument(v1Operations, deps.version);
  const specSchema = specJsonSchema();
  const answers = new AnswerCache();
  /** A deterministic answer under its ETag: from the cache, or made, serialised once and kept. */
  const sendAnswer = async (res: Response, tag: string, make: () => Promise<unknown>): Promise<void> => {
    let answer = answers.get(tag);
    if (answer === undefined) {
      answer = JSON.stringify(await make());
      answers.set(tag, answer);
    }
    res.type('application/json').send(answer);
  };

  const limitOf = (req: Request) => apiKeyOf(req).ratePerMinute ?? limits.perWindow;
  const limitStore = deps.rateLimitStore ?? new BatchedRateLimitStore(deps.db, 'api-v1:', { syncMs: limits.rateSyncMs, logger: deps.logger });
  const limiter = rateLimit({
    windowMs: limits.windowMs,
    limit: limitOf,
    keyGenerator: (req) => {
      // The store syncs each of a key's last hits before its limit, so it needs the limit first.
      limitStore.noteLimit(apiKeyOf(req).id, limitOf(req));
      return apiKeyOf(req).id;
    },
    store: limitStore,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    // The key is the identity here, not the address; nothing about req.ip to validate.
    validate: { keyGeneratorIpFallback: false },
    handler: (req, _res, next) =>
      next(
        new HttpProblem({
          type: apiProblemTypes.rateLimited,
          title: 'Too many requests',
          status: 429,
          detail: `Key ${apiKeyOf(req).prefix} has made more than ${limitOf(req)} requests in ${Math.round(limits.windowMs / 1000)} s; wait for Retry-After seconds.`,
        }),
      ),
  });

  const json = express.json({ limit: v1Limits.bodyBytes });
  const specJson = express.json({ limit: v1Limits.specBodyBytes });
  const body = (req: Request) => (req.body === undefined ? {} : req.body);

  const handlers: Record<string, RequestHandler> = {
    listTemplates: async (_req, res) => {
      res.setHeader('Cache-Control', 'private, no-cache');
      res.json(await catalogue.list());
    },
    getTemplate: async (req, res) => {
      const { version } = parseOrThrow(v1TemplateQuerySchema, req.query);
      const exact = version !== undefined && /^\d+\.\d+\.\d+(-[0-9A-Za-z.-]+)?$/.test(version);
      res.setHeader('Cache-Control', exact ? 'private, max-age=3600' : 'private, no-cache');
      res.json(await catalogue.detail(slugOf(req), version));
    },
    solveTemplate: async (req, res) => {
      const slug = slugOf(req);
      const b = parseOrThrow(v1SolveRequestSchema, body(req));
      const v = await catalogue.resolve(slug, b.version);
      const tag = etagFor(v.row.contentHash, { op: 'solve', inputs: b.inputs, units: b.units });
      if (notModified(req, res, tag)) return;
      await sendAnswer(res, tag, () => catalogue.solve(slug, v.row.semver, b.inputs, b.units));
    },
    sweepTemplate: async (req, res) => {
      const format = chartFormat(req, res);
      const slug = slugOf(req);
      const b = parseOrThrow(v1SweepRequestSchema, body(req));
      const v = await catalogue.resolve(slug, b.version);
      const tag = etagFor(v.row.contentHash, { op: 'sweep', inputs: b.inputs, units: b.units, sweep: b.sweep, ...chartTagPart(format) });
      if (notModified(req, res, tag)) return;
      if (format === 'json') return sendAnswer(res, tag, () => catalogue.sweep(slug, v.row.semver, b.inputs, b.sweep, b.units));
      const svg = await chartRenderer.sweep(tag, chartIdentity(v, b.units), async () => (await catalogue.sweep(slug, v.row.semver, b.inputs, b.sweep, b.units)).sweep);
      sendSvg(res, svg, `${slug}-${v.row.semver}-sweep-${b.sweep.input}.svg`);
    },
    sensitivityTemplate: async (req, res) => {
      const format = chartFormat(req, res);
      const slug = slugOf(req);
      const b = parseOrThrow(v1SensitivityRequestSchema, body(req));
      const v = await catalogue.resolve(slug, b.version);
      const tag = etagFor(v.row.contentHash, { op: 'sensitivity', inputs: b.inputs, units: b.units, tornado: b.tornado, ...chartTagPart(format) });
      if (notModified(req, res, tag)) return;
      if (format === 'json') return sendAnswer(res, tag, () => catalogue.sensitivity(slug, v.row.semver, b.inputs, b.tornado, b.units));
      const svg = await chartRenderer.tornado(tag, chartIdentity(v, b.units), async () => (await catalogue.sensitivity(slug, v.row.semver, b.inputs, b.tornado, b.units)).tornado);
      sendSvg(res, svg, `${slug}-${v.row.semver}-sensitivity-${b.tornado.result}.svg`);
    },
    specSchema: (_req, res) => {
      res.setHeader('Cache-Control', 'public, max-age=300');
      res.json(specSchema);
    },
    validateSpec: (req, res) => {
      const b = parseOrThrow(v1SpecRequestSchema, body(req));
      res.json(validateSpecForApi(b.spec, limits.spec));
    },
    solveSpec: (req, res) => {
      const b = parseOrThrow(v1SpecRequestSchema, body(req));
      res.json(solveSpecForApi(b.spec, b.inputs, limits.spec));
    },
    openapi: (_req, res) => {
      res.setHeader('Cache-Control', 'public, max-age=300');
      res.json(document);
    },
  };

  router.use(apiCors(keys));
  const keyed = [requireApiKey(keys), limiter, requireQuota(usage)];
  const methods = new Map<string, string[]>();
  for (const op of v1Operations) {
    const chain: RequestHandler[] = op.scope ? [...keyed, requireScope(op.scope, op.id, usage)] : [];
    if (op.method === 'post') chain.push(op.path.startsWith('/specs/') ? specJson : json);
    chain.push(handlerFor(op, handlers));
    const path = expressPath(op.path);
    if (op.method === 'get') router.get(path, ...chain);
    else router.post(path, ...chain);
    methods.set(path, [...(methods.get(path) ?? []), ...(op.method === 'get' ? ['GET', 'HEAD'] : ['POST'])]);
  }
  for (const [path, allowed] of methods) router.all(path, methodNotAllowed(allowed));
  router.use((req, res) => {
    sendProblem(req, res, { type: problemTypes.notFound, title: 'Not found', status: 404, detail: `There is no API v1 endpoint ${req.method} ${req.path}; see /api/v1/openapi.json.` });
  });
  return router;
}

function handlerFor(op: V1Operation, handlers: Record<string, RequestHandler>): RequestHandler {
  const handler = handlers[op.id];
  if (!handler) throw new Error(`no handler for the v1 operation ${op.id}`);
  return handler;
}
