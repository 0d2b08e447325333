import { MigrationInterface, QueryRunner, Table, TableIndex } from 'typeorm';

/**
 * Request counts per client and throttler, shared by every app instance on the database: one row
 * per key with the start of its current window and the hits in it (database/db-throttler-storage.ts).
 */
export class ThrottleHits1764600850000 implements MigrationInterface {
  name = 'ThrottleHits1764600850000';

  async up(qr: QueryRunner): Promise<void> {
    await qr.createTable(
      new Table({
        name: 'throttle_hits',
        columns: [
          { name: 'key', type: 'varchar', length: '200', isPrimary: true },
          // Milliseconds since the epoch: an integer compares alike on SQLite and PostgreSQL.
          { name: 'windowStart', type: 'bigint' },
          { name: 'hits', type: 'integer' },
        ],
        indices: [new TableIndex({ name: 'IDX_throttle_hits_window', columnNames: ['windowStart'] })],
      }),
    );
  }

  async down(qr: QueryRunner): Promise<void> {
    await qr.dropTable('throttle_hits');
  }
}
