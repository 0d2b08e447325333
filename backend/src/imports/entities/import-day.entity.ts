import { Column, Entity, PrimaryColumn } from 'typeorm';

/**
 * What imports wrote for one vehicle and scan day: the job the rows went to and the content hash of
 * every row imported, so that importing the same rows again changes nothing. Written by the
 * import's prepared statements; the entity describes the schema and serves reads.
 */
@Entity('import_days', { withoutRowid: true })
export class ImportDay {
  @PrimaryColumn()
  shopId: string;

  /** A deleted vehicle's rows are imported again for the vehicle created in its place. */
  @PrimaryColumn()
  vehicleId: string;

  /** YYYY-MM-DD as written in the file. */
  @PrimaryColumn({ length: 10 })
  scanDay: string;

  /** The job of that day (reused while it is open; a later file opens a new one once it is closed). */
  @Column()
  jobId: string;

  /** The import that last added rows. */
  @Column()
  importId: string;

  /** The sha256 (base64url, 43 characters each) of every row imported, one after the other. */
  @Column('text')
  hashes: string;

  /** The module (ECU) each code was read from, as { code: module }, when the file said. */
  @Column({ type: 'simple-json', nullable: true })
  modules: Record<string, string> | null;
}
