// Measures what a user waits for: from spawning `tsx server/index.ts` (what `npm run
// start:server` runs) to the first 200 from /api/health, on a new data folder (first start,
// from the build's snapshot) and again on the same folder (restart); and the resident memory
// of the server's processes once it is up. A measurement to read, not a test that passes.
//
//   npm run bench:db-start -- [runs=3] [--runner=node]
//   (--runner=node starts `node --import tsx server/index.ts`: no tsx wrapper process)
import { spawn } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const args = process.argv.slice(2);
const runs = Number(args.find((a) => /^\d+$/.test(a)) ?? 3);
const viaNode = args.includes('--runner=node');

async function startOnce(dataDir: string, port: number) {
  const started = performance.now();
  const [command, commandArgs] = viaNode
    ? [process.execPath, ['--import', 'tsx', 'server/index.ts']]
    : [path.join(root, 'node_modules/.bin/tsx'), ['server/index.ts']];
  const child = spawn(command, commandArgs, {
    cwd: root,
    env: { ...process.env, DATA_DIR: dataDir, PORT: String(port), LOG_LEVEL: 'warn', DATABASE_URL: '' },
    stdio: 'ignore',
  });
  const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
  for (;;) {
    if (child.exitCode !== null) throw new Error(`server exited with ${child.exitCode}`);
    try {
      const res = await fetch(`http://127.0.0.1:${port}/api/health`);
      if (res.status === 200) break;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
  const ms = performance.now() - started;
  await new Promise((resolve) => setTimeout(resolve, 1000));
  const rss = treeRss(child.pid!);
  child.kill('SIGTERM');
  const code = await exited;
  if (code !== 0) throw new Error(`server stopped with ${code}`);
  return { ms, rss };
}

/** RSS in MB of a process and its descendants, from /proc. */
function treeRss(pid: number): { server: number; total: number } {
  const parents = new Map<number, number>();
  for (const entry of readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      const stat = readFileSync(`/proc/${entry}/stat`, 'utf8');
      parents.set(Number(entry), Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]));
    } catch {
      // gone
    }
  }
  const tree = [pid];
  for (let i = 0; i < tree.length; i++) for (const [p, pp] of parents) if (pp === tree[i]) tree.push(p);
  const rssOf = (p: number) =>
    Number(/VmRSS:\s+(\d+)/.exec(readFileSync(`/proc/${p}/status`, 'utf8'))?.[1] ?? 0) / 1024;
  const each = tree.map(rssOf);
  return { server: Math.max(...each), total: each.reduce((a, b) => a + b, 0) };
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;
const first: number[] = [];
const restart: number[] = [];
const rss: number[] = [];
for (let i = 0; i < runs; i++) {
  const dir = mkdtempSync(path.join(tmpdir(), 'pinwork-start-'));
  try {
    const a = await startOnce(dir, 3900 + i);
    const b = await startOnce(dir, 3900 + i);
    first.push(a.ms);
    restart.push(b.ms);
    rss.push(b.rss.server);
    console.log(
      `run ${i + 1}: first start ${a.ms.toFixed(0)} ms, restart ${b.ms.toFixed(0)} ms, ` +
        `RSS server ${b.rss.server.toFixed(0)} MB (with the tsx wrapper ${b.rss.total.toFixed(0)} MB)`,
    );
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
console.log(
  `median of ${runs}: first start ${median(first).toFixed(0)} ms, restart ${median(restart).toFixed(0)} ms, RSS ${median(rss).toFixed(0)} MB`,
);
