import type { DataSource, QueryRunner } from 'typeorm';
import type { Row, SqlOp, WriteProgram } from './writer';

interface Statement {
  get(...params: unknown[]): unknown;
  all(...params: unknown[]): unknown[];
  run(...params: unknown[]): unknown;
}

interface SqliteHandle {
  prepare(sql: string): Statement;
  exec(sql: string): unknown;
  readonly inTransaction: boolean;
}

const DB_TIME = /^\d{4}-\d{2}-\d{2} \d{2}:\d{2}:\d{2}\.\d{3}$/;

/**
 * On PostgreSQL, instants go in as Date objects, exactly as TypeORM writes them (the program's
 * UTC text form would be read in the server's time zone instead).
 */
function pgParam(v: string | number | null): unknown {
  return typeof v === 'string' && DB_TIME.test(v) ? new Date(`${v.replace(' ', 'T')}Z`) : v;
}

function pgSql(sql: string): string {
  let n = 0;
  return sql.replace(/\?/g, () => `$${++n}`);
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

export function isSqlite(dataSource: DataSource): boolean {
  return dataSource.options.type === 'better-sqlite3';
}

/**
 * Runs write programs in one transaction each. On SQLite the program is driven synchronously on
 * the app's own connection with cached prepared statements: from BEGIN IMMEDIATE to COMMIT no other
 * request can run, so nothing interleaves and a crash leaves either all or none of it.
 */
export class ImportTransactions {
  private readonly statements = new Map<string, Statement>();

  constructor(private readonly dataSource: DataSource) {}

  private get sqlite(): SqliteHandle {
    return (this.dataSource.driver as unknown as { databaseConnection: SqliteHandle }).databaseConnection;
  }

  private stmt(sql: string): Statement {
    let s = this.statements.get(sql);
    if (!s) {
      s = this.sqlite.prepare(sql);
      this.statements.set(sql, s);
    }
    return s;
  }

  private execSqlite(op: SqlOp): unknown {
    const s = this.stmt(op.sql);
    if (op.kind === 'get') return s.get(op.params);
    if (op.kind === 'all') return s.all(op.params);
    s.run(op.params);
    return undefined;
  }

  /**
   * Runs `before`, `program`, then `after(result)` in one transaction; commits, or rolls back when
   * `rollback` is true (a rehearsal) or anything throws.
   */
  async run<T>(program: WriteProgram<T>, after: (result: T) => SqlOp[], rollback: boolean, before: SqlOp[] = []): Promise<T> {
    return isSqlite(this.dataSource) ? this.runSqlite(program, after, rollback, before) : this.runPostgres(program, after, rollback, before);
  }

  private async runSqlite<T>(program: WriteProgram<T>, after: (result: T) => SqlOp[], rollback: boolean, before: SqlOp[]): Promise<T> {
    const db = this.sqlite;
    // Another request's TypeORM transaction may be open on the shared connection: let it finish.
    for (let waited = 0; db.inTransaction; waited += 5) {
      if (waited > 30_000) throw new Error('import: the database stayed busy for 30 s');
      await sleep(5);
    }
    db.exec('BEGIN IMMEDIATE');
    try {
      for (const op of before) this.execSqlite(op);
      let step = program.next();
      while (!step.done) step = program.next(this.execSqlite(step.value));
      for (const op of after(step.value)) this.execSqlite(op);
      db.exec(rollback ? 'ROLLBACK' : 'COMMIT');
      return step.value;
    } catch (err) {
      if (db.inTransaction) db.exec('ROLLBACK');
      throw err;
    }
  }

  private async runPostgres<T>(program: WriteProgram<T>, after: (result: T) => SqlOp[], rollback: boolean, before: SqlOp[]): Promise<T> {
    const qr: QueryRunner = this.dataSource.createQueryRunner();
    await qr.connect();
    await qr.startTransaction();
    const exec = async (op: SqlOp): Promise<unknown> => {
      const rows = (await qr.query(pgSql(op.sql), op.params.map(pgParam))) as Row[];
      if (op.kind === 'get') return rows[0];
      if (op.kind === 'all') return rows;
      return undefined;
    };
    try {
      for (const op of before) await exec(op);
      let step = program.next();
      while (!step.done) step = program.next(await exec(step.value));
      for (const op of after(step.value)) await exec(op);
      if (rollback) await qr.rollbackTransaction();
      else await qr.commitTransaction();
      return step.value;
    } catch (err) {
      if (qr.isTransactionActive) await qr.rollbackTransaction();
      throw err;
    } finally {
      await qr.release();
    }
  }
}
