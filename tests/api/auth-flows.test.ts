import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mailAcceptedResponseSchema, meResponseSchema, signUpResponseSchema } from '../../shared/api/auth';
import { problemSchema } from '../../shared/api/problem';
import type { DatabaseHandle } from '../../server/db/database';
import { accounts, sessions, users, verifications } from '../../server/db/schema/auth';
import { mailQueue } from '../../server/db/schema/mail';
import { auditLog } from '../../server/db/schema/audit';
import {
  GOOD_PASSWORD,
  ORIGIN,
  authApp,
  lastMail,
  signUpVerified,
  signedInAgent,
  tokenFromText,
  uniqueEmail,
  type AuthTestApp,
} from '../helpers/auth-fixture';
import { openTestDatabase } from '../helpers/test-database';

let database: DatabaseHandle;
let t: AuthTestApp;
beforeAll(async () => {
  database = await openTestDatabase();
  t = authApp(database);
});
afterAll(async () => {
  await database?.close();
});

const problem = (body: unknown) => problemSchema.parse(body);

describe('sign-up', () => {
  it('creates an unverified user, stores only a hash and queues a verification mail with both parts', async () => {
    const email = uniqueEmail('signup');
    const res = await request(t.app).post('/api/auth/sign-up/email').send({ name: 'Ines Marlow', email, password: GOOD_PASSWORD });
    expect(res.status).toBe(200);
    expect(signUpResponseSchema.parse(res.body)).toEqual({ status: 'verification-sent', email });
    expect(res.headers['set-cookie']).toBeUndefined();
    const [user] = await database.db.select().from(users).where(eq(users.email, email));
    expect(user).toMatchObject({ name: 'Ines Marlow', emailVerified: false, role: 'user' });
    const [account] = await database.db.select().from(accounts).where(eq(accounts.userId, user!.id));
    expect(account!.password).toBeTruthy();
    expect(account!.password).not.toContain(GOOD_PASSWORD);
    const mail = await lastMail(database, email, 'verify-email');
    expect(mail!.subject).toMatch(/confirm/i);
    expect(mail!.html).toContain('<a href="http://pinwork.test/verify-email?token=');
    expect(mail!.html).not.toMatch(/<img|https?:\/\/(?!pinwork\.test)/);
    expect(tokenFromText(mail!.text, '/verify-email').length).toBeGreaterThan(20);
  });

  it('answers a duplicate sign-up exactly like a new one and mails the owner instead of making a second user', async () => {
    const email = uniqueEmail('dup');
    await signUpVerified(t, database, email, 'First Owner');
    const again = await request(t.app).post('/api/auth/sign-up/email').send({ name: 'Someone Else', email, password: 'another-long-phrase-9' });
    expect(again.status).toBe(200);
    expect(again.body).toEqual({ status: 'verification-sent', email });
    const rows = await database.db.select().from(users).where(eq(users.email, email));
    expect(rows).toHaveLength(1);
    expect(rows[0]!.name).toBe('First Owner');
    const notice = await lastMail(database, email, 'already-registered');
    expect(notice!.text).toContain('already has an account');
  });

  it.each([
    [{ name: 'A', email: 'not-an-address', password: GOOD_PASSWORD }, '/email', /e-mail address/],
    [{ name: 'A', email: uniqueEmail(), password: 'short' }, '/password', /at least 10/],
    [{ name: 'A', email: uniqueEmail(), password: 'aaaaaaaaaaaa' }, '/password', /5 different/],
    [{ name: 'A', email: uniqueEmail(), password: 'password1234' }, '/password', /common/],
    [{ name: 'A', email: 'gantrybuilder@example.com', password: 'my-gantrybuilder-pw' }, '/password', /e-mail/],
    [{ email: uniqueEmail(), password: GOOD_PASSWORD }, '/name', /required/],
    [{ name: 'A', email: uniqueEmail(), password: 'x'.repeat(129) }, '/password', /at most 128/],
  ])('refuses %j with a 422 naming %s', async (body, path, message) => {
    const res = await request(t.app).post('/api/auth/sign-up/email').send(body);
    expect(res.status).toBe(422);
    expect(res.headers['content-type']).toMatch(/problem\+json/);
    const p = problem(res.body);
    const field = p.errors?.find((e) => e.path === path);
    expect(field, JSON.stringify(p.errors)).toBeDefined();
    expect(field!.message).toMatch(message);
  });

  it('answers malformed JSON with a 400 problem', async () => {
    const res = await request(t.app).post('/api/auth/sign-up/email').set('Content-Type', 'application/json').send('{"name":');
    expect(res.status).toBe(400);
    expect(problem(res.body).type).toBe('/problems/malformed-json');
  });
});

