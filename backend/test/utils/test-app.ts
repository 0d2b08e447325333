import type { INestApplication } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { Test } from '@nestjs/testing';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import type { AuthResponse } from '@causeway/shared';
import { DataSource } from 'typeorm';
import { AppModule } from '../../src/app.module';
import { setupApp } from '../../src/setup-app';
import { freshPostgresDatabase, onPostgres, portableSql } from './pg-database';

export interface TestApp {
  app: INestApplication;
  dataDir: string;
  http: () => ReturnType<typeof request>;
  close: () => Promise<void>;
  /** Environment for another instance on this app's database: `createTestApp({ ...t.sameDatabase })`. */
  sameDatabase: Record<string, string>;
  /** Raw SQL with `?` placeholders on SQLite or PostgreSQL; quote camelCase names ("sourceId"). */
  query: <T = Record<string, unknown>>(sql: string, params?: unknown[]) => Promise<T[]>;
}

/**
 * Boots the real application on a fresh SQLite database in a temporary DATA_DIR (or, when
 * DATABASE_URL is postgres://…, on a fresh database on that server — unless `env` names the
 * database itself, as `sameDatabase` does), with the real migrations, the same global pipes,
 * guards and filters as production.
 */
export async function createTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  const dataDir = mkdtempSync(join(tmpdir(), 'causeway-test-'));
  const saved = { ...process.env };
  const pg = !env.DATABASE_URL && onPostgres() ? await freshPostgresDatabase(process.env.DATABASE_URL!) : undefined;
  if (pg) env = { ...env, DATABASE_URL: pg.url };
  Object.assign(process.env, {
    DATA_DIR: dataDir,
    SEED_DEMO: 'false',
    LOG_LEVEL: 'silent',
    BCRYPT_ROUNDS: '4',
    AUTH_THROTTLE_LIMIT: '1000',
    CLIENT_DIST: join(dataDir, 'no-client'),
    ...env,
  });
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).compile();
  const app = moduleRef.createNestApplication<NestExpressApplication>({ bufferLogs: true, bodyParser: false });
  setupApp(app);
  await app.init();
  const ds = app.get(DataSource);
  const sameDatabase: Record<string, string> = onPostgres()
    ? { DATA_DIR: process.env.DATA_DIR!, DATABASE_URL: process.env.DATABASE_URL! }
    : { DATA_DIR: process.env.DATA_DIR!, DATABASE_FILE: process.env.DATABASE_FILE ?? join(process.env.DATA_DIR!, 'causeway.sqlite') };
  return {
    app,
    dataDir,
    sameDatabase,
    http: () => request(app.getHttpServer()),
    close: async () => {
      await app.close();
      process.env = saved;
      rmSync(dataDir, { recursive: true, force: true });
      await pg?.drop();
    },
    query: async (sql, params = []) => ds.query(portableSql(sql, ds.options.type === 'postgres'), params),
  };
}

let counter = 0;
export function uniqueEmail(prefix = 'user'): string {
  counter += 1;
  return `${prefix}.${process.pid}.${counter}@example.test`;
}

export const GOOD_PASSWORD = 'correct-horse-42';

export const KESTREL_SHOP = { name: 'Test Garage', currency: 'GBP', locale: 'en-GB', labourRateMinor: 9500, taxRateBp: 2000, distanceUnit: 'mi' as const };

/** Registers a shop owner with a new shop. */
export async function registerOwner(t: TestApp, shop = KESTREL_SHOP): Promise<AuthResponse> {
  const res = await t.http().post('/api/auth/register').send({ email: uniqueEmail('owner'), password: GOOD_PASSWORD, displayName: 'Owner', shop }).expect(201);
  return res.body as AuthResponse;
}

/** Makes an invite as `owner` and registers a new member of that shop with it. */
export async function registerMember(t: TestApp, owner: AuthResponse, role: 'technician' | 'contributor' = 'technician'): Promise<AuthResponse> {
  const invite = await t.http().post('/api/shops/mine/invites').set('Authorization', `Bearer ${owner.accessToken}`).send({ role }).expect(201);
  const res = await t.http().post('/api/auth/register').send({ email: uniqueEmail(role), password: GOOD_PASSWORD, displayName: role, inviteCode: invite.body.code }).expect(201);
  return res.body as AuthResponse;
}

export function bearer(auth: AuthResponse | string): [string, string] {
  return ['Authorization', `Bearer ${typeof auth === 'string' ? auth : auth.accessToken}`];
}

/** Gives a user a role directly in the database (only admins can, and tests need an admin first). */
export async function setRole(t: TestApp, userId: string, role: 'technician' | 'contributor' | 'moderator' | 'admin'): Promise<void> {
  await t.query('UPDATE users SET role = ? WHERE id = ?', [role, userId]);
}
