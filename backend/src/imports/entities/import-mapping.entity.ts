import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { ImportMappingInput } from '@causeway/shared';
import { Shop } from '../../shops/entities/shop.entity';

/** A column mapping a shop saved under a name, for the next file from the same scan tool. */
@Entity('import_mappings')
@Index('IDX_import_mappings_shop_name', ['shopId', 'name'], { unique: true })
export class ImportMappingEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column()
  shopId: string;

  @ManyToOne(() => Shop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shopId' })
  shop: Shop;

  @Column({ length: 80 })
  name: string;

  @Column('simple-json')
  mapping: ImportMappingInput;

  @Column({ type: 'varchar', nullable: true })
  createdById: string | null;

  @CreateDateColumn()
  createdAt: Date;

  @UpdateDateColumn()
  updatedAt: Date;
}
