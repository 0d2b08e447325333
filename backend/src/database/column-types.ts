import type { ColumnType } from 'typeorm';

/**
 * Entities name date-time columns through this, so they map on SQLite and PostgreSQL alike
 * (`timestamptz` on PostgreSQL, as the migrations create them through database/portable.ts).
 */
export const DATETIME: ColumnType = (process.env.DATABASE_URL ?? '').startsWith('postgres') ? 'timestamptz' : 'datetime';
