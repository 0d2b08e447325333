import { DataSource, type DataSourceOptions } from 'typeorm';

/** An arbitrary, fixed key for PostgreSQL's advisory lock ("Caus"). */
const STARTUP_LOCK = 0x43617573;

/**
 * Runs `fn` while holding a database-wide lock, so that instances starting at the same time
 * migrate and seed one after the other instead of racing (two CREATE TABLEs, two catalogues).
 * PostgreSQL: a session advisory lock on a connection of its own, released however `fn` ends.
 * SQLite: one process owns the file; nothing to take.
 */
export async function withStartupLock<T>(dataSource: DataSource, fn: () => Promise<T>): Promise<T> {
  if (dataSource.options.type !== 'postgres') return fn();
  const qr = dataSource.createQueryRunner();
  await qr.connect();
  try {
    await qr.query('SELECT pg_advisory_lock($1)', [STARTUP_LOCK]);
    try {
      return await fn();
    } finally {
      await qr.query('SELECT pg_advisory_unlock($1)', [STARTUP_LOCK]);
    }
  } finally {
    await qr.release();
  }
}

/**
 * The app's DataSource: connects, then runs pending migrations (all in one transaction) under the
 * startup lock. For TypeOrmModule's dataSourceFactory; the options must not set migrationsRun.
 */
export async function initializeAndMigrate(options: DataSourceOptions): Promise<DataSource> {
  const dataSource = await new DataSource({ ...options, migrationsRun: false }).initialize();
  try {
    await withStartupLock(dataSource, () => dataSource.runMigrations({ transaction: 'all' }));
  } catch (err) {
    await dataSource.destroy();
    throw err;
  }
  return dataSource;
}
