import { defineConfig } from 'drizzle-kit';

// Generating migrations needs no database: drizzle-kit diffs the schema files against the
// snapshots in drizzle/meta. The server applies drizzle/ at start (server/db/migrate.ts).
export default defineConfig({
  dialect: 'postgresql',
  schema: './server/db/schema/*.ts',
  out: './drizzle',
  strict: true,
  verbose: true,
});
