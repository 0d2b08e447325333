import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { DATETIME } from '../../database/column-types';
import { Shop } from '../../shops/entities/shop.entity';

/** A vehicle a shop works on; its VIN is unique within the shop. */
@Entity('vehicles')
@Index('IDX_vehicles_shop_vin', ['shopId', 'vin'], { unique: true })
export class Vehicle {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column()
  shopId: string;

  @ManyToOne(() => Shop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shopId' })
  shop: Shop;

  /** Normalised: upper case, no spaces or dashes. */
  @Column({ length: 17 })
  vin: string;

  @Column({ length: 40 })
  make: string;

  @Column({ length: 60 })
  model: string;

  @Column({ type: 'varchar', length: 40, nullable: true })
  engine: string | null;

  @Column({ type: 'integer', nullable: true })
  year: number | null;

  @Column({ type: 'varchar', length: 20, nullable: true })
  plate: string | null;

  /** The last reading, in km whatever the shop's unit (double precision: 100 mi is 160.9344 km exactly). */
  @Column({ type: 'double precision', nullable: true })
  odometerKm: number | null;

  @Column({ type: DATETIME, nullable: true })
  odometerReadAt: Date | null;

  @Column({ type: 'varchar', length: 120, nullable: true })
  ownerName: string | null;

  @Column({ type: 'varchar', length: 254, nullable: true })
  ownerEmail: string | null;

  @CreateDateColumn()
  createdAt: Date;

  @UpdateDateColumn()
  updatedAt: Date;
}
