import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** Anything a possible cause names: a component, a wiring fault or a repair (clean the EGR passages). */
@Entity('parts')
export class Part {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** Stable key, e.g. `fuel-cap`; possible causes and outcomes refer to parts by it. */
  @Column({ length: 60, unique: true })
  key: string;

  @Column({ length: 160 })
  name: string;

  /** The system the part belongs to (`fuel`, `ignition`, `hybrid`, …); decides its safety cautions. */
  @Column({ length: 30 })
  system: string;
}
