import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { Role } from '@causeway/shared';
import { Shop } from '../../shops/entities/shop.entity';

@Entity('users')
export class User {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** As typed, for display. */
  @Column({ length: 254 })
  email: string;

  /** Lower-cased: e-mail addresses are unique regardless of case. */
  @Index({ unique: true })
  @Column({ length: 254 })
  emailNormalized: string;

  @Column({ select: false, length: 100 })
  passwordHash: string;

  @Column({ length: 80 })
  displayName: string;

  @Column({ type: 'varchar', length: 20 })
  role: Role;

  @Column({ type: 'varchar', nullable: true })
  shopId: string | null;

  @ManyToOne(() => Shop, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'shopId' })
  shop: Shop | null;

  @Column({ default: false })
  shopOwner: boolean;

  @Column({ default: false })
  disabled: boolean;

  /** Bumped on password change or disabling; tokens carry it, so older tokens stop working. */
  @Column('integer', { default: 0 })
  tokenVersion: number;

  @CreateDateColumn()
  createdAt: Date;

  @UpdateDateColumn()
  updatedAt: Date;
}
