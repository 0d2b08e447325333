/**
 * Money as integer minor units of an ISO 4217 currency; tax rates in basis points
 * (2000 bp = 20 %). No floating-point amount is ever produced.
 */

import { showValue } from '../dtc/show-value';
import { divRoundHalfAway, pow10, toDecimal } from './decimal';

export interface TaxedAmount {
  net: number;
  tax: number;
  gross: number;
}

const BASIS_POINTS = 10_000n;

let knownCurrencies: ReadonlySet<string> | null = null;

function requireSafeInteger(value: number, name: string): void {
  if (!Number.isSafeInteger(value)) {
    throw new RangeError(`${name}: expected a whole number of minor units (a safe integer), got ${showValue(value)}`);
  }
}

function requireSafeResult(value: bigint, name: string): number {
  const n = Number(value);
  if (!Number.isSafeInteger(n)) throw new RangeError(`${name}: result ${value} is beyond the safe integer range`);
  return n;
}

function listCurrencies(): ReadonlySet<string> | null {
  if (knownCurrencies === null && typeof Intl.supportedValuesOf === 'function') {
    knownCurrencies = new Set(Intl.supportedValuesOf('currency'));
  }
  return knownCurrencies;
}

/**
 * True for three upper-case letters the runtime knows as a currency: its list of supported
 * currencies where there is one, otherwise its currency display names.
 */
export function isIsoCurrency(code: string): boolean {
  if (typeof code !== 'string' || !/^[A-Z]{3}$/.test(code)) return false;
  const list = listCurrencies();
  if (list !== null) return list.has(code);
  try {
    return new Intl.DisplayNames(['en'], { type: 'currency', fallback: 'none' }).of(code) !== undefined;
  } catch {
    return true;
  }
}

function requireCurrency(currency: string): void {
  if (!isIsoCurrency(currency)) {
    throw new RangeError(`currency: expected an ISO 4217 code such as GBP, got ${showValue(currency)}`);
  }
}

/**
 * Digits after the decimal point of a currency (GBP 2, JPY 0, BHD 3), taken from the runtime's
 * Intl data (CLDR) so that stored minor units and formatted amounts always agree. CLDR follows
 * ISO 4217 for nearly every currency; a few, such as IQD, differ in practice.
 * Throws RangeError for a code that is not a known currency.
 */
export function currencyMinorDigits(currency: string): number {
  requireCurrency(currency);
  return new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
}

/**
 * Net, tax and gross in minor units. tax = net × rate / 10 000, rounded half away from zero
 * (a half minor unit goes up for a charge and down for a refund), computed exactly with BigInt,
 * so gross = net + tax always. Throws RangeError unless `netMinor` is a safe integer and
 * `taxRateBp` a non-negative integer number of basis points.
 */
export function applyTaxMinor(netMinor: number, taxRateBp: number): TaxedAmount {
  requireSafeInteger(netMinor, 'netMinor');
  if (!Number.isSafeInteger(taxRateBp) || taxRateBp < 0) {
    throw new RangeError(`taxRateBp: expected a whole, non-negative number of basis points, got ${showValue(taxRateBp)}`);
  }
  const tax = requireSafeResult(divRoundHalfAway(BigInt(netMinor) * BigInt(taxRateBp), BASIS_POINTS), 'tax');
  const gross = requireSafeResult(BigInt(netMinor) + BigInt(tax), 'gross');
  return { net: netMinor, tax, gross };
}

/**
 * Labour charge in minor units: hours × rate, rounded half up to a whole minor unit. `hours` is
 * read as the decimal it was written as (0.1 h steps are usual), so 1.005 h × 100 is 100.5 and
 * rounds to 101, where floating point would give 100.49999999999999.
 * Throws RangeError for negative or non-finite hours or a rate that is not a non-negative safe integer.
 */
export function labourCostMinor(hours: number, ratePerHourMinor: number): number {
  if (typeof hours !== 'number' || !Number.isFinite(hours) || hours < 0) {
    throw new RangeError(`hours: expected a finite number of hours, zero or more, got ${showValue(hours)}`);
  }
  if (!Number.isSafeInteger(ratePerHourMinor) || ratePerHourMinor < 0) {
    throw new RangeError(
      `ratePerHourMinor: expected a whole, non-negative number of minor units, got ${showValue(ratePerHourMinor)}`,
    );
  }
  const { mantissa, exponent } = toDecimal(hours);
  const product = mantissa * BigInt(ratePerHourMinor);
  const cost = exponent >= 0 ? product * pow10(exponent) : divRoundHalfAway(product, pow10(-exponent));
  return requireSafeResult(cost, 'labour cost');
}

function numberFormat(locale: string, options: Intl.NumberFormatOptions): Intl.NumberFormat {
  if (typeof locale !== 'string') throw new RangeError(`locale: expected a BCP 47 tag such as en-GB, got ${showValue(locale)}`);
  try {
    return new Intl.NumberFormat(locale, options);
  } catch {
    throw new RangeError(`locale: ${showValue(locale)} is not a valid BCP 47 language tag (e.g. en-GB)`);
  }
}

/**
 * An amount for display, e.g. (14400, 'GBP', 'en-GB') → '£144.00'. The amount goes to Intl as
 * an exact decimal string ('144.00'), which ECMA-402 formats without a binary detour, so even
 * the largest safe integers print digit for digit.
 */
export function formatMoney(minor: number, currency: string, locale: string): string {
  requireSafeInteger(minor, 'minor');
  const digits = currencyMinorDigits(currency);
  const negative = minor < 0;
  const magnitude = (negative ? -BigInt(minor) : BigInt(minor)).toString().padStart(digits + 1, '0');
  const whole = magnitude.slice(0, magnitude.length - digits);
  const fraction = magnitude.slice(magnitude.length - digits);
  const decimal = `${negative ? '-' : ''}${whole}${digits > 0 ? `.${fraction}` : ''}`;
  const format = numberFormat(locale, { style: 'currency', currency }).format as unknown as (value: string) => string;
  return format(decimal);
}

/** A probability or share (0.4) as a whole percentage in the locale's style: '40%' (en-GB), '40 %' (fr-FR). */
export function formatPercent(p: number, locale: string): string {
  if (typeof p !== 'number' || !Number.isFinite(p)) {
    throw new RangeError(`p: expected a finite number such as 0.4, got ${showValue(p)}`);
  }
  return numberFormat(locale, { style: 'percent', maximumFractionDigits: 0 }).format(p);
}
