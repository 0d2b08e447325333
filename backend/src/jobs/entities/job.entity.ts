import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, OneToMany, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { JobResolution, JobStatus } from '@causeway/shared';
import { DATETIME } from '../../database/column-types';
import { Shop } from '../../shops/entities/shop.entity';
import { User } from '../../users/entities/user.entity';
import { Vehicle } from '../../vehicles/entities/vehicle.entity';
import { JobCode } from './job-code.entity';
import { JobStep } from './job-step.entity';

/** A repair case: a vehicle, its codes, the steps taken and how it ended. */
@Entity('jobs')
@Index('IDX_jobs_shop_opened', ['shopId', 'openedAt'])
export class Job {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column()
  shopId: string;

  @ManyToOne(() => Shop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shopId' })
  shop: Shop;

  @Column()
  vehicleId: string;

  @ManyToOne(() => Vehicle, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'vehicleId' })
  vehicle: Vehicle;

  @Column('text')
  complaint: string;

  @Column({ type: 'varchar', nullable: true })
  technicianId: string | null;

  @ManyToOne(() => User, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'technicianId' })
  technician: User | null;

  @Column({ type: 'varchar', length: 10 })
  status: JobStatus;

  @Column({ type: 'varchar', length: 12, nullable: true })
  resolution: JobResolution | null;

  /** The odometer when the job was opened, km. */
  @Column({ type: 'double precision', nullable: true })
  odometerKm: number | null;

  /** Σ over codes of the fix path's expected cost when the job was opened (net, minor units). */
  @Column({ type: 'integer', nullable: true })
  expectedCostMinor: number | null;

  @Column({ type: DATETIME })
  openedAt: Date;

  @Column({ type: DATETIME, nullable: true })
  closedAt: Date | null;

  @Column({ type: 'boolean', nullable: true })
  verificationPassed: boolean | null;

  @Column({ type: 'text', nullable: true })
  closeNotes: string | null;

  @Column({ type: 'varchar', nullable: true })
  createdById: string | null;

  @OneToMany(() => JobCode, (c) => c.job)
  codes: JobCode[];

  @OneToMany(() => JobStep, (s) => s.job)
  steps: JobStep[];

  @CreateDateColumn()
  createdAt: Date;

  @UpdateDateColumn()
  updatedAt: Date;
}
