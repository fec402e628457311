import { defineConfig } from 'vitest/config';

// Vite builds the client from index.html; Vitest reads the `test` block.
export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts', 'tests/**/*.test.tsx'],
    exclude: ['tests/e2e/**', 'node_modules/**'],
    environment: 'node',
  },
});
