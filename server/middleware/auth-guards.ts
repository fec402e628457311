import { fromNodeHeaders } from 'better-auth/node';
import { and, eq } from 'drizzle-orm';
import type { Request, RequestHandler } from 'express';
import { authProblemTypes, type MemberRole, type UserRole } from '../../shared/api/auth';
import type { Database } from '../db/database';
import { members } from '../db/schema/organisations';
import type { PinworkAuth } from '../services/auth/auth-system';
import { HttpProblem } from './http-problem';

export interface SignedIn {
  user: { id: string; name: string; email: string; role: UserRole; emailVerified: boolean; createdAt: Date; banned: boolean };
  session: { id: string; token: string; expiresAt: Date };
}

const signedInKey = Symbol('pinwork.signedIn');
type WithAuth = Request & { [signedInKey]?: SignedIn | null };

/** The signed-in user of this request, or null; reads the session row once per request. */
export async function sessionOf(auth: PinworkAuth, req: Request): Promise<SignedIn | null> {
  const r = req as WithAuth;
  if (r[signedInKey] !== undefined) return r[signedInKey];
  const found = await auth.api.getSession({ headers: fromNodeHeaders(req.headers), query: { disableRefresh: false } });
  const value: SignedIn | null =
    found && !found.user.banned
      ? {
          user: {
            id: found.user.id,
            name: found.user.name,
            email: found.user.email,
            role: (found.user.role ?? 'user') as UserRole,
            emailVerified: found.user.emailVerified,
            createdAt: found.user.createdAt,
            banned: Boolean(found.user.banned),
          },
          session: { id: found.session.id, token: found.session.token, expiresAt: found.session.expiresAt },
        }
      : null;
  r[signedInKey] = value;
  return value;
}

/** For handlers behind requireSession: the signed-in user (the guard has made sure of one). */
export function signedIn(req: Request): SignedIn {
  const value = (req as WithAuth)[signedInKey];
  if (!value) throw new Error('signedIn() used on a route without requireSession');
  return value;
}

export const unauthorized = () =>
  new HttpProblem({ type: authProblemTypes.unauthorized, title: 'Sign-in required', status: 401, detail: 'Sign in to use this.' });

export const forbidden = (detail: string) =>
  new HttpProblem({ type: authProblemTypes.forbidden, title: 'Not allowed', status: 403, detail });

export function requireSession(auth: PinworkAuth): RequestHandler {
  return async (req, _res, next) => {
    next((await sessionOf(auth, req)) ? undefined : unauthorized());
  };
}

export function requireRole(roles: readonly UserRole[]): RequestHandler {
  return (req, _res, next) => {
    const { user } = signedIn(req);
    next(roles.includes(user.role) ? undefined : forbidden(`This needs the role ${roles.join(' or ')}; your role is ${user.role}.`));
  };
}

/** Membership (or ownership) of the organisation named by a path parameter; admins always pass. */
export function requireOrgRole(db: Database, orgRole: MemberRole | 'any', param: string): RequestHandler {
  return async (req, _res, next) => {
    const { user } = signedIn(req);
    if (user.role === 'admin') return next();
    const organisationId = String(req.params[param] ?? '');
    const uuid = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(organisationId);
    const [row] = uuid
      ? await db
          .select({ role: members.role })
          .from(members)
          .where(and(eq(members.organisationId, organisationId), eq(members.userId, user.id)))
      : [];
    const allowed = row && (orgRole === 'any' || row.role === orgRole || (orgRole === 'member' && row.role === 'owner'));
    next(allowed ? undefined : forbidden(orgRole === 'owner' ? 'Only an owner of this organisation may do this.' : 'Only members of this organisation may see this.'));
  };
}
