import { eq } from 'drizzle-orm';
import express, { type Request, type RequestHandler, type Response } from 'express';
import { z } from 'zod';
import {
  authProblemTypes,
  changePasswordRequestSchema,
  requestPasswordResetSchema,
  resendVerificationRequestSchema,
  resetPasswordRequestSchema,
  signInRequestSchema,
  signUpRequestSchema,
  verifyEmailQuerySchema,
} from '../../shared/api/auth';
import { problemTypes, type Problem } from '../../shared/api/problem';
import type { Database } from '../db/database';
import { users } from '../db/schema/auth';
import { apiNotFound } from '../middleware/error-handler';
import { HttpProblem } from '../middleware/http-problem';
import { requireTrustedOrigin } from '../middleware/origin-check';
import { parseOrThrow } from '../middleware/validate';
import { sessionOf } from '../middleware/auth-guards';
import type { AccountService } from '../services/accounts';
import { recordAudit } from '../services/audit';
import { CLIENT_IP_HEADER, type PinworkAuth } from '../services/auth/auth-system';
import { checkPasswordStrength } from '../services/auth/password-policy';
import { authRequestContext } from '../services/auth/request-context';
import { authLimiters, type AuthRateLimits } from './auth-rate-limits';

export interface AuthFrontOptions {
  auth: PinworkAuth;
  db: Database;
  accounts: AccountService;
  publicUrl: () => string;
  limits: AuthRateLimits;
  /** Origins whose pages may send changes (our own, the dev servers). */
  origins: () => readonly string[];
}

interface AuthAnswer {
  status: number;
  headers: Headers;
  body: unknown;
}

const SIGN_IN_FAILED: Problem = {
  type: authProblemTypes.signInFailed,
  title: 'Sign-in failed',
  status: 401,
  detail: 'The e-mail address or the password is not right.',
};

const INVALID_LINK: Problem = {
  type: authProblemTypes.invalidLink,
  title: 'Link not valid',
  status: 400,
  detail: 'This link is unknown, has expired or has already been used. Ask for a new one.',
};

const signUpSchema = signUpRequestSchema.superRefine((body, ctx) => checkPasswordStrength(ctx, body.password, body.email, 'password'));
const resetSchema = resetPasswordRequestSchema.superRefine((body, ctx) => checkPasswordStrength(ctx, body.newPassword, undefined, 'newPassword'));

/**
 * /api/auth/*: the auth library's endpoints behind our own front. The flows the client uses are
 * validated with our schemas (field errors as problems), rate limited per IP and per account,
 * audited, and answered uniformly so no answer tells whether an address has an account. The
 * library still runs the whole flow (its origin check, hashing, tokens, sessions); its errors
 * come back as problem details. Endpoints not listed here are not reachable over HTTP.
 */
