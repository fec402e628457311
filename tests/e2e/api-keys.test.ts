import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { launchBrowser, type TestBrowser } from './support/browser';
import { expectHeading } from './support/heading';
import { watchContext, type PageProblems } from './support/page-watch';
import { artifactsDir } from './support/paths';
import { startBuiltServer, type RunningServer } from './support/server';

// A supplier's way to the API, through the real server: make a key in the app, read it the one
// time it is shown, call the API with it from outside the browser until its own rate limit
// answers, see the calls and the last use in the app, revoke it and be refused; an admin then
// finds it among every key.

let server: RunningServer;
let browser: TestBrowser;
let problems: PageProblems;
let page: Page;
let base: string;

interface Demo {
  email: string;
  password: string;
}
const demo: Record<'admin' | 'supplier', Demo> = {} as never;
const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');
const keyName = `Quote builder ${Date.now() % 100_000}`;
const solveBody = JSON.stringify({ version: '^1.0.0', inputs: { L: 4000, h: 1500 }, units: 'SI' });
let secret = '';
let prefix = '';

beforeAll(async () => {
  // Demo accounts exist only on a development server.
  server = await startBuiltServer({ NODE_ENV: 'development' });
  base = server.url.replace('//127.0.0.1:', '//localhost:');
  for (const role of ['admin', 'supplier'] as const) {
    const line = server.output().match(new RegExp(`^\\s*${role}\\s+(\\S+@\\S+)\\s+(\\S+)\\s+\\((.+)\\)`, 'm'));
    if (!line) throw new Error(`the server did not print the ${role} demo account:\n${server.output()}`);
    demo[role] = { email: line[1]!, password: line[2]! };
  }
  browser = await launchBrowser();
  await browser.context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: base });
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

async function shoot(name: string) {
  await page.screenshot({ path: join(artifactsDir, `${name}.png`), fullPage: true });
}

async function signIn(who: Demo, lands: RegExp) {
  await page.goto(`${base}/sign-in`, { waitUntil: 'networkidle' });
  await page.getByLabel('E-mail').fill(who.email);
  await page.getByLabel('Password').fill(who.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(lands);
}

async function seriousAxeViolations() {
  await page.evaluate(axeSource);
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: Document) => Promise<{ violations: { id: string; impact: string | null; nodes: { target: unknown }[] }[] }> } }).axe;
    return (await axe.run(document)).violations.map((v) => ({ id: v.id, impact: v.impact, targets: v.nodes.map((n) => JSON.stringify(n.target)) }));
  });
  return violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
}

const pageOverflow = () => page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);

function solve(key: string) {
  return fetch(`${server.url}/api/v1/templates/wall-jib-tie-rod/solve`, {
    method: 'POST',
    headers: { Authorization: `Bearer ${key}`, 'Content-Type': 'application/json' },
    body: solveBody,
  });
}

/** Reloads the organisation page until `check` holds (usage is written in batches each second). */
async function reloadUntil(check: () => Promise<boolean>, what: string, timeoutMs = 15_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    await page.reload({ waitUntil: 'networkidle' });
    await page.locator('[data-api-keys]').waitFor();
    if (await check()) return;
    if (Date.now() > deadline) throw new Error(`the page did not show ${what} within ${timeoutMs} ms`);
    await page.waitForTimeout(400);
  }
}

const keyRow = () => page.locator(`tr[data-key-prefix="${prefix}"]`);

