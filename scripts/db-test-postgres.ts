// Runs the test suite once more against a real PostgreSQL server: makes a throwaway cluster with
// Debian's binaries in a temp folder, starts it on a free local port, runs `vitest run` with
// DATABASE_URL pointing at it, then stops and deletes the cluster. Exits with vitest's code.
//
//   npm run test:postgres [-- <vitest args>]
//   PG_BIN=/usr/lib/postgresql/15/bin   which binaries (default: the newest under /usr/lib/postgresql)
//   PG_USER=postgres                    the OS user that runs them when we are root (initdb refuses root)
import { spawnSync, spawn } from 'node:child_process';
import { chownSync, existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir, userInfo } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));

function fail(message: string): never {
  process.stderr.write(`test:postgres: ${message}\n`);
  process.exit(2);
}

function findBin(): string {
  if (process.env.PG_BIN) return process.env.PG_BIN;
  const base = '/usr/lib/postgresql';
  const versions = existsSync(base)
    ? readdirSync(base).filter((v) => existsSync(path.join(base, v, 'bin/initdb'))).sort((a, b) => Number(b) - Number(a))
    : [];
  if (!versions[0]) fail('no PostgreSQL binaries under /usr/lib/postgresql; apt-get install -y postgresql (or set PG_BIN)');
  return path.join(base, versions[0], 'bin');
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

const bin = findBin();
const asRoot = userInfo().uid === 0;
const pgUser = process.env.PG_USER ?? 'postgres';
if (asRoot && spawnSync('id', ['-u', pgUser]).status !== 0) {
  fail(`running as root and there is no user ${pgUser} to run PostgreSQL as; create one (useradd ${pgUser}) or set PG_USER`);
}

function pg(tool: string, args: string[]) {
  const command = asRoot ? 'runuser' : path.join(bin, tool);
  const fullArgs = asRoot ? ['-u', pgUser, '--', path.join(bin, tool), ...args] : args;
  const result = spawnSync(command, fullArgs, { encoding: 'utf8' });
  if (result.status !== 0) fail(`${tool} failed:\n${result.stdout}${result.stderr}`);
}

const dir = mkdtempSync(path.join(tmpdir(), 'pinwork-pg-'));
if (asRoot) {
  const id = (flag: string) => Number(spawnSync('id', [flag, pgUser], { encoding: 'utf8' }).stdout.trim());
  chownSync(dir, id('-u'), id('-g'));
}
const data = path.join(dir, 'data');
const port = Number(process.env.PG_PORT ?? (await freePort()));
let started = false;

function cleanUp() {
  if (started) spawnSync(asRoot ? 'runuser' : path.join(bin, 'pg_ctl'), [
    ...(asRoot ? ['-u', pgUser, '--', path.join(bin, 'pg_ctl')] : []),
    '-D', data, '-m', 'fast', '-w', 'stop',
  ]);
  rmSync(dir, { recursive: true, force: true });
}

try {
  const t = Date.now();
  pg('initdb', ['-D', data, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--no-sync']);
  // Durability settings off: this cluster lives for one test run.
  pg('pg_ctl', [
    '-D', data, '-l', path.join(dir, 'server.log'), '-w', 'start',
    '-o', `-p ${port} -k ${dir} -c listen_addresses=127.0.0.1 -c fsync=off -c synchronous_commit=off -c full_page_writes=off`,
  ]);
  started = true;
  const url = `postgres://postgres@127.0.0.1:${port}/postgres`;
  process.stdout.write(`test:postgres: PostgreSQL from ${bin} on port ${port} ready in ${Date.now() - t} ms\n`);

  const vitest = spawn(path.join(root, 'node_modules/.bin/vitest'), ['run', ...process.argv.slice(2)], {
    cwd: root,
    stdio: 'inherit',
    env: { ...process.env, DATABASE_URL: url },
  });
  const forward = (signal: NodeJS.Signals) => vitest.kill(signal);
  process.on('SIGINT', forward);
  process.on('SIGTERM', forward);
  const code = await new Promise<number>((resolve) => vitest.on('exit', (c, s) => resolve(c ?? (s ? 1 : 0))));
  cleanUp();
  process.exit(code);
} catch (error) {
  cleanUp();
  throw error;
}
