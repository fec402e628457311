import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { mailMessageSchema, mailPageSchema } from '../../shared/api/auth';
import { launchBrowser, type TestBrowser } from './support/browser';
import { expectHeading } from './support/heading';
import { pageOverflow, seriousAxeViolations } from './support/page-checks';
import { watchContext, type PageProblems } from './support/page-watch';
import { artifactsDir } from './support/paths';
import { startBuiltServer, type RunningServer } from './support/server';
import { demoAccountsFrom, signInWithForm, signOutWithMenu } from './support/session';

// The ways back into an account and into an organisation, through the real server in
// development mode: change the password while signed in, reset a forgotten one from the mailed
// link, and accept an organisation's invitation from its mail. The mails are read from the
// server's own SMTP outbox through the admin's dev mail API, as the person would open them.

let server: RunningServer;
let browser: TestBrowser;
let problems: PageProblems;
let page: Page;
let base: string;
let demo: ReturnType<typeof demoAccountsFrom>;
let adminCookie = '';

const person = { name: 'Ilse Marrow', email: `ilse.marrow.${Date.now()}@example.com`, password: 'seven brass pulleys on a beam' };
const changed = 'twelve oak wedges under a sill';
const reset = 'a quiet winch beside the dock';

/** A cookie-carrying fetch from outside the browser, as a page of our origin would send it. */
async function call(path: string, init: { method?: string; body?: unknown; cookie?: string } = {}) {
  const headers: Record<string, string> = { Origin: base };
  if (init.body !== undefined) headers['Content-Type'] = 'application/json';
  if (init.cookie) headers.Cookie = init.cookie;
  return fetch(`${base}${path}`, { method: init.method ?? 'GET', headers, body: init.body === undefined ? undefined : JSON.stringify(init.body) });
}

