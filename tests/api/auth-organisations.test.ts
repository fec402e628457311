import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { memberListSchema } from '../../shared/api/auth';
import type { DatabaseHandle } from '../../server/db/database';
import { invitations } from '../../server/db/schema/invitations';
import { members, organisations } from '../../server/db/schema/organisations';
import { seedDemoData } from '../../server/db/seed';
import { ORIGIN, authApp, lastMail, setRole, signUpVerified, signedInAgent, tokenFromText, uniqueEmail, type AuthTestApp } from '../helpers/auth-fixture';
import { openTestDatabase } from '../helpers/test-database';

let database: DatabaseHandle;
let t: AuthTestApp;
let orgId: string;
let owner: ReturnType<typeof request.agent>;

beforeAll(async () => {
  database = await openTestDatabase();
  await seedDemoData(database.db);
  t = authApp(database);
  const [org] = await database.db.select().from(organisations).where(eq(organisations.slug, 'brightwater-rigging-supply'));
  orgId = org!.id;
  const email = uniqueEmail('owner');
  const id = await signUpVerified(t, database, email, 'Oona Owner');
  await setRole(database, id, 'supplier');
  await database.db.insert(members).values({ organisationId: orgId, userId: id, role: 'owner' });
  owner = await signedInAgent(t, email);
}, 60_000);
afterAll(async () => {
  await database?.close();
});

async function invite(email: string) {
  const res = await owner.post(`/api/organisations/${orgId}/invitations`).set('Origin', ORIGIN).send({ email });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return tokenFromText((await lastMail(database, email, 'invitation'))!.text, '/invitations/accept');
}

describe('invitations', () => {
  it('invites by e-mail; the invitee previews, accepts once, becomes a supplier member; the link is spent', async () => {
    const email = uniqueEmail('invitee');
    const token = await invite(email);
    const preview = await request(t.app).get('/api/invitations/preview').query({ token });
    expect(preview.body).toMatchObject({ organisation: { name: 'Brightwater Rigging Supply', kind: 'supplier' }, email, role: 'member' });

    await signUpVerified(t, database, email, 'Ivo Invitee');
    const invitee = await signedInAgent(t, email);
    const accepted = await invitee.post('/api/invitations/accept').set('Origin', ORIGIN).send({ token });
    expect(accepted.status).toBe(200);
    expect(accepted.body).toMatchObject({ organisation: { id: orgId, role: 'member' }, userRole: 'supplier' });
    const me = await invitee.get('/api/me');
    expect(me.body.user.role).toBe('supplier');
    expect(me.body.organisations.map((o: { id: string }) => o.id)).toEqual([orgId]);

    const list = memberListSchema.parse((await owner.get(`/api/organisations/${orgId}/members`)).body);
    expect(list.items.map((m) => m.email)).toContain(email);

    const again = await invitee.post('/api/invitations/accept').set('Origin', ORIGIN).send({ token });
    expect(again.status).toBe(400);
    expect(again.body.type).toBe('/problems/invalid-link');
    expect((await request(t.app).get('/api/invitations/preview').query({ token })).status).toBe(400);

    const dup = await owner.post(`/api/organisations/${orgId}/invitations`).set('Origin', ORIGIN).send({ email });
    expect(dup.status).toBe(409);
  });

  it('refuses an expired invitation and one for another address', async () => {
    const email = uniqueEmail('late');
    const token = await invite(email);
    const before = await database.db.select().from(members).where(eq(members.organisationId, orgId));
    await signUpVerified(t, database, email);
    const other = uniqueEmail('other');
    await signUpVerified(t, database, other);
    const wrongPerson = await (await signedInAgent(t, other)).post('/api/invitations/accept').set('Origin', ORIGIN).send({ token });
    expect(wrongPerson.status).toBe(403);

    await database.db.update(invitations).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(invitations.email, email));
    const late = await (await signedInAgent(t, email)).post('/api/invitations/accept').set('Origin', ORIGIN).send({ token });
    expect(late.status).toBe(400);
    expect(late.body.type).toBe('/problems/invalid-link');
    expect(await database.db.select().from(members).where(eq(members.organisationId, orgId))).toHaveLength(before.length);
  });

  it('withdraws an open invitation, names bad input, and keeps the last owner', async () => {
    const email = uniqueEmail('withdrawn');
    const token = await invite(email);
    const open = memberListSchema.parse((await owner.get(`/api/organisations/${orgId}/members`)).body).invitations.find((i) => i.email === email)!;
    expect((await owner.delete(`/api/organisations/${orgId}/invitations/${open.id}`).set('Origin', ORIGIN)).status).toBe(204);
    expect((await request(t.app).get('/api/invitations/preview').query({ token })).status).toBe(400);

    const bad = await owner.post(`/api/organisations/${orgId}/invitations`).set('Origin', ORIGIN).send({ email: 'nope', role: 'boss' });
    expect(bad.status).toBe(422);
    expect(bad.body.errors.map((e: { path: string }) => e.path).sort()).toEqual(['/email', '/role']);

    const me = await owner.get('/api/me');
    const owners = memberListSchema.parse((await owner.get(`/api/organisations/${orgId}/members`)).body).items.filter((m) => m.role === 'owner');
    for (const other of owners.filter((o) => o.userId !== me.body.user.id)) {
      expect((await owner.delete(`/api/organisations/${orgId}/members/${other.userId}`).set('Origin', ORIGIN)).status).toBe(204);
    }
    const last = await owner.delete(`/api/organisations/${orgId}/members/${me.body.user.id}`).set('Origin', ORIGIN);
    expect(last.status).toBe(409);
  });
});
