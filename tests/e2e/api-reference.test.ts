import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { launchBrowser, type TestBrowser } from './support/browser';
import { expectHeading } from './support/heading';
import { watchContext, type PageProblems } from './support/page-watch';
import { artifactsDir } from './support/paths';
import { startBuiltServer, type RunningServer } from './support/server';

// The API reference on a development server: Swagger UI on the v1 document under our own
// framing, the demo key filled in, "Try it out" answered by this same server, and nothing that
// the Content-Security-Policy (no eval, no inline styles) has to refuse.

let server: RunningServer;
let browser: TestBrowser;
let problems: PageProblems;
let page: Page;
let demoKey: string;
let operations: { method: string; path: string; operationId: string }[];

const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

beforeAll(async () => {
  server = await startBuiltServer({ NODE_ENV: 'development' });
  const printed = /^Demo API key \(development only[^\n]*\n\s+(pw_sk_\S+)/m.exec(server.output());
  if (!printed) throw new Error(`the development server did not print a demo API key:\n${server.output()}`);
  demoKey = printed[1]!;
  const doc = (await (await fetch(`${server.url}/api/v1/openapi.json`)).json()) as { paths: Record<string, Record<string, { operationId: string }>> };
  operations = Object.entries(doc.paths).flatMap(([path, item]) => Object.entries(item).map(([method, op]) => ({ method: method.toUpperCase(), path, operationId: op.operationId })));
  browser = await launchBrowser();
  problems = await watchContext(browser.context);
  page = browser.context.pages()[0] ?? (await browser.context.newPage());
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

beforeEach(async () => {
  await page.setViewportSize({ width: 1280, height: 900 });
  problems.clear();
});

async function openReference() {
  await page.goto(`${server.url}/developers/api`, { waitUntil: 'networkidle' });
  await expectHeading(page, 'API reference');
  await page.locator('.pinwork-openapi .opblock').first().waitFor();
}

function operationBlock(method: string, path: string): Locator {
  return page.locator('.opblock').filter({ has: page.locator(`.opblock-summary-method:text-is("${method}")`) }).filter({ has: page.locator(`.opblock-summary-path[data-path="${path}"]`) });
}

/** Opens an operation, switches it to "Try it out", runs it and answers the status shown and the response text. */
async function tryItOut(method: string, path: string): Promise<{ status: string; body: string; curl: string }> {
  const block = operationBlock(method, path);
  await block.locator('.opblock-summary').first().click();
  await block.getByRole('button', { name: 'Try it out' }).click();
  await block.getByRole('button', { name: 'Execute' }).click();
  const live = block.locator('.live-responses-table tbody tr.response');
  await live.first().waitFor({ timeout: 20_000 });
  return {
    status: (await live.first().locator('.response-col_status').innerText()).trim(),
    body: await block.locator('.live-responses-table .response-col_description .microlight').first().innerText(),
    curl: await block.locator('.curl-command').innerText(),
  };
}

describe('API reference page (development server)', () => {
  it('is linked from the footer and shows every operation of the v1 document with the demo key filled in', async () => {
    await page.goto(`${server.url}/`, { waitUntil: 'networkidle' });
    await page.getByRole('contentinfo').getByRole('link', { name: 'API reference' }).click();
    await page.waitForURL(`${server.url}/developers/api`);
    await expectHeading(page, 'API reference');
    await page.locator('.pinwork-openapi .opblock').first().waitFor();

    expect(operations.length).toBeGreaterThanOrEqual(9);
    expect(await page.locator('.pinwork-openapi .opblock').count()).toBe(operations.length);
    for (const op of operations) expect(await operationBlock(op.method, op.path).count(), `${op.method} ${op.path}`).toBe(1);

    for (const name of ['Keys', 'Scopes', 'Limits', 'Errors']) await expect(page.getByRole('heading', { level: 2, name }).isVisible()).resolves.toBe(true);
    const notice = page.getByRole('status').filter({ hasText: 'the demo key is filled in' });
    expect(await notice.textContent()).toContain(demoKey);
    // Authorize shows the scheme as already authorised with the demo key.
    await page.locator('.pinwork-openapi .btn.authorize').click();
    const dialog = page.locator('.pinwork-openapi .dialog-ux');
    await dialog.getByRole('button', { name: 'Remove authorization' }).waitFor();
    expect(await dialog.getByRole('heading', { level: 6 }).textContent()).toBe('Authorized');
    await dialog.getByRole('button', { name: 'Close' }).click();

    await page.screenshot({ path: join(artifactsDir, 'api-reference-1280.png'), fullPage: true });
    expect(problems.all()).toEqual([]);
  });

  it('runs GET /templates from the page with the demo key and shows 200 with the template list', async () => {
    await openReference();
    const answer = await tryItOut('GET', '/templates');
    expect(answer.status).toBe('200');
    expect(answer.body).toContain('"wall-jib-tie-rod"');
    expect(answer.curl).toContain(`Authorization: Bearer ${demoKey}`);
    // The request went to this origin's /api/v1, as the document's relative server says.
    expect(answer.curl).toContain(`${server.url}/api/v1/templates`);
    expect(problems.all()).toEqual([]);
  });

  it('runs POST /templates/{slug}/solve with its documented example and shows 200 with results', async () => {
    await openReference();
    const answer = await tryItOut('POST', '/templates/{slug}/solve');
    expect(answer.status).toBe('200');
    const body = JSON.parse(answer.body) as { slug: string; contentHash: string; result: { ok: boolean; inputs: Record<string, number> } };
    expect(body.slug).toBe('wall-jib-tie-rod');
    expect(body.contentHash).toMatch(/^[0-9a-f]{64}$/);
    expect(body.result.ok).toBe(true);
    expect(body.result.inputs).toMatchObject({ L: 4000, h: 1500 });
    expect(answer.curl).toContain(`${server.url}/api/v1/templates/wall-jib-tie-rod/solve`);
    expect(answer.curl).toMatch(/"L":\s*4000/);
    await page.screenshot({ path: join(artifactsDir, 'api-reference-solve-1280.png'), fullPage: false });
    expect(problems.all()).toEqual([]);
  });

  it('fits a 360 px screen without sideways scrolling of the page, with an operation open and run', async () => {
    await page.setViewportSize({ width: 360, height: 800 });
    await openReference();
    const overflow = () => page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(await overflow()).toBeLessThanOrEqual(0);
    await page.screenshot({ path: join(artifactsDir, 'api-reference-360.png'), fullPage: true });
    const answer = await tryItOut('POST', '/templates/{slug}/solve');
    expect(answer.status).toBe('200');
    expect(await overflow()).toBeLessThanOrEqual(0);
    await operationBlock('POST', '/templates/{slug}/solve').screenshot({ path: join(artifactsDir, 'api-reference-solve-360.png') });
    expect(problems.all()).toEqual([]);
  });

  it('has no serious or critical axe-core violations in our framing (the viewer is reported, not judged)', async () => {
    await openReference();
    await page.evaluate(axeSource);
    type Violation = { id: string; impact: string | null; nodes: { target: unknown }[] };
    const run = (context: unknown) =>
      page.evaluate(async (ctx) => {
        const axe = (window as unknown as { axe: { run: (c: unknown, o: unknown) => Promise<{ violations: Violation[] }> } }).axe;
        const result = await axe.run(ctx, { resultTypes: ['violations'] });
        return result.violations.map((v) => ({ id: v.id, impact: v.impact, targets: v.nodes.map((n) => JSON.stringify(n.target)) }));
      }, context);
    const ours = await run({ exclude: [['.pinwork-openapi']] });
    expect(ours.filter((v) => v.impact === 'serious' || v.impact === 'critical')).toEqual([]);
    const viewer = await run({ include: [['.pinwork-openapi']] });
    console.info(`axe on the Swagger UI part: ${viewer.length ? viewer.map((v) => `${v.id} (${v.impact}, ${v.targets.length})`).join('; ') : 'no violations'}`);
  });
});
