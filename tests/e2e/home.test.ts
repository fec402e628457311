import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { launchBrowser, type TestBrowser } from './support/browser';
import { expectHeading } from './support/heading';
import { watchContext, type PageProblems } from './support/page-watch';
import { artifactsDir, repoRoot } from './support/paths';
import { startBuiltServer, type RunningServer } from './support/server';

let server: RunningServer;
let browser: TestBrowser;
let problems: PageProblems;
let page: Page;

beforeAll(async () => {
  server = await startBuiltServer();
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
  await page.unrouteAll();
  problems.clear();
});

async function shoot(name: string) {
  await page.screenshot({ path: join(artifactsDir, `${name}.png`), fullPage: true });
}

describe('the built app served by the Pinwork server', () => {
  it('shows the home page with its heading and a healthy server, without console errors', async () => {
    const response = await page.goto(server.url, { waitUntil: 'networkidle' });
    expect(response?.status()).toBe(200);

    await expect
      .poll(() => page.getByRole('heading', { level: 1 }).textContent())
      .toBe('Know the force in every pin, link and jaw.');
    expect(await page.getByRole('link', { name: 'Pinwork' }).isVisible()).toBe(true);

    const serverStatus = page.getByTestId('health-server');
    await serverStatus.waitFor();
    expect(await serverStatus.textContent()).toBe('ok');
    expect(await page.getByTestId('health-database').textContent()).toBe('ok');
    const version = JSON.parse(readFileSync(join(repoRoot, 'package.json'), 'utf8')).version;
    expect(await page.getByTestId('health-version').textContent()).toBe(version);

    // The font ships with the app: Manrope must have been loaded from our own origin.
    expect(await page.evaluate(() => document.fonts.check('16px Manrope'))).toBe(true);

    await shoot('home-desktop');
    expect(problems.all()).toEqual([]);
  });

  it('reports a violation of the server’s Content-Security-Policy (the watcher itself can fail)', async () => {
    await page.goto(server.url, { waitUntil: 'networkidle' });
    problems.clear();
    await page.evaluate(() => {
      const style = document.createElement('style');
      style.textContent = 'body { outline: 1px solid red; }';
      document.head.append(style);
      const script = document.createElement('script');
      script.textContent = 'window.__inlineRan = true;';
      document.head.append(script);
    });
    await expect.poll(() => problems.cspViolations.length).toBeGreaterThanOrEqual(2);
    expect(problems.cspViolations.join('\n')).toMatch(/style-src/);
    expect(problems.cspViolations.join('\n')).toMatch(/script-src/);
    expect(await page.evaluate(() => 'inlineRan' in window || '__inlineRan' in window)).toBe(false);
  });

  it('fits a 360 px wide screen without sideways scrolling', async () => {
    await page.setViewportSize({ width: 360, height: 780 });
    await page.goto(server.url, { waitUntil: 'networkidle' });
    await page.getByTestId('health-server').waitFor();
    const overflow = await page.evaluate(
      () => document.documentElement.scrollWidth - document.documentElement.clientWidth,
    );
    expect(overflow).toBeLessThanOrEqual(0);
    expect(await page.getByRole('navigation', { name: 'Main' }).isVisible()).toBe(true);
    await shoot('home-360');
    expect(problems.all()).toEqual([]);
  });

  it('offers a skip link as the first stop of the keyboard that moves focus to the content', async () => {
    await page.goto(server.url, { waitUntil: 'networkidle' });
    await page.keyboard.press('Tab');
    const focused = await page.evaluate(() => document.activeElement?.textContent);
    expect(focused).toBe('Skip to content');
    expect(await page.getByRole('link', { name: 'Skip to content' }).isVisible()).toBe(true);
    await page.keyboard.press('Enter');
    await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe('main');
  });

  it('navigates to How it works from the menu and marks the current page', async () => {
    await page.goto(server.url, { waitUntil: 'networkidle' });
    const nav = page.getByRole('navigation', { name: 'Main' });
    await nav.getByRole('link', { name: 'How it works' }).click();
    await page.waitForURL(`${server.url}/how-it-works`);
    await expectHeading(page, 'How it works');
    expect(await nav.getByRole('link', { name: 'How it works' }).getAttribute('aria-current')).toBe('page');
    expect(await page.title()).toBe('How it works · Pinwork');
    await shoot('how-it-works');
    expect(problems.all()).toEqual([]);
  });

  it('sends the library’s first address on to /templates, and the main navigation links there', async () => {
    await page.goto(`${server.url}/library`, { waitUntil: 'networkidle' });
    await page.waitForURL('**/templates');
    await expectHeading(page, 'Template library');
    const nav = page.getByRole('navigation', { name: 'Main' });
    expect(await nav.getByRole('link', { name: 'Library' }).getAttribute('href')).toBe('/templates');
    expect(await nav.textContent()).not.toMatch(/coming soon/i);
    expect(problems.all()).toEqual([]);
  });

  it('answers an unknown address with the app’s not-found page', async () => {
    const response = await page.goto(`${server.url}/no/such/page`, { waitUntil: 'networkidle' });
    expect(response?.headers()['content-type']).toMatch(/text\/html/);
    await expectHeading(page, 'Page not found');
    expect(await page.locator('main').textContent()).toContain('/no/such/page');
    await shoot('not-found');
    expect(problems.all()).toEqual([]);
  });

  it('shows the API reference in production without asking for a demo key that only development has', async () => {
    const asked: string[] = [];
    page.on('request', (r) => {
      if (r.url().includes('/api/dev/')) asked.push(r.url());
    });
    await page.goto(`${server.url}/developers/api`, { waitUntil: 'networkidle' });
    await page.locator('.pinwork-openapi .opblock').first().waitFor();
    expect(await page.locator('#main').textContent()).not.toContain('bwdemo');
    expect(await page.getByText('Try it out with your own key').isVisible()).toBe(true);
    // One main landmark: the viewer's own is turned into a region.
    expect(await page.getByRole('main').count()).toBe(1);
    expect(asked).toEqual([]);
    expect(problems.all()).toEqual([]);
  });

  it('shows the server’s problem details when the health check fails', async () => {
    await page.route('**/api/health', (route) =>
      route.fulfill({
        status: 503,
        contentType: 'application/problem+json',
        body: JSON.stringify({
          type: 'about:blank',
          title: 'Database unavailable',
          status: 503,
          detail: 'The database did not answer.',
        }),
      }),
    );
    await page.goto(server.url);
    const serverStatus = page.getByTestId('health-server');
    await serverStatus.waitFor({ timeout: 20_000 });
    expect(await serverStatus.textContent()).toBe('unreachable');
    expect(await page.getByText('Database unavailable: The database did not answer.').isVisible()).toBe(true);
  });

  it('says which part is degraded when the server reports its database not answering', async () => {
    await page.route('**/api/health', (route) =>
      route.fulfill({
        status: 503,
        contentType: 'application/json',
        body: JSON.stringify({
          status: 'degraded',
          version: '9.9.9',
          mode: 'production',
          database: { ok: false, driver: 'postgres', latencyMs: null },
        }),
      }),
    );
    await page.goto(server.url);
    const serverStatus = page.getByTestId('health-server');
    await serverStatus.waitFor();
    expect(await serverStatus.textContent()).toBe('degraded');
    expect(await page.getByTestId('health-database').textContent()).toBe('not answering');
    expect(await page.getByTestId('health-version').textContent()).toBe('9.9.9');
  });

  it('drops its colour fades for a visitor who asks for reduced motion', async () => {
    await page.goto(server.url, { waitUntil: 'networkidle' });
    const durations = await page.evaluate(() => ({
      asked: window.matchMedia('(prefers-reduced-motion: reduce)').matches,
      fading: [...document.querySelectorAll('[class*="transition"]')].map((el) => getComputedStyle(el).transitionDuration),
    }));
    expect(durations.asked).toBe(true);
    expect(durations.fading.length).toBeGreaterThan(0);
    expect(new Set(durations.fading)).toEqual(new Set(['0s']));
  });

  it('has no serious accessibility violations on the home page (axe-core)', async () => {
    await page.goto(server.url, { waitUntil: 'networkidle' });
    await page.getByTestId('health-server').waitFor();
    const require = createRequire(import.meta.url);
    const axeSource = readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');
    await page.evaluate(axeSource);
    const violations = await page.evaluate(async () => {
      const axe = (window as unknown as { axe: { run: (ctx: Document) => Promise<{ violations: { id: string; impact: string | null; nodes: unknown[] }[] }> } }).axe;
      const result = await axe.run(document);
      return result.violations.map((v) => ({ id: v.id, impact: v.impact, count: v.nodes.length }));
    });
    const serious = violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
    expect(serious).toEqual([]);
  });
});
