import { fileURLToPath } from 'node:url';

// drizzle's migrators record applied files in drizzle.__drizzle_migrations, so running them on
// every start is a cheap no-op once the database is current.
export const migrationsFolder = fileURLToPath(new URL('../../drizzle', import.meta.url));