describe('e-mail verification', () => {
  it('refuses sign-in before the address is confirmed, then accepts it after the link', async () => {
    const email = uniqueEmail('verify');
    await request(t.app).post('/api/auth/sign-up/email').send({ name: 'Vera Pohl', email, password: GOOD_PASSWORD });
    const early = await request(t.app).post('/api/auth/sign-in/email').send({ email, password: GOOD_PASSWORD });
    expect(early.status).toBe(403);
    expect(problem(early.body).type).toBe('/problems/email-not-verified');

    const token = tokenFromText((await lastMail(database, email, 'verify-email'))!.text, '/verify-email');
    const verified = await request(t.app).get('/api/auth/verify-email').query({ token });
    expect(verified.status).toBe(200);
    expect(verified.body).toEqual({ status: 'verified', email });
    const [user] = await database.db.select().from(users).where(eq(users.email, email));
    expect(user!.emailVerified).toBe(true);
    const signIn = await request(t.app).post('/api/auth/sign-in/email').set('Origin', ORIGIN).send({ email, password: GOOD_PASSWORD });
    expect(signIn.status).toBe(200);
    // The same link a second time is used up, and the confirmation is in the audit log once.
    const again = await request(t.app).get('/api/auth/verify-email').query({ token });
    expect(again.status).toBe(400);
    expect(problem(again.body).type).toBe('/problems/invalid-link');
    const entries = await database.db.select().from(auditLog).where(eq(auditLog.action, 'auth.email-verified'));
    expect(entries.filter((e) => e.actorId === user!.id)).toHaveLength(1);
  });

  it('refuses a spoilt token and an expired one as an invalid link', async () => {
    const email = uniqueEmail('expire');
    const short = authApp(database, { verificationExpiresIn: 1 });
    await request(short.app).post('/api/auth/sign-up/email').send({ name: 'Ed Short', email, password: GOOD_PASSWORD });
    const token = tokenFromText((await lastMail(database, email, 'verify-email'))!.text, '/verify-email');
    const spoilt = await request(short.app).get('/api/auth/verify-email').query({ token: `${token.slice(0, -3)}abc` });
    expect(spoilt.status).toBe(400);
    expect(problem(spoilt.body).type).toBe('/problems/invalid-link');
    await new Promise((resolve) => setTimeout(resolve, 2100));
    const expired = await request(short.app).get('/api/auth/verify-email').query({ token });
    expect(expired.status).toBe(400);
    expect(problem(expired.body).type).toBe('/problems/invalid-link');
    const [user] = await database.db.select().from(users).where(eq(users.email, email));
    expect(user!.emailVerified).toBe(false);
  });

  it('sends a new link on request for an unverified account, and answers the same for unknown addresses', async () => {
    const email = uniqueEmail('resend');
    await request(t.app).post('/api/auth/sign-up/email').send({ name: 'Rae Send', email, password: GOOD_PASSWORD });
    const before = await database.db.select().from(mailQueue).where(eq(mailQueue.to, email));
    const known = await request(t.app).post('/api/auth/send-verification-email').send({ email });
    const unknown = await request(t.app).post('/api/auth/send-verification-email').send({ email: uniqueEmail('nobody') });
    expect(known.status).toBe(200);
    expect(unknown.status).toBe(200);
    expect(mailAcceptedResponseSchema.parse(known.body)).toEqual(unknown.body);
    const after = await database.db.select().from(mailQueue).where(eq(mailQueue.to, email));
    expect(after.length).toBe(before.length + 1);
  });
});

