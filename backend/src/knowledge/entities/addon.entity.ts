import { Column, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { Teardown } from './teardown.entity';

/** Due maintenance that shares a teardown: done "while it is apart" it costs only its part and own labour. */
@Entity('addons')
export class AddOn {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ length: 80, unique: true })
  key: string;

  @Column({ length: 200 })
  label: string;

  @Column({ length: 80 })
  teardownKey: string;

  @ManyToOne(() => Teardown, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'teardownKey', referencedColumnName: 'key' })
  teardown: Teardown;

  @Column('integer')
  partCostMinor: number;

  @Column({ length: 3 })
  currency: string;

  /** Its own labour hours, excluding the teardown. */
  @Column('double precision')
  hours: number;

  @Column({ type: 'varchar', length: 40, nullable: true })
  make: string | null;

  @Column({ type: 'varchar', length: 60, nullable: true })
  model: string | null;

  @Column({ type: 'varchar', length: 60, nullable: true })
  engine: string | null;

  @Column({ type: 'integer', nullable: true })
  yearFrom: number | null;

  @Column({ type: 'integer', nullable: true })
  yearTo: number | null;
}
