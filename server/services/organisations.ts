import { createHash, randomBytes } from 'node:crypto';
import { and, asc, count, desc, eq, gt, ilike, inArray, isNull, or, type SQL } from 'drizzle-orm';
import {
  authProblemTypes,
  type AdminOrganisationPage,
  type Invitation,
  type InvitationPreview,
  type MemberList,
  type MemberRole,
  type MyOrganisation,
  type UserRole,
} from '../../shared/api/auth';
import { problemTypes } from '../../shared/api/problem';
import type { Database } from '../db/database';
import { users } from '../db/schema/auth';
import { invitations } from '../db/schema/invitations';
import { members, organisations, type OrganisationKind } from '../db/schema/organisations';
import { HttpProblem } from '../middleware/http-problem';
import { forbidden } from '../middleware/auth-guards';
import type { SignedIn } from '../middleware/auth-guards';
import type { MailQueue } from './mail/mail-queue';
import { invitationMessage } from './mail/messages';
import { recordAudit } from './audit';

export const INVITATION_LIFETIME_MS = 7 * 24 * 3600 * 1000;

const notFound = (what: string) => new HttpProblem({ type: problemTypes.notFound, title: 'Not found', status: 404, detail: `There is no ${what}.` });
const conflict = (detail: string) => new HttpProblem({ type: problemTypes.conflict, title: 'Conflict', status: 409, detail });
const invalidInvitation = () =>
  new HttpProblem({
    type: authProblemTypes.invalidLink,
    title: 'Invitation link not valid',
    status: 400,
    detail: 'This invitation link is unknown, has expired, was withdrawn or has already been used. Ask for a new invitation.',
  });

const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

/** A plain user who joins an organisation takes the role its kind implies; other roles stay. */
const roleForJoining: Record<OrganisationKind, UserRole> = { supplier: 'supplier', engineering: 'engineer' };

export class OrganisationService {
  constructor(
    private readonly db: Database,
    private readonly mail: MailQueue,
    private readonly publicUrl: () => string,
  ) {}

  private async organisation(organisationId: string) {
    const uuid = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(organisationId);
    const [row] = uuid ? await this.db.select().from(organisations).where(eq(organisations.id, organisationId)) : [];
    if (!row) throw notFound(`organisation ${organisationId}`);
    return row;
  }

  async members(organisationId: string): Promise<MemberList> {
    const organisation = await this.organisation(organisationId);
    const rows = await this.db
      .select({ userId: users.id, name: users.name, email: users.email, role: members.role, joinedAt: members.createdAt })
      .from(members)
      .innerJoin(users, eq(users.id, members.userId))
      .where(eq(members.organisationId, organisationId))
      .orderBy(asc(users.name));
    const open = await this.db
      .select()
      .from(invitations)
      .where(and(eq(invitations.organisationId, organisationId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, new Date())))
      .orderBy(desc(invitations.createdAt));
    return {
      organisation: { id: organisation.id, slug: organisation.slug, name: organisation.name, kind: organisation.kind },
      items: rows.map((row) => ({ ...row, joinedAt: row.joinedAt.toISOString() })),
      invitations: open.map(toInvitation),
    };
  }

  async invite(actor: SignedIn, ip: string | null, organisationId: string, email: string, role: MemberRole): Promise<Invitation> {
    const organisation = await this.organisation(organisationId);
    const [already] = await this.db
      .select({ id: members.id })
      .from(members)
      .innerJoin(users, eq(users.id, members.userId))
      .where(and(eq(members.organisationId, organisationId), eq(users.email, email)));
    if (already) throw conflict(`${email} is already a member of ${organisation.name}.`);
    const token = randomBytes(32).toString('base64url');
    const [row] = await this.db
      .insert(invitations)
      .values({ organisationId, email, role, tokenHash: hashToken(token), invitedBy: actor.user.id, expiresAt: new Date(Date.now() + INVITATION_LIFETIME_MS) })
      .returning();
    await this.mail.enqueue(invitationMessage(email, actor.user.name, organisation.name, role, `${this.publicUrl()}/invitations/accept?token=${token}`));
    await recordAudit(this.db, { actorKind: 'user', actorId: actor.user.id, action: 'organisation.invitation-created', target: `organisation:${organisationId}`, ip, details: { email, role } });
    return toInvitation(row!);
  }

  async revokeInvitation(actor: SignedIn, ip: string | null, organisationId: string, invitationId: string): Promise<void> {
    const uuid = /^[0-9a-f-]{36}$/i.test(invitationId);
    const revoked = uuid
      ? await this.db
          .update(invitations)
          .set({ revokedAt: new Date() })
          .where(and(eq(invitations.id, invitationId), eq(invitations.organisationId, organisationId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)))
          .returning({ id: invitations.id })
      : [];
    if (!revoked.length) throw notFound(`open invitation ${invitationId} in this organisation`);
    await recordAudit(this.db, { actorKind: 'user', actorId: actor.user.id, action: 'organisation.invitation-revoked', target: `organisation:${organisationId}`, ip, details: { invitationId } });
  }

