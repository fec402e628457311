import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext } from 'playwright-core';

export interface TestBrowser {
  context: BrowserContext;
  close: () => Promise<void>;
}

/** Debian's chromium with a fresh profile that is removed afterwards. */
export async function launchBrowser(viewport = { width: 1280, height: 900 }): Promise<TestBrowser> {
  const profileDir = mkdtempSync(join(tmpdir(), 'pinwork-e2e-'));
  const context = await chromium.launchPersistentContext(profileDir, {
    executablePath: '/usr/bin/chromium',
    headless: true,
    viewport,
    // The app drops its transitions for reduced motion, so a check (axe's contrast above all)
    // never samples a colour halfway through a fade.
    reducedMotion: 'reduce',
    env: { ...process.env, HOME: profileDir, TMPDIR: profileDir },
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  return {
    context,
    close: async () => {
      await context.close();
      rmSync(profileDir, { recursive: true, force: true });
    },
  };
}
