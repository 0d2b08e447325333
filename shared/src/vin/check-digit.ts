/** VIN transliteration and check digit (49 CFR 565.15(c)). */

/** Characters a VIN may contain: digits and A–Z except I, O and Q (49 CFR 565.15(b)). */
export const VIN_ALPHABET = '0123456789ABCDEFGHJKLMNPRSTUVWXYZ';

export const VIN_LENGTH = 17;

/** Position weights 1–17; position 9, the check digit itself, weighs nothing. */
export const VIN_WEIGHTS: readonly number[] = [8, 7, 6, 5, 4, 3, 2, 10, 0, 9, 8, 7, 6, 5, 4, 3, 2];

const LETTER_VALUES: Readonly<Record<string, number>> = {
  A: 1, B: 2, C: 3, D: 4, E: 5, F: 6, G: 7, H: 8,
  J: 1, K: 2, L: 3, M: 4, N: 5, P: 7, R: 9,
  S: 2, T: 3, U: 4, V: 5, W: 6, X: 7, Y: 8, Z: 9,
};

/** Numeric value of one VIN character, or null when the character is not allowed in a VIN. */
export function vinCharValue(ch: string): number | null {
  if (ch.length === 1 && ch >= '0' && ch <= '9') return ch.charCodeAt(0) - 48;
  return LETTER_VALUES[ch] ?? null;
}

/** Why a character is not allowed, naming the look-alike for I, O and Q. */
export function vinCharProblem(ch: string): string | null {
  if (vinCharValue(ch) !== null) return null;
  if (ch === 'I') return "letter I is never used in a VIN (it reads like 1); did you mean '1'?";
  if (ch === 'O') return "letter O is never used in a VIN (it reads like 0); did you mean '0'?";
  if (ch === 'Q') return "letter Q is never used in a VIN (it reads like 0); did you mean '0'?";
  const cp = ch.codePointAt(0) ?? 0;
  const shown = cp >= 0x21 && cp <= 0x7e ? `'${ch}'` : `U+${cp.toString(16).toUpperCase().padStart(4, '0')}`;
  return `${shown} is not allowed; a VIN uses digits and the letters A–Z except I, O and Q`;
}

/** Normal form for comparison: trimmed, upper case, spaces and dashes removed. */
export function normaliseVin(input: string): string {
  return typeof input === 'string' ? input.trim().toUpperCase().replace(/[\s-]+/g, '') : '';
}

/**
 * Sum of transliterated values times position weights (49 CFR 565.15(c)). The input is
 * normalised first; position 9 may hold anything allowed, since it weighs nothing.
 * Throws RangeError naming the length or the position of a character that is not allowed.
 */
export function vinWeightedSum(vin: string): number {
  const chars = Array.from(normaliseVin(vin));
  if (chars.length !== VIN_LENGTH) {
    throw new RangeError(`VIN: expected ${VIN_LENGTH} characters, got ${chars.length}`);
  }
  let sum = 0;
  for (let i = 0; i < VIN_LENGTH; i++) {
    const value = vinCharValue(chars[i]);
    if (value === null) throw new RangeError(`VIN position ${i + 1}: ${vinCharProblem(chars[i]) ?? ''}`);
    sum += value * VIN_WEIGHTS[i];
  }
  return sum;
}

/** Check digit ('0'–'9' or 'X'): weighted sum mod 11, a remainder of 10 written X. Throws as `vinWeightedSum`. */
export function vinCheckDigit(vin: string): string {
  const remainder = vinWeightedSum(vin) % 11;
  return remainder === 10 ? 'X' : String(remainder);
}
