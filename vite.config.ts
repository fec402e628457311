import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vitest/config';

// Vite builds the client from index.html; Vitest reads the `test` block.
export default defineConfig({
  plugins: [react(), tailwindcss()],
  build: {
    outDir: 'dist/client',
    emptyOutDir: true,
    // Every asset becomes a file: the server's CSP allows fonts and images from 'self'
    // only, so no data: URIs may appear in the built CSS.
    assetsInlineLimit: 0,
    rolldownOptions: {
      output: {
        codeSplitting: {
          groups: [
            // zod decides at schema construction whether it may compile code; src/lib/zod.ts turns
            // that off (the CSP forbids eval). Keeping zod and that setting in one chunk, which every
            // chunk defining schemas imports, runs the setting before any schema exists, however
            // the other modules are split.
            { name: 'zod', test: /node_modules[\\/]zod[\\/]|src[\\/]lib[\\/]zod\.ts$/, priority: 100 },
          ],
        },
      },
    },
  },
  server: {
    proxy: {
      '/api': 'http://localhost:3000',
    },
  },
  test: {
    include: ['tests/**/*.test.ts', 'tests/**/*.test.tsx'],
    exclude: ['tests/e2e/**', 'node_modules/**'],
    environment: 'node',
    globalSetup: ['tests/helpers/global-setup.ts'],
  },
});
