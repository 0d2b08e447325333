import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { DistanceUnit } from '@causeway/shared';

@Entity('shops')
export class Shop {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ length: 120 })
  name: string;

  /** ISO 4217 code. */
  @Column({ length: 3 })
  currency: string;

  @Column({ length: 35, default: 'en-GB' })
  locale: string;

  /** Labour per hour before tax, integer minor units. */
  @Column('integer')
  labourRateMinor: number;

  /** Sales tax in basis points (2000 = 20 %). */
  @Column('integer')
  taxRateBp: number;

  @Column({ type: 'varchar', length: 2 })
  distanceUnit: DistanceUnit;

  @CreateDateColumn()
  createdAt: Date;

  @UpdateDateColumn()
  updatedAt: Date;
}
