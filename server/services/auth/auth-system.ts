import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import { admin } from 'better-auth/plugins/admin';
import { adminAc, userAc } from 'better-auth/plugins/admin/access';
import type { Logger } from 'pino';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '../../../shared/api/auth';
import type { ServerMode } from '../../config';
import type { Database } from '../../db/database';
import { accounts, sessions, users, verifications } from '../../db/schema/auth';
import { recordAudit } from '../audit';
import type { MailQueue } from '../mail/mail-queue';
import { alreadyRegisteredMessage, resetPasswordMessage, verifyEmailMessage } from '../mail/messages';
import { currentIp } from './request-context';

/** The header our front router sets from Express's req.ip (trust-proxy aware); never the client's. */
export const CLIENT_IP_HEADER = 'x-pinwork-client-ip';

export interface AuthSettings {
  mode: ServerMode;
  secret: string;
  /** Where people reach the site: links in mail, the trusted origin. */
  publicUrl: () => string;
  /** More origins allowed to send cookie-authenticated changes (the Vite dev server…). */
  trustedOrigins: readonly string[];
  /** Lifetime of e-mail verification links, seconds. */
  verificationExpiresIn?: number;
  /** Lifetime of password-reset links, seconds. */
  resetExpiresIn?: number;
}

export function createBetterAuth(db: Database, mail: MailQueue, logger: Logger, settings: AuthSettings) {
  // Unknown until the server listens when PORT=0: the library then reads it from each request,
  // whose URL our front router builds from publicUrl().
  const publicUrl = settings.publicUrl() || undefined;
  return betterAuth({
    appName: 'Pinwork',
    baseURL: publicUrl,
    basePath: '/api/auth',
    secret: settings.secret,
    database: drizzleAdapter(db, {
      provider: 'pg',
      usePlural: true,
      schema: { users, sessions, accounts, verifications },
    }),
    trustedOrigins: () => allowedOrigins(settings),
    logger: {
      level: 'warn',
      log: (level, message, ...args) => {
        const log = level === 'error' ? logger.error.bind(logger) : level === 'warn' ? logger.warn.bind(logger) : logger.debug.bind(logger);
        log({ args }, `auth: ${message}`);
      },
    },
    // express-rate-limit in front of the routes does this, with counters in our database.
    rateLimit: { enabled: false },
    emailAndPassword: {
      enabled: true,
      requireEmailVerification: true,
      autoSignIn: false,
      minPasswordLength: PASSWORD_MIN_LENGTH,
      maxPasswordLength: PASSWORD_MAX_LENGTH,
      resetPasswordTokenExpiresIn: settings.resetExpiresIn ?? 3600,
      revokeSessionsOnPasswordReset: true,
      sendResetPassword: async ({ user, token }) => {
        await mail.enqueue(resetPasswordMessage(user.email, user.name, `${settings.publicUrl()}/reset-password?token=${encodeURIComponent(token)}`));
      },
      onPasswordReset: async ({ user }) => {
        await recordAudit(db, { actorKind: 'user', actorId: user.id, action: 'auth.password-reset', target: `user:${user.id}`, ip: currentIp() });
      },
      onExistingUserSignUp: async ({ user }) => {
        const base = settings.publicUrl();
        await mail.enqueue(alreadyRegisteredMessage(user.email, user.name, `${base}/sign-in`, `${base}/forgot-password`));
      },
    },
    emailVerification: {
      sendOnSignUp: true,
      autoSignInAfterVerification: false,
      expiresIn: settings.verificationExpiresIn ?? 24 * 3600,
      sendVerificationEmail: async ({ user, token }) => {
        await mail.enqueue(verifyEmailMessage(user.email, user.name, `${settings.publicUrl()}/verify-email?token=${encodeURIComponent(token)}`));
      },
    },
    databaseHooks: {
      user: {
        create: {
          after: async (user) => {
            await recordAudit(db, { actorKind: 'user', actorId: user.id, action: 'auth.sign-up', target: `user:${user.id}`, ip: currentIp(), details: { email: user.email } });
          },
        },
      },
    },
    session: {
      expiresIn: 7 * 24 * 3600,
      updateAge: 24 * 3600,
      // Off on purpose: every request reads the session row, so revoking one ends it at once.
      cookieCache: { enabled: false },
    },
    advanced: {
      cookiePrefix: 'pinwork',
      useSecureCookies: settings.mode === 'production',
      defaultCookieAttributes: { httpOnly: true, sameSite: 'lax', path: '/' },
      // Whole addresses: our own limiters group IPv6 clients by prefix; the session list and the
      // audit log should name the address itself, not its /64.
      ipAddress: { ipAddressHeaders: [CLIENT_IP_HEADER], ipv6Subnet: 128 },
    },
    plugins: [
      admin({
        defaultRole: 'user',
        adminRoles: ['admin'],
        roles: { admin: adminAc, engineer: userAc, supplier: userAc, user: userAc },
        bannedUserMessage: 'This account is disabled.',
      }),
    ],
    telemetry: { enabled: false },
  });
}

export type PinworkAuth = ReturnType<typeof createBetterAuth>;

export function allowedOrigins(settings: Pick<AuthSettings, 'publicUrl' | 'trustedOrigins'>): string[] {
  const own = settings.publicUrl();
  return [...new Set([...(own ? [new URL(own).origin] : []), ...settings.trustedOrigins.map((o) => new URL(o).origin)])];
}
