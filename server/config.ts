import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { z } from 'zod';

const projectRoot = fileURLToPath(new URL('..', import.meta.url));

const envSchema = z.object({
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().min(1).optional(),
  DATA_DIR: z.string().min(1).default('./data'),
  DATABASE_URL: z
    .string()
    .regex(/^postgres(ql)?:\/\//, 'must be a postgres:// or postgresql:// connection string')
    .optional(),
  DB_SNAPSHOT: z.string().min(1).optional(),
  CLIENT_DIR: z.string().min(1).optional(),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  TRUST_PROXY: z
    .string()
    .optional()
    .transform((value) => {
      if (value === undefined || value === '' || value === 'false') return false;
      if (value === 'true') return true;
      return /^\d+$/.test(value) ? Number(value) : value;
    }),
  NODE_ENV: z.string().optional(),
  SMTP_URL: z.string().regex(/^smtps?:\/\//, 'must be an smtp:// or smtps:// URL').optional(),
  MAIL_FROM: z.string().min(3).default('Pinwork <no-reply@pinwork.example>'),
  AUTH_SECRET: z.string().min(32, 'must be at least 32 characters').optional(),
  PUBLIC_URL: z.url({ protocol: /^https?$/, error: 'must be an http(s) URL such as https://pinwork.example' }).optional(),
  TRUSTED_ORIGINS: z.string().optional(),
});

export type ServerMode = 'development' | 'production' | 'test';

export interface ServerConfig {
  port: number;
  host: string | undefined;
  dataDir: string;
  databaseUrl: string | undefined;
  snapshotFile: string;
  clientDir: string;
  logLevel: string;
  trustProxy: boolean | number | string;
  /** From NODE_ENV: 'production' and 'test' as named, anything else is development. */
  mode: ServerMode;
  /** Unset in development: the server starts its own loopback SMTP server (the dev outbox). */
  smtpUrl: string | undefined;
  mailFrom: string;
  /** Signs session cookies and e-mail tokens; required in production. */
  authSecret: string | undefined;
  /** The address people reach the site at, for links in e-mails; required in production. */
  publicUrl: string | undefined;
  /** Extra origins allowed to send cookie-authenticated changes (comma-separated). */
  trustedOrigins: string[];
}

export class ConfigError extends Error {}

export function readConfig(env: NodeJS.ProcessEnv = process.env): ServerConfig {
  // Empty variables (PORT= in a shell) mean "not set", not "invalid".
  const present = Object.fromEntries(Object.entries(env).filter(([, value]) => value !== ''));
  const parsed = envSchema.safeParse(present);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`);
    throw new ConfigError(`Pinwork cannot start: some settings are not valid:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  const mode: ServerMode = e.NODE_ENV === 'production' ? 'production' : e.NODE_ENV === 'test' ? 'test' : 'development';
  if (mode === 'production') {
    const missing = (['AUTH_SECRET', 'PUBLIC_URL', 'SMTP_URL'] as const).filter((name) => !e[name]);
    if (missing.length) {
      throw new ConfigError(
        `Pinwork cannot start: in production these settings are required:\n${missing.map((name) => `  ${name}: is required`).join('\n')}`,
      );
    }
  }
  return {
    port: e.PORT,
    host: e.HOST,
    dataDir: e.DATA_DIR === 'memory' ? 'memory' : path.resolve(e.DATA_DIR),
    databaseUrl: e.DATABASE_URL,
    snapshotFile: e.DB_SNAPSHOT ? path.resolve(e.DB_SNAPSHOT) : path.join(projectRoot, 'dist/db-snapshot.tar.gz'),
    clientDir: e.CLIENT_DIR ? path.resolve(e.CLIENT_DIR) : path.join(projectRoot, 'dist/client'),
    logLevel: e.LOG_LEVEL,
    trustProxy: e.TRUST_PROXY,
    mode,
    smtpUrl: e.SMTP_URL,
    mailFrom: e.MAIL_FROM,
    authSecret: e.AUTH_SECRET,
    publicUrl: e.PUBLIC_URL?.replace(/\/+$/, ''),
    trustedOrigins: (e.TRUSTED_ORIGINS ?? '').split(',').map((origin) => origin.trim()).filter(Boolean),
  };
}
