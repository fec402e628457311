import type { Page } from 'playwright-core';
import { expect } from 'vitest';

/**
 * Waits for the page's h1 to read `text`, then checks it. A client-side navigation changes the URL
 * a moment before React renders the new route, so reading the heading at once can still see the
 * old page. If the heading never arrives, the comparison below fails with what the page shows.
 */
export async function expectHeading(page: Page, text: string): Promise<void> {
  const h1 = page.getByRole('heading', { level: 1 });
  await h1.filter({ hasText: text }).first().waitFor({ timeout: 10_000 }).catch(() => undefined);
  expect(await h1.first().textContent()).toBe(text);
}
