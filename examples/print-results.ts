/**
 * A tiny client of the Pinwork API v1: solves one template with a key and prints its results
 * as a table.
 *
 *   PINWORK_URL=http://localhost:3000 PINWORK_KEY=pw_sk_… \
 *     node_modules/.bin/tsx examples/print-results.ts wall-jib-tie-rod L=4500 h=1600
 *
 * Add `--us` for US customary units. Depends on nothing but Node's fetch.
 */

interface ResultRow {
  key: string;
  label: string;
  value: number | null;
  quantity: string;
}

interface Problem {
  type: string;
  title: string;
  detail?: string;
  errors?: { path: string; message: string }[];
}

export async function solveTable(baseUrl: string, key: string, slug: string, inputs: Record<string, number>, units: 'SI' | 'US' = 'SI'): Promise<string> {
  const res = await fetch(`${baseUrl}/api/v1/templates/${encodeURIComponent(slug)}/solve`, {
    method: 'POST',
    headers: { Authorization: `Bearer ${key}`, 'Content-Type': 'application/json' },
    body: JSON.stringify({ inputs, units }),
  });
  const body = (await res.json()) as { version: string; result: { results: ResultRow[]; checks: { label: string; verdict: string }[] } } & Problem;
  if (!res.ok) {
    const fields = (body.errors ?? []).map((e) => `\n  ${e.path || '(body)'}: ${e.message}`).join('');
    throw new Error(`${res.status} ${body.title}: ${body.detail ?? ''}${fields}`);
  }
  const rows = body.result.results.map((r) => [r.label, r.value === null ? '—' : r.value.toPrecision(5), r.quantity]);
  const width = [0, 1, 2].map((i) => Math.max(...rows.map((r) => r[i]!.length), ['Result', 'Value', 'Quantity'][i]!.length));
  const line = (cells: string[]) => cells.map((c, i) => (i === 1 ? c.padStart(width[i]!) : c.padEnd(width[i]!))).join('  ');
  return [
    `${slug} ${body.version} (${units})`,
    line(['Result', 'Value', 'Quantity']),
    line(width.map((w) => '-'.repeat(w))),
    ...rows.map(line),
    '',
    ...body.result.checks.map((c) => `${c.verdict.toUpperCase().padEnd(5)} ${c.label}`),
  ].join('\n');
}

const isMain = process.argv[1] && import.meta.url.endsWith(process.argv[1].replace(/\\/g, '/').split('/').pop()!);
if (isMain) {
  const args = process.argv.slice(2);
  const slug = args.find((a) => !a.includes('=') && !a.startsWith('--')) ?? 'wall-jib-tie-rod';
  const inputs = Object.fromEntries(args.filter((a) => a.includes('=')).map((a) => [a.split('=')[0]!, Number(a.split('=')[1])]));
  const key = process.env.PINWORK_KEY;
  if (!key) {
    process.stderr.write('Set PINWORK_KEY to an API key with the solve scope.\n');
    process.exit(2);
  }
  solveTable(process.env.PINWORK_URL ?? 'http://localhost:3000', key, slug, inputs, args.includes('--us') ? 'US' : 'SI').then(
    (table) => process.stdout.write(`${table}\n`),
    (error: Error) => {
      process.stderr.write(`${error.message}\n`);
      process.exit(1);
    },
  );
}
