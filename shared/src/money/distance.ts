/**
 * Distance conversion. Distances are stored in km; 1 international mile is exactly 1.609344 km
 * (international yard and pound agreement, 1959: 1 yd = 0.9144 m, 1 mi = 1760 yd).
 */

import { showValue } from '../dtc/show-value';
import { decimalToNumber, rationalToNumber, toDecimal } from './decimal';

// Millimetres per mile (1609.344 m), so that the factor is an integer and the arithmetic exact.
const MM_PER_MILE = 1_609_344n;
const MM_PER_KM_EXPONENT = 6;

function requireFinite(value: number, name: string): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(`${name}: expected a finite number, got ${showValue(value)}`);
  }
}

function requireFiniteResult(result: number): number {
  if (!Number.isFinite(result)) throw new RangeError(`distance: result is beyond the range of numbers`);
  return result;
}

function requireUnit(unit: string): void {
  if (unit !== 'km' && unit !== 'mi') throw new RangeError(`unit: expected 'km' or 'mi', got ${showValue(unit)}`);
}

/**
 * Kilometres for a distance in `unit`. The value is read as the decimal it was written as and
 * the result is the number nearest to the exact product (100 mi → 160.9344 km exactly).
 */
export function toKm(value: number, unit: 'km' | 'mi'): number {
  requireFinite(value, 'value');
  requireUnit(unit);
  if (unit === 'km') return value;
  const { mantissa, exponent } = toDecimal(value);
  // value × 1.609344 = mantissa × 1 609 344 × 10^(exponent − 6)
  return requireFiniteResult(decimalToNumber(mantissa * MM_PER_MILE, exponent - MM_PER_KM_EXPONENT));
}

/** A distance stored in km expressed in `unit`, the number nearest to the exact quotient. */
export function fromKm(km: number, unit: 'km' | 'mi'): number {
  requireFinite(km, 'km');
  requireUnit(unit);
  if (unit === 'km') return km;
  const { mantissa, exponent } = toDecimal(km);
  // km / 1.609344 = mantissa × 10^(exponent + 6) / 1 609 344
  const shift = exponent + MM_PER_KM_EXPONENT;
  return shift >= 0
    ? rationalToNumber(mantissa * 10n ** BigInt(shift), MM_PER_MILE)
    : rationalToNumber(mantissa, MM_PER_MILE * 10n ** BigInt(-shift));
}
