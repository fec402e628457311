import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { adminOrganisationPageSchema, adminUserPageSchema, adminUserSchema, auditPageSchema } from '../../shared/api/auth';
import type { DatabaseHandle } from '../../server/db/database';
import { sessions, users } from '../../server/db/schema/auth';
import { seedDemoData } from '../../server/db/seed';
import { csvCell } from '../../server/services/audit-log';
import { GOOD_PASSWORD, ORIGIN, authApp, setRole, signUpVerified, signedInAgent, uniqueEmail, type AuthTestApp } from '../helpers/auth-fixture';
import { openTestDatabase } from '../helpers/test-database';

let database: DatabaseHandle;
let t: AuthTestApp;
let admin: ReturnType<typeof request.agent>;
let adminId: string;

beforeAll(async () => {
  database = await openTestDatabase();
  await seedDemoData(database.db);
  t = authApp(database);
  const email = uniqueEmail('admin');
  adminId = await signUpVerified(t, database, email, 'Ada Admin');
  await setRole(database, adminId, 'admin');
  admin = await signedInAgent(t, email);
}, 60_000);
afterAll(async () => {
  await database?.close();
});

describe('admin users', () => {
  it('searches by name or e-mail, filters by role, sorts and pages with a total', async () => {
    const tag = `zephyr${Date.now().toString(36)}`;
    const names = ['Bo Zephyr', 'Al Zephyr', 'Cy Zephyr'];
    for (const name of names) await signUpVerified(t, database, `${tag}-${name.split(' ')[0]!.toLowerCase()}@example.com`, name);
    const page1 = await admin.get('/api/admin/users').query({ q: tag, sort: 'name', order: 'asc', pageSize: 2 });
    expect(page1.status).toBe(200);
    const p1 = adminUserPageSchema.parse(page1.body);
    expect(p1.total).toBe(3);
    expect(p1.items.map((u) => u.name)).toEqual(['Al Zephyr', 'Bo Zephyr']);
    const page2 = adminUserPageSchema.parse((await admin.get('/api/admin/users').query({ q: tag, sort: 'name', order: 'asc', pageSize: 2, page: 2 })).body);
    expect(page2.items.map((u) => u.name)).toEqual(['Cy Zephyr']);
    const byName = adminUserPageSchema.parse((await admin.get('/api/admin/users').query({ q: 'Al Zeph' })).body);
    expect(byName.items.map((u) => u.name)).toEqual(['Al Zephyr']);

    const suppliers = adminUserPageSchema.parse((await admin.get('/api/admin/users').query({ role: 'supplier' })).body);
    expect(suppliers.items.length).toBeGreaterThan(0);
    expect(suppliers.items.every((u) => u.role === 'supplier')).toBe(true);
    expect(suppliers.items.find((u) => u.email === 'sales@brightwater-rigging.example')?.organisations[0]?.name).toBe('Brightwater Rigging Supply');
  });

  it('names bad query fields', async () => {
    const res = await admin.get('/api/admin/users').query({ role: 'wizard', pageSize: 500, sort: 'age' });
    expect(res.status).toBe(422);
    expect(res.body.errors.map((e: { path: string }) => e.path).sort()).toEqual(['/pageSize', '/role', '/sort']);
  });

  it('changes a role (audited), which the user sees at once', async () => {
    const email = uniqueEmail('promote');
    const id = await signUpVerified(t, database, email);
    const user = await signedInAgent(t, email);
    const res = await admin.patch(`/api/admin/users/${id}/role`).set('Origin', ORIGIN).send({ role: 'engineer' });
    expect(res.status).toBe(200);
    expect(adminUserSchema.parse(res.body).role).toBe('engineer');
    const me = await user.get('/api/me');
    expect(me.body.user.role).toBe('engineer');
    expect(me.body.capabilities).toContain('templates:author');
    const audit = auditPageSchema.parse((await admin.get('/api/admin/audit').query({ action: 'user.role-changed', target: `user:${id}` })).body);
    expect(audit.items[0]).toMatchObject({ actorId: adminId, details: { from: 'user', to: 'engineer' } });

    const bad = await admin.patch(`/api/admin/users/${id}/role`).set('Origin', ORIGIN).send({ role: 'overlord' });
    expect(bad.status).toBe(422);
    expect(bad.body.errors[0].path).toBe('/role');
    const self = await admin.patch(`/api/admin/users/${adminId}/role`).set('Origin', ORIGIN).send({ role: 'user' });
    expect(self.status).toBe(409);
    const missing = await admin.patch('/api/admin/users/nobody-here/role').set('Origin', ORIGIN).send({ role: 'user' });
    expect(missing.status).toBe(404);
  });

  it('disables a user: sessions end at once, sign-in is refused only after a right password, enabling lets them back', async () => {
    const email = uniqueEmail('disable');
    const id = await signUpVerified(t, database, email);
    const user = await signedInAgent(t, email);
    const res = await admin.post(`/api/admin/users/${id}/disable`).set('Origin', ORIGIN).send({ reason: 'left the company' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ disabled: true, disabledReason: 'left the company' });
    expect((await user.get('/api/me')).status).toBe(401);
    expect(await database.db.select().from(sessions).where(eq(sessions.userId, id))).toHaveLength(0);

    const right = await request(t.app).post('/api/auth/sign-in/email').send({ email, password: GOOD_PASSWORD });
    expect(right.status).toBe(403);
    expect(right.body.type).toBe('/problems/account-disabled');
    const wrong = await request(t.app).post('/api/auth/sign-in/email').send({ email, password: 'wrong-password-99' });
    expect(wrong.status).toBe(401);
    expect(wrong.body.type).toBe('/problems/sign-in-failed');

    const enabled = await admin.post(`/api/admin/users/${id}/enable`).set('Origin', ORIGIN).send({});
    expect(enabled.body.disabled).toBe(false);
    expect((await request(t.app).post('/api/auth/sign-in/email').send({ email, password: GOOD_PASSWORD })).status).toBe(200);
    expect((await admin.post(`/api/admin/users/${adminId}/disable`).set('Origin', ORIGIN).send({})).status).toBe(409);
    const [row] = await database.db.select().from(users).where(eq(users.id, adminId));
    expect(row!.banned).toBe(false);
  });
});

