import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { FieldReportKind, FieldReportPayload, FieldReportStatus } from '@causeway/shared';
import { DATETIME } from '../../database/column-types';

/**
 * A contributor's field report: a confirmed fix, a new possible cause or a correction,
 * with its review. The payload is validated per kind before it is stored.
 */
@Entity('field_reports')
@Index('IDX_field_reports_author', ['authorId', 'createdAt'])
@Index('IDX_field_reports_queue', ['status', 'submittedAt'])
@Index('IDX_field_reports_code', ['code'])
export class FieldReport {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar', length: 16 })
  kind: FieldReportKind;

  @Column({ type: 'varchar', length: 12 })
  status: FieldReportStatus;

  /** No foreign key: a decided report is evidence that outlives the account. */
  @Column({ type: 'varchar' })
  authorId: string;

  /** The author's shop when filed (influence caps count per shop). */
  @Column({ type: 'varchar', nullable: true })
  shopId: string | null;

  /** Normalised (codec) code, for the queue's filter. */
  @Column({ length: 5 })
  code: string;

  @Column('simple-json')
  payload: FieldReportPayload;

  /** The code is valid but not in the catalogue: approving adds an entry. */
  @Column({ default: false })
  proposesNewCode: boolean;

  @Column({ type: DATETIME, nullable: true })
  submittedAt: Date | null;

  @Column({ type: DATETIME, nullable: true })
  decidedAt: Date | null;

  @Column({ type: 'varchar', nullable: true })
  decidedById: string | null;

  /** The approval note or the rejection reason. */
  @Column('text', { nullable: true })
  decisionNote: string | null;

  /** When the author was e-mailed the decision; null when the mail could not be sent. */
  @Column({ type: DATETIME, nullable: true })
  notifiedAt: Date | null;

  @Column('text', { nullable: true })
  notifyError: string | null;

  @CreateDateColumn()
  createdAt: Date;

  @UpdateDateColumn()
  updatedAt: Date;
}
