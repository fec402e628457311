import { inArray } from 'drizzle-orm';
import type { Database } from './database';
import { demoOrganisations, demoUsers } from './demo-data';
import { users } from './schema/auth';
import { members, organisations } from './schema/organisations';

export interface SeedReport {
  organisations: number;
  users: number;
  members: number;
}

export interface SeedOptions {
  /** The demo people and their memberships; a production start seeds only the organisations. */
  people?: boolean;
}

/**
 * Runs on every start. Each insert is keyed on a unique column and skips rows that exist, so a
 * second run inserts nothing and never overwrites what users have changed since. The demo
 * engineering organisation owns the built-in templates, so organisations are always seeded;
 * the fictional people only where demo accounts exist (development and tests).
 */
export async function seedDemoData(db: Database, options: SeedOptions = {}): Promise<SeedReport> {
  return db.transaction(async (tx) => {
    const insertedOrganisations = await tx
      .insert(organisations)
      .values(demoOrganisations.map((o) => ({ slug: o.slug, name: o.name, kind: o.kind })))
      .onConflictDoNothing({ target: organisations.slug })
      .returning({ id: organisations.id });
    if (options.people === false) return { organisations: insertedOrganisations.length, users: 0, members: 0 };

    const insertedUsers = await tx
      .insert(users)
      .values(demoUsers.map((u) => ({ id: u.id, name: u.name, email: u.email, role: u.role })))
      .onConflictDoNothing()
      .returning({ id: users.id });

    const organisationRows = await tx
      .select({ id: organisations.id, slug: organisations.slug })
      .from(organisations)
      .where(inArray(organisations.slug, demoOrganisations.map((o) => o.slug)));
    const organisationIdBySlug = new Map(organisationRows.map((row) => [row.slug, row.id]));
    const userRows = await tx
      .select({ id: users.id, email: users.email })
      .from(users)
      .where(inArray(users.email, demoUsers.map((u) => u.email)));
    const userIdByEmail = new Map(userRows.map((row) => [row.email, row.id]));

    const membershipRows = demoUsers.flatMap((user) =>
      user.memberOf.flatMap((membership) => {
        const organisationId = organisationIdBySlug.get(membership.organisationSlug);
        const userId = userIdByEmail.get(user.email);
        return organisationId && userId ? [{ organisationId, userId, role: membership.role }] : [];
      }),
    );
    const insertedMembers = membershipRows.length
      ? await tx
          .insert(members)
          .values(membershipRows)
          .onConflictDoNothing({ target: [members.organisationId, members.userId] })
          .returning({ id: members.id })
      : [];

    return {
      organisations: insertedOrganisations.length,
      users: insertedUsers.length,
      members: insertedMembers.length,
    };
  });
}