describe('admin organisations and audit log', () => {
  it('lists organisations with member counts and owners', async () => {
    const res = await admin.get('/api/admin/organisations').query({ kind: 'supplier' });
    const page = adminOrganisationPageSchema.parse(res.body);
    const brightwater = page.items.find((o) => o.slug === 'brightwater-rigging-supply');
    expect(brightwater).toMatchObject({ kind: 'supplier', memberCount: 1 });
    expect(brightwater!.owners.map((o) => o.email)).toEqual(['sales@brightwater-rigging.example']);
    expect(page.items.every((o) => o.kind === 'supplier')).toBe(true);
  });

  it('filters by action prefix and actor, and exports the same rows as CSV with formula cells defused', async () => {
    const email = uniqueEmail('audit');
    await signUpVerified(t, database, email, '=HYPERLINK("x")');
    await request(t.app).post('/api/auth/sign-in/email').send({ email, password: 'wrong-password-99' });
    const failed = auditPageSchema.parse((await admin.get('/api/admin/audit').query({ action: 'auth.sign-in-failed', target: `email:${email}` })).body);
    expect(failed.total).toBe(1);
    expect(failed.items[0]!.ip).toBeTruthy();
    const authOnly = auditPageSchema.parse((await admin.get('/api/admin/audit').query({ action: 'auth.', pageSize: 100 })).body);
    expect(authOnly.items.every((e) => e.action.startsWith('auth.'))).toBe(true);
    const mine = auditPageSchema.parse((await admin.get('/api/admin/audit').query({ actor: email })).body);
    expect(mine.items.map((e) => e.action)).toContain('auth.sign-up');

    const csv = await admin.get('/api/admin/audit.csv').query({ actor: email });
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    expect(csv.headers['content-disposition']).toMatch(/attachment; filename="pinwork-audit-/);
    const lines = csv.text.trim().split('\r\n');
    expect(lines[0]).toBe('at,actor_kind,actor_id,actor_email,action,target,ip,details');
    expect(lines).toHaveLength(mine.total + 1);
    expect(csv.text).toContain(email);

    expect(csvCell('=HYPERLINK("x")')).toBe(`"'=HYPERLINK(""x"")"`);
    expect(csvCell('plain')).toBe('plain');

    const range = await admin.get('/api/admin/audit').query({ from: 'yesterday' });
    expect(range.status).toBe(422);
    expect(range.body.errors[0].path).toBe('/from');
  });
});
