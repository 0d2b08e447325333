import { randomBytes } from 'node:crypto';
import { Client } from 'pg';

/** True when the suite runs against PostgreSQL (scripts/pg-test.sh sets DATABASE_URL). */
export function onPostgres(env: NodeJS.ProcessEnv = process.env): boolean {
  return (env.DATABASE_URL ?? '').startsWith('postgres');
}

function withDatabase(url: string, name: string): string {
  const u = new URL(url);
  u.pathname = `/${name}`;
  return u.toString();
}

/**
 * A fresh, empty PostgreSQL database for one suite on the server DATABASE_URL names, so each suite
 * starts from nothing as it does on its own temporary SQLite file. `drop` removes it.
 */
export async function freshPostgresDatabase(baseUrl: string): Promise<{ url: string; drop: () => Promise<void> }> {
  const name = `causeway_t_${process.pid}_${randomBytes(4).toString('hex')}`;
  const admin = new Client({ connectionString: baseUrl });
  await admin.connect();
  try {
    await admin.query(`CREATE DATABASE "${name}"`);
  } finally {
    await admin.end();
  }
  return {
    url: withDatabase(baseUrl, name),
    drop: async () => {
      const c = new Client({ connectionString: baseUrl });
      await c.connect();
      try {
        await c.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
      } finally {
        await c.end();
      }
    },
  };
}

/**
 * Runs raw SQL written with `?` placeholders on either engine (PostgreSQL numbers them $1, $2…).
 * Quote camelCase identifiers ("sourceId"): PostgreSQL folds unquoted names to lower case.
 */
export function portableSql(sql: string, postgres: boolean): string {
  if (!postgres) return sql;
  let n = 0;
  return sql.replace(/\?/g, () => `$${++n}`);
}
