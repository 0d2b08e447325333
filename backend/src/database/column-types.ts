import type { ColumnType } from 'typeorm';

/** Entities name date-time columns through this, so they map on SQLite and PostgreSQL alike. */
export const DATETIME: ColumnType = (process.env.DATABASE_URL ?? '').startsWith('postgres') ? 'timestamp' : 'datetime';
