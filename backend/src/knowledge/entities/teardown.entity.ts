import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** What must be taken apart to reach parts, shared between possible causes (O_g of the fix path). */
@Entity('teardowns')
export class Teardown {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ length: 80, unique: true })
  key: string;

  @Column({ length: 240 })
  name: string;

  /** Labour hours to take apart and put back. */
  @Column('double precision')
  hours: number;

  /** Vehicle scope; null = any. */
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

  /** Caution keys (safety_cautions.key). */
  @Column('simple-json')
  cautions: string[];
}
