/**
 * Money on the client: integer minor units in, integer minor units out. Decimals typed by the
 * user are converted as text, never through floating-point arithmetic.
 */

const fractionDigitsCache = new Map<string, number>();

/** Minor-unit digits of an ISO 4217 currency: 2 for GBP, 0 for JPY, 3 for KWD. */
export function currencyFractionDigits(currency: string): number {
  const code = currency.toUpperCase();
  let digits = fractionDigitsCache.get(code);
  if (digits === undefined) {
    try {
      digits = new Intl.NumberFormat('en', { style: 'currency', currency: code }).resolvedOptions().maximumFractionDigits ?? 2;
    } catch {
      digits = 2;
    }
    fractionDigitsCache.set(code, digits);
  }
  return digits;
}

/**
 * A non-negative decimal as typed ("120", "120.5", "120,50") to an integer scaled by
 * 10^digits, rounding half up on the first dropped digit. Null when it is not such a number.
 */
export function decimalToScaledInteger(value: string | number | null | undefined, digits: number): number | null {
  if (value === null || value === undefined) return null;
  const match = /^\s*(\d*)(?:[.,](\d*))?\s*$/.exec(String(value));
  if (!match || (match[1] === '' && (match[2] ?? '') === '')) return null;
  const whole = match[1] || '0';
  const fraction = match[2] ?? '';
  const kept = fraction.slice(0, digits).padEnd(digits, '0');
  const roundUp = fraction.length > digits && Number(fraction[digits]) >= 5 ? 1 : 0;
  const scaled = Number(whole) * 10 ** digits + Number(kept || '0') + roundUp;
  return Number.isSafeInteger(scaled) ? scaled : null;
}

/** An integer scaled by 10^digits back to its decimal text: (12050, 2) → "120.50". */
export function scaledIntegerToDecimal(value: number, digits: number): string {
  const sign = value < 0 ? '-' : '';
  const abs = Math.abs(value);
  if (digits === 0) return `${sign}${abs}`;
  const factor = 10 ** digits;
  const whole = Math.floor(abs / factor);
  const fraction = String(abs % factor).padStart(digits, '0');
  return `${sign}${whole}.${fraction}`;
}

export function toMinorUnits(value: string | number | null | undefined, currency: string): number | null {
  return decimalToScaledInteger(value, currencyFractionDigits(currency));
}

export function fromMinorUnits(minor: number, currency: string): string {
  return scaledIntegerToDecimal(minor, currencyFractionDigits(currency));
}

/** A percentage as typed ("20", "17.5") to basis points (2000, 1750). */
export function percentToBasisPoints(value: string | number | null | undefined): number | null {
  return decimalToScaledInteger(value, 2);
}

export function basisPointsToPercent(bp: number): string {
  return scaledIntegerToDecimal(bp, 2).replace(/\.?0+$/, '');
}

/** The tax on a net amount, rounded half up to a whole minor unit: round(net × bp / 10000). */
export function taxOn(netMinor: number, taxRateBp: number): number {
  return Math.round((netMinor * taxRateBp) / 10_000);
}

/** Gross = net + round(net × bp / 10000), all in integer minor units. */
export function grossFromNet(netMinor: number, taxRateBp: number): number {
  return netMinor + taxOn(netMinor, taxRateBp);
}

export function formatMoney(minor: number, currency: string, locale: string): string {
  const digits = currencyFractionDigits(currency);
  return new Intl.NumberFormat(locale, { style: 'currency', currency }).format(minor / 10 ** digits);
}

export function formatTaxRate(taxRateBp: number, locale: string): string {
  return new Intl.NumberFormat(locale, { style: 'percent', maximumFractionDigits: 2 }).format(taxRateBp / 10_000);
}
