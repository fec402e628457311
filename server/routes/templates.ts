import express from 'express';
import { rateLimit } from 'express-rate-limit';
import { z } from 'zod';
import { semverSchema, sensitivityRouteRequestSchema, solveRequestSchema, sweepRouteRequestSchema } from '../../shared/api/templates';
import { methodNotAllowed } from '../middleware/error-handler';
import { HttpProblem } from '../middleware/http-problem';
import { parseOrThrow } from '../middleware/validate';
import type { TemplateCatalogue } from '../services/templates/catalogue';

const slugParam = z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'must be a template slug such as wall-jib-tie-rod').max(60);
const versionQuery = z.object({ version: semverSchema.optional() }).strict();

export interface TemplateRoutesOptions {
  /** Requests per minute per client IP on the first-party routes. */
  perMinute?: number;
}

/**
 * First-party routes of the calculator (no API key; a per-IP limit). Thin: parse, call the
 * catalogue, respond. Errors are problem details thrown by the parser or the catalogue.
 */
export function templateRoutes(catalogue: TemplateCatalogue, options: TemplateRoutesOptions = {}) {
  const router = express.Router();
  const limiter = rateLimit({
    windowMs: 60_000,
    limit: options.perMinute ?? 600,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next, opts) =>
      next(
        new HttpProblem(
          { type: '/problems/rate-limited', title: 'Too many requests', status: 429, detail: `More than ${opts.limit} requests a minute from this address; wait a moment and try again.` },
          {},
        ),
      ),
  });
  router.use('/templates', limiter);

  const slugOf = (req: express.Request) => parseOrThrow(slugParam, req.params.slug);

  router
    .route('/templates')
    .get(async (_req, res) => {
      res.setHeader('Cache-Control', 'no-cache');
      res.json(await catalogue.list());
    })
    .all(methodNotAllowed(['GET', 'HEAD']));

  router
    .route('/templates/:slug')
    .get(async (req, res) => {
      const { version } = parseOrThrow(versionQuery, req.query);
      res.setHeader('Cache-Control', version ? 'public, max-age=3600' : 'no-cache');
      res.json(await catalogue.detail(slugOf(req), version));
    })
    .all(methodNotAllowed(['GET', 'HEAD']));

  router
    .route('/templates/:slug/versions/:version/validator.js')
    .get(async (req, res) => {
      const version = parseOrThrow(semverSchema, req.params.version);
      const script = await catalogue.validatorScript(slugOf(req), version);
      // A published version is immutable, so its validator is too.
      res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
      res.type('application/javascript').send(script);
    })
    .all(methodNotAllowed(['GET', 'HEAD']));

  const post = (path: string, handler: express.RequestHandler) => router.route(path).post(handler).all(methodNotAllowed(['POST']));

  post('/templates/:slug/solve', async (req, res) => {
    const body = parseOrThrow(solveRequestSchema, req.body ?? {});
    res.json(await catalogue.solve(slugOf(req), body.version, body.inputs));
  });
  post('/templates/:slug/sweep', async (req, res) => {
    const body = parseOrThrow(sweepRouteRequestSchema, req.body ?? {});
    res.json(await catalogue.sweep(slugOf(req), body.version, body.inputs, body.sweep));
  });
  post('/templates/:slug/sensitivity', async (req, res) => {
    const body = parseOrThrow(sensitivityRouteRequestSchema, req.body ?? {});
    res.json(await catalogue.sensitivity(slugOf(req), body.version, body.inputs, body.tornado));
  });

  return router;
}
