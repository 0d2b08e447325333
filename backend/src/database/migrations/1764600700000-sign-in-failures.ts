import { MigrationInterface, QueryRunner, Table, TableIndex } from 'typeorm';
import { idColumn } from '../portable';

/** Failed sign-ins per (hashed) e-mail address, for the per-account lockout. */
export class SignInFailures1764600700000 implements MigrationInterface {
  name = 'SignInFailures1764600700000';

  async up(qr: QueryRunner): Promise<void> {
    await qr.createTable(
      new Table({
        name: 'sign_in_failures',
        columns: [idColumn(qr), { name: 'keyHash', type: 'varchar', length: '64' }, { name: 'at', type: 'bigint' }],
        indices: [
          new TableIndex({ name: 'IDX_sign_in_failures_key_at', columnNames: ['keyHash', 'at'] }),
          new TableIndex({ name: 'IDX_sign_in_failures_at', columnNames: ['at'] }),
        ],
      }),
    );
  }

  async down(qr: QueryRunner): Promise<void> {
    await qr.dropTable('sign_in_failures');
  }
}
