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

// A visitor's path through the library and three calculators, on the built app under the
// server's real Content-Security-Policy. Expected numbers come from the page itself before and
// after a change (and from the exact unit factors), never from a copy of the engine's output.

let server: RunningServer;
let browser: TestBrowser;
let problems: PageProblems;
let page: Page;

const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');
const MM_PER_IN = 25.4;
const N_PER_LBF = 0.45359237 * 9.80665;

interface InputInfo {
  key: string;
  label: string;
  control: 'number' | 'slider' | 'choice';
  quantity: string;
  default: number;
  min: number;
  max: number;
}
interface Detail {
  title: string;
  spec: { inputs: InputInfo[]; parts: { id: string; label: string }[] };
  results: { key: string; label: string; quantity: string }[];
}

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
  problems.clear();
});

async function detailOf(slug: string): Promise<Detail> {
  const response = await fetch(`${server.url}/api/templates/${slug}`);
  expect(response.status).toBe(200);
  return (await response.json()) as Detail;
}

/** Parses a number as the page prints it: thin-space grouping, a true minus sign. */
function readNumber(text: string | null): number {
  const cleaned = (text ?? '').replace(/[\u2009\u202f\s]/g, '').replace('\u2212', '-');
  const value = Number(cleaned);
  if (!Number.isFinite(value)) throw new Error(`not a number on the page: "${text}"`);
  return value;
}

/**
 * Waits until the results on screen were solved for exactly the inputs in the address bar
 * (the page marks them current and names the inputs they belong to).
 */
async function waitForCurrentResults(p: Page = page) {
  await expect
    .poll(async () => {
      const status = p.locator('[data-solve-state="current"]');
      if ((await status.count()) !== 1) return false;
      const solvedFor = JSON.parse((await status.getAttribute('data-solved-for')) ?? '{}') as Record<string, number>;
      const params = new URL(p.url()).searchParams;
      return [...params.entries()].every(([k, v]) => k === 'units' || Math.abs(Number(v) - (solvedFor[k] ?? NaN)) <= 1e-9 * Math.max(1, Math.abs(Number(v))));
    }, { timeout: 15_000 })
    .toBe(true);
}

const resultCell = (key: string, p: Page = page) => p.locator(`[data-result="${key}"] [data-value]`);

/**
 * Waits until the results are current again and the given result reads differently from
 * `previous` (a change of inputs must move it), then returns what it reads.
 */
async function waitForNewResult(key: string, previous: string | null, p: Page = page): Promise<string> {
  await expect
    .poll(async () => {
      await waitForCurrentResults(p);
      return (await resultCell(key, p).textContent()) !== previous;
    }, { timeout: 15_000 })
    .toBe(true);
  return (await resultCell(key, p).textContent())!;
}

async function runAxe(p: Page) {
  await p.evaluate(axeSource);
  const result = await p.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (c: unknown, o: unknown) => Promise<{ violations: { id: string; impact: string; help: string; nodes: unknown[] }[] }> } }).axe;
    const r = await axe.run(document, { resultTypes: ['violations'] });
    return r.violations.map((v) => ({ id: v.id, impact: v.impact, help: v.help, nodes: v.nodes.map((n) => (n as { target: string[]; failureSummary?: string }).target.join(' ') + ' :: ' + ((n as { failureSummary?: string }).failureSummary ?? '').slice(0, 200)) }));
  });
  return result;
}

async function shoot(name: string, p: Page = page) {
  await p.screenshot({ path: join(artifactsDir, `${name}.png`), fullPage: true });
}

/** A value inside the input's range, away from its default, as the visitor would type it. */
function anotherValue(input: InputInfo): number {
  const span = input.max - input.min;
  const up = input.default + span * 0.1;
  const v = up <= input.max ? up : input.default - span * 0.1;
  return Number(v.toPrecision(3));
}

