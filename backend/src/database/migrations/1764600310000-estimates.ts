import { MigrationInterface, QueryRunner, Table, TableForeignKey, TableIndex } from 'typeorm';
import { idColumn, refColumn, timestampColumn } from '../portable';

export class Estimates1764600310000 implements MigrationInterface {
  name = 'Estimates1764600310000';

  async up(qr: QueryRunner): Promise<void> {
    await qr.createTable(
      new Table({
        name: 'estimates',
        columns: [
          idColumn(qr),
          refColumn(qr, 'shopId'),
          refColumn(qr, 'jobId'),
          { name: 'tokenHash', type: 'varchar', length: '64' },
          timestampColumn(qr, 'expiresAt'),
          { name: 'currency', type: 'varchar', length: '3' },
          { name: 'locale', type: 'varchar', length: '35' },
          { name: 'taxRateBp', type: 'integer' },
          { name: 'codes', type: 'text' },
          { name: 'stages', type: 'text' },
          { name: 'totals', type: 'text' },
          { name: 'message', type: 'text', isNullable: true },
          { name: 'recipientEmail', type: 'varchar', length: '254', isNullable: true },
          timestampColumn(qr, 'emailedAt', { nullable: true }),
          { name: 'emailError', type: 'text', isNullable: true },
          refColumn(qr, 'createdById', true),
          timestampColumn(qr, 'createdAt', { defaultNow: true }),
        ],
        indices: [
          new TableIndex({ name: 'IDX_estimates_token_hash', columnNames: ['tokenHash'], isUnique: true }),
          new TableIndex({ name: 'IDX_estimates_job', columnNames: ['jobId'] }),
        ],
        foreignKeys: [
          new TableForeignKey({ columnNames: ['shopId'], referencedTableName: 'shops', referencedColumnNames: ['id'], onDelete: 'CASCADE' }),
          new TableForeignKey({ columnNames: ['jobId'], referencedTableName: 'jobs', referencedColumnNames: ['id'], onDelete: 'CASCADE' }),
        ],
      }),
    );
    await qr.createTable(
      new Table({
        name: 'estimate_answers',
        columns: [
          idColumn(qr),
          refColumn(qr, 'estimateId'),
          { name: 'stageIndex', type: 'integer' },
          { name: 'decision', type: 'varchar', length: '10' },
          { name: 'name', type: 'varchar', length: '120', isNullable: true },
          timestampColumn(qr, 'answeredAt'),
        ],
        indices: [new TableIndex({ name: 'IDX_estimate_answers_estimate', columnNames: ['estimateId'] })],
        foreignKeys: [new TableForeignKey({ columnNames: ['estimateId'], referencedTableName: 'estimates', referencedColumnNames: ['id'], onDelete: 'CASCADE' })],
      }),
    );
  }

  async down(qr: QueryRunner): Promise<void> {
    await qr.dropTable('estimate_answers');
    await qr.dropTable('estimates');
  }
}
