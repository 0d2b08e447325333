import { Column, Entity, PrimaryColumn } from 'typeorm';

/** The usual cautions of a hazardous system, shown with every code, cause and plan that touches it. */
@Entity('safety_cautions')
export class SafetyCaution {
  @PrimaryColumn({ length: 40 })
  key: string;

  @Column({ length: 120 })
  title: string;

  @Column('simple-json')
  points: string[];

  @Column('simple-json')
  sources: string[];
}
