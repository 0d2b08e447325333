import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { DATETIME } from '../../database/column-types';
import { Estimate } from './estimate.entity';

/** The vehicle owner's answer to one stage; every answer is kept, the latest per stage counts. */
@Entity('estimate_answers')
@Index('IDX_estimate_answers_estimate', ['estimateId'])
export class EstimateAnswer {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column()
  estimateId: string;

  @ManyToOne(() => Estimate, (e) => e.answers, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'estimateId' })
  estimate: Estimate;

  @Column('integer')
  stageIndex: number;

  @Column({ type: 'varchar', length: 10 })
  decision: 'approved' | 'declined';

  @Column({ type: 'varchar', length: 120, nullable: true })
  name: string | null;

  @Column({ type: DATETIME })
  answeredAt: Date;
}
