import { spawn } from 'node:child_process';
import { createInterface } from 'node:readline';
import autocannon from 'autocannon';

/**
 * HTTP section of `npm run bench`: the v1 solve endpoint against two baselines on the same
 * server (a bare Express route, and one behind helmet, JSON parsing and the same database-backed
 * rate limit), in alternating order. The goal (solve ≥ 80 % of the middleware baseline's
 * throughput, p99 within 1.5×) is reported, not asserted.
 */
interface Target {
  name: string;
  method: 'GET' | 'POST';
  path: string;
  headers?: Record<string, string>;
  body?: string;
  /** A new body for every request (so no answer can come from a cache). */
  freshBody?: (n: number) => string;
}
interface Run {
  rps: number;
  p50: number;
  p99: number;
  non2xx: number;
}

const CONNECTIONS = 50;
const SECONDS = 4;
// Three, so the median is a middle run rather than the better of two.
const ROUNDS = 3;

function run(url: string, t: Target): Promise<Run> {
  let n = 0;
  const fresh = t.freshBody;
  const requests: autocannon.Request[] | undefined = fresh ? [{ setupRequest: (req: autocannon.Request) => ({ ...req, body: fresh(n++) }) }] : undefined;
  return new Promise((resolve, reject) => {
    autocannon(
      { url: url + t.path, method: t.method, headers: t.headers, body: t.body, requests, connections: CONNECTIONS, duration: SECONDS },
      (err, r) => (err ? reject(err) : resolve({ rps: r.requests.average, p50: r.latency.p50, p99: r.latency.p99, non2xx: r.non2xx })),
    );
  });
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

export async function benchHttp(): Promise<{ rows: string[][]; pass: boolean; note: string }> {
  const child = spawn('node_modules/.bin/tsx', ['bench/http-server.ts'], { stdio: ['ignore', 'pipe', 'inherit'] });
  try {
    const line = await new Promise<string>((resolve, reject) => {
      createInterface({ input: child.stdout! }).once('line', resolve);
      child.once('exit', (code) => reject(new Error(`benchmark server exited with ${code}`)));
    });
    const ready = JSON.parse(line) as { port: number; key: string; solveBody: string; bytes: number };
    const url = `http://127.0.0.1:${ready.port}`;
    const targets: Target[] = [
      { name: 'bare Express', method: 'GET', path: '/bench/bare' },
      { name: 'helmet + json + rate limit', method: 'POST', path: '/bench/middleware', headers: { 'Content-Type': 'application/json' }, body: ready.solveBody },
      {
        name: 'v1 solve (key, limit, quota, usage)',
        method: 'POST',
        path: '/api/v1/templates/wall-jib-tie-rod/solve',
        headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${ready.key}`, 'Accept-Encoding': 'identity' },
        body: ready.solveBody,
      },
      {
        // The same endpoint asked a new question each time: every answer is solved and serialised.
        name: 'v1 solve, a new question each request',
        method: 'POST',
        path: '/api/v1/templates/wall-jib-tie-rod/solve',
        headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${ready.key}`, 'Accept-Encoding': 'identity' },
        freshBody: (n) => JSON.stringify({ inputs: { L: 2000 + (n % 1_000_000) * 0.004, h: 1500 } }),
      },
    ];
    await run(url, { ...targets[2]!, path: targets[2]!.path }); // warm-up: compile caches, JIT
    const runs = new Map<string, Run[]>(targets.map((t) => [t.name, []]));
    for (let round = 0; round < ROUNDS; round++) {
      const order = round % 2 === 0 ? targets : [...targets].reverse();
      for (const t of order) runs.get(t.name)!.push(await run(url, t));
    }
    const summary = targets.map((t) => {
      const rs = runs.get(t.name)!;
      return { name: t.name, rps: median(rs.map((r) => r.rps)), p50: median(rs.map((r) => r.p50)), p99: median(rs.map((r) => r.p99)), non2xx: rs.reduce((s, r) => s + r.non2xx, 0) };
    });
    const [bare, mw, solve] = summary as [(typeof summary)[0], (typeof summary)[0], (typeof summary)[0]];
    const rows = [
      ['target', 'req/s', 'p50 ms', 'p99 ms', 'non-2xx', 'req/s vs middleware', 'p99 vs middleware'],
      ...summary.map((s) => [s.name, s.rps.toFixed(0), String(s.p50), String(s.p99), String(s.non2xx), (s.rps / mw.rps).toFixed(2), (s.p99 / mw.p99).toFixed(2)]),
    ];
    const pass = solve.rps >= 0.8 * mw.rps && solve.p99 <= 1.5 * mw.p99;
    const note = `${CONNECTIONS} connections, ${SECONDS} s a run, ${ROUNDS} rounds in alternating order (medians); responses ${ready.bytes} bytes; bare/middleware ${(bare.rps / mw.rps).toFixed(2)}`;
    return { rows, pass, note };
  } finally {
    child.kill('SIGTERM');
  }
}
