import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { repoRoot } from './paths';

export interface RunningServer {
  url: string;
  output: () => string;
  stop: () => Promise<void>;
}

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.unref();
    probe.on('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      if (address === null || typeof address === 'string') return reject(new Error('no port'));
      probe.close(() => resolve(address.port));
    });
  });
}

function exited(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => child.once('exit', () => resolve()));
}

async function waitForHealth(url: string, child: ChildProcess, output: () => string, timeoutMs: number) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) {
      throw new Error(`server exited with code ${child.exitCode} before answering:\n${output()}`);
    }
    try {
      const response = await fetch(`${url}/api/health`);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`server did not answer /api/health within ${timeoutMs} ms:\n${output()}`);
}

/**
 * Start the production server (server/index.ts serving dist/client) on a free port.
 * E2E_BASE_URL points the tests at a server that is already running instead (for
 * instance `npm run dev` on http://localhost:5173); nothing is started or stopped then.
 */
export async function startBuiltServer(env: Record<string, string> = {}): Promise<RunningServer> {
  const external = process.env.E2E_BASE_URL;
  if (external) {
    return { url: external.replace(/\/$/, ''), output: () => '', stop: async () => {} };
  }
  const port = await freePort();
  // The browser tests use an in-memory database unless a caller asks otherwise, even
  // when the surrounding shell (CI) has DATABASE_URL set for the database suite.
  // Production mode by default, as a deployment runs; it insists on the settings below.
  // Test-only values: the secret is throwaway and nothing listens on port 9, so mail is queued
  // and never sent. Development mode (asked for by the account tests) starts its own mail server.
  const production = (env.NODE_ENV ?? 'production') === 'production';
  const childEnv: Record<string, string | undefined> = {
    ...process.env,
    NODE_ENV: 'production',
    LOG_LEVEL: 'warn',
    DATA_DIR: 'memory',
    ...(production
      ? { AUTH_SECRET: 'browser-tests-only-secret-0123456789abcdef', PUBLIC_URL: `http://localhost:${port}`, SMTP_URL: 'smtp://127.0.0.1:9' }
      : {}),
    ...env,
    PORT: String(port),
  };
  if (env.DATABASE_URL === undefined) delete childEnv.DATABASE_URL;
  const child = spawn(join(repoRoot, 'node_modules/.bin/tsx'), ['server/index.ts'], {
    cwd: repoRoot,
    env: childEnv,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let log = '';
  child.stdout?.on('data', (chunk: Buffer) => (log += chunk.toString()));
  child.stderr?.on('data', (chunk: Buffer) => (log += chunk.toString()));
  const output = () => log;
  const url = `http://127.0.0.1:${port}`;

  const stop = async () => {
    if (child.exitCode !== null || child.signalCode !== null) return;
    const killTimer = setTimeout(() => child.kill('SIGKILL'), 10_000);
    child.kill('SIGTERM');
    await exited(child);
    clearTimeout(killTimer);
  };

  try {
    await waitForHealth(url, child, output, 90_000);
  } catch (error) {
    await stop();
    throw error;
  }
  return { url, output, stop };
}
