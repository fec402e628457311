import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync } from 'node:fs';
import { artifactsDir, builtIndexHtml, repoRoot } from './paths';

// The browser tests exercise the built app as a user gets it. When no build exists
// (a fresh clone), make one; an existing build is used as it is, so run
// `npm run build` after changing the client.
export default function setup(): void {
  mkdirSync(artifactsDir, { recursive: true });
  if (!existsSync(builtIndexHtml)) {
    console.log('[e2e] dist/client is missing: running npm run build');
    execFileSync('npm', ['run', 'build'], { cwd: repoRoot, stdio: 'inherit' });
  }
}
