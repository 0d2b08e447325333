import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { AttachmentContentType } from '@causeway/shared';

/** Evidence attached to a field report: a re-encoded photo or a checked PDF invoice. */
@Entity('field_report_attachments')
@Index('IDX_field_report_attachments_report', ['reportId'])
export class Attachment {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar' })
  reportId: string;

  /** Random key in the storage (the file's name on disk); never the uploaded name. */
  @Index('IDX_field_report_attachments_key', { unique: true })
  @Column({ length: 64 })
  storageKey: string;

  /** The uploaded name, sanitised, kept as metadata for the download's Content-Disposition. */
  @Column({ length: 120 })
  originalName: string;

  /** Decided from the content, not the name or the client's claim. */
  @Column({ type: 'varchar', length: 40 })
  contentType: AttachmentContentType;

  @Column('integer')
  size: number;

  @Column({ type: 'integer', nullable: true })
  width: number | null;

  @Column({ type: 'integer', nullable: true })
  height: number | null;

  @Column({ type: 'varchar' })
  uploadedById: string;

  @CreateDateColumn()
  createdAt: Date;
}
