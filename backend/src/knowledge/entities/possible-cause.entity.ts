import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { Part } from './part.entity';
import { Teardown } from './teardown.entity';
import { VehicleScoped } from './vehicle-scoped';

/** One possible cause of one code for one vehicle scope: a part, its prior weight, costs, check and teardown. */
@Entity('possible_causes')
@Index('IDX_possible_causes_code', ['code'])
export class PossibleCause extends VehicleScoped {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ length: 5 })
  code: string;

  @Column({ length: 60 })
  partKey: string;

  @ManyToOne(() => Part, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'partKey', referencedColumnName: 'key' })
  part: Part;

  /** Curated prior weight w_i; per code and scope the weights sum to at most 1. */
  @Column('double precision')
  prior: number;

  @Column('integer')
  partCostMinor: number;

  /** ISO 4217 currency of partCostMinor. */
  @Column({ length: 3 })
  currency: string;

  /** Labour hours to replace, excluding the teardown. */
  @Column('double precision')
  replaceHours: number;

  @Column({ type: 'varchar', length: 80, nullable: true })
  teardownKey: string | null;

  @ManyToOne(() => Teardown, { nullable: true, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'teardownKey', referencedColumnName: 'key' })
  teardown: Teardown | null;

  @Column('text', { default: '' })
  checkDescription: string;

  /** Labour hours of a check that decides for sure; null = cannot be checked, only replaced. */
  @Column('double precision', { nullable: true })
  checkHours: number | null;

  /** Must be found by the check before it may be replaced (wiring faults, costly repairs). */
  @Column({ default: false })
  checkMustPrecede: boolean;
}
