import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

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
