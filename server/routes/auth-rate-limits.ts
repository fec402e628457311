import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { authProblemTypes } from '../../shared/api/auth';
import type { Database } from '../db/database';
import { HttpProblem } from '../middleware/http-problem';
import { DatabaseRateLimitStore } from '../services/rate-limit-store';

export interface LimitRule {
  /** Requests allowed per window. */
  limit: number;
  windowMs: number;
}

/** Per flow: one rule per client IP, one per account (the e-mail in the body). */
export interface AuthRateLimits {
  signIn: { perIp: LimitRule; perAccount: LimitRule };
  signUp: { perIp: LimitRule; perAccount: LimitRule };
  passwordReset: { perIp: LimitRule; perAccount: LimitRule };
  verification: { perIp: LimitRule; perAccount: LimitRule };
  /** Per account here means the signed-in person (a stolen session guessing the current password). */
  changePassword: { perIp: LimitRule; perAccount: LimitRule };
}

const MINUTE = 60_000;
export const defaultAuthRateLimits: AuthRateLimits = {
  // Failed sign-ins only count against an account, so its owner is not locked out by success.
  signIn: { perIp: { limit: 30, windowMs: 15 * MINUTE }, perAccount: { limit: 8, windowMs: 15 * MINUTE } },
  signUp: { perIp: { limit: 10, windowMs: 60 * MINUTE }, perAccount: { limit: 3, windowMs: 60 * MINUTE } },
  passwordReset: { perIp: { limit: 10, windowMs: 60 * MINUTE }, perAccount: { limit: 3, windowMs: 60 * MINUTE } },
  verification: { perIp: { limit: 10, windowMs: 60 * MINUTE }, perAccount: { limit: 3, windowMs: 60 * MINUTE } },
  changePassword: { perIp: { limit: 20, windowMs: 60 * MINUTE }, perAccount: { limit: 5, windowMs: 15 * MINUTE } },
};

function emailOf(req: Request): string | null {
  const email = (req.body as { email?: unknown } | undefined)?.email;
  return typeof email === 'string' && email.trim() ? email.trim().toLowerCase() : null;
}

/** The signed-in person's id, set by the route before its limiters run (see change-password). */
export function signedInAccountOf(req: Request): string | null {
  const id = (req.res?.locals as { accountId?: unknown } | undefined)?.accountId;
  return typeof id === 'string' ? `user:${id}` : null;
}

function limiter(db: Database, name: string, rule: LimitRule, scope: 'ip' | 'account', onlyFailures: boolean, accountOf: (req: Request) => string | null = emailOf): RequestHandler {
  return rateLimit({
    windowMs: rule.windowMs,
    limit: rule.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    identifier: `${name}-${scope}`,
    store: new DatabaseRateLimitStore(db, `auth:${name}:${scope}:`),
    skipSuccessfulRequests: onlyFailures,
    skip: scope === 'account' ? (req) => accountOf(req) === null : undefined,
    keyGenerator: scope === 'account' ? (req) => accountOf(req)! : (req) => ipKeyGenerator(req.ip ?? 'unknown'),
    handler: (_req, res, next) => {
      const wait = res.getHeader('Retry-After');
      next(
        new HttpProblem({
          type: authProblemTypes.rateLimited,
          title: 'Too many attempts',
          status: 429,
          detail: `Too many attempts ${scope === 'ip' ? 'from this address' : 'for this account'}; try again in ${wait ?? 'a few'} seconds.`,
        }),
      );
    },
  });
}

export function authLimiters(db: Database, limits: AuthRateLimits) {
  const pair = (name: keyof AuthRateLimits, onlyFailures = false, accountOf = emailOf): RequestHandler[] => [
    limiter(db, name, limits[name].perIp, 'ip', false),
    limiter(db, name, limits[name].perAccount, 'account', onlyFailures, accountOf),
  ];
  return {
    signIn: pair('signIn', true),
    signUp: pair('signUp'),
    passwordReset: pair('passwordReset'),
    verification: pair('verification'),
    changePassword: pair('changePassword', false, signedInAccountOf),
  };
}
