// Measures the built calculator in Chromium (not a test: speed figures belong in a report,
// never in a timed assertion). Usage: start the server on the built client, then
//   node_modules/.bin/tsx tests/e2e/measure-calculator.ts http://127.0.0.1:3000 [slug]
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { gzipSync } from 'node:zlib';
import { chromium } from 'playwright-core';

const base = process.argv[2] ?? 'http://127.0.0.1:3000';
const slug = process.argv[3] ?? 'wall-jib-tie-rod';
const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--no-sandbox', '--headless', '--disable-gpu'] });
const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
const page = await context.newPage();

const scripts: { url: string; bytes: number; gzip: number; transferred: number }[] = [];
page.on('response', async (response) => {
  const type = response.headers()['content-type'] ?? '';
  if (!type.includes('javascript')) return;
  const body = await response.body().catch(() => Buffer.alloc(0));
  const sizes = await response.request().sizes().catch(() => ({ responseBodySize: body.length, responseHeadersSize: 0 }));
  scripts.push({ url: response.url().replace(base, ''), bytes: body.length, gzip: gzipSync(body).length, transferred: sizes.responseBodySize + sizes.responseHeadersSize });
});

await page.goto(`${base}/templates/${slug}`, { waitUntil: 'networkidle' });
await page.locator('[data-solve-state="current"]').waitFor();
const sum = (xs: typeof scripts, k: 'bytes' | 'gzip' | 'transferred') => xs.reduce((s, x) => s + x[k], 0);
const first = scripts.filter((s) => !s.url.includes('charts-panel'));
console.log('JavaScript for the calculator page:');
for (const s of scripts) console.log(`  ${s.url}  ${(s.bytes / 1024).toFixed(1)} kB raw, ${(s.gzip / 1024).toFixed(1)} kB gzip, ${(s.transferred / 1024).toFixed(1)} kB on the wire`);
console.log(`  first load without the lazy charts: ${(sum(first, 'gzip') / 1024).toFixed(1)} kB gzip (${(sum(first, 'transferred') / 1024).toFixed(1)} kB on the wire as served)`);
console.log(`  with the charts chunk: ${(sum(scripts, 'gzip') / 1024).toFixed(1)} kB gzip (${(sum(scripts, 'transferred') / 1024).toFixed(1)} kB on the wire)`);

// Changed input → updated results: from the keystroke to the results marked current for it.
const detail = (await (await fetch(`${base}/api/templates/${slug}`)).json()) as { spec: { inputs: { key: string; label: string; control: string; min: number; max: number; default: number }[] } };
const input = detail.spec.inputs.find((i) => i.control === 'number')!;
const field = page.locator(`#root_${input.key}`);
const times: number[] = [];
for (let i = 0; i < 20; i++) {
  const value = Number((input.default + ((input.max - input.min) * (i % 2 === 0 ? 0.05 : 0.1)) * (1 + i / 100)).toPrecision(6));
  await field.fill('');
  await page.waitForTimeout(400);
  const start = await page.evaluate(() => performance.now());
  await field.fill(String(value));
  // A string, not a function: tsx would wrap a named function in a helper the page lacks.
  const end = (await page.evaluate(`new Promise((resolve) => {
    const key = ${JSON.stringify(input.key)}, value = ${value};
    const check = () => {
      const el = document.querySelector('[data-solve-state="current"]');
      const solved = el ? JSON.parse(el.getAttribute('data-solved-for') || '{}') : {};
      if (el && Math.abs((solved[key] ?? NaN) - value) < 1e-9 * Math.max(1, Math.abs(value))) resolve(performance.now());
      else requestAnimationFrame(check);
    };
    check();
  })`)) as number;
  times.push(end - start);
}
times.sort((a, b) => a - b);
console.log(`Changed input → updated results (${input.label}, 20 changes, debounce 250 ms included): median ${((times[9]! + times[10]!) / 2).toFixed(0)} ms, min ${times[0]!.toFixed(0)} ms, max ${times[19]!.toFixed(0)} ms`);

const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');
for (const path of ['/templates', `/templates/${slug}`]) {
  await page.goto(`${base}${path}`, { waitUntil: 'networkidle' });
  await page.waitForTimeout(800);
  await page.evaluate(axeSource);
  const r = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (c: unknown, o: unknown) => Promise<{ violations: { id: string; impact: string }[]; passes: unknown[] }> } }).axe;
    const out = await axe.run(document, {});
    return { violations: out.violations.map((v) => `${v.id} (${v.impact})`), passes: out.passes.length };
  });
  console.log(`axe ${path}: ${r.violations.length} violations${r.violations.length ? `: ${r.violations.join(', ')}` : ''}; ${r.passes} rules passed`);
}
await browser.close();
