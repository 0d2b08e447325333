import 'reflect-metadata';
import { join } from 'node:path';
import { DataSource, type DataSourceOptions } from 'typeorm';
import { resolveDataDir } from '../config/configuration';
import { migrations } from './migrations';

/**
 * The one description of the database, used by the app and by the TypeORM CLI.
 * SQLite (better-sqlite3) under DATA_DIR by default; DATABASE_URL=postgres://… switches engine.
 */
export function dataSourceOptions(env: NodeJS.ProcessEnv = process.env): DataSourceOptions {
  const url = env.DATABASE_URL;
  const common = { migrations, migrationsRun: false, synchronize: false, logging: false } as const;
  if (url?.startsWith('postgres')) {
    return {
      type: 'postgres',
      url,
      ...common,
      // New ids come from gen_random_uuid(), built into PostgreSQL 13+: no extension to install.
      uuidExtension: 'pgcrypto',
      installExtensions: false,
      extra: {
        // Connections per instance (PG_POOL_MAX); several instances share the server's max_connections.
        max: Number(env.PG_POOL_MAX ?? 10),
        // Sessions in UTC, as the embedded database keeps times: a date-time written as text
        // without an offset means the same instant on both engines, whatever the server's zone.
        options: '-c TimeZone=UTC',
      },
    };
  }
  const database = env.DATABASE_FILE ?? join(resolveDataDir(env), 'causeway.sqlite');
  return {
    type: 'better-sqlite3',
    database,
    ...common,
    prepareDatabase: (db: { pragma: (s: string) => unknown }) => {
      db.pragma('journal_mode = WAL');
      db.pragma('foreign_keys = ON');
      db.pragma('busy_timeout = 5000');
      db.pragma('synchronous = NORMAL');
    },
  };
}

/** For the TypeORM CLI (`npm run migration:run -w backend`). */
export default new DataSource({
  ...dataSourceOptions(),
  entities: [join(__dirname, '..', '**', '*.entity.js')],
} as DataSourceOptions);
