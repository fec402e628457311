import type { Request, RequestHandler } from 'express';
import { apiProblemTypes, type ApiScope } from '../../shared/api/v1';
import type { ApiKeyService, VerifiedKey } from '../services/api-keys/api-keys';
import { nextMonthStart, type UsageRecorder } from '../services/api-keys/usage-recorder';
import { HttpProblem } from './http-problem';

const keyOf = Symbol('pinwork.apiKey');
type WithKey = Request & { [keyOf]?: VerifiedKey };

/** The key of a request behind requireApiKey. */
export function apiKeyOf(req: Request): VerifiedKey {
  const key = (req as WithKey)[keyOf];
  if (!key) throw new Error('apiKeyOf() used on a route without requireApiKey');
  return key;
}

const bearer = { 'WWW-Authenticate': 'Bearer realm="pinwork-api"' };
const keyProblem = (type: string, title: string, detail: string, status = 401) =>
  new HttpProblem({ type, title, status, detail }, status === 401 ? bearer : {});

const exposed = 'ETag, Retry-After, RateLimit, RateLimit-Policy';

/**
 * CORS for the public API: a browser may call it only from an origin that a live publishable
 * key lists. A preflight carries no key, so it is answered from the set of such origins; the
 * real request is then checked against its own key's origins.
 */
export function apiCors(keys: ApiKeyService): RequestHandler {
  return async (req, res, next) => {
    const origin = req.headers.origin;
    if (!origin || req.method !== 'OPTIONS') return next();
    if (!(await keys.originAllowed(origin.toLowerCase()))) {
      return next(keyProblem(apiProblemTypes.wrongOrigin, 'Origin not allowed', `No publishable key allows calls from ${origin}.`, 403));
    }
    res.setHeader('Access-Control-Allow-Origin', origin);
    res.setHeader('Vary', 'Origin');
    res.setHeader('Access-Control-Allow-Methods', 'GET, POST');
    res.setHeader('Access-Control-Allow-Headers', 'Authorization, Content-Type, If-None-Match');
    res.setHeader('Access-Control-Max-Age', '600');
    res.status(204).end();
  };
}

/** A valid, live key in `Authorization: Bearer …`; a publishable one only from its origins. */
export function requireApiKey(keys: ApiKeyService): RequestHandler {
  return async (req, res, next) => {
    const header = req.headers.authorization;
    if (!header) {
      return next(keyProblem(apiProblemTypes.keyMissing, 'API key missing', 'Send your key as `Authorization: Bearer <key>`.'));
    }
    const match = /^Bearer\s+(\S+)\s*$/i.exec(header);
    if (!match) {
      return next(keyProblem(apiProblemTypes.keyInvalid, 'API key invalid', 'The Authorization header must read `Bearer <key>`.'));
    }
    const check = await keys.verify(match[1]!);
    if (!check.ok) {
      if (check.reason === 'revoked') return next(keyProblem(apiProblemTypes.keyRevoked, 'API key revoked', 'This key has been revoked; ask your organisation for a new one.'));
      if (check.reason === 'expired') return next(keyProblem(apiProblemTypes.keyExpired, 'API key expired', 'This key has expired (or its rotation grace period has ended); use its replacement.'));
      return next(keyProblem(apiProblemTypes.keyInvalid, 'API key invalid', 'No such key; check that it was copied whole.'));
    }
    const key = check.key;
    const origin = req.headers.origin?.toLowerCase();
    if (key.kind === 'publishable') {
      if (!origin || !key.allowedOrigins.includes(origin)) {
        return next(
          keyProblem(
            apiProblemTypes.wrongOrigin,
            'Origin not allowed',
            origin ? `Key ${key.prefix} may be used from ${key.allowedOrigins.join(', ')}, not from ${origin}.` : `Key ${key.prefix} is publishable: it is accepted only from a browser on its allowed origins.`,
            403,
          ),
        );
      }
      res.setHeader('Access-Control-Allow-Origin', req.headers.origin!);
      res.setHeader('Access-Control-Expose-Headers', exposed);
      res.vary('Origin');
    }
    (req as WithKey)[keyOf] = key;
    next();
  };
}

/** The organisation's monthly quota (admins' own keys have none). */
export function requireQuota(usage: UsageRecorder): RequestHandler {
  return async (req, _res, next) => {
    const key = apiKeyOf(req);
    if (!key.organisationId) return next();
    const { used, quota } = await usage.monthlyFigure(key.organisationId);
    if (quota === null || used < quota) return next();
    const now = new Date();
    const reset = nextMonthStart(now);
    next(
      new HttpProblem(
        {
          type: apiProblemTypes.quotaExceeded,
          title: 'Monthly quota used up',
          status: 429,
          detail: `Your organisation has made ${used} of its ${quota} calls this month; the quota starts again on ${reset.toISOString().slice(0, 10)}.`,
        },
        { 'Retry-After': String(Math.ceil((reset.getTime() - now.getTime()) / 1000)) },
      ),
    );
  };
}

/** The scope the endpoint needs; then the call is counted for usage (batched). */
export function requireScope(scope: ApiScope, endpoint: string, usage: UsageRecorder): RequestHandler {
  return (req, _res, next) => {
    const key = apiKeyOf(req);
    if (!key.scopes.includes(scope)) {
      return next(
        new HttpProblem({
          type: apiProblemTypes.outOfScope,
          title: 'Key lacks a scope',
          status: 403,
          detail: `This endpoint needs the scope '${scope}'; key ${key.prefix} has ${key.scopes.map((s) => `'${s}'`).join(', ') || 'none'}.`,
        }),
      );
    }
    usage.record(key.id, key.organisationId, endpoint);
    next();
  };
}
