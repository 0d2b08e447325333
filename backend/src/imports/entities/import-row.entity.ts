import { Column, Entity, PrimaryColumn } from 'typeorm';

/**
 * One imported reading (a code of a vehicle at a scan date), keyed by the shop, the vehicle and the
 * sha256 of its normalised values. Written by the import's prepared statements; the entity describes the
 * schema and serves reads.
 */
@Entity('import_rows', { withoutRowid: true })
export class ImportRow {
  @PrimaryColumn()
  shopId: string;

  /** The vehicle of the VIN; a deleted vehicle's rows are imported again for the new one. */
  @PrimaryColumn()
  vehicleId: string;

  /** sha256 (base64url) of the row's normalised values. */
  @PrimaryColumn({ length: 43 })
  hash: string;

  @Column()
  importId: string;

  @Column('integer')
  line: number;

  @Column({ type: 'varchar', nullable: true })
  jobId: string | null;

  /** YYYY-MM-DD as written in the file. */
  @Column({ length: 10 })
  scanDay: string;

  @Column({ length: 8 })
  code: string;

  @Column({ type: 'varchar', length: 60, nullable: true })
  module: string | null;
}
