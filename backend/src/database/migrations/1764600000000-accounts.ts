import { MigrationInterface, QueryRunner, Table, TableForeignKey, TableIndex } from 'typeorm';
import { boolColumn, idColumn, refColumn, timestampColumn } from '../portable';

export class Accounts1764600000000 implements MigrationInterface {
  name = 'Accounts1764600000000';

  async up(qr: QueryRunner): Promise<void> {
    await qr.createTable(
      new Table({
        name: 'shops',
        columns: [
          idColumn(qr),
          { name: 'name', type: 'varchar', length: '120' },
          { name: 'currency', type: 'varchar', length: '3' },
          { name: 'locale', type: 'varchar', length: '35', default: "'en-GB'" },
          { name: 'labourRateMinor', type: 'integer' },
          { name: 'taxRateBp', type: 'integer' },
          { name: 'distanceUnit', type: 'varchar', length: '2' },
          timestampColumn(qr, 'createdAt', { defaultNow: true }),
          timestampColumn(qr, 'updatedAt', { defaultNow: true }),
        ],
      }),
    );
    await qr.createTable(
      new Table({
        name: 'users',
        columns: [
          idColumn(qr),
          { name: 'email', type: 'varchar', length: '254' },
          { name: 'emailNormalized', type: 'varchar', length: '254' },
          { name: 'passwordHash', type: 'varchar', length: '100' },
          { name: 'displayName', type: 'varchar', length: '80' },
          { name: 'role', type: 'varchar', length: '20' },
          refColumn(qr, 'shopId', true),
          boolColumn('shopOwner', false),
          boolColumn('disabled', false),
          { name: 'tokenVersion', type: 'integer', default: 0 },
          timestampColumn(qr, 'createdAt', { defaultNow: true }),
          timestampColumn(qr, 'updatedAt', { defaultNow: true }),
        ],
        indices: [new TableIndex({ name: 'IDX_users_email', columnNames: ['emailNormalized'], isUnique: true }), new TableIndex({ name: 'IDX_users_shop', columnNames: ['shopId'] })],
        foreignKeys: [new TableForeignKey({ columnNames: ['shopId'], referencedTableName: 'shops', referencedColumnNames: ['id'], onDelete: 'SET NULL' })],
      }),
    );
    await qr.createTable(
      new Table({
        name: 'invites',
        columns: [
          idColumn(qr),
          { name: 'code', type: 'varchar', length: '32' },
          refColumn(qr, 'shopId'),
          { name: 'role', type: 'varchar', length: '20' },
          refColumn(qr, 'createdById'),
          timestampColumn(qr, 'expiresAt'),
          timestampColumn(qr, 'usedAt', { nullable: true }),
          timestampColumn(qr, 'createdAt', { defaultNow: true }),
        ],
        indices: [new TableIndex({ name: 'IDX_invites_code', columnNames: ['code'], isUnique: true })],
        foreignKeys: [new TableForeignKey({ columnNames: ['shopId'], referencedTableName: 'shops', referencedColumnNames: ['id'], onDelete: 'CASCADE' })],
      }),
    );
  }

  async down(qr: QueryRunner): Promise<void> {
    await qr.dropTable('invites');
    await qr.dropTable('users');
    await qr.dropTable('shops');
  }
}
