import express from 'express';
import type { DatabaseHandle } from '../db/database';
import { methodNotAllowed } from '../middleware/error-handler';
import type { Health } from '../../shared/api/health';
import { checkHealth } from '../services/health';

export function healthRouter(database: DatabaseHandle, version: string, mode: Health['mode']) {
  const router = express.Router();
  router
    .route('/health')
    .get(async (_req, res) => {
      const health = await checkHealth(database, version, mode);
      res.setHeader('Cache-Control', 'no-store');
      res.status(health.database.ok ? 200 : 503).json(health);
    })
    .all(methodNotAllowed(['GET', 'HEAD']));
  return router;
}
