import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { StepKind, StepResult } from '@causeway/shared';
import { DATETIME } from '../../database/column-types';
import { User } from '../../users/entities/user.entity';
import { Job } from './job.entity';

/** One thing done on a job: a part checked, or parts replaced together, and what came of it. */
@Entity('job_steps')
@Index('IDX_job_steps_job_seq', ['jobId', 'sequence'], { unique: true })
export class JobStep {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column()
  jobId: string;

  @ManyToOne(() => Job, (j) => j.steps, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'jobId' })
  job: Job;

  @Column('integer')
  sequence: number;

  @Column({ length: 5 })
  code: string;

  @Column({ type: 'varchar', length: 10 })
  kind: StepKind;

  @Column('simple-json')
  parts: string[];

  @Column({ type: 'varchar', length: 14 })
  result: StepResult;

  /** Pre-tax, integer minor units of the shop's currency. */
  @Column('integer')
  actualCostMinor: number;

  @Column('text', { default: '' })
  notes: string;

  @Column({ type: DATETIME })
  at: Date;

  @Column({ type: 'varchar', nullable: true })
  createdById: string | null;

  @ManyToOne(() => User, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'createdById' })
  createdBy: User | null;

  @CreateDateColumn()
  createdAt: Date;
}
