import { MigrationInterface, QueryRunner, Table, TableForeignKey, TableIndex } from 'typeorm';
import { boolColumn, idColumn, refColumn, timestampColumn } from '../portable';

/** Scan-tool CSV imports: their history and reports, saved column mappings, and one row per imported reading. */
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
    // One row per imported reading. vehicleId and jobId are plain references (no foreign key, so
    // deleting a job or vehicle is not slowed by this table); the hash stays, so a deleted job's
    // rows are still recognised as imported.
    await qr.createTable(
      new Table({
        name: 'import_rows',
        columns: [
          { name: 'id', type: 'integer', isPrimary: true, isGenerated: true, generationStrategy: 'increment' },
          refColumn(qr, 'shopId'),
          refColumn(qr, 'importId'),
          { name: 'hash', type: 'varchar', length: '43' },
          { name: 'line', type: 'integer' },
          refColumn(qr, 'vehicleId', true),
          refColumn(qr, 'jobId', true),
          { name: 'scanDay', type: 'varchar', length: '10' },
          { name: 'code', type: 'varchar', length: '8' },
          { name: 'module', type: 'varchar', length: '60', isNullable: true },
        ],
        indices: [
          new TableIndex({ name: 'IDX_import_rows_shop_hash', columnNames: ['shopId', 'hash'], isUnique: true }),
          new TableIndex({ name: 'IDX_import_rows_vehicle_day', columnNames: ['shopId', 'vehicleId', 'scanDay'] }),
          new TableIndex({ name: 'IDX_import_rows_import', columnNames: ['importId'] }),
        ],
        foreignKeys: [
          new TableForeignKey({ columnNames: ['shopId'], referencedTableName: 'shops', referencedColumnNames: ['id'], onDelete: 'CASCADE' }),
          new TableForeignKey({ columnNames: ['importId'], referencedTableName: 'imports', referencedColumnNames: ['id'], onDelete: 'CASCADE' }),
        ],
      }),
    );
  }

  async down(qr: QueryRunner): Promise<void> {
    await qr.dropTable('import_rows');
    await qr.dropTable('import_mappings');
    await qr.dropTable('imports');
  }
}
