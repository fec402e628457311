import { and, desc, eq } from 'drizzle-orm';
import type express from 'express';
import request from 'supertest';
import { expect } from 'vitest';
import type { AppOptions } from '../../server/app';
import type { DatabaseHandle } from '../../server/db/database';
import type { AuthRateLimits } from '../../server/routes/auth-rate-limits';
import { users } from '../../server/db/schema/auth';
import { mailQueue } from '../../server/db/schema/mail';
import type { AccountSystem } from '../../server/services/auth/account-system';
import { appFor } from '../api/app-fixture';

export const PUBLIC_URL = 'http://pinwork.test';
export const ORIGIN = PUBLIC_URL;

export interface AuthTestApp {
  app: express.Express;
  system: AccountSystem;
}

const roomy = { limit: 10_000, windowMs: 60_000 };
/** Limits no functional test reaches; the rate-limit tests set tight ones of their own. */
export const roomyRateLimits: AuthRateLimits = {
  signIn: { perIp: roomy, perAccount: roomy },
  signUp: { perIp: roomy, perAccount: roomy },
  passwordReset: { perIp: roomy, perAccount: roomy },
  verification: { perIp: roomy, perAccount: roomy },
  changePassword: { perIp: roomy, perAccount: roomy },
};

export function authApp(database: DatabaseHandle, accounts: AppOptions['accounts'] = {}, options: Partial<AppOptions> = {}): AuthTestApp {
  const app = appFor(database, { ...options, accounts: { publicUrl: () => PUBLIC_URL, rateLimits: roomyRateLimits, ...accounts } });
  return { app, system: app.locals.accountSystem as AccountSystem };
}

/** The newest queued message to an address for a purpose (the link tests follow). */
export async function lastMail(database: DatabaseHandle, to: string, purpose: string) {
  const [row] = await database.db
    .select()
    .from(mailQueue)
    .where(and(eq(mailQueue.to, to), eq(mailQueue.purpose, purpose)))
    .orderBy(desc(mailQueue.id))
    .limit(1);
  return row ?? null;
}

/** The `token` query parameter of the first link to `path` in a message's text part. */
export function tokenFromText(text: string, path: string): string {
  const match = new RegExp(`${PUBLIC_URL.replaceAll('.', '\\.')}${path}\\?token=([^\\s&]+)`).exec(text);
  expect(match, `a ${path} link in:\n${text}`).not.toBeNull();
  return decodeURIComponent(match![1]!);
}

let counter = 0;
export function uniqueEmail(label = 'user'): string {
  counter += 1;
  return `${label}-${process.pid}-${counter}-${Date.now().toString(36)}@example.com`;
}

export const GOOD_PASSWORD = 'tall-gantry-47-pulley';

/** Signs up, follows the verification mail's link; returns the new user's id. */
export async function signUpVerified(t: AuthTestApp, database: DatabaseHandle, email: string, name = 'Test Person', password = GOOD_PASSWORD): Promise<string> {
  const up = await request(t.app).post('/api/auth/sign-up/email').send({ name, email, password });
  expect(up.status, JSON.stringify(up.body)).toBe(200);
  const mail = await lastMail(database, email, 'verify-email');
  const token = tokenFromText(mail!.text, '/verify-email');
  const verified = await request(t.app).get('/api/auth/verify-email').query({ token });
  expect(verified.status, JSON.stringify(verified.body)).toBe(200);
  const [row] = await database.db.select({ id: users.id }).from(users).where(eq(users.email, email));
  return row!.id;
}

/** A supertest agent holding a session cookie. */
export async function signedInAgent(t: AuthTestApp, email: string, password = GOOD_PASSWORD) {
  const agent = request.agent(t.app);
  const res = await agent.post('/api/auth/sign-in/email').set('Origin', ORIGIN).send({ email, password });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return agent;
}

export async function setRole(database: DatabaseHandle, userId: string, role: 'admin' | 'engineer' | 'supplier' | 'user') {
  await database.db.update(users).set({ role }).where(eq(users.id, userId));
}
