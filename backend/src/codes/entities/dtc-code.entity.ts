import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

export type CodeSource = 'reference' | 'causeway' | 'import' | 'field-report';

/** One catalogue entry: a code, generic or with the meaning one make gives it. */
@Entity('dtc_codes')
@Index('IDX_dtc_codes_code_make', ['code', 'make'], { unique: true })
export class DtcCode {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ length: 5 })
  code: string;

  /** '' for every make; otherwise the make whose meaning this is (manufacturer-controlled codes). */
  @Column({ length: 40, default: '' })
  make: string;

  @Column({ length: 1 })
  system: string;

  @Column({ length: 12 })
  control: string;

  @Column({ length: 200 })
  title: string;

  @Column('text', { default: '' })
  description: string;

  @Column({ length: 120 })
  subsystem: string;

  @Column('simple-json')
  symptoms: string[];

  @Column({ length: 120, default: '' })
  verificationMonitor: string;

  @Column('text', { default: '' })
  verificationProcedure: string;

  /** Labour hours to clear, drive and confirm the fix. */
  @Column('double precision', { default: 0.5 })
  verificationHours: number;

  /** Labour hours of further diagnosis when the likely causes are exhausted; null = not offered. */
  @Column('double precision', { nullable: true })
  escalationHours: number | null;

  @Column('text', { default: '' })
  escalationDescription: string;

  /** Keys of safety cautions (safety_cautions.key). */
  @Column('simple-json')
  cautions: string[];

  @Column({ length: 20 })
  source: CodeSource;

  @CreateDateColumn()
  createdAt: Date;

  @UpdateDateColumn()
  updatedAt: Date;
}
