/** Model year from VIN position 10 (49 CFR 565.15) and the position-7 rule (73 FR 23367). */

import { normaliseVin, vinCharValue } from './check-digit';
import { showValue } from '../dtc/show-value';

/** Position-10 codes in order; the first stands for 1980, then the cycle repeats every 30 years. */
export const VIN_YEAR_CODES = 'ABCDEFGHJKLMNPRSTVWXY123456789';

const FIRST_YEAR = 1980;
const CYCLE = 30;

export interface VinModelYearOptions {
  /**
   * Latest calendar year to consider: a model year may be at most one year after it. Defaults to
   * the current year; pass it explicitly wherever results must be reproducible.
   */
  referenceYear?: number;
  /**
   * Car, multipurpose vehicle or truck of at most 4,536 kg GVWR, for which position 7 picks the
   * 30-year cycle. Defaults to true, since those are most vehicles in a workshop (common practice).
   * For heavier vehicles, trailers and motorcycles the year is given only when one candidate remains.
   */
  lightVehicle?: boolean;
}

export interface VinModelYear {
  year: number | null;
  /** Every model year position 10 can mean up to the reference year + 1, earliest first. */
  candidates: number[];
}

/** Validates the reference year; throws RangeError naming the option. */
export function resolveReferenceYear(referenceYear: number | undefined): number {
  if (referenceYear === undefined) return new Date().getFullYear();
  if (!Number.isInteger(referenceYear) || referenceYear < FIRST_YEAR || referenceYear > 9999) {
    throw new RangeError(`referenceYear: expected a whole year from ${FIRST_YEAR} to 9999, got ${showValue(referenceYear)}`);
  }
  return referenceYear;
}

/**
 * Model year of a VIN. Numeric position 7 selects 1980–2009, alphabetic 2010–2039 (NHTSA final
 * rule 73 FR 23367, 30 April 2008, for light vehicles). Returns year null with no candidates
 * when position 10 holds no year code (U, Z and 0 are never used there).
 */
export function vinModelYear(vin: string, opts: VinModelYearOptions = {}): VinModelYear {
  const referenceYear = resolveReferenceYear(opts.referenceYear);
  const normal = normaliseVin(vin);
  const index = normal.length >= 10 ? VIN_YEAR_CODES.indexOf(normal[9]) : -1;
  if (index === -1) return { year: null, candidates: [] };

  const candidates: number[] = [];
  for (let y = FIRST_YEAR + index; y <= referenceYear + 1; y += CYCLE) candidates.push(y);

  if (opts.lightVehicle === false) {
    return { year: candidates.length === 1 ? candidates[0] : null, candidates };
  }
  const seventh = normal[6];
  if (vinCharValue(seventh) === null) return { year: null, candidates };
  const cycleStart = /[0-9]/.test(seventh) ? FIRST_YEAR : FIRST_YEAR + CYCLE;
  const year = cycleStart + index;
  return { year: candidates.includes(year) ? year : null, candidates };
}
