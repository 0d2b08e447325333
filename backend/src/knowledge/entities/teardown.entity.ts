import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { VehicleScoped } from './vehicle-scoped';

/** What must be taken apart to reach parts, shared between possible causes (O_g of the fix path). */
@Entity('teardowns')
export class Teardown extends VehicleScoped {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ length: 80, unique: true })
  key: string;

  @Column({ length: 240 })
  name: string;

  /** Labour hours to take apart and put back. */
  @Column('double precision')
  hours: number;

  /** Caution keys (safety_cautions.key). */
  @Column('simple-json')
  cautions: string[];
}
