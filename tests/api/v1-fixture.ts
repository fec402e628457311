import { eq } from 'drizzle-orm';
import request from 'supertest';
import { expect } from 'vitest';
import type { AppOptions } from '../../server/app';
import type { DatabaseHandle } from '../../server/db/database';
import { members, organisations } from '../../server/db/schema/organisations';
import { seedDemoData } from '../../server/db/seed';
import { seedBuiltInTemplates } from '../../server/db/seed-templates';
import type { UsageRecorder } from '../../server/services/api-keys/usage-recorder';
import { problemSchema } from '../../shared/api/problem';
import { createdApiKeySchema, type CreateApiKeyRequest, type CreatedApiKey } from '../../shared/api/v1';
import { builtInTemplates } from '../../templates/registry';
import { ORIGIN, authApp, setRole, signUpVerified, signedInAgent, uniqueEmail, type AuthTestApp } from '../helpers/auth-fixture';

export interface V1Test extends AuthTestApp {
  supplierOrgId: string;
  supplier: ReturnType<typeof request.agent>;
  admin: ReturnType<typeof request.agent>;
  usage: UsageRecorder;
}

/** Seeds built-ins, signs in a supplier (owner of the demo supplier organisation) and an admin. */
export async function seedV1(database: DatabaseHandle): Promise<{ supplierOrgId: string }> {
  await seedDemoData(database.db);
  await seedBuiltInTemplates(database.db, builtInTemplates, 'tallow-ridge-engineering');
  const [org] = await database.db.select().from(organisations).where(eq(organisations.slug, 'brightwater-rigging-supply'));
  return { supplierOrgId: org!.id };
}

export async function v1App(database: DatabaseHandle, supplierOrgId: string, apiV1: AppOptions['apiV1'] = {}): Promise<V1Test> {
  const t = authApp(database, {}, { apiV1 });
  const supplierEmail = uniqueEmail('v1-supplier');
  const supplierId = await signUpVerified(t, database, supplierEmail, 'Vera Supplier');
  await setRole(database, supplierId, 'supplier');
  await database.db.insert(members).values({ organisationId: supplierOrgId, userId: supplierId, role: 'owner' });
  const adminEmail = uniqueEmail('v1-admin');
  const adminId = await signUpVerified(t, database, adminEmail, 'Ada Admin');
  await setRole(database, adminId, 'admin');
  return {
    ...t,
    supplierOrgId,
    supplier: await signedInAgent(t, supplierEmail),
    admin: await signedInAgent(t, adminEmail),
    usage: t.app.locals.apiUsage as UsageRecorder,
  };
}

export const allScopes = ['read', 'solve', 'sweep', 'sensitivity', 'author'] as const;

/** A key made through the management API, as a supplier would. */
export async function createKey(t: V1Test, body: Partial<CreateApiKeyRequest> = {}): Promise<CreatedApiKey> {
  const res = await t.supplier
    .post(`/api/organisations/${t.supplierOrgId}/api-keys`)
    .set('Origin', ORIGIN)
    .send({ name: 'Quoting tool', kind: 'secret', scopes: [...allScopes], ...body });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return createdApiKeySchema.parse(res.body);
}

export function expectProblem(res: request.Response, status: number, type?: string) {
  expect(res.status, res.text).toBe(status);
  expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
  const p = problemSchema.parse(JSON.parse(res.text));
  if (type) expect(p.type).toBe(type);
  return p;
}
