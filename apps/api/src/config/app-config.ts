import { isIP } from 'node:net';
import { resolve } from 'node:path';
import { z } from 'zod';
import { defaultMigrationsDir, defaultWebDist } from './workspace-paths.js';

const booleanFlag = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'], { message: 'Use true or false' })
  .transform((value) => value === 'true' || value === '1' || value === 'yes');

const optionalText = z
  .string()
  .trim()
  .optional()
  .transform((value) => (value ? value : undefined));

/** Express's `trust proxy` setting: trust nothing, everything, the nearest n hops, or these addresses. */
export type TrustProxy = boolean | number | string[];

const trustProxyPresets = new Set(['loopback', 'linklocal', 'uniquelocal']);

function isProxyAddress(entry: string): boolean {
  if (trustProxyPresets.has(entry) || isIP(entry) !== 0) return true;
  const [address = '', range = '', ...rest] = entry.split('/');
  const family = isIP(address);
  if (family === 0 || rest.length > 0) return false;
  if (/^\d{1,3}$/.test(range)) return Number(range) <= (family === 4 ? 32 : 128);
  // 10.0.0.0/255.0.0.0 as proxy-addr accepts it: a contiguous mask, else Express throws at boot.
  if (family !== 4 || isIP(range) !== 4) return false;
  const mask = range.split('.').reduce((bits, octet) => bits * 256 + Number(octet), 0);
  const hostBits = 2 ** 32 - 1 - mask;
  return (hostBits & (hostBits + 1)) === 0;
}

/** Undefined when the value is none of the accepted forms. */
export function parseTrustProxy(value: string): TrustProxy | undefined {
  const lowered = value.toLowerCase();
  if (lowered === 'false') return false;
  if (lowered === 'true') return true;
  if (/^\d+$/.test(value)) return Number(value);
  const entries = value
    .split(',')
    .map((entry) => entry.trim())
    .filter(Boolean);
  return entries.length > 0 && entries.every(isProxyAddress) ? entries : undefined;
}

const trustProxy = optionalText
  .refine((value) => value === undefined || parseTrustProxy(value) !== undefined, {
    message: 'Use false, true, a hop count, or comma-separated addresses/subnets (e.g. loopback, 10.0.0.0/8)',
  })
  .transform((value) => (value === undefined ? false : (parseTrustProxy(value) ?? false)));