export function authFrontRouter(options: AuthFrontOptions) {
  const { auth, db, accounts } = options;
  const router = express.Router();
  const limit = authLimiters(db, options.limits);
  // Our own Origin check first: the library's does not cover every endpoint (sign-out).
  router.use(requireTrustedOrigin(options.origins));
  router.use(express.json({ limit: '16kb' }));

  async function callAuth(req: Request, body?: unknown, search?: URLSearchParams): Promise<AuthAnswer> {
    const url = new URL(`/api/auth${req.path}`, options.publicUrl());
    if (search) url.search = search.toString();
    const headers = new Headers();
    for (const [name, value] of Object.entries(req.headers)) {
      if (value === undefined || ['host', 'content-length', 'transfer-encoding', 'connection', CLIENT_IP_HEADER].includes(name)) continue;
      headers.set(name, Array.isArray(value) ? value.join(', ') : value);
    }
    headers.set(CLIENT_IP_HEADER, req.ip ?? '');
    const init: RequestInit = { method: req.method, headers };
    if (body !== undefined) {
      headers.set('content-type', 'application/json');
      init.body = JSON.stringify(body);
    }
    const response = await authRequestContext.run({ ip: req.ip ?? null }, () => auth.handler(new Request(url, init)));
    const text = await response.text();
    let parsed: unknown = null;
    try {
      parsed = text ? JSON.parse(text) : null;
    } catch {
      parsed = text;
    }
    return { status: response.status, headers: response.headers, body: parsed };
  }

  function forwardCookies(answer: AuthAnswer, res: Response): void {
    for (const cookie of answer.headers.getSetCookie()) res.append('Set-Cookie', cookie);
  }

  const codeOf = (answer: AuthAnswer) => (answer.body as { code?: string } | null)?.code ?? '';

  /** The library's error as a problem; flows with their own wording map codes first. */
  function libraryProblem(answer: AuthAnswer): HttpProblem {
    const code = codeOf(answer);
    const message = (answer.body as { message?: string } | null)?.message;
    if (['MISSING_OR_NULL_ORIGIN', 'INVALID_ORIGIN', 'CROSS_SITE_NAVIGATION_LOGIN_BLOCKED'].includes(code) || code.startsWith('INVALID_') && code.endsWith('URL')) {
      return new HttpProblem({ type: authProblemTypes.crossOrigin, title: 'Cross-origin request refused', status: 403, detail: 'Changes are accepted only from this site\'s own pages.' });
    }
    if (code === 'PASSWORD_TOO_SHORT' || code === 'PASSWORD_TOO_LONG') {
      return new HttpProblem({ type: problemTypes.validation, title: 'Validation failed', status: 422, detail: message ?? 'The password is not accepted.', errors: [{ path: '/password', message: message ?? 'is not accepted' }] });
    }
    if (answer.status === 401) {
      return new HttpProblem({ type: authProblemTypes.unauthorized, title: 'Sign-in required', status: 401, detail: 'Sign in to use this.' });
    }
    const status = answer.status >= 400 && answer.status < 600 ? answer.status : 500;
    return new HttpProblem({ type: problemTypes.generic, title: 'Request not accepted', status, detail: message ?? 'The request was not accepted.' });
  }

  const ipOf = (req: Request) => req.ip ?? null;

  router.post('/sign-up/email', ...limit.signUp, async (req, res) => {
    const body = parseOrThrow(signUpSchema, req.body ?? {});
    const answer = await callAuth(req, { name: body.name, email: body.email, password: body.password });
    if (answer.status >= 400) throw libraryProblem(answer);
    res.setHeader('Cache-Control', 'no-store');
    res.json({ status: 'verification-sent', email: body.email });
  });

  router.post('/sign-in/email', ...limit.signIn, async (req, res) => {
    const body = parseOrThrow(signInRequestSchema, req.body ?? {});
    const answer = await callAuth(req, { email: body.email, password: body.password, rememberMe: body.rememberMe ?? true });
    const code = codeOf(answer);
    if (answer.status >= 400) {
      const reason = code === 'INVALID_EMAIL_OR_PASSWORD' ? 'wrong-credentials' : code.toLowerCase() || `status-${answer.status}`;
      await recordAudit(db, { actorKind: 'system', action: 'auth.sign-in-failed', target: `email:${body.email}`, ip: ipOf(req), details: { reason } });
      if (code === 'EMAIL_NOT_VERIFIED') {
        throw new HttpProblem({ type: authProblemTypes.emailNotVerified, title: 'E-mail address not confirmed', status: 403, detail: 'Confirm your e-mail address with the link we sent, or ask for a new link.' });
      }
      if (code === 'BANNED_USER') {
        throw new HttpProblem({ type: authProblemTypes.accountDisabled, title: 'Account disabled', status: 403, detail: 'This account is disabled. Ask an administrator.' });
      }
      if (answer.status === 401 || answer.status === 400) throw new HttpProblem(SIGN_IN_FAILED);
      throw libraryProblem(answer);
    }
    const token = (answer.body as { token?: string } | null)?.token;
    const me = token ? await accounts.meForToken(token) : null;
    if (!me) throw new Error('sign-in answered without a session');
    await recordAudit(db, { actorKind: 'user', actorId: me.user.id, action: 'auth.sign-in', target: `user:${me.user.id}`, ip: ipOf(req), details: { sessionId: me.session.id } });
    forwardCookies(answer, res);
    res.setHeader('Cache-Control', 'no-store');
    res.json(me);
  });

  router.post('/sign-out', async (req, res) => {
    const before = await sessionOf(auth, req);
    const answer = await callAuth(req, {});
    if (answer.status >= 400) throw libraryProblem(answer);
    if (before) await recordAudit(db, { actorKind: 'user', actorId: before.user.id, action: 'auth.sign-out', target: `user:${before.user.id}`, ip: ipOf(req) });
    forwardCookies(answer, res);
    res.json({ success: true });
  });

  router.get('/verify-email', async (req, res) => {
    const { token } = parseOrThrow(verifyEmailQuerySchema, req.query);
    // The library's tokens are signed, not stored, so it would accept one twice: a link whose
    // address is already confirmed counts as used.
    const email = emailInToken(token);
    const [already] = email ? await db.select({ verified: users.emailVerified }).from(users).where(eq(users.email, email)) : [];
    if (already?.verified) throw new HttpProblem(INVALID_LINK);
    const answer = await callAuth(req, undefined, new URLSearchParams({ token }));
    if (answer.status >= 400) {
      if (answer.status === 401 || answer.status === 400) throw new HttpProblem(INVALID_LINK);
      throw libraryProblem(answer);
    }
    const [user] = await db.select({ id: users.id }).from(users).where(eq(users.email, email));
    if (user) await recordAudit(db, { actorKind: 'user', actorId: user.id, action: 'auth.email-verified', target: `user:${user.id}`, ip: ipOf(req) });
    forwardCookies(answer, res);
    res.setHeader('Cache-Control', 'no-store');
    res.json({ status: 'verified', email });
  });

  const acceptedAlways = (schema: z.ZodType<{ email: string }>, audit?: string): RequestHandler => async (req, res) => {
    const body = parseOrThrow(schema, req.body ?? {});
    const answer = await callAuth(req, { email: body.email });
    if (answer.status >= 400 && answer.status !== 400) throw libraryProblem(answer);
    if (audit) await recordAudit(db, { actorKind: 'system', action: audit, target: `email:${body.email}`, ip: ipOf(req) });
    res.setHeader('Cache-Control', 'no-store');
    res.json({ status: 'accepted' });
  };
  router.post('/send-verification-email', ...limit.verification, acceptedAlways(resendVerificationRequestSchema));
  router.post('/request-password-reset', ...limit.passwordReset, acceptedAlways(requestPasswordResetSchema, 'auth.password-reset-requested'));

  router.post('/reset-password', ...limit.passwordReset, async (req, res) => {
    const body = parseOrThrow(resetSchema, req.body ?? {});
    const answer = await callAuth(req, { token: body.token, newPassword: body.newPassword });
    if (answer.status >= 400) {
      if (['INVALID_TOKEN', 'USER_NOT_FOUND'].includes(codeOf(answer))) throw new HttpProblem(INVALID_LINK);
      throw libraryProblem(answer);
    }
    res.setHeader('Cache-Control', 'no-store');
    res.json({ status: 'password-changed' });
  });

  // Read-only or self-service endpoints of the library the client may call as they are.
  const passThrough: RequestHandler = async (req, res) => {
    const answer = await callAuth(req, req.method === 'GET' ? undefined : (req.body ?? {}), new URL(req.originalUrl, 'http://x').searchParams);
    if (answer.status >= 400) throw libraryProblem(answer);
    forwardCookies(answer, res);
    res.setHeader('Cache-Control', 'no-store');
    res.status(answer.status).json(answer.body);
  };
  // The session answer is read by page scripts: it must not carry the session token, which the
  // httpOnly cookie exists to keep away from JavaScript.
  router.get('/get-session', async (req, res) => {
    const answer = await callAuth(req, undefined, new URL(req.originalUrl, 'http://x').searchParams);
    if (answer.status >= 400) throw libraryProblem(answer);
    forwardCookies(answer, res);
    res.setHeader('Cache-Control', 'no-store');
    res.status(answer.status).json(withoutSessionToken(answer.body));
  });
  // Signed in: the session is found first so the per-account limiter counts the person, not
  // an address in the body. A wrong current password is a field error, not a sign-in failure.
  const signedInFirst: RequestHandler = async (req, res, next) => {
    const me = await sessionOf(auth, req);
    if (!me) return next(new HttpProblem({ type: authProblemTypes.unauthorized, title: 'Sign-in required', status: 401, detail: 'Sign in to change your password.' }));
    res.locals.accountId = me.user.id;
    next();
  };
  router.post('/change-password', signedInFirst, ...limit.changePassword, async (req, res) => {
    const me = (await sessionOf(auth, req))!;
    const body = parseOrThrow(
      changePasswordRequestSchema.superRefine((b, ctx) => checkPasswordStrength(ctx, b.newPassword, me.user.email, 'newPassword')),
      req.body ?? {},
    );
    if (body.newPassword === body.currentPassword) {
      throw new HttpProblem({ type: problemTypes.validation, title: 'Validation failed', status: 422, detail: 'The new password must differ from the current one.', errors: [{ path: '/newPassword', message: 'must differ from the current password' }] });
    }
    const answer = await callAuth(req, { currentPassword: body.currentPassword, newPassword: body.newPassword, revokeOtherSessions: body.signOutOtherSessions });
    if (answer.status >= 400) {
      if (codeOf(answer) === 'INVALID_PASSWORD') {
        await recordAudit(db, { actorKind: 'user', actorId: me.user.id, action: 'auth.password-change-failed', target: `user:${me.user.id}`, ip: ipOf(req) });
        throw new HttpProblem({ type: problemTypes.validation, title: 'Validation failed', status: 422, detail: 'The current password is not right.', errors: [{ path: '/currentPassword', message: 'is not right' }] });
      }
      throw libraryProblem(answer);
    }
    await recordAudit(db, { actorKind: 'user', actorId: me.user.id, action: 'auth.password-changed', target: `user:${me.user.id}`, ip: ipOf(req), details: { otherSessionsSignedOut: body.signOutOtherSessions } });
    // With other sessions ended the library starts a new one for this browser: pass its cookie on.
    forwardCookies(answer, res);
    res.setHeader('Cache-Control', 'no-store');
    res.json({ status: 'password-changed', otherSessionsSignedOut: body.signOutOtherSessions });
  });
  router.post('/update-user', passThrough);

  router.use((req, res, next) => {
    if (res.headersSent) return next();
    apiNotFound(req, res, next);
  });
  return router;
}

/** The address a verification token names (read after the library has verified it). */
function emailInToken(token: string): string {
  try {
    const payload = JSON.parse(Buffer.from(token.split('.')[1] ?? '', 'base64url').toString('utf8')) as { email?: unknown };
    return typeof payload.email === 'string' ? payload.email : '';
  } catch {
    return '';
  }
}

/** A session answer with its `session.token` removed; anything else unchanged. */
export function withoutSessionToken(body: unknown): unknown {
  if (!body || typeof body !== 'object' || !('session' in body)) return body;
  const { session, ...rest } = body as { session: unknown };
  if (!session || typeof session !== 'object') return body;
  const { token: _token, ...safeSession } = session as Record<string, unknown>;
  return { ...rest, session: safeSession };
}
