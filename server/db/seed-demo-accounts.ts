import { randomUUID } from 'node:crypto';
import { hashPassword } from 'better-auth/crypto';
import { and, eq, inArray } from 'drizzle-orm';
import type { Database } from './database';
import { demoUsers } from './demo-data';
import { accounts, users } from './schema/auth';

// Development only (start-server checks the mode): printed at start and listed in README.md.
// These open nothing real: the addresses are .example ones and production never seeds them.
export const demoPasswords: Readonly<Record<string, string>> = {
  'admin@tallow-ridge.example': 'okafor-admin-demo',
  'engineer@tallow-ridge.example': 'lindqvist-engineer-demo',
  'sales@brightwater-rigging.example': 'castellane-supplier-demo',
};

export interface DemoAccount {
  name: string;
  email: string;
  role: string;
  password: string;
}

/**
 * Gives each demo user a password (hashed by the auth library's own hasher) and a confirmed
 * address, once: a demo user who already has a password keeps it.
 */
export async function seedDemoAccounts(db: Database): Promise<{ created: number; accounts: DemoAccount[] }> {
  const rows = await db
    .select({ id: users.id, email: users.email, name: users.name, role: users.role })
    .from(users)
    .where(inArray(users.email, demoUsers.map((u) => u.email)));
  let created = 0;
  for (const user of rows) {
    const password = demoPasswords[user.email];
    if (!password) continue;
    const [existing] = await db
      .select({ id: accounts.id })
      .from(accounts)
      .where(and(eq(accounts.userId, user.id), eq(accounts.providerId, 'credential')));
    if (existing) continue;
    await db.insert(accounts).values({ id: randomUUID(), accountId: user.id, providerId: 'credential', userId: user.id, password: await hashPassword(password) });
    await db.update(users).set({ emailVerified: true }).where(eq(users.id, user.id));
    created += 1;
  }
  return {
    created,
    accounts: demoUsers.map((u) => ({ name: u.name, email: u.email, role: u.role, password: demoPasswords[u.email] ?? '' })),
  };
}
