// Build step: a migrated PGlite, dumped, so a new data folder starts from it in well under a
// second instead of creating PostgreSQL's files from nothing (many seconds).
import { mkdir, rename, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { createMigratedSnapshot } from '../server/db/snapshot';

const target = path.resolve(
  process.argv[2] ?? fileURLToPath(new URL('../dist/db-snapshot.tar.gz', import.meta.url)),
);
const started = Date.now();
const snapshot = await createMigratedSnapshot();
await mkdir(path.dirname(target), { recursive: true });
// Written beside, then renamed: a half-written snapshot must never be picked up by a start.
const partial = `${target}.partial-${process.pid}`;
await writeFile(partial, Buffer.from(await snapshot.arrayBuffer()));
await rename(partial, target);
console.log(`Wrote ${path.relative(process.cwd(), target)} (${(snapshot.size / 1e6).toFixed(1)} MB) in ${Date.now() - started} ms`);
