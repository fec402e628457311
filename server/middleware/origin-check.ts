import type { RequestHandler } from 'express';
import { authProblemTypes } from '../../shared/api/auth';
import { HttpProblem } from './http-problem';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * CSRF defence for cookie-authenticated changes on our own routes (the auth library checks its
 * own): a state-changing request that names another origin is refused. Browsers send Origin on
 * every cross-origin request and on same-origin POST/PATCH/DELETE; a request with neither
 * Origin nor a cross-site fetch marker comes from a non-browser client, which a forged page
 * cannot be, and SameSite=Lax keeps the session cookie off cross-site subrequests anyway.
 */
export function requireTrustedOrigin(allowed: () => readonly string[]): RequestHandler {
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const origin = req.get('origin');
    const site = req.get('sec-fetch-site');
    const refused = origin ? origin === 'null' || !allowed().includes(origin) : site === 'cross-site';
    if (!refused) return next();
    next(
      new HttpProblem({
        type: authProblemTypes.crossOrigin,
        title: 'Cross-origin request refused',
        status: 403,
        detail: `Changes are accepted only from this site's own pages${origin ? `, not from ${origin}` : ''}.`,
      }),
    );
  };
}
