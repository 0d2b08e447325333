import { getStorageToken } from '@nestjs/throttler';
import { DataSource } from 'typeorm';
import { DatabaseThrottlerStorage, throttleInDatabase } from '../src/database/db-throttler-storage';
import { createTestApp, type TestApp } from './utils/test-app';

/**
 * The throttler's counts in the database (table throttle_hits), on whichever engine the suite runs
 * (SQLite here by default, PostgreSQL under scripts/pg-test.sh): what lets several instances
 * share one limit. Outside sources: RFC 6585 §4 (429 Too Many Requests, may carry Retry-After),
 * RFC 9110 §10.2.3 (Retry-After in delay-seconds).
 */
describe('throttler storage in the database (e2e)', () => {
  let t: TestApp;
  let storage: DatabaseThrottlerStorage;

  beforeAll(async () => {
    t = await createTestApp({ THROTTLE_STORAGE: 'database', PUBLIC_THROTTLE_LIMIT: '2' });
    storage = t.app.get(getStorageToken());
  });
  afterAll(() => t.close());

  it('is chosen by THROTTLE_STORAGE, and by default only on PostgreSQL', () => {
    expect(storage).toBeInstanceOf(DatabaseThrottlerStorage);
    expect(throttleInDatabase({})).toBe(false);
    expect(throttleInDatabase({ DATABASE_URL: 'postgres://db.internal/causeway' })).toBe(true);
    expect(throttleInDatabase({ DATABASE_URL: 'postgres://db.internal/causeway', THROTTLE_STORAGE: 'memory' })).toBe(false);
  });

  it('counts concurrent hits without losing one (one atomic upsert each)', async () => {
    const results = await Promise.all(Array.from({ length: 20 }, () => storage.increment('concurrent', 60_000, 15, 60_000, 'default')));
    expect(results.map((r) => r.totalHits).sort((x, y) => x - y)).toEqual(Array.from({ length: 20 }, (_, i) => i + 1));
    // Over the limit of 15: the last five are blocked until the window ends.
    expect(results.filter((r) => r.isBlocked)).toHaveLength(5);
    for (const r of results) expect(r.timeToExpire).toBeLessThanOrEqual(60);
  });

  it('starts a new window once the old one has passed', async () => {
    await storage.increment('windowed', 60_000, 1, 60_000, 'default');
    expect((await storage.increment('windowed', 60_000, 1, 60_000, 'default')).isBlocked).toBe(true);
    // A minute and a bit later (the row's window moved back rather than the clock forward).
    await t.app.get(DataSource).query(`UPDATE throttle_hits SET "windowStart" = "windowStart" - 61000 WHERE "key" = 'default:windowed'`);
    expect(await storage.increment('windowed', 60_000, 1, 60_000, 'default')).toMatchObject({ totalHits: 1, isBlocked: false });
  });

  it('refuses the request over the limit with 429 and Retry-After', async () => {
    await t.http().get(`/api/public/estimates/${'A'.repeat(43)}`).expect(404);
    await t.http().get(`/api/public/estimates/${'B'.repeat(43)}`).expect(404);
    const res = await t.http().get(`/api/public/estimates/${'C'.repeat(43)}`).expect(429);
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
    expect(Number(res.headers['retry-after'])).toBeLessThanOrEqual(60);
    const rows = await t.query<{ hits: number | string }>(`SELECT hits FROM throttle_hits WHERE "key" LIKE 'default:%' AND "key" NOT IN ('default:concurrent', 'default:windowed')`);
    expect(rows.map((r) => Number(r.hits))).toContain(3);
  });
});
