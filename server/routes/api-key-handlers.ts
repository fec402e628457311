import type { Request, RequestHandler } from 'express';
import { rotateApiKeyRequestSchema, usageQuerySchema } from '../../shared/api/v1';
import { signedIn } from '../middleware/auth-guards';
import { parseOrThrow } from '../middleware/validate';
import type { ApiKeyService, KeyActor, KeyScope } from '../services/api-keys/api-keys';
import type { UsageReportService } from '../services/api-keys/usage-report';
import type { ApiKeyRouteId } from './route-access';

export interface ApiKeyRouteServices {
  apiKeys: ApiKeyService;
  usageReports: UsageReportService;
}

const orgScope = (req: Request): KeyScope => ({ organisationId: String(req.params.organisationId) });
const everyKey: KeyScope = { all: true };
const body = (req: Request) => req.body ?? {};
const actorOf = (req: Request): KeyActor => ({ userId: signedIn(req).user.id, ip: req.ip ?? null });

/** Key management for suppliers (their organisation's keys) and admins (every key, and their own). */
export function apiKeyHandlers(s: ApiKeyRouteServices): Record<ApiKeyRouteId, RequestHandler> {
  const list = (scope: (req: Request) => KeyScope): RequestHandler => async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json({ items: await s.apiKeys.list(scope(req)) });
  };
  const rotate = (scope: (req: Request) => KeyScope): RequestHandler => async (req, res) => {
    const { graceSeconds } = parseOrThrow(rotateApiKeyRequestSchema, body(req));
    res.setHeader('Cache-Control', 'no-store');
    res.status(201).json(await s.apiKeys.rotate(String(req.params.keyId), scope(req), graceSeconds, actorOf(req)));
  };
  const revoke = (scope: (req: Request) => KeyScope): RequestHandler => async (req, res) => {
    res.json(await s.apiKeys.revoke(String(req.params.keyId), scope(req), actorOf(req)));
  };
  const usage = (scope: (req: Request) => KeyScope): RequestHandler => async (req, res) => {
    const range = parseOrThrow(usageQuerySchema, req.query);
    res.setHeader('Cache-Control', 'no-store');
    res.json(await s.usageReports.report(scope(req), range));
  };
  return {
    'apiKeys.list': list(orgScope),
    'apiKeys.create': async (req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      res.status(201).json(await s.apiKeys.create({ organisationId: String(req.params.organisationId), ...actorOf(req) }, body(req)));
    },
    'apiKeys.rotate': rotate(orgScope),
    'apiKeys.revoke': revoke(orgScope),
    'apiKeys.usage': usage(orgScope),
    'apiKeys.admin.list': async (_req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      const items = await s.apiKeys.list(everyKey);
      const owners = [...new Set(items.map((k) => k.organisationId).filter((id): id is string => id !== null))];
      res.json({ items, organisationNames: await s.usageReports.organisationNames(owners) });
    },
    'apiKeys.admin.create': async (req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      res.status(201).json(await s.apiKeys.create({ organisationId: null, ...actorOf(req) }, body(req)));
    },
    'apiKeys.admin.rotate': rotate(() => everyKey),
    'apiKeys.admin.revoke': revoke(() => everyKey),
    'apiKeys.admin.usage': usage(() => everyKey),
  };
}
