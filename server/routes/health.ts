import express from 'express';
import type { DatabaseHandle } from '../db/database';
import { methodNotAllowed } from '../middleware/error-handler';
import { checkHealth } from '../services/health';

export function healthRouter(database: DatabaseHandle, version: string) {
  const router = express.Router();
  router
    .route('/health')
    .get(async (_req, res) => {
      const health = await checkHealth(database, version);
      res.setHeader('Cache-Control', 'no-store');
      res.status(health.database.ok ? 200 : 503).json(health);
    })
    .all(methodNotAllowed(['GET', 'HEAD']));
  return router;
}
