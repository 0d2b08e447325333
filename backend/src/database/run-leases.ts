import { Injectable, Logger, type OnApplicationShutdown } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { createHash } from 'node:crypto';
import type { DataSource, QueryRunner } from 'typeorm';

/** A signed 64-bit advisory-lock key from a name, as a decimal string (node-postgres sends it as text). */
function lockKey(name: string): string {
  return createHash('sha256').update(name).digest().readBigInt64BE(0).toString();
}

/**
 * Which long-running jobs (imports) are still alive somewhere. Several instances share one
 * PostgreSQL; one that starts must not take another's running import for one cut off by a crash.
 *
 * PostgreSQL: while it runs, the job holds a session advisory lock named after it, on one
 * connection this instance keeps for its leases; the server drops the lock when that connection
 * ends, however the process ended. A job is abandoned when its lock can be taken.
 * SQLite: one process owns the file, so at start-up every job left running is abandoned.
 */
@Injectable()
export class RunLeases implements OnApplicationShutdown {
  private readonly logger = new Logger('RunLeases');
  private runner: Promise<QueryRunner> | null = null;
  /** Lock calls go one at a time on the one connection. */
  private queue: Promise<unknown> = Promise.resolve();

  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  private get postgres(): boolean {
    return this.dataSource.options.type === 'postgres';
  }

  private connection(): Promise<QueryRunner> {
    if (!this.runner) {
      const qr = this.dataSource.createQueryRunner();
      this.runner = qr.connect().then(() => qr);
      this.runner.catch(() => (this.runner = null));
    }
    return this.runner;
  }

  private run<T>(sql: string, key: string): Promise<T> {
    const next = this.queue.then(async () => (await (await this.connection()).query(sql, [key])) as T);
    this.queue = next.catch(() => undefined);
    return next;
  }

  /** Marks `name` alive until the returned release is called (which never throws). */
  async hold(name: string): Promise<() => Promise<void>> {
    if (!this.postgres) return async () => undefined;
    const key = lockKey(name);
    try {
      await this.run('SELECT pg_advisory_lock($1::bigint)', key);
    } catch (err) {
      // Without a lease the job still runs; only a later start-up could misjudge it.
      this.logger.warn(`No lease for ${name}: ${(err as Error).message}`);
      return async () => undefined;
    }
    return async () => {
      await this.run('SELECT pg_advisory_unlock($1::bigint)', key).catch(() => undefined);
    };
  }

  /** Whether no instance holds `name` any more. */
  async abandoned(name: string): Promise<boolean> {
    if (!this.postgres) return true;
    const key = lockKey(name);
    const [row] = await this.run<Array<{ free: boolean }>>('SELECT pg_try_advisory_lock($1::bigint) AS free', key);
    if (!row?.free) return false;
    await this.run('SELECT pg_advisory_unlock($1::bigint)', key);
    return true;
  }

  async onApplicationShutdown(): Promise<void> {
    const runner = this.runner;
    this.runner = null;
    if (runner) await (await runner.catch(() => null))?.release();
  }
}
