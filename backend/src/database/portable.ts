import type { QueryRunner, TableColumnOptions } from 'typeorm';

/**
 * Column helpers so one migration runs on the embedded SQLite and on PostgreSQL:
 * TypeORM's Table API is portable except for a few type names.
 */
export function isPostgres(queryRunner: QueryRunner): boolean {
  return queryRunner.connection.options.type === 'postgres';
}

export function idColumn(qr: QueryRunner, name = 'id'): TableColumnOptions {
  return isPostgres(qr)
    ? { name, type: 'uuid', isPrimary: true, isGenerated: true, generationStrategy: 'uuid' }
    : { name, type: 'varchar', isPrimary: true };
}

export function refColumn(qr: QueryRunner, name: string, nullable = false): TableColumnOptions {
  return { name, type: isPostgres(qr) ? 'uuid' : 'varchar', isNullable: nullable };
}

export function timestampColumn(qr: QueryRunner, name: string, opts: { nullable?: boolean; defaultNow?: boolean } = {}): TableColumnOptions {
  const type = isPostgres(qr) ? 'timestamp' : 'datetime';
  const col: TableColumnOptions = { name, type, isNullable: opts.nullable ?? false };
  if (opts.defaultNow) col.default = isPostgres(qr) ? 'now()' : "(datetime('now'))";
  return col;
}

export function boolColumn(name: string, defaultValue: boolean): TableColumnOptions {
  return { name, type: 'boolean', default: defaultValue };
}
