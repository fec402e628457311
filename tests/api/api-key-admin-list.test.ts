import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiKeyListSchema } from '../../shared/api/v1';
import type { DatabaseHandle } from '../../server/db/database';
import { ORIGIN } from '../helpers/auth-fixture';
import { openTestDatabase } from '../helpers/test-database';
import { createKey, seedV1, v1App, type V1Test } from './v1-fixture';

// The admin key table names each key's organisation; the list itself carries only ids.

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

describe('the admin key list', () => {
  it('names the organisation of every organisation key, and leaves an admin’s own key unnamed', async () => {
    const orgKey = await createKey(t, { name: 'Shop configurator' });
    const own = await t.admin.post('/api/admin/api-keys').set('Origin', ORIGIN).send({ name: 'Admin probe', kind: 'secret', scopes: ['read'] });
    expect(own.status).toBe(201);
    const res = await t.admin.get('/api/admin/api-keys');
    expect(res.status).toBe(200);
    const all = apiKeyListSchema.parse(res.body);
    expect(all.organisationNames).toEqual({ [t.supplierOrgId]: 'Brightwater Rigging Supply' });
    expect(all.items.find((k) => k.id === orgKey.info.id)?.organisationId).toBe(t.supplierOrgId);
    expect(all.items.find((k) => k.id === own.body.info.id)?.organisationId).toBeNull();
  });

  it('is not what an organisation owner gets: their own list carries no names of others', async () => {
    const res = await t.supplier.get(`/api/organisations/${t.supplierOrgId}/api-keys`);
    expect(res.status).toBe(200);
    expect(apiKeyListSchema.parse(res.body).organisationNames).toBeUndefined();
  });
});