describe('the template library', () => {
  it('lists every published template with its drawing, and filters by category and by words', async () => {
    await page.goto(`${server.url}/templates`, { waitUntil: 'networkidle' });
    const list = (await (await fetch(`${server.url}/api/templates`)).json()) as { templates: { slug: string; title: string; category: string }[] };
    expect(list.templates.length).toBeGreaterThanOrEqual(3);

    const cards = page.getByRole('list', { name: 'Templates' }).getByRole('listitem');
    await expect.poll(() => cards.count()).toBe(list.templates.length);
    // Every card carries the server's thumbnail as an image with a name.
    for (const t of list.templates) {
      const card = cards.filter({ has: page.getByRole('link', { name: t.title, exact: true }) });
      expect(await card.locator('svg[role="img"]').count()).toBe(1);
    }

    const category = list.templates[0]!.category;
    await page.getByLabel('Category').selectOption(category);
    const inCategory = list.templates.filter((t) => t.category === category).length;
    await expect.poll(() => cards.count()).toBe(inCategory);
    await page.getByLabel('Category').selectOption('');

    const target = list.templates.find((t) => t.slug === 'wall-jib-tie-rod') ?? list.templates[0]!;
    await page.getByLabel('Search by words').fill(target.title.split(' ').slice(-2).join(' '));
    await expect.poll(() => cards.count()).toBeLessThan(list.templates.length);
    expect(await page.getByRole('link', { name: target.title, exact: true }).count()).toBe(1);
    await page.getByLabel('Search by words').fill('no-such-word-anywhere');
    await expect.poll(() => cards.count()).toBe(0);
    expect(await page.getByText('No template matches these words').isVisible()).toBe(true);

    await page.getByLabel('Search by words').fill('');
    await shoot('library-desktop');
    const violations = await runAxe(page);
    expect(violations.filter((v) => v.impact === 'serious' || v.impact === 'critical')).toEqual([]);
    expect(problems.all().join('\n')).toBe('');
  });

  it('fits a 360 px screen', async () => {
    await page.setViewportSize({ width: 360, height: 780 });
    await page.goto(`${server.url}/templates`, { waitUntil: 'networkidle' });
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);
    await shoot('library-360');
  });
});

const templates = ['wall-jib-tie-rod', 'toggle-clamp', 'four-bar-linkage'];

