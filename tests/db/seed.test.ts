import { count, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Database, DatabaseHandle } from '../../server/db/database';
import { demoOrganisations, demoUsers } from '../../server/db/demo-data';
import { users } from '../../server/db/schema/auth';
import { members, organisations } from '../../server/db/schema/organisations';
import { seedDemoData } from '../../server/db/seed';
import { openTestDatabase } from '../helpers/test-database';

let handle: DatabaseHandle;
let db: Database;
beforeAll(async () => {
  handle = await openTestDatabase();
  db = handle.db;
});
afterAll(async () => {
  await handle?.close();
});

async function counts() {
  const [u] = await db.select({ n: count() }).from(users);
  const [o] = await db.select({ n: count() }).from(organisations);
  const [m] = await db.select({ n: count() }).from(members);
  return { users: u!.n, organisations: o!.n, members: m!.n };
}

describe('demo seed', () => {
  it('inserts the demo data once, and a second run inserts nothing', async () => {
    const before = await counts();
    const first = await seedDemoData(db);
    const afterFirst = await counts();
    const memberships = demoUsers.reduce((n, u) => n + u.memberOf.length, 0);
    expect(first).toEqual({ organisations: demoOrganisations.length, users: demoUsers.length, members: memberships });
    expect(afterFirst).toEqual({
      users: before.users + demoUsers.length,
      organisations: before.organisations + demoOrganisations.length,
      members: before.members + memberships,
    });

    const second = await seedDemoData(db);
    expect(second).toEqual({ organisations: 0, users: 0, members: 0 });
    expect(await counts()).toEqual(afterFirst);
  });

  it('links each demo user to their organisation with the intended role', async () => {
    await seedDemoData(db);
    const rows = await db
      .select({ email: users.email, role: users.role, org: organisations.slug, memberRole: members.role })
      .from(members)
      .innerJoin(users, eq(users.id, members.userId))
      .innerJoin(organisations, eq(organisations.id, members.organisationId));
    for (const user of demoUsers) {
      for (const membership of user.memberOf) {
        expect(rows).toContainEqual({
          email: user.email,
          role: user.role,
          org: membership.organisationSlug,
          memberRole: membership.role,
        });
      }
    }
  });

  it('does not overwrite a demo row someone has since changed', async () => {
    await seedDemoData(db);
    const admin = demoUsers.find((u) => u.role === 'admin')!;
    await db.update(users).set({ name: 'Renamed by the admin' }).where(eq(users.email, admin.email));
    await seedDemoData(db);
    const [row] = await db.select({ name: users.name }).from(users).where(eq(users.email, admin.email));
    expect(row?.name).toBe('Renamed by the admin');
  });

  it('seeds only the organisations when asked for no people, as a production start does', async () => {
    const fresh = await openTestDatabase();
    try {
      const report = await seedDemoData(fresh.db, { people: false });
      expect(report).toEqual({ organisations: demoOrganisations.length, users: 0, members: 0 });
      const emails = (await fresh.db.select({ email: users.email }).from(users)).map((r) => r.email);
      for (const person of demoUsers) expect(emails).not.toContain(person.email);
      const slugs = (await fresh.db.select({ slug: organisations.slug }).from(organisations)).map((r) => r.slug);
      for (const organisation of demoOrganisations) expect(slugs).toContain(organisation.slug);
    } finally {
      await fresh.close();
    }
  });
});

