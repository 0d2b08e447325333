import { MigrationInterface, QueryRunner, Table, TableForeignKey, TableIndex } from 'typeorm';
import { boolColumn, idColumn, refColumn, timestampColumn } from '../portable';

/** Scan-tool CSV imports: their history and reports, saved column mappings, and the hashes of the rows imported per vehicle and scan day. */
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
    // The content hashes of the rows imported for each vehicle and scan day, and the job they went
    // to. A row's hash covers its VIN and scan time, so equal rows can only meet within one vehicle
    // and day: one row here per vehicle-day (not per reading) keeps re-imports changing nothing while
    // a 100 000-row import writes a fifth of the rows. jobId and importId are plain references
    // without foreign keys, so the hashes outlive a deleted job.
    await qr.createTable(
      new Table({
        name: 'import_days',
        withoutRowid: true,
        columns: [
          { ...refColumn(qr, 'shopId'), isPrimary: true },
          { ...refColumn(qr, 'vehicleId'), isPrimary: true },
          { name: 'scanDay', type: 'varchar', length: '10', isPrimary: true },
          refColumn(qr, 'jobId'),
          refColumn(qr, 'importId'),
          { name: 'hashes', type: 'text' },
          { name: 'modules', type: 'text', isNullable: true },
        ],
        foreignKeys: [new TableForeignKey({ columnNames: ['shopId'], referencedTableName: 'shops', referencedColumnNames: ['id'], onDelete: 'CASCADE' })],
      }),
    );
  }

  async down(qr: QueryRunner): Promise<void> {
    await qr.dropTable('import_days');
    await qr.dropTable('import_mappings');
    await qr.dropTable('imports');
  }
}
