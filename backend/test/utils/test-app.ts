import type { INestApplication } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { Test } from '@nestjs/testing';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import type { AuthResponse } from '@causeway/shared';
import { AppModule } from '../../src/app.module';
import { setupApp } from '../../src/setup-app';

export interface TestApp {
  app: INestApplication;
  dataDir: string;
  http: () => ReturnType<typeof request>;
  close: () => Promise<void>;
}

/**
 * Boots the real application on a fresh SQLite database in a temporary DATA_DIR,
 * with the real migrations, the same global pipes, guards and filters as production.
 */
export async function createTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  const dataDir = mkdtempSync(join(tmpdir(), 'causeway-test-'));
  const saved = { ...process.env };
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
  return {
    app,
    dataDir,
    http: () => request(app.getHttpServer()),
    close: async () => {
      await app.close();
      process.env = saved;
      rmSync(dataDir, { recursive: true, force: true });
    },
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
  const { DataSource } = await import('typeorm');
  await t.app.get(DataSource).query('UPDATE users SET role = ? WHERE id = ?', [role, userId]);
}
