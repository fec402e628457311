import { fromNodeHeaders } from 'better-auth/node';
import { and, asc, count, desc, eq, ilike, inArray, ne, or, type SQL } from 'drizzle-orm';
import type { IncomingHttpHeaders } from 'node:http';
import {
  capabilitiesByRole,
  homeByRole,
  type AdminUser,
  type AdminUserPage,
  type AdminUserQuery,
  type MeResponse,
  type MyOrganisation,
  type SessionInfo,
  type UserRole,
} from '../../shared/api/auth';
import { problemTypes } from '../../shared/api/problem';
import type { Database } from '../db/database';
import { sessions, users } from '../db/schema/auth';
import { members, organisations } from '../db/schema/organisations';
import { HttpProblem } from '../middleware/http-problem';
import type { SignedIn } from '../middleware/auth-guards';
import { recordAudit } from './audit';
import { readableAddress } from './auth/readable-address';
import type { PinworkAuth } from './auth/auth-system';

export interface Actor {
  userId: string;
  ip: string | null;
  headers: IncomingHttpHeaders;
}

const notFound = (what: string) => new HttpProblem({ type: problemTypes.notFound, title: 'Not found', status: 404, detail: `There is no ${what}.` });
const conflict = (detail: string) => new HttpProblem({ type: problemTypes.conflict, title: 'Conflict', status: 409, detail });

/** The signed-in user's own account, sessions and organisations; and the admin's view of users. */
export class AccountService {
  constructor(
    private readonly db: Database,
    private readonly auth: PinworkAuth,
  ) {}

  async organisationsOf(userId: string): Promise<MyOrganisation[]> {
    return this.db
      .select({ id: organisations.id, slug: organisations.slug, name: organisations.name, kind: organisations.kind, role: members.role })
      .from(members)
      .innerJoin(organisations, eq(organisations.id, members.organisationId))
      .where(eq(members.userId, userId))
      .orderBy(asc(organisations.name));
  }

  async me(signedIn: SignedIn): Promise<MeResponse> {
    const { user, session } = signedIn;
    return {
      user: { id: user.id, name: user.name, email: user.email, role: user.role, emailVerified: user.emailVerified, createdAt: user.createdAt.toISOString() },
      organisations: await this.organisationsOf(user.id),
      capabilities: [...capabilitiesByRole[user.role]],
      home: homeByRole[user.role],
      session: { id: session.id, expiresAt: session.expiresAt.toISOString() },
    };
  }

  /** The me answer for a session token just issued by sign-in. */
  async meForToken(token: string): Promise<MeResponse | null> {
    const [row] = await this.db
      .select({ session: sessions, user: users })
      .from(sessions)
      .innerJoin(users, eq(users.id, sessions.userId))
      .where(eq(sessions.token, token));
    if (!row) return null;
    return this.me({
      user: { ...row.user, banned: row.user.banned },
      session: { id: row.session.id, token: row.session.token, expiresAt: row.session.expiresAt },
    });
  }

  async sessions(signedIn: SignedIn): Promise<SessionInfo[]> {
    const rows = await this.db.select().from(sessions).where(eq(sessions.userId, signedIn.user.id)).orderBy(desc(sessions.createdAt));
    return rows
      .filter((row) => row.expiresAt > new Date())
      .map((row) => ({
        id: row.id,
        createdAt: row.createdAt.toISOString(),
        expiresAt: row.expiresAt.toISOString(),
        ipAddress: readableAddress(row.ipAddress),
        userAgent: row.userAgent,
        current: row.id === signedIn.session.id,
      }));
  }

  async revokeOtherSessions(signedIn: SignedIn, ip: string | null): Promise<number> {
    const revoked = await this.db
      .delete(sessions)
      .where(and(eq(sessions.userId, signedIn.user.id), ne(sessions.id, signedIn.session.id)))
      .returning({ id: sessions.id });
    await recordAudit(this.db, { actorKind: 'user', actorId: signedIn.user.id, action: 'auth.sessions-revoked', target: `user:${signedIn.user.id}`, ip, details: { revoked: revoked.length } });
    return revoked.length;
  }

  async revokeSession(signedIn: SignedIn, sessionId: string, ip: string | null): Promise<void> {
    const revoked = await this.db
      .delete(sessions)
      .where(and(eq(sessions.userId, signedIn.user.id), eq(sessions.id, sessionId)))
      .returning({ id: sessions.id });
    if (!revoked.length) throw notFound(`session ${sessionId} of yours`);
    await recordAudit(this.db, { actorKind: 'user', actorId: signedIn.user.id, action: 'auth.sessions-revoked', target: `user:${signedIn.user.id}`, ip, details: { revoked: 1, sessionId } });
  }

