import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

/** axe-core's serious and critical findings on the page as it is now (optionally inside `selector`). */
export async function seriousAxeViolations(page: Page, selector?: string) {
  await page.evaluate(axeSource);
  const violations = await page.evaluate(async (within) => {
    const axe = (window as unknown as { axe: { run: (ctx: Document | Element) => Promise<{ violations: { id: string; impact: string | null; nodes: unknown[] }[] }> } }).axe;
    const context = within ? document.querySelector(within) ?? document : document;
    return (await axe.run(context)).violations.map((v) => ({ id: v.id, impact: v.impact, count: v.nodes.length }));
  }, selector ?? null);
  return violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
}

/** How far the page scrolls sideways (0 or less when it fits the viewport). */
export function pageOverflow(page: Page): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
}
