import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { z } from 'zod';

const here = path.dirname(fileURLToPath(import.meta.url));
const appsDir = path.resolve(here, '../..');

const booleanish = z
  .enum(['true', 'false', '1', '0'])
  .transform((v) => v === 'true' || v === '1');

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  DATABASE_URL: z.url({ protocol: /^postgres(ql)?$/, error: 'must be a postgres:// URL' }),
  SESSION_SECRET: z.string().min(32, { error: 'must be at least 32 characters (a random string)' }),
  // Encrypts the badge codes kept for reprinting cards; without it a database dump shows none.
  BADGE_SECRET: z.string().min(32, { error: 'must be at least 32 characters (a random string)' }),
  SMTP_URL: z.url({ protocol: /^smtps?$/, error: 'must be an smtp:// or smtps:// URL' }).default('smtp://127.0.0.1:2525'),
  MAIL_FROM: z.string().default('Chuckkey <chuckkey@example.org>'),
  PUBLIC_URL: z.url().optional(),
  // Express "trust proxy": false, true, a hop count or a list of addresses (behind a load balancer).
  TRUST_PROXY: z.string().default('false'),
  COOKIE_SECURE: z.enum(['auto', 'true', 'false']).default('auto'),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  SIGN_IN_WINDOW_MINUTES: z.coerce.number().int().min(1).default(15),
  SIGN_IN_MAX_FAILURES_PER_ACCOUNT: z.coerce.number().int().min(1).default(10),
  SIGN_IN_MAX_FAILURES_PER_ADDRESS: z.coerce.number().int().min(1).default(30),
  // Badge scans one machine station may send a minute (see SCANS_PER_MINUTE in the station routes).
  STATION_SCAN_LIMIT_PER_MINUTE: z.coerce.number().int().min(1).default(60),
  ADMIN_DIST: z.string().default(path.join(appsDir, 'admin', 'dist')),
  KIOSK_DIST: z.string().default(path.join(appsDir, 'kiosk', 'dist')),
  SERVE_APPS: booleanish.default(true),
});

export type Config = z.infer<typeof envSchema> & { publicUrl: string; trustProxy: boolean | number | string };

function parseTrustProxy(value: string): boolean | number | string {
  if (value === 'true') return true;
  if (value === 'false' || value === '') return false;
  if (/^\d+$/.test(value)) return Number(value);
  return value;
}

export class ConfigError extends Error {}

/** Parses the environment; a bad variable stops start-up with the list of what is wrong. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join('.') || '(environment)'}: ${issue.message}`);
    throw new ConfigError(`The server's configuration is not valid:\n${lines.join('\n')}`);
  }
  const config = parsed.data;
  return {
    ...config,
    publicUrl: (config.PUBLIC_URL ?? `http://${config.HOST}:${config.PORT}`).replace(/\/$/, ''),
    trustProxy: parseTrustProxy(config.TRUST_PROXY),
  };
}
