import { fileURLToPath } from 'node:url';

export const repoRoot = fileURLToPath(new URL('../../..', import.meta.url));
export const artifactsDir = fileURLToPath(new URL('../artifacts', import.meta.url));
export const builtIndexHtml = fileURLToPath(new URL('../../../dist/client/index.html', import.meta.url));
