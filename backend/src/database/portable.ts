import type { QueryRunner, TableColumnOptions } from 'typeorm';

/**
 * Column helpers so one migration runs on the embedded SQLite and on PostgreSQL:
 * TypeORM's Table API is portable except for a few type names and defaults.
 *
 * Ids are text on both engines (PostgreSQL makes new ones with the built-in gen_random_uuid(),
 * version 13 and later; imports write time-ordered ids of their own). Text, not PostgreSQL's uuid
 * type, so that a malformed id in a URL or filter simply matches nothing — a 404, as on SQLite —
 * instead of a type error, and every reference compares text with text.
 */
export function isPostgres(queryRunner: QueryRunner): boolean {
  return queryRunner.connection.options.type === 'postgres';
}

export function idColumn(qr: QueryRunner, name = 'id'): TableColumnOptions {
  return isPostgres(qr)
    ? { name, type: 'varchar', length: '36', isPrimary: true, default: 'gen_random_uuid()' }
    : { name, type: 'varchar', isPrimary: true };
}

export function refColumn(qr: QueryRunner, name: string, nullable = false): TableColumnOptions {
  return isPostgres(qr) ? { name, type: 'varchar', length: '36', isNullable: nullable } : { name, type: 'varchar', isNullable: nullable };
}

/**
 * A point in time. PostgreSQL: `timestamptz`, so instances in different time zones read the
 * same instant. SQLite: TypeORM's `datetime` (UTC text).
 */
export function timestampColumn(qr: QueryRunner, name: string, opts: { nullable?: boolean; defaultNow?: boolean } = {}): TableColumnOptions {
  const type = isPostgres(qr) ? 'timestamptz' : 'datetime';
  const col: TableColumnOptions = { name, type, isNullable: opts.nullable ?? false };
  if (opts.defaultNow) col.default = isPostgres(qr) ? 'now()' : "(datetime('now'))";
  return col;
}

export function boolColumn(name: string, defaultValue: boolean): TableColumnOptions {
  return { name, type: 'boolean', default: defaultValue };
}

/** A floating-point number: `double precision` is an 8-byte float on both (REAL affinity on SQLite). */
export function doubleColumn(name: string, opts: { nullable?: boolean; default?: number } = {}): TableColumnOptions {
  const col: TableColumnOptions = { name, type: 'double precision', isNullable: opts.nullable ?? false };
  if (opts.default !== undefined) col.default = opts.default;
  return col;
}
