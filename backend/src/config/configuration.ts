import { registerAs } from '@nestjs/config';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';

/** Where the SQLite file, uploads, caught mail and the generated secret live. */
export function resolveDataDir(env: NodeJS.ProcessEnv = process.env): string {
  const dir = resolve(env.DATA_DIR ?? join(__dirname, '..', '..', '..', 'data'));
  mkdirSync(dir, { recursive: true });
  return dir;
}

/**
 * A fresh machine needs no set-up: without JWT_SECRET a random secret is made once and
 * kept under DATA_DIR, so tokens survive a restart.
 */
export function resolveJwtSecret(dataDir: string, env: NodeJS.ProcessEnv = process.env): string {
  if (env.JWT_SECRET) return env.JWT_SECRET;
  const file = join(dataDir, 'jwt-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  const secret = randomBytes(48).toString('base64url');
  writeFileSync(file, secret + '\n', { mode: 0o600 });
  return secret;
}

export const appConfig = registerAs('app', () => {
  const dataDir = resolveDataDir();
  return {
    port: Number(process.env.PORT ?? 3000),
    dataDir,
    publicUrl: process.env.PUBLIC_URL ?? `http://localhost:${process.env.PORT ?? 3000}`,
    seedDemo: (process.env.SEED_DEMO ?? 'true') !== 'false',
    logLevel: process.env.LOG_LEVEL ?? 'info',
    clientDist: process.env.CLIENT_DIST ?? join(__dirname, '..', '..', '..', 'frontend', 'dist'),
    priorStrength: Number(process.env.PRIOR_STRENGTH ?? 10),
  };
});

export const authConfig = registerAs('auth', () => {
  const dataDir = resolveDataDir();
  return {
    jwtSecret: resolveJwtSecret(dataDir),
    /** Seconds a token is valid. */
    tokenTtl: Number(process.env.JWT_TTL_SECONDS ?? 8 * 3600),
    bcryptRounds: Number(process.env.BCRYPT_ROUNDS ?? 10),
    /** Requests per minute per client on sign-in and registration. */
    authThrottleLimit: Number(process.env.AUTH_THROTTLE_LIMIT ?? 10),
    /** Requests per minute per client on everything else. */
    throttleLimit: Number(process.env.THROTTLE_LIMIT ?? 6000),
  };
});

export const mailConfig = registerAs('mail', () => ({
  host: process.env.SMTP_HOST ?? '127.0.0.1',
  port: Number(process.env.SMTP_PORT ?? 1025),
  secure: process.env.SMTP_SECURE === 'true',
  user: process.env.SMTP_USER,
  pass: process.env.SMTP_PASS,
  from: process.env.MAIL_FROM ?? 'Causeway <no-reply@causeway.test>',
}));

export type AppConfig = ReturnType<typeof appConfig>;
export type AuthConfig = ReturnType<typeof authConfig>;
export type MailConfig = ReturnType<typeof mailConfig>;
