import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { solveTable } from '../../examples/print-results';
import type { DatabaseHandle } from '../../server/db/database';
import { openTestDatabase } from '../helpers/test-database';
import { createKey, seedV1, v1App, type V1Test } from './v1-fixture';

let database: DatabaseHandle;
let t: V1Test;
let server: Server;
let base: string;
beforeAll(async () => {
  database = await openTestDatabase();
  const { supplierOrgId } = await seedV1(database);
  t = await v1App(database, supplierOrgId);
  server = t.app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
}, 120_000);
afterAll(async () => {
  server?.close();
  await database?.close();
});

describe('the example client', () => {
  it('prints a result table with the values the API returns', async () => {
    const { key } = await createKey(t, { scopes: ['solve'] });
    const table = await solveTable(base, key, 'wall-jib-tie-rod', { L: 4500 });
    const api = await request(t.app).post('/api/v1/templates/wall-jib-tie-rod/solve').set('Authorization', `Bearer ${key}`).send({ inputs: { L: 4500 } });
    const tie = api.body.result.results.find((r: { key: string }) => r.key === 'T');
    expect(table).toMatch(/^wall-jib-tie-rod 1\.0\.0 \(SI\)/);
    expect(table).toContain(`${tie.label}`);
    expect(table).toContain(Number(tie.value).toPrecision(5));
  });

  it('reports a problem with its field', async () => {
    const { key } = await createKey(t, { scopes: ['solve'] });
    await expect(solveTable(base, key, 'wall-jib-tie-rod', { L: -1 })).rejects.toThrow(/422[\s\S]*\/inputs\/L/);
  });
});
