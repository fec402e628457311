import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DatabaseHandle } from '../../server/db/database';
import { makeTempDir } from '../helpers/server-process';
import { openTestDatabase } from '../helpers/test-database';
import { appFor } from './app-fixture';

let database: DatabaseHandle;
const client = makeTempDir('client');
const indexHtml = '<!doctype html><html><body><div id="root">Pinwork test shell</div></body></html>';
const hashedAsset = 'assets/index-Bq3xY7kd.js';

beforeAll(async () => {
  database = await openTestDatabase();
  mkdirSync(path.join(client.dir, 'assets'));
  writeFileSync(path.join(client.dir, 'index.html'), indexHtml);
  writeFileSync(path.join(client.dir, hashedAsset), 'console.log("built");');
  writeFileSync(path.join(client.dir, 'robots.txt'), 'User-agent: *\n');
});
afterAll(async () => {
  await database?.close();
  client.remove();
});

describe('serving the built client', () => {
  it('serves index.html for the root and for client-side routes, revalidated each time', async () => {
    const app = appFor(database, { clientDir: client.dir });
    for (const url of ['/', '/templates/plate-clamp', '/admin/keys?tab=revoked']) {
      const res = await request(app).get(url).set('Accept', 'text/html');
      expect(res.status, url).toBe(200);
      expect(res.headers['content-type']).toMatch(/^text\/html/);
      expect(res.text).toBe(indexHtml);
      expect(res.headers['cache-control']).toBe('no-cache');
      expect(res.headers['content-security-policy']).toContain("script-src 'self'");
    }
  });

  it('caches hashed assets for a year and other files not at all', async () => {
    const app = appFor(database, { clientDir: client.dir });
    const asset = await request(app).get(`/${hashedAsset}`);
    expect(asset.status).toBe(200);
    expect(asset.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    const robots = await request(app).get('/robots.txt');
    expect(robots.status).toBe(200);
    expect(robots.headers['cache-control']).toBe('no-cache');
  });

  it('answers a missing file with 404 instead of the app shell', async () => {
    const res = await request(appFor(database, { clientDir: client.dir })).get('/assets/index-Zz9zZ9zZ.js');
    expect(res.status).toBe(404);
    expect(res.text).not.toContain('Pinwork test shell');
  });

  it('never falls back to the shell under /api', async () => {
    const res = await request(appFor(database, { clientDir: client.dir }))
      .get('/api/not-here')
      .set('Accept', 'text/html');
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
  });

  it('skips serving quietly when there is no build', async () => {
    const app = appFor(database, { clientDir: path.join(client.dir, 'no-build-here') });
    expect((await request(app).get('/api/health')).status).toBe(200);
    expect((await request(app).get('/').set('Accept', 'text/html')).status).toBe(404);
  });
});
