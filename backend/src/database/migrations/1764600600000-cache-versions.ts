import { MigrationInterface, QueryRunner, Table } from 'typeorm';

export class CacheVersions1764600600000 implements MigrationInterface {
  name = 'CacheVersions1764600600000';

  async up(qr: QueryRunner): Promise<void> {
    await qr.createTable(
      new Table({
        name: 'cache_versions',
        columns: [
          { name: 'name', type: 'varchar', length: '40', isPrimary: true },
          { name: 'version', type: 'integer', default: 0 },
        ],
      }),
    );
    await qr.query(`INSERT INTO cache_versions (name, version) VALUES ('knowledge', 0)`);
  }

  async down(qr: QueryRunner): Promise<void> {
    await qr.dropTable('cache_versions');
  }
}
