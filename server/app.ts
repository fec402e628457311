import compression from 'compression';
import express from 'express';
import type { Logger } from 'pino';
import type { DatabaseHandle } from './db/database';
import { apiNotFound, problemErrorHandler } from './middleware/error-handler';
import { requestLogging } from './middleware/request-logging';
import { securityHeaders } from './middleware/security-headers';
import { serveClient } from './middleware/serve-client';
import { healthRouter } from './routes/health';
import { templateRoutes } from './routes/templates';
import { defaultV1Limits, v1Router, type V1Limits } from './routes/v1';
import { ApiKeyService } from './services/api-keys/api-keys';
import { UsageRecorder } from './services/api-keys/usage-recorder';
import { UsageReportService } from './services/api-keys/usage-report';
import { V1Catalogue } from './services/api-v1/v1-catalogue';
import { BatchedRateLimitStore } from './services/batched-rate-limit-store';
import { createAccountSystem, type AccountSystemOptions } from './services/auth/account-system';
import { TemplateCatalogue } from './services/templates/catalogue';
import { TemplateStore } from './services/templates/template-store';
import { appVersion } from './version';

export interface AppOptions {
  database: DatabaseHandle;
  logger: Logger;
  /** The built client (Vite's outDir); skipped quietly when it has no index.html. */
  clientDir?: string | undefined;
  /** Largest JSON body accepted, in body-parser's notation. */
  jsonLimit?: string | number;
  version?: string;
  /** Express's `trust proxy` setting; off unless the operator names the proxies. */
  trustProxy?: boolean | number | string;
  /** Sign-in, sessions, mail and administration; tests default to mode 'test'. */
  accounts?: Partial<AccountSystemOptions>;
  /** The public API v1: limits, and how long key rows and quota figures are cached. */
  apiV1?: { limits?: Partial<V1Limits>; keyCacheMs?: number; flushMs?: number; defaultMonthlyQuota?: number | null };
}

/**
 * Ends the app's batched work (the API usage counts and rate-limit hits held in memory) and
 * writes what is pending; call it after the last request and before the database closes.
 */
export async function stopAppWork(app: express.Express): Promise<void> {
  const locals = app.locals as { apiUsage?: UsageRecorder; apiRateLimits?: BatchedRateLimitStore };
  await Promise.all([locals.apiUsage?.stop(), locals.apiRateLimits?.shutdown()]);
}

/** Builds the whole HTTP app without listening, so tests drive it through supertest. */
export function createApp(options: AppOptions): express.Express {
  const { database, logger } = options;
  const app = express();
  app.disable('x-powered-by');
  // Proxies are trusted only when configured to be, so req.ip cannot be spoofed by a header.
  app.set('trust proxy', options.trustProxy ?? false);

  app.use(securityHeaders());
  // Bundles, validator scripts and solve results shrink to a third or less with gzip. A request
  // that accepts no compression would only be answered as is, so it skips compression's
  // per-response wrapping (server-to-server API calls often ask for none).
  const compress = compression();
  app.use((req, res, next) => {
    if (/\b(gzip|deflate|br)\b/i.test(req.headers['accept-encoding'] ?? '')) return compress(req, res, next);
    res.vary('Accept-Encoding');
    next();
  });
  app.use(requestLogging(logger));
  const v1 = options.apiV1 ?? {};
  const apiKeys = new ApiKeyService(database.db, { cacheMs: v1.keyCacheMs });
  const defaultMonthlyQuota = v1.defaultMonthlyQuota === undefined ? 100_000 : v1.defaultMonthlyQuota;
  const apiUsage = new UsageRecorder(database.db, logger, { flushMs: v1.flushMs, defaultMonthlyQuota });
  app.locals.apiUsage = apiUsage;
  const usageReports = new UsageReportService(database.db, defaultMonthlyQuota);
  const accountSystem = createAccountSystem(database.db, logger, { mode: 'test', ...options.accounts, apiKeys, usageReports });
  app.locals.accountSystem = accountSystem;
  // Before express.json: the auth routes parse their own bodies.
  app.use('/api/auth', accountSystem.authRouter);
  // Also before express.json: v1 checks the key first, then parses with its own, tighter limits.
  const templateStore = new TemplateStore(database.db);
  const apiRateLimits = new BatchedRateLimitStore(database.db, 'api-v1:', { syncMs: v1.limits?.rateSyncMs ?? defaultV1Limits.rateSyncMs, logger });
  app.locals.apiRateLimits = apiRateLimits;
  app.use(
    '/api/v1',
    v1Router({
      db: database.db,
      logger,
      keys: apiKeys,
      usage: apiUsage,
      catalogue: new V1Catalogue(templateStore),
      version: options.version ?? appVersion,
      limits: v1.limits,
      rateLimitStore: apiRateLimits,
    }),
  );
  app.use(express.json({ limit: options.jsonLimit ?? '100kb' }));

  const api = express.Router();
  api.use(healthRouter(database, options.version ?? appVersion, options.accounts?.mode ?? 'test'));
  api.use(templateRoutes(new TemplateCatalogue(templateStore)));
  api.use(accountSystem.apiRouter);
  api.use(apiNotFound);
  app.use('/api', api);

  const client = options.clientDir ? serveClient(options.clientDir) : null;
  if (client) app.use(client);

  app.use(problemErrorHandler(logger));
  return app;
}