describe('sign-in and sign-out', () => {
  it('signs in with an httpOnly SameSite cookie, answers me, records the sign-in, and signs out', async () => {
    const email = uniqueEmail('signin');
    const userId = await signUpVerified(t, database, email, 'Sol Anders');
    const agent = request.agent(t.app);
    const res = await agent.post('/api/auth/sign-in/email').set('Origin', ORIGIN).send({ email: email.toUpperCase(), password: GOOD_PASSWORD });
    expect(res.status).toBe(200);
    const me = meResponseSchema.parse(res.body);
    expect(me.user).toMatchObject({ id: userId, email, role: 'user', emailVerified: true });
    const cookie = (res.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith('pinwork.session_token='));
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie).not.toMatch(/Secure/); // not in test mode; production is checked below

    const again = await agent.get('/api/me');
    expect(again.status).toBe(200);
    expect(again.body.user.id).toBe(userId);
    const audit = await database.db.select().from(auditLog).where(eq(auditLog.actorId, userId));
    expect(audit.map((a) => a.action)).toContain('auth.sign-in');

    const out = await agent.post('/api/auth/sign-out').set('Origin', ORIGIN).send({});
    expect(out.status).toBe(200);
    expect((await agent.get('/api/me')).status).toBe(401);
    expect(await database.db.select().from(sessions).where(eq(sessions.userId, userId))).toHaveLength(0);
  });

  it('gives one generic answer for a wrong password and an unknown address, and records both failures', async () => {
    const email = uniqueEmail('generic');
    await signUpVerified(t, database, email);
    const wrong = await request(t.app).post('/api/auth/sign-in/email').send({ email, password: 'not-the-password-1' });
    const unknownEmail = uniqueEmail('ghost');
    const unknown = await request(t.app).post('/api/auth/sign-in/email').send({ email: unknownEmail, password: 'not-the-password-1' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    const strip = (body: Record<string, unknown>) => ({ ...body, instance: undefined });
    expect(strip(wrong.body)).toEqual(strip(unknown.body));
    expect(wrong.body.type).toBe('/problems/sign-in-failed');
    const failures = await database.db.select().from(auditLog).where(eq(auditLog.action, 'auth.sign-in-failed'));
    expect(failures.map((f) => f.target)).toEqual(expect.arrayContaining([`email:${email}`, `email:${unknownEmail}`]));
  });

  it('refuses a sign-in body with missing fields by name', async () => {
    const res = await request(t.app).post('/api/auth/sign-in/email').send({ email: 'a@example.com' });
    expect(res.status).toBe(422);
    expect(problem(res.body).errors).toEqual([{ path: '/password', message: 'is required' }]);
  });

  it('refuses a cookie-carrying sign-out from a foreign origin', async () => {
    const email = uniqueEmail('csrf');
    await signUpVerified(t, database, email);
    const agent = await signedInAgent(t, email);
    const res = await agent.post('/api/auth/sign-out').set('Origin', 'https://evil.example').send({});
    expect(res.status).toBe(403);
    expect(problem(res.body).type).toBe('/problems/cross-origin');
    expect((await agent.get('/api/me')).status).toBe(200);
  });

  it('does not expose library endpoints that are not part of the contract', async () => {
    const res = await request(t.app).get('/api/auth/list-sessions');
    expect(res.status).toBe(404);
    expect(problem(res.body).status).toBe(404);
    const adminCall = await request(t.app).post('/api/auth/admin/set-role').send({ userId: 'x', role: 'admin' });
    expect(adminCall.status).toBe(404);
  });
});

describe('password reset', () => {
  async function requestReset(email: string) {
    const res = await request(t.app).post('/api/auth/request-password-reset').send({ email });
    expect(res.status).toBe(200);
    return res.body;
  }

  it('answers the same for known and unknown addresses and mails only the known one', async () => {
    const email = uniqueEmail('reset-known');
    await signUpVerified(t, database, email);
    const ghost = uniqueEmail('reset-ghost');
    expect(await requestReset(email)).toEqual(await requestReset(ghost));
    expect(await lastMail(database, email, 'reset-password')).not.toBeNull();
    expect(await database.db.select().from(mailQueue).where(eq(mailQueue.to, ghost))).toHaveLength(0);
  });

  it('changes the password through the link once, ends every session, and refuses the link a second time', async () => {
    const email = uniqueEmail('reset');
    const userId = await signUpVerified(t, database, email);
    const agent = await signedInAgent(t, email);
    await requestReset(email);
    const token = tokenFromText((await lastMail(database, email, 'reset-password'))!.text, '/reset-password');

    const weak = await request(t.app).post('/api/auth/reset-password').send({ token, newPassword: 'short' });
    expect(weak.status).toBe(422);
    expect(problem(weak.body).errors?.[0]?.path).toBe('/newPassword');

    const done = await request(t.app).post('/api/auth/reset-password').send({ token, newPassword: 'fresh-jib-arm-2031' });
    expect(done.status).toBe(200);
    expect(done.body).toEqual({ status: 'password-changed' });
    expect((await agent.get('/api/me')).status).toBe(401);
    expect(await database.db.select().from(sessions).where(eq(sessions.userId, userId))).toHaveLength(0);

    const reused = await request(t.app).post('/api/auth/reset-password').send({ token, newPassword: 'another-jib-arm-2032' });
    expect(reused.status).toBe(400);
    expect(problem(reused.body).type).toBe('/problems/invalid-link');

    expect((await request(t.app).post('/api/auth/sign-in/email').send({ email, password: GOOD_PASSWORD })).status).toBe(401);
    expect((await request(t.app).post('/api/auth/sign-in/email').send({ email, password: 'fresh-jib-arm-2031' })).status).toBe(200);
  });

  it('refuses an expired reset link', async () => {
    const email = uniqueEmail('reset-expired');
    await signUpVerified(t, database, email);
    await requestReset(email);
    const token = tokenFromText((await lastMail(database, email, 'reset-password'))!.text, '/reset-password');
    await database.db.update(verifications).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(verifications.identifier, `reset-password:${token}`));
    const res = await request(t.app).post('/api/auth/reset-password').send({ token, newPassword: 'fresh-jib-arm-2031' });
    expect(res.status).toBe(400);
    expect(problem(res.body).type).toBe('/problems/invalid-link');
  });
});

