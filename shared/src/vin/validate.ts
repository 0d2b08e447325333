/** VIN validation for data entry and import (49 CFR 565.15; ISO 3779 outside North America). */

import { showValue } from '../dtc/show-value';
import { VIN_LENGTH, normaliseVin, vinCharProblem, vinCheckDigit } from './check-digit';
import { VIN_YEAR_CODES, resolveReferenceYear, vinModelYear, type VinModelYearOptions } from './model-year';

export interface VinIssue {
  /** 1-based position in the normalised VIN, or null for the VIN as a whole. */
  position: number | null;
  message: string;
  severity: 'error' | 'warning';
}

export type VinRegion = 'north-america' | 'other';

export interface VinCheckDigitResult {
  expected: string;
  actual: string;
  /** True where the check digit is required: first character 1–5 (US, Canada, Mexico) or L (China). */
  applies: boolean;
}

export interface VinResult {
  /** Trimmed, upper case, spaces and dashes removed. */
  vin: string;
  /** No issue of severity 'error'. */
  valid: boolean;
  issues: VinIssue[];
  /** Null unless the VIN has 17 allowed characters. */
  checkDigit: VinCheckDigitResult | null;
  modelYear: number | null;
  modelYearCandidates: number[];
  region: VinRegion;
  /** World manufacturer identifier, positions 1–3. */
  wmi: string;
}

export type VinOptions = VinModelYearOptions;

// Beyond this, listing every bad character helps nobody; the length error says enough.
const MAX_CHARACTER_ISSUES_LENGTH = 40;

/**
 * Validates a VIN as typed or imported. Never throws for any `input`; throws RangeError only for
 * an invalid `opts.referenceYear`.
 *
 * A wrong check digit is an error where the check digit is required (first character 1–5, and
 * L for China under GB 16735 — the latter from memory) and a warning elsewhere, since ISO 3779
 * does not require one.
 */
export function validateVin(input: string, opts: VinOptions = {}): VinResult {
  // Checked first so that a bad option fails the same way whatever the VIN.
  resolveReferenceYear(opts.referenceYear);
  const raw: unknown = input;
  const issues: VinIssue[] = [];
  const vin = normaliseVin(input);
  const chars = Array.from(vin);
  const region: VinRegion = /^[1-5]/.test(vin) ? 'north-america' : 'other';
  const result = (checkDigit: VinCheckDigitResult | null, year: number | null, candidates: number[]): VinResult => ({
    vin,
    valid: !issues.some((issue) => issue.severity === 'error'),
    issues,
    checkDigit,
    modelYear: year,
    modelYearCandidates: candidates,
    region,
    wmi: chars.slice(0, 3).join(''),
  });

  if (typeof raw !== 'string') {
    issues.push({ position: null, message: `Expected text, got ${showValue(raw)}`, severity: 'error' });
    return result(null, null, []);
  }
  if (chars.length === 0) {
    issues.push({ position: null, message: 'Empty: a VIN has 17 characters', severity: 'error' });
    return result(null, null, []);
  }
  if (chars.length !== VIN_LENGTH) {
    issues.push({
      position: null,
      message: `Length: a VIN has ${VIN_LENGTH} characters; this one has ${chars.length}`,
      severity: 'error',
    });
  }
  let allAllowed = true;
  if (chars.length <= MAX_CHARACTER_ISSUES_LENGTH) {
    chars.forEach((ch, i) => {
      const problem = vinCharProblem(ch);
      if (problem !== null) {
        allAllowed = false;
        issues.push({ position: i + 1, message: `Position ${i + 1}: ${problem}`, severity: 'error' });
      }
    });
  }
  if (chars.length !== VIN_LENGTH || !allAllowed) return result(null, null, []);

  const expected = vinCheckDigit(vin);
  const actual = chars[8];
  const applies = /^[1-5L]/.test(vin);
  if (expected !== actual) {
    const base = `Position 9: check digit is '${actual}' but the other characters give '${expected}' (49 CFR 565.15)`;
    issues.push(
      applies
        ? { position: 9, message: `${base}; a character is probably mistyped`, severity: 'error' }
        : {
            position: 9,
            message: `${base}; VINs made for markets outside North America and China need not carry one`,
            severity: 'warning',
          },
    );
  }

  if (!VIN_YEAR_CODES.includes(chars[9])) {
    issues.push({
      position: 10,
      message: `Position 10: '${chars[9]}' is not a model-year code (U, Z and 0 are not used there)`,
      severity: 'warning',
    });
  }
  const { year, candidates } = vinModelYear(vin, opts);
  return result({ expected, actual, applies }, year, candidates);
}