describe.each(templates)('the calculator for %s', (slug) => {
  it('follows a visitor from the library through inputs, drawings, charts, units, a shared link and a CSV', async () => {
    const detail = await detailOf(slug);
    const numbers = detail.spec.inputs.filter((i) => i.control === 'number');
    const slider = detail.spec.inputs.find((i) => i.control === 'slider');
    expect(numbers.length).toBeGreaterThanOrEqual(2);
    expect(slider, `${slug} has a slider input`).toBeDefined();
    const firstResult = detail.results[0]!;

    // Library → calculator, by the card's link.
    await page.goto(`${server.url}/templates`, { waitUntil: 'networkidle' });
    await page.getByRole('link', { name: detail.title, exact: true }).click();
    await page.waitForURL(`**/templates/${slug}`);
    await waitForCurrentResults();
    await expectHeading(page, detail.title);
    expect(await page.getByRole('complementary', { name: 'Cautions' }).isVisible()).toBe(true);
    expect(await page.getByText(/Every part balances to/).isVisible()).toBe(true);

    const before = await resultCell(firstResult.key).textContent();
    const drawingBefore = await page.locator('[data-view="mechanism"]').innerHTML();

    // Two inputs typed, one moved by its slider with the keyboard.
    const [a, b] = numbers as [InputInfo, InputInfo];
    await page.getByLabel(a.label, { exact: true }).fill(String(anotherValue(a)));
    await page.getByLabel(b.label, { exact: true }).fill(String(anotherValue(b)));
    const range = page.locator(`#root_${slider!.key}`);
    const sliderBefore = await range.inputValue();
    await range.focus();
    for (let i = 0; i < 3; i++) await page.keyboard.press(Number(sliderBefore) >= slider!.max ? 'ArrowLeft' : 'ArrowRight');
    expect(await range.inputValue()).not.toBe(sliderBefore);
    await expect.poll(() => page.url()).toContain(`${a.key}=${anotherValue(a)}`);
    const after = await waitForNewResult(firstResult.key, before);
    expect(await page.locator('[data-view="mechanism"]').innerHTML()).not.toBe(drawingBefore);
    // The drawing's words reach screen readers.
    expect(await page.locator('[data-view="mechanism"] > svg[role="img"] > title').count()).toBe(1);
    await shoot(`calculator-${slug}`);

    // A free-body view per part.
    const part = detail.spec.parts[0]!;
    await page.getByRole('tab', { name: `Free body: ${part.label}` }).click();
    const freeBody = page.locator(`[data-view="${part.id}"] svg`);
    await freeBody.waitFor();
    expect(await freeBody.getAttribute('role')).toBe('img');
    await page.getByRole('tab', { name: 'Mechanism' }).click();

    // Sweep and tornado (the charts load lazily, when scrolled near).
    await page.locator('#charts-heading').scrollIntoViewIfNeeded();
    const sweep = page.locator('[data-chart="sweep"]');
    await sweep.waitFor({ timeout: 20_000 });
    await expect.poll(() => sweep.locator('.recharts-line path').count()).toBeGreaterThan(0);
    const tornadoRows = page.locator('[data-tornado-table] tbody tr');
    await expect.poll(() => tornadoRows.count()).toBeGreaterThan(0);

    // The results as CSV: its rows carry the labels and the numbers on screen.
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download results CSV' }).click()]);
    expect(download.suggestedFilename()).toMatch(new RegExp(`^${slug}-\\d+\\.\\d+\\.\\d+-results\\.csv$`));
    const csv = readFileSync((await download.path())!, 'utf8');
    const lines = csv.trim().split(/\r\n/);
    expect(lines[0]).toBe('Section,Quantity,Value,Unit,Note');
    const row = lines.find((l) => l.startsWith(`Results,${firstResult.label.includes(',') ? `"${firstResult.label}"` : firstResult.label},`));
    expect(row, csv).toBeDefined();
    const csvValue = Number(row!.split(',')[2]);
    expect(Math.abs(csvValue - readNumber(after)) / Math.max(1e-9, Math.abs(csvValue))).toBeLessThan(0.005);
    expect(lines.some((l) => l.startsWith(`Inputs,${a.label},${anotherValue(a)},`))).toBe(true);

    // The sweep as CSV.
    const [sweepDownload] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download sweep CSV' }).click()]);
    const sweepLines = readFileSync((await sweepDownload.path())!, 'utf8').trim().split(/\r\n/);
    expect(sweepLines.length).toBe(42);
    expect(sweepLines[0]).toMatch(/,Note$/);

    // The link reproduces the calculation in a fresh page.
    const shared = page.url();
    const other = await browser.context.newPage();
    await other.goto(shared, { waitUntil: 'networkidle' });
    await waitForCurrentResults(other);
    expect(await resultCell(firstResult.key, other).textContent()).toBe(after);
    await other.close();

    // Switch to US customary: inputs and results convert by the exact factors.
    const siFirst = readNumber(after);
    const lengthInput = numbers.find((i) => i.quantity === 'length');
    const siLength = lengthInput ? Number(await page.getByLabel(lengthInput.label, { exact: true }).inputValue()) : 0;
    await page.locator('label').filter({ hasText: 'in, lbf, lb' }).click();
    await expect.poll(() => page.url()).toContain('units=US');
    const usText = firstResult.quantity === 'ratio' || firstResult.quantity === 'angle' ? after : await waitForNewResult(firstResult.key, after);
    if (lengthInput) {
      await expect
        .poll(async () => Number(await page.getByLabel(lengthInput.label, { exact: true }).inputValue()))
        .toBeCloseTo(siLength / MM_PER_IN, 2);
    }
    const usFirst = readNumber(usText);
    const factor = firstResult.quantity === 'force' ? 1 / N_PER_LBF : firstResult.quantity === 'length' ? 1 / MM_PER_IN : firstResult.quantity === 'moment' ? 1 / (N_PER_LBF * MM_PER_IN) : 1;
    expect(Math.abs(usFirst - siFirst * factor) / Math.abs(siFirst * factor)).toBeLessThan(0.002);

    // A value out of range: the precompiled validator's message, beside the field, under the real CSP.
    await page.getByLabel(a.label, { exact: true }).fill(String(a.max * 10));
    const message = page.locator(`#root_${a.key}__error`);
    await expect.poll(() => message.textContent()).toMatch(/Must be at most/);
    expect(await page.getByLabel(a.label, { exact: true }).getAttribute('aria-invalid')).toBe('true');
    expect(await page.locator('#results-status').textContent()).toMatch(/Correct the marked input/);
    await shoot(`calculator-${slug}-invalid`);

    // Reset brings the defaults back (in the unit system chosen), and the results with them.
    await page.getByRole('button', { name: 'Reset to defaults' }).click();
    await expect.poll(() => message.textContent()).toBe('');
    await waitForCurrentResults();
    await page.locator('label').filter({ hasText: 'mm, N, kg' }).click();
    await expect.poll(() => page.url()).toContain('units=SI');
    await waitForCurrentResults();
    await expect.poll(() => resultCell(firstResult.key).textContent()).toBe(before);

    const violations = await runAxe(page);
    expect(JSON.stringify(violations.filter((v) => v.impact === 'serious' || v.impact === 'critical'), null, 1)).toBe('[]');
    expect(problems.all().join('\n')).toBe('');
  });
});

