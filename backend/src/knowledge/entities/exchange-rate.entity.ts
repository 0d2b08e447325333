import { Column, Entity, PrimaryColumn } from 'typeorm';

/** Indicative rate used to compare prices stored in another currency than the shop's. */
@Entity('exchange_rates')
export class ExchangeRate {
  @PrimaryColumn({ length: 3 })
  currency: string;

  /** Units of `currency` per one unit of `base`. */
  @Column('double precision')
  perBase: number;

  @Column({ length: 3 })
  base: string;

  /** ISO date (YYYY-MM-DD) the rate was taken. */
  @Column({ length: 10 })
  asOf: string;
}
