import { Column, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { Teardown } from './teardown.entity';
import { VehicleScoped } from './vehicle-scoped';

/** Due maintenance that shares a teardown: done "while it is apart" it costs only its part and own labour. */
@Entity('addons')
export class AddOn extends VehicleScoped {
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
}
