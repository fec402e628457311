import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { launchBrowser, type TestBrowser } from './support/browser';
import { expectHeading } from './support/heading';
import { pageOverflow as overflowOf, seriousAxeViolations as seriousAxe } from './support/page-checks';
import { demoAccountsFrom, signInWithForm, signOutWithMenu } from './support/session';
import { watchContext, type PageProblems } from './support/page-watch';
import { artifactsDir } from './support/paths';
import { startBuiltServer, type RunningServer } from './support/server';

// A new person's way in, through the real server in development mode (its own SMTP server
// keeps every message; the demo admin reads them in the outbox): sign up, confirm the address
// from the mail, sign in, reach the role's start page; then the admin changes that person's
// role and the next sign-in lands on the new role's page.

let server: RunningServer;
let browser: TestBrowser;
let problems: PageProblems;
let page: Page;
let base: string;

let demo: ReturnType<typeof demoAccountsFrom>;

const person = { name: 'Dara Quill', email: `dara.quill.${Date.now()}@example.com`, password: 'copper kettle under 19 stairs' };

beforeAll(async () => {
  server = await startBuiltServer({ NODE_ENV: 'development' });
  // The server accepts changes only from its public origin, which it names with "localhost".
  base = server.url.replace('//127.0.0.1:', '//localhost:');
  demo = demoAccountsFrom(server.output());
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

async function shoot(name: string, fullPage = true) {
  await page.screenshot({ path: join(artifactsDir, `${name}.png`), fullPage });
}

const signIn = (email: string, password: string) => signInWithForm(page, base, email, password);
const signOut = () => signOutWithMenu(page);

/** The header's link to the account, named by who is signed in and as what role. */
function accountLink(name: string, role: string): RegExp {
  return new RegExp(`^Your account: ${name}\\W+signed in as\\W+${role}$`);
}

const seriousAxeViolations = () => seriousAxe(page);
const pageOverflow = () => overflowOf(page);

describe('accounts in the browser', () => {
  it('refuses a weak password beside the field, then signs up and says where the link went', async () => {
    await page.goto(`${base}/sign-up`, { waitUntil: 'networkidle' });
    await expectHeading(page, 'Create an account');
    await page.getByLabel('Name').fill(person.name);
    await page.getByLabel('E-mail').fill(person.email);
    const password = page.getByLabel('Password', { exact: true });
    await password.fill('short');
    expect(await page.locator('[data-password-strength]').getAttribute('data-password-strength')).toBe('1');
    await page.getByRole('button', { name: 'Create the account' }).click();
    expect(await password.getAttribute('aria-invalid')).toBe('true');
    expect(await page.getByText('Password must be at least 10 characters.').isVisible()).toBe(true);

    await password.fill(person.password);
    expect(Number(await page.locator('[data-password-strength]').getAttribute('data-password-strength'))).toBeGreaterThanOrEqual(3);
    await shoot('auth-sign-up');
    expect(await seriousAxeViolations()).toEqual([]);
    await page.getByRole('button', { name: 'Create the account' }).click();

    await page.waitForURL(/\/sign-up\/check-email\?email=/);
    await expectHeading(page, 'Check your e-mail');
    expect(await page.locator('main').textContent()).toContain(person.email);
    await shoot('auth-check-email');
    expect(problems.all()).toEqual([]);
  });

  it('gives one message for a wrong password and for an unknown address, and asks for confirmation first', async () => {
    await signIn(person.email, 'not the password at all');
    const failed = page.getByRole('alert');
    await failed.waitFor();
    const wrongPassword = await failed.textContent();
    await signIn(`nobody.${Date.now()}@example.com`, 'not the password at all');
    await page.getByRole('alert').waitFor();
    expect(await page.getByRole('alert').textContent()).toBe(wrongPassword);
    expect(wrongPassword).toMatch(/e-mail address or the password is not right/);
    await shoot('auth-sign-in-failed');

    await signIn(person.email, person.password);
    await page.getByText('Confirm your e-mail address first').waitFor();
    expect(await page.getByRole('button', { name: 'Send the link again' }).isVisible()).toBe(true);
    // The refusals above are answers the page expected (401, 403), not faults.
    expect(problems.pageErrors).toEqual([]);
    expect(problems.cspViolations).toEqual([]);
  });

  it('lets the demo admin read the confirmation mail in the outbox and follow its link', async () => {
    await signIn(demo.admin.email, demo.admin.password);
    await page.waitForURL(`${base}/admin`);
    const banner = page.getByRole('banner');
    expect(await banner.getByRole('link', { name: accountLink(demo.admin.name, 'Administrator') }).isVisible()).toBe(true);
    expect(await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Admin' }).isVisible()).toBe(true);

    await page.getByRole('navigation', { name: 'Administration' }).getByRole('link', { name: 'Mail outbox' }).click();
    await page.waitForURL(`${base}/admin/mail`);
    await page.getByLabel('Addressee').fill(person.email);
    const row = page.locator(`[data-mail-row="${person.email}"]`).first();
    await row.waitFor({ timeout: 20_000 });
    await row.click();
    const text = page.locator('[data-mail-text]');
    await text.waitFor();
    expect(await page.locator('[data-mail-to]').textContent()).toBe(person.email);
    const frame = page.frameLocator('iframe[title^="HTML part"]');
    await frame.locator('body').waitFor();
    expect((await frame.locator('body').textContent())?.trim().length).toBeGreaterThan(20);
    expect(await page.locator('iframe[title^="HTML part"]').getAttribute('sandbox')).toBe('');
    expect(await pageOverflow()).toBeLessThanOrEqual(0);
    await shoot('auth-outbox');
    expect(problems.all()).toEqual([]);

    const link = page.locator('[data-mail-link]', { hasText: '/verify-email?token=' }).first();
    const href = await link.getAttribute('href');
    expect(href).toMatch(/\/verify-email\?token=/);
    await signOut();
    // The person opens the link in their own (signed-out) browser.
    await page.goto(href!, { waitUntil: 'networkidle' });
    await page.getByText('Your e-mail address is confirmed').waitFor();
    expect(await page.locator('main').textContent()).toContain(person.email);
    await shoot('auth-verified');
    expect(problems.all()).toEqual([]);
  });

  it('signs the confirmed person in to their start page, shows the role, and hides what the role may not use', async () => {
    await signIn(person.email, person.password);
    await page.waitForURL(`${base}/`);
    const banner = page.getByRole('banner');
    await banner.getByRole('link', { name: accountLink(person.name, 'Member') }).waitFor();
    const nav = page.getByRole('navigation', { name: 'Main' });
    expect(await nav.getByRole('link', { name: 'Admin' }).count()).toBe(0);
    expect(await nav.getByRole('link', { name: 'My organisation' }).count()).toBe(0);

    await page.goto(`${base}/admin`, { waitUntil: 'networkidle' });
    await expectHeading(page, 'Not allowed for your role');
    expect(await page.locator('main').textContent()).toContain('signed in as Member');
    await shoot('auth-not-allowed');

    await page.goto(`${base}/account`, { waitUntil: 'networkidle' });
    await expectHeading(page, 'Your account');
    await page.locator('[data-session-current]').waitFor();
    expect(await page.locator('[data-session-current]').textContent()).toContain('This device');
    expect(await seriousAxeViolations()).toEqual([]);
    await shoot('auth-account');
    expect(problems.all()).toEqual([]);
    await signOut();
  });

  it('sends a visitor who opens a protected page to sign in and back again', async () => {
    await page.goto(`${base}/admin/audit`, { waitUntil: 'networkidle' });
    await page.waitForURL(/\/sign-in\?next=%2Fadmin%2Faudit$/);
    expect(await page.getByText('Sign in to open that page.').isVisible()).toBe(true);
    await page.getByLabel('E-mail').fill(demo.admin.email);
    await page.getByLabel('Password').fill(demo.admin.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${base}/admin/audit`);
    const rows = page.locator('[data-audit-action]');
    await rows.first().waitFor();
    const actions = await rows.evaluateAll((els) => els.map((e) => e.getAttribute('data-audit-action')));
    expect(actions).toContain('auth.sign-in-failed');
    expect(actions).toContain('auth.sign-up');
    expect(await page.locator('[data-audit-csv]').getAttribute('href')).toBe('/api/admin/audit.csv');

    // The filter goes to the server, and the CSV link carries the same filter.
    await page.getByLabel('Action').selectOption('auth.sign-in-failed');
    await page.getByRole('button', { name: 'Apply the filters' }).click();
    await expect
      .poll(async () => [...new Set(await rows.evaluateAll((els) => els.map((e) => e.getAttribute('data-audit-action'))))])
      .toEqual(['auth.sign-in-failed']);
    expect(await page.locator('[data-audit-csv]').getAttribute('href')).toBe('/api/admin/audit.csv?action=auth.sign-in-failed');
    const csv = await page.evaluate(async (href) => (await fetch(href!)).text(), await page.locator('[data-audit-csv]').getAttribute('href'));
    expect(csv.split('\n')[0]).toMatch(/^at,actor_kind,actor_id,actor_email,action,target,ip,details/);
    expect(csv).toContain('auth.sign-in-failed');
    expect(csv).not.toContain('auth.sign-up');
    await shoot('auth-admin-audit');
    expect(problems.all()).toEqual([]);
  });

  it('lets the admin change the person’s role after confirming, and the next sign-in lands on the new role’s page', async () => {
    await page.goto(`${base}/admin`, { waitUntil: 'networkidle' });
    await page.getByLabel('Search by name or e-mail').fill(person.email);
    const row = page.locator(`[data-user-email="${person.email}"]`);
    await row.waitFor();
    await expect.poll(() => page.locator('[data-user-email]').count()).toBe(1);
    const select = row.locator('[data-role-select]');
    expect(await select.inputValue()).toBe('user');

    await select.selectOption('engineer');
    const dialog = page.getByRole('dialog', { name: `Make ${person.name} Engineer?` });
    await dialog.waitFor();
    await shoot('auth-admin-role-dialog', false);
    await dialog.getByRole('button', { name: 'Change the role' }).click();
    await page.getByText(`${person.name} is now Engineer.`).waitFor();
    await expect.poll(() => select.inputValue()).toBe('engineer');
    await shoot('auth-admin-users');
    expect(problems.all()).toEqual([]);

    // Cancelling leaves the role as it was.
    await select.selectOption('admin');
    await page.getByRole('dialog').getByRole('button', { name: 'Cancel' }).click();
    await expect.poll(() => select.inputValue()).toBe('engineer');

    await signOut();
    await signIn(person.email, person.password);
    await page.waitForURL(`${base}/workbench`);
    await expectHeading(page, 'Your workbench');
    await page.getByRole('banner').getByRole('link', { name: accountLink(person.name, 'Engineer') }).waitFor();
    expect(problems.all()).toEqual([]);
    await signOut();
  });

  it('shows a supplier their organisation with its owner and members', async () => {
    await signIn(demo.supplier.email, demo.supplier.password);
    await page.waitForURL(`${base}/supplier`);
    const nav = page.getByRole('navigation', { name: 'Main' });
    await nav.getByRole('link', { name: 'My organisation' }).click();
    await page.waitForURL(`${base}/organisation`);
    const me = page.locator(`[data-member="${demo.supplier.email}"]`);
    await me.waitFor();
    expect(await me.textContent()).toContain('(you)');
    expect(await nav.getByRole('link', { name: 'Admin' }).count()).toBe(0);
    await shoot('auth-organisation');
    expect(problems.all()).toEqual([]);
  });

  it('fits 360 px without sideways scrolling on the sign-up, organisation and admin pages', async () => {
    await page.setViewportSize({ width: 360, height: 780 });
    await page.goto(`${base}/organisation`, { waitUntil: 'networkidle' });
    await page.locator('[data-member]').first().waitFor();
    expect(await pageOverflow()).toBeLessThanOrEqual(0);
    await shoot('auth-organisation-360');
    await signOut();

    await page.goto(`${base}/sign-up`, { waitUntil: 'networkidle' });
    expect(await pageOverflow()).toBeLessThanOrEqual(0);
    await shoot('auth-sign-up-360');

    await signIn(demo.admin.email, demo.admin.password);
    await page.waitForURL(`${base}/admin`);
    await page.locator('[data-user-email]').first().waitFor();
    expect(await pageOverflow()).toBeLessThanOrEqual(0);
    await shoot('auth-admin-users-360');
    expect(problems.all()).toEqual([]);
  });
});
