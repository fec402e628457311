import { and, asc, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DatabaseHandle } from '../../server/db/database';
import { auditLog } from '../../server/db/schema/audit';
import { auditPageSchema } from '../../shared/api/auth';
import { ORIGIN } from '../helpers/auth-fixture';
import { openTestDatabase } from '../helpers/test-database';
import { createKey, seedV1, v1App, type V1Test } from './v1-fixture';

let database: DatabaseHandle;
let t: V1Test;
beforeAll(async () => {
  database = await openTestDatabase();
  const { supplierOrgId } = await seedV1(database);
  t = await v1App(database, supplierOrgId);
}, 120_000);
afterAll(async () => {
  await database?.close();
});

const entriesFor = (keyId: string) => database.db.select().from(auditLog).where(eq(auditLog.target, keyId)).orderBy(asc(auditLog.id));

describe('API key audit entries', () => {
  it('record creation, rotation and revocation with the actor, organisation, key prefix and address', async () => {
    const { info } = await createKey(t, { name: 'Audited' });
    const rotated = await t.supplier.post(`/api/organisations/${t.supplierOrgId}/api-keys/${info.id}/rotate`).set('Origin', ORIGIN).send({ graceSeconds: 60 });
    expect(rotated.status).toBe(201);
    const revoked = await t.supplier.post(`/api/organisations/${t.supplierOrgId}/api-keys/${info.id}/revoke`).set('Origin', ORIGIN).send({});
    expect(revoked.status).toBe(200);

    const entries = await entriesFor(info.id);
    expect(entries.map((e) => e.action)).toEqual(['api-key.created', 'api-key.rotated', 'api-key.revoked']);
    const supplierId = entries[0]!.actorId;
    expect(supplierId).toBeTruthy();
    for (const e of entries) {
      expect(e).toMatchObject({ actorKind: 'user', actorId: supplierId });
      expect(e.ip).toMatch(/127\.0\.0\.1|::1/);
      expect(e.details).toMatchObject({ prefix: info.prefix, organisationId: t.supplierOrgId });
    }
    expect(entries[1]!.details).toMatchObject({ newKeyId: rotated.body.info.id, newPrefix: rotated.body.info.prefix, graceSeconds: 60 });
    // The admin audit page reads the same table: the entries show there with the actor's e-mail.
    const page = auditPageSchema.parse((await t.admin.get('/api/admin/audit').query({ action: 'api-key.', target: info.id })).body);
    expect(page.items.map((e) => e.action).sort()).toEqual(['api-key.created', 'api-key.revoked', 'api-key.rotated']);
    expect(page.items.every((e) => e.actorEmail?.includes('v1-supplier'))).toBe(true);
  });

  it('record an admin’s own key with no organisation', async () => {
    const res = await t.admin.post('/api/admin/api-keys').set('Origin', ORIGIN).send({ name: 'Admin own', kind: 'secret', scopes: ['read'] });
    expect(res.status).toBe(201);
    const [entry] = await database.db.select().from(auditLog).where(and(eq(auditLog.target, res.body.info.id), eq(auditLog.action, 'api-key.created')));
    expect(entry!.details).toMatchObject({ prefix: res.body.info.prefix, organisationId: null, kind: 'secret', scopes: ['read'] });
  });
});
