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
}

/** Builds the whole HTTP app without listening, so tests drive it through supertest. */
export function createApp(options: AppOptions): express.Express {
  const { database, logger } = options;
  const app = express();
  app.disable('x-powered-by');
  // Proxies are trusted only when configured to be, so req.ip cannot be spoofed by a header.
  app.set('trust proxy', options.trustProxy ?? false);

  app.use(securityHeaders());
  // Bundles, validator scripts and solve results shrink to a third or less with gzip.
  app.use(compression());
  app.use(requestLogging(logger));
  const accountSystem = createAccountSystem(database.db, logger, { mode: 'test', ...options.accounts });
  app.locals.accountSystem = accountSystem;
  // Before express.json: the auth routes parse their own bodies.
  app.use('/api/auth', accountSystem.authRouter);
  app.use(express.json({ limit: options.jsonLimit ?? '100kb' }));

  const api = express.Router();
  api.use(healthRouter(database, options.version ?? appVersion));
  api.use(templateRoutes(new TemplateCatalogue(new TemplateStore(database.db))));
  api.use(accountSystem.apiRouter);
  api.use(apiNotFound);
  app.use('/api', api);

  const client = options.clientDir ? serveClient(options.clientDir) : null;
  if (client) app.use(client);

  app.use(problemErrorHandler(logger));
  return app;
}
