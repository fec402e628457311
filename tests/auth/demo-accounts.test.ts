import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ConfigError, readConfig } from '../../server/config';
import type { DatabaseHandle } from '../../server/db/database';
import { accounts } from '../../server/db/schema/auth';
import { seedDemoData } from '../../server/db/seed';
import { demoPasswords, seedDemoAccounts } from '../../server/db/seed-demo-accounts';
import { ORIGIN, authApp } from '../helpers/auth-fixture';
import { openTestDatabase } from '../helpers/test-database';

let database: DatabaseHandle;
beforeAll(async () => {
  database = await openTestDatabase();
  await seedDemoData(database.db);
});
afterAll(async () => {
  await database?.close();
});

describe('demo accounts', () => {
  it('have no password until seeded, then sign in with the listed passwords into their roles and organisations', async () => {
    const t = authApp(database);
    const before = await request(t.app).post('/api/auth/sign-in/email').send({ email: 'admin@tallow-ridge.example', password: demoPasswords['admin@tallow-ridge.example'] });
    expect(before.status).toBe(401);

    const first = await seedDemoAccounts(database.db);
    expect(first.created).toBe(3);
    const expectations = [
      ['admin@tallow-ridge.example', 'admin', 'Tallow Ridge Engineering', '/admin'],
      ['engineer@tallow-ridge.example', 'engineer', 'Tallow Ridge Engineering', '/workbench'],
      ['sales@brightwater-rigging.example', 'supplier', 'Brightwater Rigging Supply', '/supplier'],
    ] as const;
    for (const [email, role, organisation, home] of expectations) {
      const res = await request(t.app).post('/api/auth/sign-in/email').set('Origin', ORIGIN).send({ email, password: first.accounts.find((a) => a.email === email)!.password });
      expect(res.status, email).toBe(200);
      expect(res.body.user).toMatchObject({ role, emailVerified: true });
      expect(res.body.organisations.map((o: { name: string }) => o.name)).toEqual([organisation]);
      expect(res.body.home).toBe(home);
    }
  });

  it('seed once: a second run changes nothing, and the stored password is a hash', async () => {
    const again = await seedDemoAccounts(database.db);
    expect(again.created).toBe(0);
    const rows = await database.db.select().from(accounts).where(eq(accounts.userId, 'demo-admin'));
    expect(rows).toHaveLength(1);
    expect(rows[0]!.password).not.toContain(demoPasswords['admin@tallow-ridge.example']);
  });
});

describe('production settings', () => {
  it('refuses to start in production without a secret, a public URL and SMTP, naming each', () => {
    expect(() => readConfig({ NODE_ENV: 'production' })).toThrow(ConfigError);
    expect(() => readConfig({ NODE_ENV: 'production' })).toThrow(/AUTH_SECRET: is required[\s\S]*PUBLIC_URL: is required[\s\S]*SMTP_URL: is required/);
    const ok = readConfig({ NODE_ENV: 'production', AUTH_SECRET: 'x'.repeat(32), PUBLIC_URL: 'https://pinwork.example/', SMTP_URL: 'smtps://mail.example:465' });
    expect(ok).toMatchObject({ mode: 'production', publicUrl: 'https://pinwork.example', smtpUrl: 'smtps://mail.example:465' });
    expect(readConfig({}).mode).toBe('development');
    expect(() => readConfig({ AUTH_SECRET: 'short' })).toThrow(/AUTH_SECRET: must be at least 32 characters/);
  });
});
