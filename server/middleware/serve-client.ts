import { existsSync } from 'node:fs';
import path from 'node:path';
import express, { type Router } from 'express';

// Vite names bundled files by content hash under assets/, so they can be cached for a year;
// index.html (and anything unhashed) must be revalidated so a deploy is seen at once.
const HASHED_ASSET = /\/assets\/[^/]+-[\w-]{8,}\.[a-z0-9]+$/i;

/** Serves the built client with an SPA fallback, or returns null when there is no build. */
export function serveClient(clientDir: string): Router | null {
  const indexHtml = path.join(clientDir, 'index.html');
  if (!existsSync(indexHtml)) return null;

  const router = express.Router();
  router.use(
    express.static(clientDir, {
      index: false,
      setHeaders(res, filePath) {
        res.setHeader(
          'Cache-Control',
          HASHED_ASSET.test(filePath.split(path.sep).join('/')) ? 'public, max-age=31536000, immutable' : 'no-cache',
        );
      },
    }),
  );
  router.get('/{*path}', (req, res, next) => {
    if (req.path === '/api' || req.path.startsWith('/api/')) return next();
    // A missing file (a stale hashed asset, a typo) is a 404, not the app's HTML.
    if (path.posix.extname(req.path) !== '' || !req.accepts('html')) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexHtml);
  });
  return router;
}
