import express, { type RequestHandler } from 'express';
import type { ServerMode } from '../config';
import type { Database } from '../db/database';
import { requireOrgRole, requireRole, requireSession } from '../middleware/auth-guards';
import { methodNotAllowed } from '../middleware/error-handler';
import { requireTrustedOrigin } from '../middleware/origin-check';
import type { PinworkAuth } from '../services/auth/auth-system';
import { routeTable, type AccessRule, type RouteId } from './route-access';

export type RouteHandlers = Record<RouteId, RequestHandler>;

/** The guards one table row asks for, in order: origin (for changes), session, role, organisation. */
export function guardsFor(rule: AccessRule, auth: PinworkAuth, db: Database, origins: () => readonly string[]): RequestHandler[] {
  const originGuard = rule.method === 'GET' ? [] : [requireTrustedOrigin(origins)];
  return [...originGuard, ...accessGuards(rule, auth, db)];
}

function accessGuards(rule: AccessRule, auth: PinworkAuth, db: Database): RequestHandler[] {
  switch (rule.access.kind) {
    case 'public':
      return [];
    case 'signed-in':
      return [requireSession(auth)];
    case 'roles':
      return [requireSession(auth), requireRole(rule.access.roles)];
    case 'organisation':
      return [requireSession(auth), requireOrgRole(db, rule.access.orgRole, rule.access.param)];
  }
}

/**
 * Registers every row of the route table with its guards and its handler (the handler record
 * must name every id, which the type checker enforces), and a 405 for other methods on a path.
 */
export function accessControlledRouter(handlers: RouteHandlers, deps: { auth: PinworkAuth; db: Database; mode: ServerMode; origins: () => readonly string[] }) {
  const router = express.Router();
  const rules: readonly AccessRule[] = routeTable;
  const methodsByPath = new Map<string, string[]>();
  for (const rule of rules) {
    if (rule.devOnly && deps.mode === 'production') continue;
    const route = router.route(rule.path);
    const chain = [...guardsFor(rule, deps.auth, deps.db, deps.origins), handlers[rule.id as RouteId]];
    if (rule.method === 'GET') route.get(...chain);
    else if (rule.method === 'POST') route.post(...chain);
    else if (rule.method === 'PATCH') route.patch(...chain);
    else route.delete(...chain);
    const methods = methodsByPath.get(rule.path) ?? [];
    methods.push(rule.method, ...(rule.method === 'GET' ? ['HEAD'] : []));
    methodsByPath.set(rule.path, methods);
  }
  for (const [path, methods] of methodsByPath) router.all(path, methodNotAllowed(methods));
  return router;
}
