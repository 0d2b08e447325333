import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { OutcomeSource } from '@causeway/shared';

/**
 * One credit of one verified fix: a resolved job or an approved confirmed-fix report. A fix
 * by several parts at once is several rows whose weights sum to 1 (fractional credit).
 */
@Entity('outcomes')
@Index('IDX_outcomes_code', ['code'])
@Index('IDX_outcomes_source', ['source', 'sourceId'])
export class Outcome {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar', length: 12 })
  source: OutcomeSource;

  /** The job or field report; null for the invented demo outcomes. */
  @Column({ type: 'varchar', nullable: true })
  sourceId: string | null;

  @Column({ type: 'varchar' })
  userId: string;

  @Column({ type: 'varchar', nullable: true })
  shopId: string | null;

  @Column({ length: 5 })
  code: string;

  @Column({ type: 'varchar', length: 40, nullable: true })
  make: string | null;

  @Column({ type: 'varchar', length: 60, nullable: true })
  model: string | null;

  @Column({ type: 'varchar', length: 60, nullable: true })
  engine: string | null;

  @Column({ type: 'integer', nullable: true })
  year: number | null;

  /** The part key credited; null = a cause not listed. */
  @Column({ type: 'varchar', length: 60, nullable: true })
  causeKey: string | null;

  /** Fractional credit in [0, 1]. */
  @Column('double precision')
  weight: number;

  @CreateDateColumn()
  createdAt: Date;
}
