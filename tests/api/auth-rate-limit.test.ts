import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DatabaseHandle } from '../../server/db/database';
import { GOOD_PASSWORD, ORIGIN, authApp, roomyRateLimits, signUpVerified, signedInAgent, uniqueEmail } from '../helpers/auth-fixture';
import { openTestDatabase } from '../helpers/test-database';

let database: DatabaseHandle;
beforeAll(async () => {
  database = await openTestDatabase();
});
afterAll(async () => {
  await database?.close();
});

const hour = 3_600_000;

describe('rate limits', () => {
  it('limits failed sign-ins per account with a 429 problem and Retry-After, whatever the address sending', async () => {
    const t = authApp(database, { rateLimits: { ...roomyRateLimits, signIn: { perIp: { limit: 100, windowMs: hour }, perAccount: { limit: 3, windowMs: hour } } } });
    const email = uniqueEmail('limited');
    await signUpVerified(t, database, email);
    for (let i = 0; i < 3; i += 1) {
      expect((await request(t.app).post('/api/auth/sign-in/email').send({ email, password: `wrong-password-${i}` })).status).toBe(401);
    }
    const blocked = await request(t.app).post('/api/auth/sign-in/email').send({ email, password: GOOD_PASSWORD });
    expect(blocked.status).toBe(429);
    expect(blocked.headers['content-type']).toMatch(/problem\+json/);
    expect(blocked.body).toMatchObject({ type: '/problems/rate-limited', status: 429 });
    const retryAfter = Number(blocked.headers['retry-after']);
    expect(retryAfter).toBeGreaterThan(0);
    expect(retryAfter).toBeLessThanOrEqual(3600);
    // Another account from the same address is not affected.
    const other = uniqueEmail('unaffected');
    await signUpVerified(t, database, other);
    expect((await request(t.app).post('/api/auth/sign-in/email').send({ email: other, password: GOOD_PASSWORD })).status).toBe(200);
  });

  it('does not count successful sign-ins against the account', async () => {
    const t = authApp(database, { rateLimits: { ...roomyRateLimits, signIn: { perIp: { limit: 100, windowMs: hour }, perAccount: { limit: 2, windowMs: hour } } } });
    const email = uniqueEmail('regular');
    await signUpVerified(t, database, email);
    for (let i = 0; i < 4; i += 1) {
      expect((await request(t.app).post('/api/auth/sign-in/email').send({ email, password: GOOD_PASSWORD })).status).toBe(200);
    }
  });

  it('limits sign-ups and reset requests per client address (behind a trusted proxy)', async () => {
    const t = authApp(
      database,
      { rateLimits: { ...roomyRateLimits, signUp: { perIp: { limit: 2, windowMs: hour }, perAccount: { limit: 10, windowMs: hour } }, passwordReset: { perIp: { limit: 2, windowMs: hour }, perAccount: { limit: 10, windowMs: hour } } } },
      { trustProxy: true },
    );
    const from = (ip: string) => (path: string, body: object) => request(t.app).post(path).set('X-Forwarded-For', ip).send(body);
    const a = from('198.51.100.7');
    const b = from('198.51.100.8');
    for (let i = 0; i < 2; i += 1) {
      expect((await a('/api/auth/sign-up/email', { name: 'N', email: uniqueEmail('ip'), password: GOOD_PASSWORD })).status).toBe(200);
    }
    const up = await a('/api/auth/sign-up/email', { name: 'N', email: uniqueEmail('ip'), password: GOOD_PASSWORD });
    expect(up.status).toBe(429);
    expect(up.headers['retry-after']).toMatch(/^\d+$/);
    expect((await b('/api/auth/sign-up/email', { name: 'N', email: uniqueEmail('ip'), password: GOOD_PASSWORD })).status).toBe(200);
    for (let i = 0; i < 2; i += 1) expect((await a('/api/auth/request-password-reset', { email: uniqueEmail('r') })).status).toBe(200);
    expect((await a('/api/auth/request-password-reset', { email: uniqueEmail('r') })).status).toBe(429);
  });

  it('limits reset requests per account across addresses', async () => {
    const t = authApp(database, { rateLimits: { ...roomyRateLimits, passwordReset: { perIp: { limit: 100, windowMs: hour }, perAccount: { limit: 2, windowMs: hour } } } });
    const email = uniqueEmail('reset-acct');
    expect((await request(t.app).post('/api/auth/request-password-reset').send({ email })).status).toBe(200);
    expect((await request(t.app).post('/api/auth/request-password-reset').send({ email: email.toUpperCase() })).status).toBe(200);
    expect((await request(t.app).post('/api/auth/request-password-reset').send({ email })).status).toBe(429);
  });

  it('limits password changes per signed-in person, whichever session they come from', async () => {
    const t = authApp(database, { rateLimits: { ...roomyRateLimits, changePassword: { perIp: { limit: 100, windowMs: hour }, perAccount: { limit: 2, windowMs: hour } } } });
    const email = uniqueEmail('change-limit');
    await signUpVerified(t, database, email);
    const first = await signedInAgent(t, email);
    const second = await signedInAgent(t, email);
    const guess = (agent: typeof first, n: number) =>
      agent.post('/api/auth/change-password').set('Origin', ORIGIN).send({ currentPassword: `guess-number-${n}`, newPassword: 'fresh-boom-pin-7001' });
    expect((await guess(first, 1)).status).toBe(422);
    expect((await guess(second, 2)).status).toBe(422);
    const limited = await guess(first, 3);
    expect(limited.status).toBe(429);
    expect(limited.headers['retry-after']).toMatch(/^\d+$/);
    expect(limited.body.type).toBe('/problems/rate-limited');
    // Another person is not held back by this one's attempts.
    const other = uniqueEmail('change-limit-other');
    await signUpVerified(t, database, other);
    const otherAgent = await signedInAgent(t, other);
    expect((await otherAgent.post('/api/auth/change-password').set('Origin', ORIGIN).send({ currentPassword: GOOD_PASSWORD, newPassword: 'fresh-boom-pin-7002' })).status).toBe(200);
  });
});