describe('changing the password while signed in', () => {
  const change = (agent: ReturnType<typeof request.agent>, body: object) => agent.post('/api/auth/change-password').set('Origin', ORIGIN).send(body);

  it('refuses a wrong current password and a weak new one beside their fields, and records the failure', async () => {
    const email = uniqueEmail('change-refused');
    const userId = await signUpVerified(t, database, email);
    const agent = await signedInAgent(t, email);

    const wrong = await change(agent, { currentPassword: 'not-the-password-1', newPassword: 'lifting-beam-5523' });
    expect(wrong.status).toBe(422);
    expect(problem(wrong.body).errors).toEqual([{ path: '/currentPassword', message: 'is not right' }]);

    const weak = await change(agent, { currentPassword: GOOD_PASSWORD, newPassword: 'short' });
    expect(weak.status).toBe(422);
    expect(problem(weak.body).errors?.map((e) => e.path)).toContain('/newPassword');

    // The e-mail's local part inside the new password is refused as at sign-up.
    const local = email.split('@')[0]!;
    const withAddress = await change(agent, { currentPassword: GOOD_PASSWORD, newPassword: `${local}-xyz` });
    expect(withAddress.status).toBe(422);
    expect(problem(withAddress.body).errors).toEqual([{ path: '/newPassword', message: 'must not contain your e-mail address' }]);

    const same = await change(agent, { currentPassword: GOOD_PASSWORD, newPassword: GOOD_PASSWORD });
    expect(same.status).toBe(422);
    expect(problem(same.body).errors?.[0]?.path).toBe('/newPassword');

    const failures = await database.db.select().from(auditLog).where(eq(auditLog.actorId, userId));
    expect(failures.map((row) => row.action)).toContain('auth.password-change-failed');
    expect((await request(t.app).post('/api/auth/sign-in/email').send({ email, password: GOOD_PASSWORD })).status).toBe(200);
  });

  it('changes the password, signs out the other sessions but keeps this browser signed in, and records it', async () => {
    const email = uniqueEmail('change');
    const userId = await signUpVerified(t, database, email);
    const laptop = await signedInAgent(t, email);
    const phone = await signedInAgent(t, email);

    const done = await change(laptop, { currentPassword: GOOD_PASSWORD, newPassword: 'fresh-boom-pin-4410' });
    expect(done.status, JSON.stringify(done.body)).toBe(200);
    expect(done.body).toEqual({ status: 'password-changed', otherSessionsSignedOut: true });
    expect((await laptop.get('/api/me')).status).toBe(200);
    expect((await phone.get('/api/me')).status).toBe(401);
    expect(await database.db.select().from(sessions).where(eq(sessions.userId, userId))).toHaveLength(1);

    expect((await request(t.app).post('/api/auth/sign-in/email').send({ email, password: GOOD_PASSWORD })).status).toBe(401);
    expect((await request(t.app).post('/api/auth/sign-in/email').send({ email, password: 'fresh-boom-pin-4410' })).status).toBe(200);
    const audit = await database.db.select().from(auditLog).where(eq(auditLog.actorId, userId));
    expect(audit.map((row) => row.action)).toContain('auth.password-changed');
  });

  it('keeps the other sessions when asked to', async () => {
    const email = uniqueEmail('change-keep');
    await signUpVerified(t, database, email);
    const laptop = await signedInAgent(t, email);
    const phone = await signedInAgent(t, email);
    const done = await change(laptop, { currentPassword: GOOD_PASSWORD, newPassword: 'fresh-boom-pin-4411', signOutOtherSessions: false });
    expect(done.body).toEqual({ status: 'password-changed', otherSessionsSignedOut: false });
    expect((await phone.get('/api/me')).status).toBe(200);
    expect((await laptop.get('/api/me')).status).toBe(200);
  });

  it('asks a visitor without a session to sign in, and refuses a foreign origin', async () => {
    const anonymous = await request(t.app).post('/api/auth/change-password').set('Origin', ORIGIN).send({ currentPassword: 'x', newPassword: 'fresh-boom-pin-4412' });
    expect(anonymous.status).toBe(401);
    expect(problem(anonymous.body).type).toBe('/problems/unauthorized');
    const email = uniqueEmail('change-foreign');
    await signUpVerified(t, database, email);
    const agent = await signedInAgent(t, email);
    const foreign = await agent.post('/api/auth/change-password').set('Origin', 'https://elsewhere.example').send({ currentPassword: GOOD_PASSWORD, newPassword: 'fresh-boom-pin-4413' });
    expect(foreign.status).toBe(403);
    expect((await request(t.app).post('/api/auth/sign-in/email').send({ email, password: GOOD_PASSWORD })).status).toBe(200);
  });
});