describe('API keys in the browser', () => {
  it('lets the supplier owner make a secret key with the solve scope and shows it once, with focus on it', async () => {
    await signIn(demo.supplier, /\/supplier$/);
    await page.goto(`${base}/organisation`, { waitUntil: 'networkidle' });
    await expectHeading(page, 'My organisation');
    await page.getByRole('heading', { name: 'API keys' }).waitFor();

    await page.getByRole('button', { name: 'New key' }).click();
    const dialog = page.getByRole('dialog', { name: 'A new API key' });
    await dialog.waitFor();
    // An empty name is refused beside the field, before anything is sent.
    await dialog.getByRole('button', { name: 'Make the key' }).click();
    expect(await dialog.getByText('Name must not be empty.').isVisible()).toBe(true);
    expect(await dialog.getByLabel('Name').getAttribute('aria-invalid')).toBe('true');

    await dialog.getByLabel('Name').fill(keyName);
    expect(await dialog.getByRole('checkbox', { name: /^Solve/ }).isChecked()).toBe(true);
    await dialog.getByLabel('Calls a minute (optional)').fill('4');
    await shoot('api-keys-create-dialog');
    expect(await seriousAxeViolations()).toEqual([]);
    await dialog.getByRole('button', { name: 'Make the key' }).click();

    const panel = page.getByRole('region', { name: `Your new key “${keyName}”` });
    await panel.waitFor();
    expect(await dialog.isVisible()).toBe(false);
    expect(await panel.evaluate((el) => el === document.activeElement)).toBe(true);
    secret = await panel.locator('[data-secret-key]').inputValue();
    expect(secret).toMatch(/^pw_sk_[0-9a-z]{10}_[A-Za-z0-9_-]{32}$/);
    prefix = secret.slice(0, 'pw_sk_'.length + 10);
    expect(await panel.textContent()).toMatch(/will not show it again/);
    const curl = await panel.locator('[data-curl]').textContent();
    expect(curl).toContain(`-H "Authorization: Bearer ${secret}"`);
    expect(curl).toContain('/api/v1/templates/wall-jib-tie-rod/solve');

    await panel.getByRole('button', { name: 'Copy the key' }).click();
    await panel.getByText('Copied.').waitFor();
    expect(await page.evaluate(() => navigator.clipboard.readText())).toBe(secret);

    expect(await keyRow().locator('[data-last-used]').textContent()).toBe('Not yet');
    expect(await keyRow().locator('[data-key-state]').getAttribute('data-key-state')).toBe('active');
    await shoot('api-keys-created-1280');
    expect(await seriousAxeViolations()).toEqual([]);
    expect(problems.all()).toEqual([]);
  });

  it('answers calls with the key until its own rate limit, and shows the calls and the last use', async () => {
    for (let i = 0; i < 4; i++) {
      const res = await solve(secret);
      expect(res.status, await res.text()).toBe(200);
    }
    const limited = await solve(secret);
    expect(limited.status).toBe(429);
    expect(Number(limited.headers.get('retry-after'))).toBeGreaterThan(0);
    expect(limited.headers.get('content-type')).toMatch(/^application\/problem\+json/);

    // After a reload the secret is gone from the page for good.
    await reloadUntil(async () => (await keyRow().locator('[data-last-used]').textContent()) !== 'Not yet', 'the last use');
    expect(await page.locator('[data-secret-key]').count()).toBe(0);
    expect(await page.content()).not.toContain(secret);

    await reloadUntil(async () => (await page.locator('[data-usage-total]').textContent()) === '4', 'four calls in the usage');
    const usage = page.getByRole('region', { name: 'API usage' }).or(page.locator('section[aria-labelledby="api-usage-heading"]'));
    await usage.first().scrollIntoViewIfNeeded();
    await page.locator('[data-usage-chart] .recharts-bar-rectangle').first().waitFor();
    expect(await page.locator('figcaption', { hasText: 'stacked by endpoint' }).textContent()).toContain('Solve 4');
    expect(await page.locator('[data-quota]').textContent()).toMatch(/^4 calls of 100,000 this month/);

    await page.getByRole('radio', { name: 'Key' }).check();
    expect(await page.locator('figcaption', { hasText: 'stacked by key' }).textContent()).toContain(`${keyName} (${prefix}) 4`);
    await page.getByText('The calls as a table').click();
    const today = new Date().toISOString().slice(0, 10);
    const todayLabel = new Date(`${today}T00:00:00Z`).toLocaleDateString('en-GB', { day: 'numeric', month: 'short', timeZone: 'UTC' });
    expect(await page.locator('[data-usage-table] tbody tr').first().textContent()).toBe(`${todayLabel}4`);
    await shoot('api-keys-usage-1280');
    expect(await seriousAxeViolations()).toEqual([]);
    expect(problems.all()).toEqual([]);
  });

  it('fits 360 px: the keys as cards, the chart and the table without sideways scrolling', async () => {
    await page.setViewportSize({ width: 360, height: 780 });
    await page.goto(`${base}/organisation`, { waitUntil: 'networkidle' });
    await page.locator(`li[data-key-prefix="${prefix}"]`).waitFor();
    expect(await keyRow().isVisible()).toBe(false);
    await page.locator('section[aria-labelledby="api-usage-heading"]').scrollIntoViewIfNeeded();
    await page.locator('[data-usage-chart] .recharts-bar-rectangle').first().waitFor();
    expect(await pageOverflow()).toBeLessThanOrEqual(0);
    await shoot('api-keys-organisation-360');
    expect(await seriousAxeViolations()).toEqual([]);
    expect(problems.all()).toEqual([]);
  });

  it('rotates the key with a chosen grace period: a new key shown once, the old one still working until then', async () => {
    await page.goto(`${base}/organisation`, { waitUntil: 'networkidle' });
    await keyRow().getByRole('button', { name: `Rotate ${keyName} (${prefix})` }).click();
    const dialog = page.getByRole('dialog', { name: `Rotate “${keyName}”` });
    await dialog.waitFor();
    await dialog.getByLabel('The old key keeps working for').selectOption({ label: 'One hour' });
    await dialog.getByRole('button', { name: 'Make the new key' }).click();
    const panel = page.getByRole('region', { name: `The new key for “${keyName}”` });
    await panel.waitFor();
    expect(await panel.evaluate((el) => el === document.activeElement)).toBe(true);
    const rotated = await panel.locator('[data-secret-key]').inputValue();
    expect(rotated).not.toBe(secret);
    await keyRow().locator('[data-key-state="rotating"]').waitFor();
    expect(await keyRow().locator('[data-key-state]').textContent()).toMatch(/^↻Rotatinguntil /);
    expect(await keyRow().getByRole('button', { name: /^Rotate/ }).count()).toBe(0);
    const newRow = page.locator(`tr[data-key-prefix="${rotated.slice(0, 16)}"]`);
    expect(await newRow.locator('[data-key-state]').getAttribute('data-key-state')).toBe('active');
    // The old key's rate-limit window may still be full; any answer but a key refusal shows it is still valid.
    const during = await solve(secret);
    expect([200, 429]).toContain(during.status);
    expect((await solve(rotated)).status).toBe(200);
    await panel.getByRole('button', { name: 'I have stored the key' }).click();
    expect(await panel.count()).toBe(0);
    expect(problems.all()).toEqual([]);
  });

  it('revokes the key after a confirmation, and the next call is refused with problem details', async () => {
    await page.goto(`${base}/organisation`, { waitUntil: 'networkidle' });
    await keyRow().getByRole('button', { name: `Revoke ${keyName} (${prefix})` }).click();
    const confirm = page.getByRole('dialog', { name: `Revoke “${keyName}”?` });
    await confirm.waitFor();
    await confirm.getByRole('button', { name: 'Revoke the key' }).click();
    await page.getByText(`${keyName} (${prefix}…) is revoked`).waitFor();
    await keyRow().locator('[data-key-state="revoked"]').waitFor();
    expect(await keyRow().getByRole('button').count()).toBe(0);

    const refused = await solve(secret);
    expect([401, 403]).toContain(refused.status);
    expect(refused.headers.get('content-type')).toMatch(/^application\/problem\+json/);
    const problem = (await refused.json()) as { type: string; title: string };
    expect(problem.type).toBe('/problems/key-revoked');
    expect(problems.all()).toEqual([]);
  });

  it('shows an admin the key among every key, with its organisation, and filters by status', async () => {
    await page.getByRole('banner').getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/\/sign-in\?signedOut=1$/);
    await signIn(demo.admin, /\/admin$/);
    await page.getByRole('navigation', { name: 'Administration' }).getByRole('link', { name: 'API keys' }).click();
    await page.waitForURL(`${base}/admin/api-keys`);
    await page.getByRole('heading', { name: 'API keys', level: 2 }).waitFor();
    await keyRow().waitFor();
    expect(await keyRow().textContent()).toContain('Brightwater Rigging Supply');
    expect(await keyRow().locator('[data-key-state]').getAttribute('data-key-state')).toBe('revoked');

    await page.getByLabel('Status').selectOption('active');
    await keyRow().waitFor({ state: 'detached' });
    expect(await page.locator('tr[data-key-prefix]').count()).toBeGreaterThan(0);
    await page.getByLabel('Status').selectOption('revoked');
    await keyRow().waitFor();
    await page.locator('[data-usage-total]').waitFor();
    expect(Number(await page.locator('[data-usage-total]').textContent())).toBeGreaterThanOrEqual(4);
    await page.locator('[data-usage-chart] .recharts-bar-rectangle').first().waitFor();
    await shoot('api-keys-admin-1280');
    expect(await seriousAxeViolations()).toEqual([]);

    await page.setViewportSize({ width: 360, height: 780 });
    await page.locator(`li[data-key-prefix="${prefix}"]`).waitFor();
    expect(await pageOverflow()).toBeLessThanOrEqual(0);
    await shoot('api-keys-admin-360');
    expect(await seriousAxeViolations()).toEqual([]);
    expect(problems.all()).toEqual([]);
  });
});
