import { readFileSync } from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { healthSchema } from '../../shared/api/health';
import { makeTempDir, startServerProcess, stopProcess, type ServerProcess } from '../helpers/server-process';
import { pgliteSnapshotFile } from '../helpers/test-database';

const started: ServerProcess[] = [];
const temps: { remove(): void }[] = [];
afterEach(async () => {
  await Promise.all(started.splice(0).map(stopProcess));
  temps.splice(0).forEach((t) => t.remove());
});

function start(dataDir: string) {
  const server = startServerProcess({ DATA_DIR: dataDir, DB_SNAPSHOT: pgliteSnapshotFile() });
  started.push(server);
  return server;
}

// Real processes: each start loads the snapshot and imports the server, a few seconds on a busy
// machine. About PGlite's folder only, so the run against PostgreSQL (DATABASE_URL) skips it.
describe.skipIf(Boolean(process.env.DATABASE_URL))('one server per data folder', { timeout: 60_000 }, () => {
  it('refuses a second start on a folder in use and leaves the first running', async () => {
    const temp = makeTempDir('lock');
    temps.push(temp);
    const first = start(temp.dir);
    const url = await first.ready;

    const second = start(temp.dir);
    expect(await second.exited).toBe(1);
    const message = second.output();
    expect(message).toContain(`Pinwork is already running on data folder ${path.resolve(temp.dir)}`);
    expect(message).toContain(`(pid ${first.child.pid})`);
    expect(message).toContain('set DATA_DIR to another folder');
    expect(message).not.toContain('Pinwork is running at');

    const res = await fetch(`${url}/api/health`);
    expect(res.status).toBe(200);
    expect(healthSchema.parse(await res.json()).database.ok).toBe(true);
    expect(first.child.exitCode).toBeNull();
    expect(readFileSync(path.join(temp.dir, 'pinwork.pid'), 'utf8').trim()).toBe(String(first.child.pid));

    // Another folder is another database: that start is not refused.
    const other = makeTempDir('lock-other');
    temps.push(other);
    const otherUrl = await start(other.dir).ready;
    expect(otherUrl).not.toBe(url);
    expect((await fetch(`${otherUrl}/api/health`)).status).toBe(200);
  });

  it('starts after the previous server died without releasing the lock', async () => {
    const temp = makeTempDir('stale');
    temps.push(temp);
    const crashed = start(temp.dir);
    await crashed.ready;
    crashed.child.kill('SIGKILL');
    expect(await crashed.exited).toBe('SIGKILL');

    const next = start(temp.dir);
    const url = await next.ready;
    expect((await fetch(`${url}/api/health`)).status).toBe(200);
  });
});