describe('sessions', () => {
  it('lists one\'s sessions and signs out the others, keeping this one', async () => {
    const email = uniqueEmail('sessions');
    await signUpVerified(t, database, email);
    const laptop = await signedInAgent(t, email);
    const phone = await signedInAgent(t, email);
    const list = await laptop.get('/api/me/sessions');
    expect(list.status).toBe(200);
    expect(list.body.items).toHaveLength(2);
    expect(list.body.items.filter((s: { current: boolean }) => s.current)).toHaveLength(1);
    const revoke = await laptop.post('/api/me/sessions/revoke-others').set('Origin', ORIGIN).send({});
    expect(revoke.status).toBe(200);
    expect(revoke.body).toEqual({ revoked: 1 });
    expect((await phone.get('/api/me')).status).toBe(401);
    expect((await laptop.get('/api/me')).status).toBe(200);
  });

  it('ends one named session of one\'s own and answers 404 for another\'s', async () => {
    const email = uniqueEmail('one-session');
    await signUpVerified(t, database, email);
    const a = await signedInAgent(t, email);
    const b = await signedInAgent(t, email);
    const other = (await b.get('/api/me')).body.session.id as string;
    expect((await a.delete(`/api/me/sessions/${other}`).set('Origin', ORIGIN)).status).toBe(204);
    expect((await b.get('/api/me')).status).toBe(401);
    const stranger = uniqueEmail('stranger');
    await signUpVerified(t, database, stranger);
    const s = await signedInAgent(t, stranger);
    const mine = (await a.get('/api/me')).body.session.id as string;
    expect((await s.delete(`/api/me/sessions/${mine}`).set('Origin', ORIGIN)).status).toBe(404);
    expect((await a.get('/api/me')).status).toBe(200);
  });
});

describe('production cookies', () => {
  it('marks the session cookie Secure in production', async () => {
    const email = uniqueEmail('prod');
    await signUpVerified(t, database, email);
    const prod = authApp(database, { mode: 'production', publicUrl: () => 'https://pinwork.test' });
    const res = await request(prod.app).post('/api/auth/sign-in/email').set('Origin', 'https://pinwork.test').send({ email, password: GOOD_PASSWORD });
    expect(res.status).toBe(200);
    const cookie = (res.headers['set-cookie'] as unknown as string[]).find((c) => c.includes('session_token='));
    expect(cookie).toMatch(/; Secure/);
    expect(cookie).toMatch(/HttpOnly/);
  });
});

describe('the session answer page scripts read', () => {
  it('names the user but never carries the session token the httpOnly cookie protects', async () => {
    const email = uniqueEmail('session-token');
    await signUpVerified(t, database, email);
    const agent = await signedInAgent(t, email);
    const res = await agent.get('/api/auth/get-session');
    expect(res.status).toBe(200);
    expect(res.body.user.email).toBe(email);
    expect(res.body.session.userId).toBe(res.body.user.id);
    expect(res.body.session).not.toHaveProperty('token');
    const [stored] = await database.db.select({ token: sessions.token }).from(sessions).where(eq(sessions.userId, res.body.user.id));
    expect(JSON.stringify(res.body)).not.toContain(stored!.token);
  });
});
