import { MigrationInterface, QueryRunner, Table, TableForeignKey, TableIndex } from 'typeorm';
import { boolColumn, idColumn, refColumn, timestampColumn } from '../portable';

/** Field reports with their attachments, and the audit log of review decisions and direct edits. */
export class FieldReports1764600400000 implements MigrationInterface {
  name = 'FieldReports1764600400000';

  async up(qr: QueryRunner): Promise<void> {
    await qr.createTable(
      new Table({
        name: 'field_reports',
        columns: [
          idColumn(qr),
          { name: 'kind', type: 'varchar', length: '16' },
          { name: 'status', type: 'varchar', length: '12' },
          // No foreign keys to users or shops: a decided report is evidence that outlives the account.
          refColumn(qr, 'authorId'),
          refColumn(qr, 'shopId', true),
          { name: 'code', type: 'varchar', length: '5' },
          { name: 'payload', type: 'text' },
          boolColumn('proposesNewCode', false),
          timestampColumn(qr, 'submittedAt', { nullable: true }),
          timestampColumn(qr, 'decidedAt', { nullable: true }),
          refColumn(qr, 'decidedById', true),
          { name: 'decisionNote', type: 'text', isNullable: true },
          timestampColumn(qr, 'notifiedAt', { nullable: true }),
          { name: 'notifyError', type: 'text', isNullable: true },
          timestampColumn(qr, 'createdAt', { defaultNow: true }),
          timestampColumn(qr, 'updatedAt', { defaultNow: true }),
        ],
        indices: [
          new TableIndex({ name: 'IDX_field_reports_author', columnNames: ['authorId', 'createdAt'] }),
          new TableIndex({ name: 'IDX_field_reports_queue', columnNames: ['status', 'submittedAt'] }),
          new TableIndex({ name: 'IDX_field_reports_code', columnNames: ['code'] }),
        ],
      }),
    );
    await qr.createTable(
      new Table({
        name: 'field_report_attachments',
        columns: [
          idColumn(qr),
          refColumn(qr, 'reportId'),
          { name: 'storageKey', type: 'varchar', length: '64' },
          { name: 'originalName', type: 'varchar', length: '120' },
          { name: 'contentType', type: 'varchar', length: '40' },
          { name: 'size', type: 'integer' },
          { name: 'width', type: 'integer', isNullable: true },
          { name: 'height', type: 'integer', isNullable: true },
          refColumn(qr, 'uploadedById'),
          timestampColumn(qr, 'createdAt', { defaultNow: true }),
        ],
        indices: [
          new TableIndex({ name: 'IDX_field_report_attachments_report', columnNames: ['reportId'] }),
          new TableIndex({ name: 'IDX_field_report_attachments_key', columnNames: ['storageKey'], isUnique: true }),
        ],
        foreignKeys: [new TableForeignKey({ columnNames: ['reportId'], referencedTableName: 'field_reports', referencedColumnNames: ['id'], onDelete: 'CASCADE' })],
      }),
    );
    await qr.createTable(
      new Table({
        name: 'audit_entries',
        columns: [
          idColumn(qr),
          timestampColumn(qr, 'at'),
          refColumn(qr, 'actorId', true),
          { name: 'actorEmail', type: 'varchar', length: '254' },
          { name: 'action', type: 'varchar', length: '40' },
          { name: 'entityType', type: 'varchar', length: '40' },
          { name: 'entityId', type: 'varchar', length: '160' },
          { name: 'before', type: 'text', isNullable: true },
          { name: 'after', type: 'text', isNullable: true },
          { name: 'note', type: 'text', isNullable: true },
        ],
        // No foreign keys: the log outlives the accounts and rows it describes.
        indices: [
          new TableIndex({ name: 'IDX_audit_entries_at', columnNames: ['at'] }),
          new TableIndex({ name: 'IDX_audit_entries_entity', columnNames: ['entityType', 'entityId'] }),
          new TableIndex({ name: 'IDX_audit_entries_actor', columnNames: ['actorId'] }),
          new TableIndex({ name: 'IDX_audit_entries_action', columnNames: ['action'] }),
        ],
      }),
    );
  }

  async down(qr: QueryRunner): Promise<void> {
    await qr.dropTable('audit_entries');
    await qr.dropTable('field_report_attachments');
    await qr.dropTable('field_reports');
  }
}
