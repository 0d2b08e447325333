import { MigrationInterface, QueryRunner, Table, TableForeignKey, TableIndex, type TableColumnOptions } from 'typeorm';
import { boolColumn, idColumn, refColumn, timestampColumn } from '../portable';

/** Vehicle scope columns (null = any) shared by teardowns, possible causes and add-ons. */
function scopeColumns(): TableColumnOptions[] {
  return [
    { name: 'make', type: 'varchar', length: '40', isNullable: true },
    { name: 'model', type: 'varchar', length: '60', isNullable: true },
    { name: 'engine', type: 'varchar', length: '60', isNullable: true },
    { name: 'yearFrom', type: 'integer', isNullable: true },
    { name: 'yearTo', type: 'integer', isNullable: true },
  ];
}

/** The knowledge base (parts, teardowns, possible causes, add-ons), outcomes and exchange rates. */
export class Knowledge1764600200000 implements MigrationInterface {
  name = 'Knowledge1764600200000';

  async up(qr: QueryRunner): Promise<void> {
    await qr.createTable(
      new Table({
        name: 'parts',
        columns: [
          idColumn(qr),
          { name: 'key', type: 'varchar', length: '60', isUnique: true },
          { name: 'name', type: 'varchar', length: '160' },
          { name: 'system', type: 'varchar', length: '30' },
        ],
      }),
    );
    await qr.createTable(
      new Table({
        name: 'teardowns',
        columns: [
          idColumn(qr),
          { name: 'key', type: 'varchar', length: '80', isUnique: true },
          { name: 'name', type: 'varchar', length: '240' },
          { name: 'hours', type: 'double precision' },
          ...scopeColumns(),
          { name: 'cautions', type: 'text' },
        ],
      }),
    );
    await qr.createTable(
      new Table({
        name: 'possible_causes',
        columns: [
          idColumn(qr),
          { name: 'code', type: 'varchar', length: '5' },
          { name: 'partKey', type: 'varchar', length: '60' },
          { name: 'prior', type: 'double precision' },
          { name: 'partCostMinor', type: 'integer' },
          { name: 'currency', type: 'varchar', length: '3' },
          { name: 'replaceHours', type: 'double precision' },
          { name: 'teardownKey', type: 'varchar', length: '80', isNullable: true },
          { name: 'checkDescription', type: 'text', default: "''" },
          { name: 'checkHours', type: 'double precision', isNullable: true },
          boolColumn('checkMustPrecede', false),
          ...scopeColumns(),
        ],
        indices: [new TableIndex({ name: 'IDX_possible_causes_code', columnNames: ['code'] })],
        foreignKeys: [
          new TableForeignKey({ columnNames: ['partKey'], referencedTableName: 'parts', referencedColumnNames: ['key'], onDelete: 'RESTRICT' }),
          new TableForeignKey({ columnNames: ['teardownKey'], referencedTableName: 'teardowns', referencedColumnNames: ['key'], onDelete: 'RESTRICT' }),
        ],
      }),
    );
    await qr.createTable(
      new Table({
        name: 'addons',
        columns: [
          idColumn(qr),
          { name: 'key', type: 'varchar', length: '80', isUnique: true },
          { name: 'label', type: 'varchar', length: '200' },
          { name: 'teardownKey', type: 'varchar', length: '80' },
          { name: 'partCostMinor', type: 'integer' },
          { name: 'currency', type: 'varchar', length: '3' },
          { name: 'hours', type: 'double precision' },
          ...scopeColumns(),
        ],
        foreignKeys: [new TableForeignKey({ columnNames: ['teardownKey'], referencedTableName: 'teardowns', referencedColumnNames: ['key'], onDelete: 'CASCADE' })],
      }),
    );
    await qr.createTable(
      new Table({
        name: 'outcomes',
        columns: [
          idColumn(qr),
          { name: 'source', type: 'varchar', length: '12' },
          refColumn(qr, 'sourceId', true),
          refColumn(qr, 'userId'),
          refColumn(qr, 'shopId', true),
          { name: 'code', type: 'varchar', length: '5' },
          { name: 'make', type: 'varchar', length: '40', isNullable: true },
          { name: 'model', type: 'varchar', length: '60', isNullable: true },
          { name: 'engine', type: 'varchar', length: '60', isNullable: true },
          { name: 'year', type: 'integer', isNullable: true },
          { name: 'causeKey', type: 'varchar', length: '60', isNullable: true },
          { name: 'weight', type: 'double precision' },
          timestampColumn(qr, 'createdAt', { defaultNow: true }),
        ],
        // No foreign keys to users or shops: an outcome is evidence that outlives the account.
        indices: [
          new TableIndex({ name: 'IDX_outcomes_code', columnNames: ['code'] }),
          new TableIndex({ name: 'IDX_outcomes_source', columnNames: ['source', 'sourceId'] }),
        ],
      }),
    );
    await qr.createTable(
      new Table({
        name: 'exchange_rates',
        columns: [
          { name: 'currency', type: 'varchar', length: '3', isPrimary: true },
          { name: 'perBase', type: 'double precision' },
          { name: 'base', type: 'varchar', length: '3' },
          { name: 'asOf', type: 'varchar', length: '10' },
        ],
      }),
    );
  }

  async down(qr: QueryRunner): Promise<void> {
    await qr.dropTable('exchange_rates');
    await qr.dropTable('outcomes');
    await qr.dropTable('addons');
    await qr.dropTable('possible_causes');
    await qr.dropTable('teardowns');
    await qr.dropTable('parts');
  }
}
