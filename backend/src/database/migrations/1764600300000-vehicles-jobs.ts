import { MigrationInterface, QueryRunner, Table, TableForeignKey, TableIndex } from 'typeorm';
import { idColumn, refColumn, timestampColumn } from '../portable';

export class VehiclesJobs1764600300000 implements MigrationInterface {
  name = 'VehiclesJobs1764600300000';

  async up(qr: QueryRunner): Promise<void> {
    await qr.createTable(
      new Table({
        name: 'vehicles',
        columns: [
          idColumn(qr),
          refColumn(qr, 'shopId'),
          { name: 'vin', type: 'varchar', length: '17' },
          { name: 'make', type: 'varchar', length: '40' },
          { name: 'model', type: 'varchar', length: '60' },
          { name: 'engine', type: 'varchar', length: '40', isNullable: true },
          { name: 'year', type: 'integer', isNullable: true },
          { name: 'plate', type: 'varchar', length: '20', isNullable: true },
          { name: 'odometerKm', type: 'double precision', isNullable: true },
          timestampColumn(qr, 'odometerReadAt', { nullable: true }),
          { name: 'ownerName', type: 'varchar', length: '120', isNullable: true },
          { name: 'ownerEmail', type: 'varchar', length: '254', isNullable: true },
          timestampColumn(qr, 'createdAt', { defaultNow: true }),
          timestampColumn(qr, 'updatedAt', { defaultNow: true }),
        ],
        indices: [new TableIndex({ name: 'IDX_vehicles_shop_vin', columnNames: ['shopId', 'vin'], isUnique: true })],
        foreignKeys: [new TableForeignKey({ columnNames: ['shopId'], referencedTableName: 'shops', referencedColumnNames: ['id'], onDelete: 'CASCADE' })],
      }),
    );
    await qr.createTable(
      new Table({
        name: 'jobs',
        columns: [
          idColumn(qr),
          refColumn(qr, 'shopId'),
          refColumn(qr, 'vehicleId'),
          { name: 'complaint', type: 'text' },
          refColumn(qr, 'technicianId', true),
          { name: 'status', type: 'varchar', length: '10' },
          { name: 'resolution', type: 'varchar', length: '12', isNullable: true },
          { name: 'odometerKm', type: 'double precision', isNullable: true },
          { name: 'expectedCostMinor', type: 'integer', isNullable: true },
          timestampColumn(qr, 'openedAt'),
          timestampColumn(qr, 'closedAt', { nullable: true }),
          { name: 'verificationPassed', type: 'boolean', isNullable: true },
          { name: 'closeNotes', type: 'text', isNullable: true },
          refColumn(qr, 'createdById', true),
          timestampColumn(qr, 'createdAt', { defaultNow: true }),
          timestampColumn(qr, 'updatedAt', { defaultNow: true }),
        ],
        indices: [
          new TableIndex({ name: 'IDX_jobs_shop_opened', columnNames: ['shopId', 'openedAt'] }),
          new TableIndex({ name: 'IDX_jobs_vehicle', columnNames: ['vehicleId'] }),
        ],
        foreignKeys: [
          new TableForeignKey({ columnNames: ['shopId'], referencedTableName: 'shops', referencedColumnNames: ['id'], onDelete: 'CASCADE' }),
          new TableForeignKey({ columnNames: ['vehicleId'], referencedTableName: 'vehicles', referencedColumnNames: ['id'], onDelete: 'RESTRICT' }),
          new TableForeignKey({ columnNames: ['technicianId'], referencedTableName: 'users', referencedColumnNames: ['id'], onDelete: 'SET NULL' }),
        ],
      }),
    );
    await qr.createTable(
      new Table({
        name: 'job_codes',
        columns: [
          idColumn(qr),
          refColumn(qr, 'jobId'),
          { name: 'code', type: 'varchar', length: '5' },
          { name: 'display', type: 'varchar', length: '8' },
          { name: 'position', type: 'integer' },
          { name: 'status', type: 'varchar', length: '10' },
          { name: 'freezeFrame', type: 'text' },
          { name: 'expectedCostMinor', type: 'integer', isNullable: true },
          { name: 'outcome', type: 'text', isNullable: true },
        ],
        indices: [
          new TableIndex({ name: 'IDX_job_codes_job_code', columnNames: ['jobId', 'code'], isUnique: true }),
          new TableIndex({ name: 'IDX_job_codes_code', columnNames: ['code'] }),
        ],
        foreignKeys: [new TableForeignKey({ columnNames: ['jobId'], referencedTableName: 'jobs', referencedColumnNames: ['id'], onDelete: 'CASCADE' })],
      }),
    );
    await qr.createTable(
      new Table({
        name: 'job_steps',
        columns: [
          idColumn(qr),
          refColumn(qr, 'jobId'),
          { name: 'sequence', type: 'integer' },
          { name: 'code', type: 'varchar', length: '5' },
          { name: 'kind', type: 'varchar', length: '10' },
          { name: 'parts', type: 'text' },
          { name: 'result', type: 'varchar', length: '14' },
          { name: 'actualCostMinor', type: 'integer' },
          { name: 'notes', type: 'text', default: "''" },
          timestampColumn(qr, 'at'),
          refColumn(qr, 'createdById', true),
          timestampColumn(qr, 'createdAt', { defaultNow: true }),
        ],
        indices: [new TableIndex({ name: 'IDX_job_steps_job_seq', columnNames: ['jobId', 'sequence'], isUnique: true })],
        foreignKeys: [
          new TableForeignKey({ columnNames: ['jobId'], referencedTableName: 'jobs', referencedColumnNames: ['id'], onDelete: 'CASCADE' }),
          new TableForeignKey({ columnNames: ['createdById'], referencedTableName: 'users', referencedColumnNames: ['id'], onDelete: 'SET NULL' }),
        ],
      }),
    );
  }

  async down(qr: QueryRunner): Promise<void> {
    await qr.dropTable('job_steps');
    await qr.dropTable('job_codes');
    await qr.dropTable('jobs');
    await qr.dropTable('vehicles');
  }
}