  async removeMember(actor: SignedIn, ip: string | null, organisationId: string, userId: string): Promise<void> {
    await this.organisation(organisationId);
    await this.db.transaction(async (tx) => {
      const [row] = await tx.select().from(members).where(and(eq(members.organisationId, organisationId), eq(members.userId, userId)));
      if (!row) throw notFound(`member ${userId} in this organisation`);
      if (row.role === 'owner') {
        const [owners] = await tx.select({ n: count() }).from(members).where(and(eq(members.organisationId, organisationId), eq(members.role, 'owner')));
        if ((owners?.n ?? 0) <= 1) throw conflict('This is the last owner; make someone else an owner first.');
      }
      await tx.delete(members).where(eq(members.id, row.id));
    });
    await recordAudit(this.db, { actorKind: 'user', actorId: actor.user.id, action: 'organisation.member-removed', target: `organisation:${organisationId}`, ip, details: { userId } });
  }

  private async openInvitation(token: string) {
    const [row] = await this.db
      .select({ invitation: invitations, organisation: organisations })
      .from(invitations)
      .innerJoin(organisations, eq(organisations.id, invitations.organisationId))
      .where(eq(invitations.tokenHash, hashToken(token)));
    if (!row || row.invitation.acceptedAt || row.invitation.revokedAt || row.invitation.expiresAt <= new Date()) throw invalidInvitation();
    return row;
  }

  async preview(token: string): Promise<InvitationPreview> {
    const { invitation, organisation } = await this.openInvitation(token);
    return {
      organisation: { name: organisation.name, kind: organisation.kind },
      email: invitation.email,
      role: invitation.role,
      expiresAt: invitation.expiresAt.toISOString(),
    };
  }

  async accept(actor: SignedIn, ip: string | null, token: string): Promise<{ organisation: MyOrganisation; userRole: UserRole }> {
    const { invitation, organisation } = await this.openInvitation(token);
    if (invitation.email.toLowerCase() !== actor.user.email.toLowerCase()) {
      throw forbidden(`This invitation is for another e-mail address; sign in as that address to accept it.`);
    }
    const userRole = actor.user.role === 'user' ? roleForJoining[organisation.kind] : actor.user.role;
    await this.db.transaction(async (tx) => {
      // Single use even when two tabs accept at once: only one update finds the row unaccepted.
      const claimed = await tx
        .update(invitations)
        .set({ acceptedAt: new Date(), acceptedBy: actor.user.id })
        .where(and(eq(invitations.id, invitation.id), isNull(invitations.acceptedAt)))
        .returning({ id: invitations.id });
      if (!claimed.length) throw invalidInvitation();
      await tx
        .insert(members)
        .values({ organisationId: organisation.id, userId: actor.user.id, role: invitation.role })
        .onConflictDoUpdate({ target: [members.organisationId, members.userId], set: { role: invitation.role } });
      if (userRole !== actor.user.role) await tx.update(users).set({ role: userRole }).where(eq(users.id, actor.user.id));
    });
    await recordAudit(this.db, {
      actorKind: 'user',
      actorId: actor.user.id,
      action: 'organisation.invitation-accepted',
      target: `organisation:${organisation.id}`,
      ip,
      details: { role: invitation.role, userRole },
    });
    return {
      organisation: { id: organisation.id, slug: organisation.slug, name: organisation.name, kind: organisation.kind, role: invitation.role },
      userRole,
    };
  }

  async listForAdmin(query: { q?: string | undefined; kind?: OrganisationKind | undefined; page: number; pageSize: number }): Promise<AdminOrganisationPage> {
    const filters: SQL[] = [];
    if (query.q) {
      const pattern = `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
      filters.push(or(ilike(organisations.name, pattern), ilike(organisations.slug, pattern))!);
    }
    if (query.kind) filters.push(eq(organisations.kind, query.kind));
    const where = filters.length ? and(...filters) : undefined;
    const [rows, [total]] = await Promise.all([
      this.db.select().from(organisations).where(where).orderBy(asc(organisations.name)).limit(query.pageSize).offset((query.page - 1) * query.pageSize),
      this.db.select({ n: count() }).from(organisations).where(where),
    ]);
    const people = rows.length
      ? await this.db
          .select({ organisationId: members.organisationId, userId: users.id, name: users.name, email: users.email, role: members.role })
          .from(members)
          .innerJoin(users, eq(users.id, members.userId))
          .where(inArray(members.organisationId, rows.map((row) => row.id)))
      : [];
    return {
      items: rows.map((row) => {
        const mine = people.filter((p) => p.organisationId === row.id);
        return {
          id: row.id,
          slug: row.slug,
          name: row.name,
          kind: row.kind,
          memberCount: mine.length,
          owners: mine.filter((p) => p.role === 'owner').map((p) => ({ userId: p.userId, name: p.name, email: p.email })),
          createdAt: row.createdAt.toISOString(),
        };
      }),
      total: total?.n ?? 0,
      page: query.page,
      pageSize: query.pageSize,
    };
  }
}

function toInvitation(row: typeof invitations.$inferSelect): Invitation {
  return { id: row.id, email: row.email, role: row.role, invitedBy: row.invitedBy, createdAt: row.createdAt.toISOString(), expiresAt: row.expiresAt.toISOString() };
}
