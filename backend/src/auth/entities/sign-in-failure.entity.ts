import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

const epochMs = { to: (v: number) => v, from: (v: string | number) => Number(v) };

/**
 * One failed sign-in, per e-mail address as typed (lower-cased and hashed, so the table holds
 * no addresses, and unknown ones are counted exactly like known ones). Kept in the database so
 * the limit holds across every app instance sharing it.
 */
@Entity('sign_in_failures')
@Index('IDX_sign_in_failures_key_at', ['keyHash', 'at'])
export class SignInFailure {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** SHA-256 (hex) of the lower-cased e-mail address. */
  @Column({ type: 'varchar', length: 64 })
  keyHash: string;

  /** When, in milliseconds since the epoch (an integer compares alike on SQLite and PostgreSQL). */
  @Index('IDX_sign_in_failures_at')
  @Column({ type: 'bigint', transformer: epochMs })
  at: number;
}
