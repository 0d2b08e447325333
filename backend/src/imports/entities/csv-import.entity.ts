import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { ImportProgress, ImportReport, ImportStatus } from '@causeway/shared';
import { DATETIME } from '../../database/column-types';
import { Shop } from '../../shops/entities/shop.entity';
import { User } from '../../users/entities/user.entity';

/** One committed (or refused, failed, interrupted) scan-tool import, with its report. */
@Entity('imports')
@Index('IDX_imports_shop_created', ['shopId', 'createdAt'])
export class CsvImport {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column()
  shopId: string;

  @ManyToOne(() => Shop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shopId' })
  shop: Shop;

  @Column({ type: 'varchar', nullable: true })
  createdById: string | null;

  @ManyToOne(() => User, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'createdById' })
  createdBy: User | null;

  @Column({ length: 255 })
  fileName: string;

  @Column('integer')
  fileBytes: number;

  @Column({ type: 'varchar', length: 12 })
  status: ImportStatus;

  @Column({ type: 'boolean', default: false })
  validOnly: boolean;

  @Column({ type: 'varchar', length: 8 })
  phase: ImportProgress['phase'];

  @Column({ type: 'integer', default: 0 })
  bytesProcessed: number;

  @Column({ type: 'integer', default: 0 })
  rowsProcessed: number;

  @Column({ type: 'integer', default: 0 })
  rows: number;

  @Column({ type: 'integer', default: 0 })
  accepted: number;

  @Column({ type: 'integer', default: 0 })
  rejected: number;

  @Column({ type: 'integer', default: 0 })
  skippedDuplicates: number;

  @Column({ type: 'integer', default: 0 })
  createdVehicles: number;

  @Column({ type: 'integer', default: 0 })
  updatedVehicles: number;

  @Column({ type: 'integer', default: 0 })
  createdJobs: number;

  @Column({ type: 'integer', default: 0 })
  createdCodes: number;

  @Column({ type: 'text', nullable: true })
  message: string | null;

  @Column({ type: 'simple-json', nullable: true })
  report: ImportReport | null;

  @CreateDateColumn()
  createdAt: Date;

  @Column({ type: DATETIME, nullable: true })
  finishedAt: Date | null;
}
