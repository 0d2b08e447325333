import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/** The job an import opened for a vehicle and scan day: a later file of the same day adds its codes to it while it is open. */
@Entity('import_jobs')
@Index('IDX_import_jobs_vehicle_day', ['shopId', 'vehicleId', 'scanDay'])
export class ImportJob {
  @PrimaryColumn()
  jobId: string;

  @Column()
  shopId: string;

  @Column()
  vehicleId: string;

  /** YYYY-MM-DD as written in the file. */
  @Column({ length: 10 })
  scanDay: string;

  @Column()
  importId: string;
}
