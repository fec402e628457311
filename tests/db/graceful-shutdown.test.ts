import http from 'node:http';
import { asc, like } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { openDatabase } from '../../server/db/client';
import { auditLog } from '../../server/db/schema/audit';
import { serverProcesses } from '../helpers/server-process';

const processes = serverProcesses('shutdown');
const newDataHome = processes.newDataHome;

const start = processes.start;

/** Sends the head and half the body of a request, and returns a way to finish it. */
function beginRequest(url: string) {
  const body = JSON.stringify({ note: 'in flight while the server stops' });
  const req = http.request(`${url}/api/in-flight-probe`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'Content-Length': Buffer.byteLength(body) },
  });
  const response = new Promise<{ status: number; body: string }>((resolve, reject) => {
    req.on('response', (res) => {
      let text = '';
      res.on('data', (chunk: Buffer) => (text += chunk.toString()));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body: text }));
    });
    req.on('error', reject);
  });
  req.write(body.slice(0, 10));
  return { finish: () => req.end(body.slice(10)), response };
}

// Real processes: each start loads the snapshot and imports the server, a few seconds on a busy machine.
describe('graceful shutdown', { timeout: 60_000 }, () => {
  it('finishes a request in flight, keeps what was committed, and exits 0 on SIGTERM', async () => {
    const home = await newDataHome();
    const first = start(home);
    const url = await first.ready;
    const inFlight = beginRequest(url);
    await new Promise((resolve) => setTimeout(resolve, 200));
    first.child.kill('SIGTERM');
    await new Promise((resolve) => setTimeout(resolve, 200));
    // Still running: it waits for the request it has already begun.
    expect(first.child.exitCode).toBeNull();
    inFlight.finish();
    const answer = await inFlight.response;
    expect(answer.status).toBe(404);
    expect(JSON.parse(answer.body)).toMatchObject({ status: 404, instance: '/api/in-flight-probe' });
    expect(await first.exited).toBe(0);

    const second = start(home);
    await second.ready;
    second.child.kill('SIGINT');
    expect(await second.exited).toBe(0);

    // Both runs' start and stop rows are there, the stop rows written during shutdown itself
    // (the first start also records the built-in templates it publishes; those are not counted here).
    const database = await openDatabase({ dataDir: home.DATA_DIR ?? 'memory', databaseUrl: home.DATABASE_URL });
    try {
      const rows = await database.db
        .select({ action: auditLog.action, details: auditLog.details })
        .from(auditLog)
        .where(like(auditLog.action, 'server.%'))
        .orderBy(asc(auditLog.id));
      expect(rows.map((r) => r.action)).toEqual(['server.start', 'server.stop', 'server.start', 'server.stop']);
      expect(rows.map((r) => r.details.pid)).toEqual([first.child.pid, first.child.pid, second.child.pid, second.child.pid]);
      expect(rows[1]!.details.reason).toBe('SIGTERM');
      expect(rows[3]!.details.reason).toBe('SIGINT');
    } finally {
      await database.close();
    }
  });
});
