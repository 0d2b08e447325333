import type { ThrottlerStorage } from '@nestjs/throttler';
import type { DataSource } from 'typeorm';

/** What ThrottlerStorage.increment answers (the package does not export the record type by name). */
export interface ThrottleRecord {
  totalHits: number;
  timeToExpire: number;
  isBlocked: boolean;
  timeToBlockExpire: number;
}

/** Rows idle this long after their window are swept (longer than any throttler's window). */
const SWEEP_AFTER_MS = 60 * 60_000;
const SWEEP_EVERY_MS = 60_000;

/**
 * Request counting for @nestjs/throttler kept in the database (table `throttle_hits`), so every
 * app instance behind a load balancer counts the same hits; the package's default keeps them in
 * one process's memory, and two instances would each allow the full limit.
 *
 * One row per key (throttler name + the guard's hashed client key): the start of the key's
 * current window and the hits in it. A window starts at a key's first hit and lasts `ttl`, as in
 * the in-memory storage; a hit after it starts a new one. The increment is one atomic upsert
 * (INSERT … ON CONFLICT DO UPDATE … RETURNING: SQLite 3.35+ and PostgreSQL 9.5+), so concurrent
 * requests on any instance never lose a count. Over the limit, the client is refused until the
 * window ends (the block lasts the rest of the window, whatever `blockDuration` says).
 */
export class DatabaseThrottlerStorage implements ThrottlerStorage {
  private readonly sql: string;
  private readonly postgres: boolean;
  private lastSweep = Date.now();

  constructor(private readonly dataSource: DataSource) {
    this.postgres = dataSource.options.type === 'postgres';
    // key, now, and now - ttl (a window that started at or before it has ended).
    const [key, now, stale] = this.postgres ? ['$1', '$2', '$3'] : ['?', '?', '?'];
    this.sql =
      `INSERT INTO throttle_hits ("key", "windowStart", "hits") VALUES (${key}, ${now}, 1) ` +
      `ON CONFLICT ("key") DO UPDATE SET ` +
      `"hits" = CASE WHEN throttle_hits."windowStart" <= ${stale} THEN 1 ELSE throttle_hits."hits" + 1 END, ` +
      `"windowStart" = CASE WHEN throttle_hits."windowStart" <= ${stale} THEN ${now} ELSE throttle_hits."windowStart" END ` +
      `RETURNING "hits", "windowStart"`;
  }

  async increment(key: string, ttl: number, limit: number, _blockDuration: number, throttlerName: string): Promise<ThrottleRecord> {
    const now = Date.now();
    const id = `${throttlerName}:${key}`;
    // SQLite's ? are positional: the values in the order they appear.
    const params = this.postgres ? [id, now, now - ttl] : [id, now, now - ttl, now - ttl, now];
    const [row] = (await this.dataSource.query(this.sql, params)) as Array<{ hits: number | string; windowStart: number | string }>;
    const totalHits = Number(row.hits);
    const windowEnd = Number(row.windowStart) + ttl;
    const timeToExpire = Math.max(0, Math.ceil((windowEnd - now) / 1000));
    const isBlocked = totalHits > limit;
    this.sweep(now);
    return { totalHits, timeToExpire, isBlocked, timeToBlockExpire: isBlocked ? Math.max(1, timeToExpire) : 0 };
  }

  /** Now and then, forget keys whose window ended long ago (never awaited by a request). */
  private sweep(now: number): void {
    if (now - this.lastSweep < SWEEP_EVERY_MS) return;
    this.lastSweep = now;
    const sql = `DELETE FROM throttle_hits WHERE "windowStart" < ${this.postgres ? '$1' : '?'}`;
    this.dataSource.query(sql, [now - SWEEP_AFTER_MS]).catch(() => undefined);
  }
}

/**
 * Which storage the throttler uses: THROTTLE_STORAGE=database|memory; by default the database on
 * PostgreSQL (several instances may share it) and memory on the embedded SQLite (one process).
 */
export function throttleInDatabase(env: NodeJS.ProcessEnv = process.env): boolean {
  const choice = env.THROTTLE_STORAGE;
  if (choice === 'database') return true;
  if (choice === 'memory') return false;
  return (env.DATABASE_URL ?? '').startsWith('postgres');
}
