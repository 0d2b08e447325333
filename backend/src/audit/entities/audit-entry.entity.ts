import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { DATETIME } from '../../database/column-types';

/**
 * One audited change to the knowledge base or one review decision: who, when, what, before
 * and after. Written in the same transaction as the change, so it exists exactly when the
 * change does. No foreign keys: the log outlives accounts and the rows it describes.
 */
@Entity('audit_entries')
@Index('IDX_audit_entries_at', ['at'])
@Index('IDX_audit_entries_entity', ['entityType', 'entityId'])
@Index('IDX_audit_entries_actor', ['actorId'])
@Index('IDX_audit_entries_action', ['action'])
export class AuditEntry {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** Set by the service with millisecond precision, so the log orders as it was written. */
  @Column({ type: DATETIME })
  at: Date;

  @Column({ type: 'varchar', nullable: true })
  actorId: string | null;

  /** Kept as it was at the time, so the entry still says who after an address change. */
  @Column({ length: 254 })
  actorEmail: string;

  @Column({ length: 40 })
  action: string;

  @Column({ length: 40 })
  entityType: string;

  @Column({ length: 160 })
  entityId: string;

  @Column('simple-json', { nullable: true })
  before: unknown;

  @Column('simple-json', { nullable: true })
  after: unknown;

  @Column('text', { nullable: true })
  note: string | null;
}
