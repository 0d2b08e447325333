import { Column, Entity, PrimaryColumn } from 'typeorm';

/**
 * A counter per cached body of data. Writers bump it in the same transaction as their
 * change; readers compare it with the version their cached value was computed at. Kept
 * in the database, so every app instance sharing it sees a change at once.
 */
@Entity('cache_versions')
export class CacheVersion {
  @PrimaryColumn({ length: 40 })
  name: string;

  @Column('integer', { default: 0 })
  version: number;
}
