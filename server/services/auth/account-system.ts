import { randomBytes } from 'node:crypto';
import type { Logger } from 'pino';
import type { ServerMode } from '../../config';
import type { Database } from '../../db/database';
import { liveDemoApiKey } from '../../db/seed-demo-key';
import { accessControlledRouter } from '../../routes/access-router';
import { accountHandlers } from '../../routes/account-handlers';
import { apiKeyHandlers } from '../../routes/api-key-handlers';
import { authFrontRouter } from '../../routes/auth-front';
import { defaultAuthRateLimits, type AuthRateLimits } from '../../routes/auth-rate-limits';
import { AccountService } from '../accounts';
import { ApiKeyService } from '../api-keys/api-keys';
import { UsageReportService } from '../api-keys/usage-report';
import { AuditLogService } from '../audit-log';
import { DevMailService } from '../dev-mail';
import { MailQueue } from '../mail/mail-queue';
import { OrganisationService } from '../organisations';
import { allowedOrigins, createBetterAuth, type PinworkAuth } from './auth-system';

export interface AccountSystemOptions {
  mode: ServerMode;
  /** Random per process when not given: sessions then end with the process. */
  secret?: string | undefined;
  publicUrl?: (() => string) | undefined;
  trustedOrigins?: readonly string[] | undefined;
  mailQueue?: MailQueue | undefined;
  rateLimits?: Partial<AuthRateLimits> | undefined;
  verificationExpiresIn?: number | undefined;
  resetExpiresIn?: number | undefined;
  /** Shared with the public API so a revocation here is seen there at once. */
  apiKeys?: ApiKeyService | undefined;
  usageReports?: UsageReportService | undefined;
}

export interface AccountSystem {
  auth: PinworkAuth;
  mailQueue: MailQueue;
  accounts: AccountService;
  /** /api/auth/* (mount before express.json: it parses its own bodies). */
  authRouter: ReturnType<typeof authFrontRouter>;
  /** The accounts, organisations, admin and dev-mail routes of the route table (under /api). */
  apiRouter: ReturnType<typeof accessControlledRouter>;
}

/** Sign-in, sessions, organisations and administration, wired over one database. */
export function createAccountSystem(db: Database, logger: Logger, options: AccountSystemOptions): AccountSystem {
  const publicUrl = options.publicUrl ?? (() => 'http://localhost:3000');
  const trustedOrigins = options.trustedOrigins ?? [];
  const mailQueue = options.mailQueue ?? new MailQueue(db);
  const auth = createBetterAuth(db, mailQueue, logger, {
    mode: options.mode,
    secret: options.secret ?? randomBytes(32).toString('base64url'),
    publicUrl,
    trustedOrigins,
    verificationExpiresIn: options.verificationExpiresIn,
    resetExpiresIn: options.resetExpiresIn,
  });
  const accounts = new AccountService(db, auth);
  const organisations = new OrganisationService(db, mailQueue, publicUrl);
  const rateLimits = { ...defaultAuthRateLimits, ...options.rateLimits };
  const origins = () => allowedOrigins({ publicUrl, trustedOrigins });
  return {
    auth,
    mailQueue,
    accounts,
    authRouter: authFrontRouter({ auth, db, accounts, publicUrl, limits: rateLimits, origins }),
    apiRouter: accessControlledRouter(
      {
        ...accountHandlers({ accounts, organisations, auditLog: new AuditLogService(db), devMail: new DevMailService(db), demoApiKey: () => liveDemoApiKey(db) }),
        ...apiKeyHandlers({ apiKeys: options.apiKeys ?? new ApiKeyService(db), usageReports: options.usageReports ?? new UsageReportService(db, null) }),
      },
      { auth, db, mode: options.mode, origins },
    ),
  };
}
