import { once } from 'node:events';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { gunzipSync } from 'node:zlib';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DatabaseHandle } from '../../server/db/database';
import { seedDemoData } from '../../server/db/seed';
import { seedBuiltInTemplates } from '../../server/db/seed-templates';
import { builtInTemplates } from '../../templates/registry';
import { openTestDatabase } from '../helpers/test-database';
import { appFor } from './app-fixture';

let database: DatabaseHandle;
let app: ReturnType<typeof appFor>;
beforeAll(async () => {
  database = await openTestDatabase();
  await seedDemoData(database.db);
  await seedBuiltInTemplates(database.db, builtInTemplates.slice(0, 2), 'tallow-ridge-engineering');
  app = appFor(database);
}, 60_000);
afterAll(async () => {
  await database?.close();
});

describe('compression', () => {
  it('gzips a large JSON answer for a client that accepts it, and the body survives', async () => {
    // A raw request: supertest would undo the compression before the test could see it.
    const server = app.listen(0, '127.0.0.1');
    await once(server, 'listening');
    try {
      const { port } = server.address() as AddressInfo;
      const { headers, body } = await new Promise<{ headers: http.IncomingHttpHeaders; body: Buffer }>((resolve, reject) => {
        http
          .get({ host: '127.0.0.1', port, path: '/api/templates', headers: { 'Accept-Encoding': 'gzip' } }, (res) => {
            const chunks: Buffer[] = [];
            res.on('data', (c: Buffer) => chunks.push(c));
            res.on('end', () => resolve({ headers: res.headers, body: Buffer.concat(chunks) }));
          })
          .on('error', reject);
      });
      expect(headers['content-encoding']).toBe('gzip');
      const plain = gunzipSync(body);
      expect((JSON.parse(plain.toString('utf8')) as { templates: unknown[] }).templates).toHaveLength(2);
      expect(body.length).toBeLessThan(plain.length / 2);
    } finally {
      server.close();
    }
  });

  it('sends plain bodies to a client that does not ask for compression', async () => {
    const res = await request(app).get('/api/templates').set('Accept-Encoding', 'identity');
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(res.body.templates).toHaveLength(2);
  });
});
