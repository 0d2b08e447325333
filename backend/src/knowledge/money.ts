import { UnprocessableEntityException } from '@nestjs/common';
import { currencyMinorDigits, type ConvertedMoney } from '@causeway/shared';
import type { ExchangeRate } from './entities/exchange-rate.entity';

export type RateTable = Map<string, ExchangeRate>;

/**
 * A price in the shop's currency. Prices stored in another currency are converted through
 * the stored rates (units per one unit of the base) and rounded half away from zero to a
 * whole minor unit of the target; such a figure is indicative, and says so.
 */
export function convertMinor(minor: number, from: string, to: string, rates: RateTable): ConvertedMoney {
  if (from === to) return { minor, currency: to, original: null, indicative: false };
  const a = rates.get(from);
  const b = rates.get(to);
  if (!a || !b || a.base !== b.base || !(a.perBase > 0) || !(b.perBase > 0)) {
    const missing = !a ? from : to;
    throw new UnprocessableEntityException({
      statusCode: 422,
      error: 'Unprocessable Entity',
      message: `No exchange rate for ${missing}: a price in ${from} cannot be shown in ${to}. An admin can add the rate.`,
      details: { from, to },
    });
  }
  const major = minor / 10 ** currencyMinorDigits(from);
  const target = (major / a.perBase) * b.perBase * 10 ** currencyMinorDigits(to);
  const rounded = Math.sign(target) * Math.round(Math.abs(target));
  return { minor: rounded, currency: to, original: { minor, currency: from }, indicative: true };
}

/**
 * Cautions that come with work on a part's system (domain-reference §7; mapping by common
 * practice), in addition to its teardown's and its code's.
 */
export const SYSTEM_CAUTIONS: Readonly<Record<string, readonly string[]>> = {
  fuel: ['fuel-vapour'],
  'fuel-injection': ['fuel-vapour', 'stored-pressure'],
  evap: ['fuel-vapour'],
  ignition: ['ignition-high-voltage'],
  hybrid: ['hybrid-high-voltage'],
  srs: ['airbag-srs'],
  brakes: ['brakes'],
};
