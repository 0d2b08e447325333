import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { CodeStatus, FreezeFrame, RecordedOutcomeDto } from '@causeway/shared';
import { Job } from './job.entity';

/** One fault code of a job, as read, with what the job learned about it. */
@Entity('job_codes')
@Index('IDX_job_codes_job_code', ['jobId', 'code'], { unique: true })
@Index('IDX_job_codes_code', ['code'])
export class JobCode {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column()
  jobId: string;

  @ManyToOne(() => Job, (j) => j.codes, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'jobId' })
  job: Job;

  /** Normalised five characters. */
  @Column({ length: 5 })
  code: string;

  /** With the failure-type byte when one was read, e.g. P0456-13. */
  @Column({ length: 8 })
  display: string;

  @Column('integer')
  position: number;

  @Column({ type: 'varchar', length: 10 })
  status: CodeStatus;

  @Column('simple-json')
  freezeFrame: FreezeFrame;

  /** The fix path's expected cost when the job was opened (net, minor units); null when there was no path. */
  @Column({ type: 'integer', nullable: true })
  expectedCostMinor: number | null;

  /** The outcome recorded at a resolved close and how it was credited; null = no outcome recorded. */
  @Column({ type: 'simple-json', nullable: true })
  outcome: RecordedOutcomeDto | null;
}
