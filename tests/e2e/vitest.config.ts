import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// Browser tests run apart from `npm test`: they need the built client and Debian's chromium.
export default defineConfig({
  root: fileURLToPath(new URL('../..', import.meta.url)),
  test: {
    include: ['tests/e2e/**/*.test.ts'],
    environment: 'node',
    globalSetup: ['tests/e2e/support/global-setup.ts'],
    // Each file starts its own server and browser; one at a time keeps memory modest.
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
