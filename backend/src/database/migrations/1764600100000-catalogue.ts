import { MigrationInterface, QueryRunner, Table, TableIndex } from 'typeorm';
import { idColumn, timestampColumn } from '../portable';

export class Catalogue1764600100000 implements MigrationInterface {
  name = 'Catalogue1764600100000';

  async up(qr: QueryRunner): Promise<void> {
    await qr.createTable(
      new Table({
        name: 'dtc_codes',
        columns: [
          idColumn(qr),
          { name: 'code', type: 'varchar', length: '5' },
          { name: 'make', type: 'varchar', length: '40', default: "''" },
          { name: 'system', type: 'varchar', length: '1' },
          { name: 'control', type: 'varchar', length: '12' },
          { name: 'title', type: 'varchar', length: '200' },
          { name: 'description', type: 'text', default: "''" },
          { name: 'subsystem', type: 'varchar', length: '120' },
          { name: 'symptoms', type: 'text' },
          { name: 'verificationMonitor', type: 'varchar', length: '120', default: "''" },
          { name: 'verificationProcedure', type: 'text', default: "''" },
          { name: 'verificationHours', type: 'double precision', default: 0.5 },
          { name: 'escalationHours', type: 'double precision', isNullable: true },
          { name: 'escalationDescription', type: 'text', default: "''" },
          { name: 'cautions', type: 'text' },
          { name: 'source', type: 'varchar', length: '20' },
          timestampColumn(qr, 'createdAt', { defaultNow: true }),
          timestampColumn(qr, 'updatedAt', { defaultNow: true }),
        ],
        indices: [
          new TableIndex({ name: 'IDX_dtc_codes_code_make', columnNames: ['code', 'make'], isUnique: true }),
          new TableIndex({ name: 'IDX_dtc_codes_system', columnNames: ['system', 'control'] }),
        ],
      }),
    );
    await qr.createTable(
      new Table({
        name: 'safety_cautions',
        columns: [
          { name: 'key', type: 'varchar', length: '40', isPrimary: true },
          { name: 'title', type: 'varchar', length: '120' },
          { name: 'points', type: 'text' },
          { name: 'sources', type: 'text' },
        ],
      }),
    );
  }

  async down(qr: QueryRunner): Promise<void> {
    await qr.dropTable('safety_cautions');
    await qr.dropTable('dtc_codes');
  }
}