describe('the calculator on a small screen, and with geometry that cannot be built', () => {
  it('fits a 360 px screen', async () => {
    await page.setViewportSize({ width: 360, height: 780 });
    await page.goto(`${server.url}/templates/wall-jib-tie-rod`, { waitUntil: 'networkidle' });
    await waitForCurrentResults();
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);
    await shoot('calculator-360');
  });

  it('shows the engine message for a four-bar that cannot close', async () => {
    const detail = await detailOf('four-bar-linkage');
    const coupler = detail.spec.inputs.find((i) => i.key === 'b')!;
    await page.goto(`${server.url}/templates/four-bar-linkage`, { waitUntil: 'networkidle' });
    await waitForCurrentResults();
    const atDefaults = await resultCell(detail.results[0]!.key).textContent();
    // The longest crank pointing away from the rocker, with the shortest coupler and rocker:
    // the two cannot reach across to the rocker pivot.
    const byKey = (k: string) => detail.spec.inputs.find((i) => i.key === k)!;
    await page.getByLabel(byKey('a').label, { exact: true }).fill(String(byKey('a').max));
    await page.getByLabel(coupler.label, { exact: true }).fill(String(coupler.min));
    await page.getByLabel(byKey('c').label, { exact: true }).fill(String(byKey('c').min));
    const before = await waitForNewResult(detail.results[0]!.key, atDefaults);
    await page.getByLabel(`${byKey('theta2').label}, in °`).fill('180');
    const alert = page.locator('[data-solve-problem]');
    await alert.waitFor({ timeout: 15_000 });
    expect(await alert.getAttribute('data-solve-problem')).toBe('geometry');
    expect((await alert.locator('[data-engine-message]').textContent())?.length).toBeGreaterThan(10);
    // The last good results stay, marked as belonging to other inputs.
    expect(await resultCell(detail.results[0]!.key).textContent()).toBe(before);
    expect(await alert.textContent()).toMatch(/last inputs that could be solved/);
    await shoot('calculator-cannot-build');
    problems.clear();
  });
});
