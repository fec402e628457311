import { existsSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import express from 'express';
import { rateLimit } from 'express-rate-limit';
import helmet from 'helmet';
import pino from 'pino';
import { createApp } from '../server/app';
import { openDatabase } from '../server/db/client';
import { seedDemoData } from '../server/db/seed';
import { seedBuiltInTemplates } from '../server/db/seed-templates';
import { ApiKeyService } from '../server/services/api-keys/api-keys';
import { BatchedRateLimitStore } from '../server/services/batched-rate-limit-store';
import { builtInTemplates } from '../templates/registry';

/**
 * The server side of the HTTP benchmark, in a process of its own: the whole app on an
 * in-memory database, plus two baselines on the same server answering a body the size of a
 * solve answer. The middleware baseline uses the same rate-limit store as v1, so the ratio
 * measures what v1 adds (key check, quota, usage, the solve), not a difference in stores. Prints one JSON line (port, key, body) when ready.
 */
const root = fileURLToPath(new URL('..', import.meta.url));
const snapshotFile = path.join(root, 'dist/db-snapshot.tar.gz');
const database = await openDatabase({ dataDir: 'memory', snapshotFile: existsSync(snapshotFile) ? snapshotFile : undefined });
await seedDemoData(database.db);
await seedBuiltInTemplates(database.db, builtInTemplates, 'tallow-ridge-engineering');
// An admin's own key: no monthly quota, and a rate limit no benchmark reaches.
const { key } = await new ApiKeyService(database.db).create(
  { organisationId: null, userId: 'demo-admin' },
  { name: 'Benchmark', kind: 'secret', scopes: ['solve'], ratePerMinute: 100_000 },
);
const logger = pino({ level: 'silent' });
const app = createApp({ database, logger });
const solveBody = JSON.stringify({ inputs: { L: 4000, h: 1500 } });

const outer = express();
let fixed = '{}';
outer.get('/bench/bare', (_req, res) => {
  res.type('application/json').send(fixed);
});
outer.post(
  '/bench/middleware',
  helmet(),
  express.json(),
  rateLimit({ windowMs: 60_000, limit: 1_000_000, standardHeaders: 'draft-8', legacyHeaders: false, store: new BatchedRateLimitStore(database.db, 'bench:') }),
  (_req, res) => {
    res.type('application/json').send(fixed);
  },
);
outer.use(app);
const server = outer.listen(0, '127.0.0.1', async () => {
  const port = (server.address() as { port: number }).port;
  const res = await fetch(`http://127.0.0.1:${port}/api/v1/templates/wall-jib-tie-rod/solve`, {
    method: 'POST',
    headers: { Authorization: `Bearer ${key}`, 'Content-Type': 'application/json', 'Accept-Encoding': 'identity' },
    body: solveBody,
  });
  const text = await res.text();
  if (res.status !== 200) throw new Error(`solve answered ${res.status}: ${text}`);
  fixed = JSON.stringify({ pad: 'x'.repeat(Math.max(0, text.length - 10)) });
  process.stdout.write(`${JSON.stringify({ port, key, solveBody, bytes: text.length })}\n`);
});
process.on('SIGTERM', () => {
  server.close();
  void database.close().then(() => process.exit(0));
});