/** The first link to `path` in the newest mail to `to` whose subject matches. Mail is delivered by a worker: poll. */
async function linkFromMail(to: string, subject: RegExp, path: string): Promise<string> {
  const pattern = new RegExp(`https?://\\S+${path.replaceAll('/', '\\/')}\\?token=[^\\s)>"]+`);
  const until = Date.now() + 15_000;
  for (;;) {
    const list = mailPageSchema.parse(await (await call(`/api/dev/mail?to=${encodeURIComponent(to)}`, { cookie: adminCookie })).json());
    const mail = list.items.find((m) => subject.test(m.subject));
    if (mail) {
      const message = mailMessageSchema.parse(await (await call(`/api/dev/mail/${mail.id}`, { cookie: adminCookie })).json());
      const link = pattern.exec(message.text ?? '')?.[0];
      if (link) return link;
    }
    if (Date.now() > until) throw new Error(`no mail to ${to} matching ${subject} with a ${path} link arrived within 15 s`);
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

/** The refusals the step expects are logged by Chromium as failed loads; anything else is a problem. */
function expectOnlyRefusals(status: number) {
  const unexpected = problems.all().filter((p) => !p.includes(`the server responded with a status of ${status}`));
  expect(unexpected).toEqual([]);
  problems.clear();
}

async function shoot(name: string) {
  await page.screenshot({ path: join(artifactsDir, `${name}.png`), fullPage: true });
}

beforeAll(async () => {
  server = await startBuiltServer({ NODE_ENV: 'development' });
  base = server.url.replace('//127.0.0.1:', '//localhost:');
  demo = demoAccountsFrom(server.output());
  const admin = await call('/api/auth/sign-in/email', { method: 'POST', body: { email: demo.admin.email, password: demo.admin.password } });
  expect(admin.status).toBe(200);
  adminCookie = admin.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');

  // The person exists and has confirmed the address (the sign-up page has its own test).
  const up = await call('/api/auth/sign-up/email', { method: 'POST', body: person });
  expect(up.status).toBe(200);
  const verify = new URL(await linkFromMail(person.email, /confirm/i, '/verify-email'));
  expect((await call(`/api/auth/verify-email${verify.search}`)).status).toBe(200);

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

describe('getting back into an account', () => {
  it('changes the password on the account page, refusing a wrong current one beside its field', async () => {
    await signInWithForm(page, base, person.email, person.password);
    await page.waitForURL(`${base}/`);
    await page.goto(`${base}/account`, { waitUntil: 'networkidle' });
    await expectHeading(page, 'Your account');
    const form = page.getByRole('form', { name: 'Change the password' });
    await form.getByLabel('Current password').fill('not the password I have');
    await form.getByLabel('New password', { exact: true }).fill(changed);
    await form.getByLabel('The new password again').fill(changed);
    await form.getByRole('button', { name: 'Change the password' }).click();
    const current = form.getByLabel('Current password');
    await expect.poll(() => current.getAttribute('aria-invalid')).toBe('true');
    expect(await form.getByText('Current password is not right').isVisible()).toBe(true);
    await shoot('account-change-password-refused');
    expectOnlyRefusals(422);

    await current.fill(person.password);
    await form.getByRole('button', { name: 'Change the password' }).click();
    await form.getByText('Your password is changed').waitFor();
    expect(await form.getByText('Every other session of the account has been signed out').isVisible()).toBe(true);
    expect(await current.inputValue()).toBe('');
    expect(await seriousAxeViolations(page)).toEqual([]);
    await shoot('account-change-password-done');
    expect(problems.all()).toEqual([]);

    // This browser stays signed in; the old password no longer opens the account.
    await page.reload({ waitUntil: 'networkidle' });
    await expectHeading(page, 'Your account');
    await signOutWithMenu(page);
    expect((await call('/api/auth/sign-in/email', { method: 'POST', body: { email: person.email, password: person.password } })).status).toBe(401);
    expect((await call('/api/auth/sign-in/email', { method: 'POST', body: { email: person.email, password: changed } })).status).toBe(200);
  });

  it('resets a forgotten password from the mailed link, once', async () => {
    await page.goto(`${base}/forgot-password`, { waitUntil: 'networkidle' });
    await page.getByLabel('E-mail').fill(person.email);
    await page.getByRole('button', { name: /link/i }).click();
    await page.getByText('Check your e-mail').waitFor();
    await shoot('account-forgot-sent');

    const link = await linkFromMail(person.email, /password/i, '/reset-password');
    await page.goto(link, { waitUntil: 'networkidle' });
    await page.getByLabel('New password', { exact: true }).fill('short');
    await page.getByLabel('The new password again').fill('short');
    await page.getByRole('button', { name: 'Save the new password' }).click();
    await expect.poll(() => page.getByLabel('New password', { exact: true }).getAttribute('aria-invalid')).toBe('true');

    await page.getByLabel('New password', { exact: true }).fill(reset);
    await page.getByLabel('The new password again').fill(reset);
    await page.getByRole('button', { name: 'Save the new password' }).click();
    await page.getByText('Your password is changed').waitFor();
    expect(await pageOverflow(page)).toBeLessThanOrEqual(0);
    await shoot('account-reset-done');

    // The same link a second time says it no longer works.
    await page.goto(link, { waitUntil: 'networkidle' });
    await page.getByLabel('New password', { exact: true }).fill('another quiet winch by the dock');
    await page.getByLabel('The new password again').fill('another quiet winch by the dock');
    await page.getByRole('button', { name: 'Save the new password' }).click();
    await page.getByText('This link no longer works').waitFor();
    expectOnlyRefusals(400);

    await signInWithForm(page, base, person.email, reset);
    await page.waitForURL(`${base}/`);
    await signOutWithMenu(page);
  });
});

describe('joining an organisation', () => {
  it('follows an invitation from the owner’s page to the mail and into the organisation', async () => {
    await signInWithForm(page, base, demo.supplier.email, demo.supplier.password);
    await page.waitForURL(`${base}/supplier`);
    await page.goto(`${base}/organisation`, { waitUntil: 'networkidle' });
    const invite = page.getByRole('form', { name: /^Invite someone to / });
    await invite.getByLabel('E-mail address to invite').fill(person.email);
    await invite.getByRole('button', { name: 'Send the invitation' }).click();
    await invite.getByText('An invitation is on its way to').waitFor();
    await page.getByRole('list', { name: 'Pending invitations' }).locator('li').filter({ hasText: person.email }).waitFor();
    await signOutWithMenu(page);

    const link = await linkFromMail(person.email, /invit/i, '/invitations/accept');
    await page.goto(link, { waitUntil: 'networkidle' });
    await page.getByText(`The invitation is for`).waitFor();
    await shoot('invitation-signed-out');
    await page.getByRole('link', { name: 'Sign in to accept' }).click();
    await page.waitForURL(/\/sign-in\?/);
    await page.getByLabel('Password', { exact: true }).fill(reset);
    if ((await page.getByLabel('E-mail').inputValue()) === '') await page.getByLabel('E-mail').fill(person.email);
    await page.getByRole('button', { name: 'Sign in' }).click();

    await page.waitForURL(/\/invitations\/accept\?token=/);
    const join = page.getByRole('button', { name: /^Join / });
    await join.waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await shoot('invitation-signed-in');
    await join.click();
    await page.waitForURL(`${base}/organisation`);
    await page.locator(`[data-member="${person.email}"]`).waitFor();
    expect(await page.locator(`[data-member="${person.email}"]`).textContent()).toContain('(you)');
    await shoot('invitation-joined');
    expect(problems.all()).toEqual([]);

    // The link is used up.
    await page.goto(link, { waitUntil: 'networkidle' });
    await page.getByText('This invitation no longer works').waitFor();
  });
});
