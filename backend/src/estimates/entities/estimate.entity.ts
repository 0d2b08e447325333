import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, OneToMany, PrimaryGeneratedColumn } from 'typeorm';
import type { EstimateStageDto, EstimateTotals } from '@causeway/shared';
import { DATETIME } from '../../database/column-types';
import { Job } from '../../jobs/entities/job.entity';
import { EstimateAnswer } from './estimate-answer.entity';

/**
 * A staged estimate as sent: a snapshot of the job's fix paths priced with the shop's tax.
 * The public link's token is never stored, only its SHA-256 hash.
 */
@Entity('estimates')
@Index('IDX_estimates_job', ['jobId'])
export class Estimate {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column()
  shopId: string;

  @Column()
  jobId: string;

  @ManyToOne(() => Job, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'jobId' })
  job: Job;

  /** Hex SHA-256 of the link token. */
  @Index('IDX_estimates_token_hash', { unique: true })
  @Column({ length: 64 })
  tokenHash: string;

  @Column({ type: DATETIME })
  expiresAt: Date;

  @Column({ length: 3 })
  currency: string;

  @Column({ length: 35 })
  locale: string;

  @Column('integer')
  taxRateBp: number;

  /** The job's codes and their titles when the estimate was made. */
  @Column('simple-json')
  codes: Array<{ code: string; title: string | null }>;

  @Column('simple-json')
  stages: EstimateStageDto[];

  @Column('simple-json')
  totals: EstimateTotals;

  @Column({ type: 'text', nullable: true })
  message: string | null;

  @Column({ type: 'varchar', length: 254, nullable: true })
  recipientEmail: string | null;

  @Column({ type: DATETIME, nullable: true })
  emailedAt: Date | null;

  @Column({ type: 'text', nullable: true })
  emailError: string | null;

  @Column({ type: 'varchar', nullable: true })
  createdById: string | null;

  @OneToMany(() => EstimateAnswer, (a) => a.estimate)
  answers: EstimateAnswer[];

  @CreateDateColumn()
  createdAt: Date;
}
