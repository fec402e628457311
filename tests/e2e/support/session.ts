import type { Page } from 'playwright-core';

/** Signs in through the sign-in page; the caller waits for where the role's start page is. */
export async function signInWithForm(page: Page, base: string, email: string, password: string): Promise<void> {
  await page.goto(`${base}/sign-in`, { waitUntil: 'networkidle' });
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

export async function signOutWithMenu(page: Page): Promise<void> {
  await page.getByRole('banner').getByRole('button', { name: 'Sign out' }).click();
  await page.waitForURL(/\/sign-in\?signedOut=1$/);
  await page.getByText('You are signed out.').waitFor();
}

/**
 * Demo sign-in details as the development server prints them at start
 * ("  admin  admin@… okafor-admin-demo  (Name)"), read from its output.
 */
export function demoAccountsFrom(output: string): Record<'admin' | 'engineer' | 'supplier', { email: string; password: string; name: string }> {
  const found = {} as Record<'admin' | 'engineer' | 'supplier', { email: string; password: string; name: string }>;
  for (const role of ['admin', 'engineer', 'supplier'] as const) {
    const line = output.match(new RegExp(`^\\s*${role}\\s+(\\S+@\\S+)\\s+(\\S+)\\s+\\((.+)\\)`, 'm'));
    if (!line) throw new Error(`the server did not print the ${role} demo account:\n${output}`);
    found[role] = { email: line[1]!, password: line[2]!, name: line[3]! };
  }
  return found;
}
