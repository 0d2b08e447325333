import { MigrationInterface, QueryRunner, Table, TableForeignKey, TableIndex } from 'typeorm';
import { boolColumn, idColumn, refColumn, timestampColumn } from '../portable';

/** Scan-tool CSV imports: their history and reports, saved column mappings, one row per imported reading, and the jobs imports opened. */
export class Imports1764600500000 implements MigrationInterface {
  name = 'Imports1764600500000';

  async up(qr: QueryRunner): Promise<void> {
    await qr.createTable(
      new Table({
        name: 'imports',
        columns: [
          idColumn(qr),
          refColumn(qr, 'shopId'),
          refColumn(qr, 'createdById', true),
          { name: 'fileName', type: 'varchar', length: '255' },
          { name: 'fileBytes', type: 'integer' },
          { name: 'status', type: 'varchar', length: '12' },
          boolColumn('validOnly', false),
          { name: 'phase', type: 'varchar', length: '8' },
          { name: 'bytesProcessed', type: 'integer', default: 0 },
          { name: 'rowsProcessed', type: 'integer', default: 0 },
          { name: 'rows', type: 'integer', default: 0 },
          { name: 'accepted', type: 'integer', default: 0 },
          { name: 'rejected', type: 'integer', default: 0 },
          { name: 'skippedDuplicates', type: 'integer', default: 0 },
          { name: 'createdVehicles', type: 'integer', default: 0 },
          { name: 'updatedVehicles', type: 'integer', default: 0 },
          { name: 'createdJobs', type: 'integer', default: 0 },
          { name: 'createdCodes', type: 'integer', default: 0 },
          { name: 'message', type: 'text', isNullable: true },
          { name: 'report', type: 'text', isNullable: true },
          timestampColumn(qr, 'createdAt', { defaultNow: true }),
          timestampColumn(qr, 'finishedAt', { nullable: true }),
        ],
        indices: [new TableIndex({ name: 'IDX_imports_shop_created', columnNames: ['shopId', 'createdAt'] })],
        foreignKeys: [
          new TableForeignKey({ columnNames: ['shopId'], referencedTableName: 'shops', referencedColumnNames: ['id'], onDelete: 'CASCADE' }),
          new TableForeignKey({ columnNames: ['createdById'], referencedTableName: 'users', referencedColumnNames: ['id'], onDelete: 'SET NULL' }),
        ],
      }),
    );
    await qr.createTable(
      new Table({
        name: 'import_mappings',
        columns: [
          idColumn(qr),
          refColumn(qr, 'shopId'),
          { name: 'name', type: 'varchar', length: '80' },
          { name: 'mapping', type: 'text' },
          refColumn(qr, 'createdById', true),
          timestampColumn(qr, 'createdAt', { defaultNow: true }),
          timestampColumn(qr, 'updatedAt', { defaultNow: true }),
        ],
        indices: [new TableIndex({ name: 'IDX_import_mappings_shop_name', columnNames: ['shopId', 'name'], isUnique: true })],
        foreignKeys: [
          new TableForeignKey({ columnNames: ['shopId'], referencedTableName: 'shops', referencedColumnNames: ['id'], onDelete: 'CASCADE' }),
          new TableForeignKey({ columnNames: ['createdById'], referencedTableName: 'users', referencedColumnNames: ['id'], onDelete: 'SET NULL' }),
        ],
      }),
    );
    // One row per imported reading: its content hash makes re-imports change nothing. The key is
    // (shopId, vehicleId, hash) — the hash covers the VIN, so it is unique per shop — and, on
    // SQLite, the table is WITHOUT ROWID: one B-tree, in which a vehicle's rows sit together (and a
    // new vehicle's time-ordered id appends at the end), keeps a 100 000-row import fast. importId
    // and jobId are plain references without foreign keys, so the hashes outlive a deleted job.
    await qr.createTable(
      new Table({
        name: 'import_rows',
        withoutRowid: true,
        columns: [
          { ...refColumn(qr, 'shopId'), isPrimary: true },
          { ...refColumn(qr, 'vehicleId'), isPrimary: true },
          { name: 'hash', type: 'varchar', length: '43', isPrimary: true },
          refColumn(qr, 'importId'),
          { name: 'line', type: 'integer' },
          refColumn(qr, 'jobId', true),
          { name: 'scanDay', type: 'varchar', length: '10' },
          { name: 'code', type: 'varchar', length: '8' },
          { name: 'module', type: 'varchar', length: '60', isNullable: true },
        ],
        foreignKeys: [new TableForeignKey({ columnNames: ['shopId'], referencedTableName: 'shops', referencedColumnNames: ['id'], onDelete: 'CASCADE' })],
      }),
    );
    // The job an import opened for a vehicle and scan day, so that a later file of the same day adds to it.
    await qr.createTable(
      new Table({
        name: 'import_jobs',
        columns: [
          { ...refColumn(qr, 'jobId'), isPrimary: true },
          refColumn(qr, 'shopId'),
          refColumn(qr, 'vehicleId'),
          { name: 'scanDay', type: 'varchar', length: '10' },
          refColumn(qr, 'importId'),
        ],
        indices: [new TableIndex({ name: 'IDX_import_jobs_vehicle_day', columnNames: ['shopId', 'vehicleId', 'scanDay'] })],
        foreignKeys: [
          new TableForeignKey({ columnNames: ['jobId'], referencedTableName: 'jobs', referencedColumnNames: ['id'], onDelete: 'CASCADE' }),
          new TableForeignKey({ columnNames: ['shopId'], referencedTableName: 'shops', referencedColumnNames: ['id'], onDelete: 'CASCADE' }),
        ],
      }),
    );
  }

  async down(qr: QueryRunner): Promise<void> {
    await qr.dropTable('import_jobs');
    await qr.dropTable('import_rows');
    await qr.dropTable('import_mappings');
    await qr.dropTable('imports');
  }
}
