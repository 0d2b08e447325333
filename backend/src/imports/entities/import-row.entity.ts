import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/**
 * One imported reading (a code of a vehicle at a scan date). Written by the import's prepared
 * statements; the entity is here for reads and for the schema's description.
 */
@Entity('import_rows')
@Index('IDX_import_rows_shop_hash', ['shopId', 'hash'], { unique: true })
@Index('IDX_import_rows_vehicle_day', ['shopId', 'vehicleId', 'scanDay'])
@Index('IDX_import_rows_import', ['importId'])
export class ImportRow {
  @PrimaryGeneratedColumn('increment')
  id: number;

  @Column()
  shopId: string;

  @Column()
  importId: string;

  /** sha256 (base64url) of the row's normalised values. */
  @Column({ length: 43 })
  hash: string;

  @Column('integer')
  line: number;

  @Column({ type: 'varchar', nullable: true })
  vehicleId: string | null;

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
