/**
 * Exact decimal reading of a JavaScript number. A number such as 1.005 is stored as the binary
 * value just below 1.005; people and databases mean the decimal they typed, which is the shortest
 * decimal that prints as the same number. Arithmetic on that decimal with BigInt avoids the
 * binary error (1.005 × 100 gives 100.49999999999999 in floating point).
 */

export interface Decimal {
  /** value = mantissa × 10^exponent */
  mantissa: bigint;
  exponent: number;
}

/** The shortest decimal of a finite number. */
export function toDecimal(value: number): Decimal {
  const match = /^(-?)(\d+)(?:\.(\d+))?(?:e([+-]\d+))?$/.exec(String(value));
  if (!match) throw new RangeError(`expected a finite number, got ${String(value)}`);
  const [, sign, whole, fraction = '', exp = '0'] = match;
  const mantissa = BigInt(`${sign}${whole}${fraction}`);
  return { mantissa, exponent: Number(exp) - fraction.length };
}

export function pow10(n: number): bigint {
  return 10n ** BigInt(n);
}

/** Integer quotient rounded half away from zero; `divisor` must be positive. */
export function divRoundHalfAway(dividend: bigint, divisor: bigint): bigint {
  const quotient = dividend / divisor;
  const remainder = dividend % divisor;
  const twice = (remainder < 0n ? -remainder : remainder) * 2n;
  if (twice < divisor) return quotient;
  return dividend < 0n ? quotient - 1n : quotient + 1n;
}

/** The number nearest to mantissa × 10^exponent (JavaScript's decimal parsing rounds correctly). */
export function decimalToNumber(mantissa: bigint, exponent: number): number {
  return Number(`${mantissa}e${exponent}`);
}

/**
 * The number nearest to the rational numerator / denominator (denominator positive), from 25
 * significant quotient digits plus a sticky digit standing for any remainder, so that the final
 * decimal-to-binary rounding sees which side of a halfway point the value lies on. Only a
 * quotient within about 1e-25 (relative) of a halfway point between two doubles could round the
 * wrong way, by one unit in the last place.
 */
export function rationalToNumber(numerator: bigint, denominator: bigint): number {
  if (numerator === 0n) return 0;
  const negative = numerator < 0n;
  const magnitude = negative ? -numerator : numerator;
  // 25 significant digits exceed the 17 a double can hold by a wide margin.
  const scale = Math.max(0, 25 - magnitude.toString().length + denominator.toString().length);
  const scaled = magnitude * pow10(scale);
  let digits = scaled / denominator;
  let exponent = -scale;
  if (scaled % denominator !== 0n) {
    digits = digits * 10n + 1n;
    exponent -= 1;
  }
  return decimalToNumber(negative ? -digits : digits, exponent);
}