  // ------------------------------------------------------------------ admin

  async listUsers(query: Required<Pick<AdminUserQuery, 'sort' | 'order'>> & { q?: string | undefined; role?: UserRole | undefined; page: number; pageSize: number }): Promise<AdminUserPage> {
    const filters: SQL[] = [];
    if (query.q) {
      const pattern = `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
      filters.push(or(ilike(users.name, pattern), ilike(users.email, pattern))!);
    }
    if (query.role) filters.push(eq(users.role, query.role));
    const where = filters.length ? and(...filters) : undefined;
    const column = { name: users.name, email: users.email, role: users.role, createdAt: users.createdAt }[query.sort];
    const direction = query.order === 'asc' ? asc : desc;
    const [rows, [total]] = await Promise.all([
      this.db
        .select()
        .from(users)
        .where(where)
        .orderBy(direction(column), asc(users.id))
        .limit(query.pageSize)
        .offset((query.page - 1) * query.pageSize),
      this.db.select({ n: count() }).from(users).where(where),
    ]);
    const memberships = rows.length
      ? await this.db
          .select({ userId: members.userId, id: organisations.id, name: organisations.name, role: members.role })
          .from(members)
          .innerJoin(organisations, eq(organisations.id, members.organisationId))
          .where(inArray(members.userId, rows.map((row) => row.id)))
      : [];
    return {
      items: rows.map((row) => toAdminUser(row, memberships.filter((m) => m.userId === row.id))),
      total: total?.n ?? 0,
      page: query.page,
      pageSize: query.pageSize,
    };
  }

  async adminUser(userId: string): Promise<AdminUser> {
    const [row] = await this.db.select().from(users).where(eq(users.id, userId));
    if (!row) throw notFound(`user ${userId}`);
    const memberships = await this.db
      .select({ userId: members.userId, id: organisations.id, name: organisations.name, role: members.role })
      .from(members)
      .innerJoin(organisations, eq(organisations.id, members.organisationId))
      .where(eq(members.userId, userId));
    return toAdminUser(row, memberships);
  }

  async changeRole(actor: Actor, userId: string, role: UserRole): Promise<AdminUser> {
    const before = await this.adminUser(userId);
    if (userId === actor.userId && role !== 'admin') throw conflict('You cannot take the admin role from yourself; ask another admin.');
    if (before.role !== role) {
      await this.auth.api.setRole({ body: { userId, role }, headers: fromNodeHeaders(actor.headers) });
      await recordAudit(this.db, { actorKind: 'user', actorId: actor.userId, action: 'user.role-changed', target: `user:${userId}`, ip: actor.ip, details: { from: before.role, to: role } });
    }
    return this.adminUser(userId);
  }

  async disable(actor: Actor, userId: string, reason: string | undefined): Promise<AdminUser> {
    await this.adminUser(userId);
    if (userId === actor.userId) throw conflict('You cannot disable your own account.');
    // The library's ban also deletes every session of the user, so they are signed out at once.
    await this.auth.api.banUser({ body: { userId, banReason: reason || 'Disabled by an administrator' }, headers: fromNodeHeaders(actor.headers) });
    await recordAudit(this.db, { actorKind: 'user', actorId: actor.userId, action: 'user.disabled', target: `user:${userId}`, ip: actor.ip, details: reason ? { reason } : {} });
    return this.adminUser(userId);
  }

  async enable(actor: Actor, userId: string): Promise<AdminUser> {
    await this.adminUser(userId);
    await this.auth.api.unbanUser({ body: { userId }, headers: fromNodeHeaders(actor.headers) });
    await recordAudit(this.db, { actorKind: 'user', actorId: actor.userId, action: 'user.enabled', target: `user:${userId}`, ip: actor.ip });
    return this.adminUser(userId);
  }
}

function toAdminUser(row: typeof users.$inferSelect, memberships: { id: string; name: string; role: 'owner' | 'member' }[]): AdminUser {
  return {
    id: row.id,
    name: row.name,
    email: row.email,
    role: row.role,
    emailVerified: row.emailVerified,
    disabled: row.banned,
    disabledReason: row.banned ? row.banReason : null,
    createdAt: row.createdAt.toISOString(),
    organisations: memberships.map((m) => ({ id: m.id, name: m.name, role: m.role })),
  };
}