const envSchema = z
  .object({
    PORT: z.coerce.number({ message: 'Must be a port number' }).int().min(0).max(65535).default(3000),
    LIMITBOOK_DATA_DIR: z.string().trim().min(1).default('./data'),
    LIMITBOOK_CONTENT_DIR: z.string().trim().min(1).default('./content'),
    LIMITBOOK_WEB_DIST: optionalText,
    LIMITBOOK_MIGRATIONS_DIR: optionalText,
    DATABASE_URL: optionalText.pipe(
      z
        .string()
        .regex(/^postgres(ql)?:\/\//, 'Must be a postgres:// or postgresql:// URL')
        .optional(),
    ),
    JWT_SECRET: optionalText.pipe(z.string().min(32, 'Use at least 32 characters').optional()),
    SMTP_URL: optionalText.pipe(z.url({ message: 'Must be an smtp:// or smtps:// URL', protocol: /^smtps?$/ }).optional()),
    MAIL_FROM: z.string().trim().min(3).default('Limitbook <limitbook@localhost>'),
    PUBLIC_URL: optionalText.pipe(z.url({ message: 'Must be an http(s) URL', protocol: /^https?$/ }).optional()),
    LIMITBOOK_ADMIN_EMAIL: optionalText.pipe(z.email({ message: 'Must be an e-mail address' }).optional()),
    LIMITBOOK_ADMIN_PASSWORD: optionalText.pipe(z.string().min(12, 'Use at least 12 characters').optional()),
    LIMITBOOK_SEED_DEMO: booleanFlag.default(true),
    LIMITBOOK_AUTH_RATE_LIMIT: z.coerce.number({ message: 'Must be a number' }).int().min(1).default(10),
    LIMITBOOK_AUTH_RATE_WINDOW_SECONDS: z.coerce.number({ message: 'Must be a number' }).int().min(1).default(60),
    LIMITBOOK_ACCESS_TOKEN_SECONDS: z.coerce.number({ message: 'Must be a number' }).int().min(10).default(15 * 60),
    // A long window would let a stolen, already rotated token through; 0 makes rotation strict.
    LIMITBOOK_REFRESH_REUSE_GRACE_SECONDS: z.coerce.number({ message: 'Must be a number' }).int().min(0).max(300).default(20),
    LIMITBOOK_TRUST_PROXY: trustProxy,
    LIMITBOOK_LOG_SQL: booleanFlag.default(false),
  })
  .refine((env) => Boolean(env.LIMITBOOK_ADMIN_EMAIL) === Boolean(env.LIMITBOOK_ADMIN_PASSWORD), {
    message: 'Set both LIMITBOOK_ADMIN_EMAIL and LIMITBOOK_ADMIN_PASSWORD, or neither',
    path: ['LIMITBOOK_ADMIN_PASSWORD'],
  });

export type DatabaseTarget =
  | { driver: 'pglite'; dataDir: string | null }
  | { driver: 'postgres'; url: string };

export interface AppConfig {
  port: number;
  dataDir: string;
  contentDir: string;
  webDist: string;
  migrationsDir: string;
  database: DatabaseTarget;
  /** Undefined until resolved at boot: a missing secret is generated and kept in the data folder. */
  jwtSecret: string | undefined;
  accessTokenSeconds: number;
  refreshTokenDays: number;
  /** How long a rotated refresh token still yields its family's live token (concurrent tabs). */
  refreshReuseGraceSeconds: number;
  smtpUrl: string | undefined;
  mailFrom: string;
  publicUrl: string;
  bootstrapAdmin: { email: string; password: string } | undefined;
  seedDemo: boolean;
  authRateLimit: { limit: number; windowSeconds: number };
  trustProxy: TrustProxy;
  logSql: boolean;
}

export class ConfigError extends Error {
  constructor(readonly problems: string[]) {
    super(`Invalid configuration:\n${problems.map((line) => `  - ${line}`).join('\n')}`);
    this.name = 'ConfigError';
  }
}

/** Parses the environment once at boot; throws ConfigError listing every bad variable. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env, cwd = process.cwd()): AppConfig {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    throw new ConfigError(parsed.error.issues.map((issue) => `${issue.path.join('.') || 'environment'}: ${issue.message}`));
  }
  const e = parsed.data;
  const dataDir = resolve(cwd, e.LIMITBOOK_DATA_DIR);
  return {
    port: e.PORT,
    dataDir,
    contentDir: resolve(cwd, e.LIMITBOOK_CONTENT_DIR),
    webDist: e.LIMITBOOK_WEB_DIST ? resolve(cwd, e.LIMITBOOK_WEB_DIST) : defaultWebDist(),
    migrationsDir: e.LIMITBOOK_MIGRATIONS_DIR ? resolve(cwd, e.LIMITBOOK_MIGRATIONS_DIR) : defaultMigrationsDir(),
    database: e.DATABASE_URL ? { driver: 'postgres', url: e.DATABASE_URL } : { driver: 'pglite', dataDir: resolve(dataDir, 'pglite') },
    jwtSecret: e.JWT_SECRET,
    accessTokenSeconds: e.LIMITBOOK_ACCESS_TOKEN_SECONDS,
    refreshTokenDays: 14,
    refreshReuseGraceSeconds: e.LIMITBOOK_REFRESH_REUSE_GRACE_SECONDS,
    smtpUrl: e.SMTP_URL,
    mailFrom: e.MAIL_FROM,
    publicUrl: (e.PUBLIC_URL ?? `http://localhost:${e.PORT}`).replace(/\/+$/, ''),
    bootstrapAdmin:
      e.LIMITBOOK_ADMIN_EMAIL && e.LIMITBOOK_ADMIN_PASSWORD
        ? { email: e.LIMITBOOK_ADMIN_EMAIL.toLowerCase(), password: e.LIMITBOOK_ADMIN_PASSWORD }
        : undefined,
    seedDemo: e.LIMITBOOK_SEED_DEMO,
    authRateLimit: { limit: e.LIMITBOOK_AUTH_RATE_LIMIT, windowSeconds: e.LIMITBOOK_AUTH_RATE_WINDOW_SECONDS },
    trustProxy: e.LIMITBOOK_TRUST_PROXY,
    logSql: e.LIMITBOOK_LOG_SQL,
  };
}
