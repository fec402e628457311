import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach } from 'vitest';
import { createPostgresCopy, pgliteSnapshotFile } from './test-database';

const root = fileURLToPath(new URL('../..', import.meta.url));
const READY = /Pinwork is running at (http:\/\/\S+)/;

export interface ServerProcess {
  child: ChildProcess;
  /** Everything written to stdout and stderr so far. */
  output(): string;
  /** Resolves with the URL once the server prints it; rejects if it exits first. */
  ready: Promise<string>;
  /** Resolves with the exit code (or signal name) when the process ends. */
  exited: Promise<number | string>;
}

/**
 * Starts the real server (server/index.ts) as its own process on a free port (PORT=0; the URL
 * is read from what it prints). Node runs it directly with tsx's loader, so `child.pid` is the
 * server itself and signals reach it without a wrapper in between.
 */
export function startServerProcess(env: Record<string, string>): ServerProcess {
  const childEnv: NodeJS.ProcessEnv = { ...process.env, PORT: '0', LOG_LEVEL: 'warn', ...env };
  // The process tests are about the embedded database and its folder.
  if (!('DATABASE_URL' in env)) delete childEnv.DATABASE_URL;
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: root,
    env: childEnv,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  const exited = new Promise<number | string>((resolve) => {
    child.on('exit', (code, signal) => resolve(code ?? signal ?? 'unknown'));
  });
  const ready = new Promise<string>((resolve, reject) => {
    const onData = (chunk: Buffer) => {
      output += chunk.toString();
      const match = READY.exec(output);
      if (match?.[1]) resolve(match[1]);
    };
    child.stdout!.on('data', onData);
    child.stderr!.on('data', onData);
    void exited.then((code) => reject(new Error(`server exited (${code}) before it was ready:\n${output}`)));
  });
  ready.catch(() => undefined);
  return { child, output: () => output, ready, exited };
}

export function makeTempDir(label: string): { dir: string; remove(): void } {
  const dir = mkdtempSync(path.join(tmpdir(), `pinwork-${label}-`));
  return { dir, remove: () => rmSync(dir, { recursive: true, force: true }) };
}

/** Ends a server a test started, if it is still running; never leaves one behind. */
export async function stopProcess(server: ServerProcess | undefined): Promise<void> {
  if (!server || server.child.exitCode !== null || server.child.signalCode !== null) return;
  server.child.kill('SIGTERM');
  const timer = setTimeout(() => server.child.kill('SIGKILL'), 10_000);
  await server.exited;
  clearTimeout(timer);
}

/**
 * Real server processes for the tests of one file: `newDataHome()` gives a test its own data (a
 * PGlite folder started from the snapshot, or a PostgreSQL copy when the run has DATABASE_URL)
 * and `start(env)` a process on it; after each test every process is stopped and every home
 * removed.
 */
export function serverProcesses(label: string) {
  const started: ServerProcess[] = [];
  const cleanups: (() => unknown)[] = [];
  afterEach(async () => {
    await Promise.all(started.splice(0).map(stopProcess));
    for (const cleanup of cleanups.splice(0)) await cleanup();
  });
  return {
    async newDataHome(): Promise<Record<string, string>> {
      const postgres = await createPostgresCopy();
      if (postgres) {
        cleanups.push(() => postgres.drop());
        return { DATABASE_URL: postgres.url };
      }
      const temp = makeTempDir(label);
      cleanups.push(() => temp.remove());
      return { DATA_DIR: temp.dir, DB_SNAPSHOT: pgliteSnapshotFile() };
    },
    start(env: Record<string, string>): ServerProcess {
      const server = startServerProcess(env);
      started.push(server);
      return server;
    },
  };
}
