import { benchEngine } from './engine';
import { benchHttp } from './http';

/** `npm run bench`: prints each section's table. Goals are reported, never asserted by tests. */
function table(rows: string[][]): string {
  const widths = rows[0]!.map((_, c) => Math.max(...rows.map((r) => (r[c] ?? '').length)));
  return rows.map((r, i) => {
    const line = r.map((cell, c) => cell.padEnd(widths[c]!)).join('  ');
    return i === 0 ? `${line}\n${widths.map((w) => '-'.repeat(w)).join('  ')}` : line;
  }).join('\n');
}

console.log(`Pinwork benchmark — Node ${process.version}, ${new Date().toISOString()}\n`);
// --http-only skips the engine section; --no-http skips the HTTP one.
if (!process.argv.includes('--http-only')) {
  console.log('Engine\n');
  const engine = benchEngine();
  console.log(table(engine.rows));
  console.log(`\nEngine goals: ${engine.pass ? 'all met' : 'some missed'}`);
}

if (!process.argv.includes('--no-http')) {
  console.log('\nHTTP\n');
  const http = await benchHttp();
  console.log(table(http.rows));
  console.log(`\n${http.note}`);
  console.log(`HTTP goal (v1 solve ≥ 0.80× the middleware baseline's req/s, p99 ≤ 1.5×): ${http.pass ? 'met' : 'missed'}`);
}
