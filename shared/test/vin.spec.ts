import fc from 'fast-check';
import { validateVin, vinCheckDigit, vinModelYear, vinWeightedSum } from '../src/vin';

// Transliteration and weights copied from 49 CFR 565.15(c) (tables in domain reference §5),
// kept apart from the module's own tables so that the tests check them.
const VALUES: Record<string, number> = {
  A: 1, B: 2, C: 3, D: 4, E: 5, F: 6, G: 7, H: 8, J: 1, K: 2, L: 3, M: 4, N: 5, P: 7, R: 9,
  S: 2, T: 3, U: 4, V: 5, W: 6, X: 7, Y: 8, Z: 9,
  '0': 0, '1': 1, '2': 2, '3': 3, '4': 4, '5': 5, '6': 6, '7': 7, '8': 8, '9': 9,
};
const WEIGHTS = [8, 7, 6, 5, 4, 3, 2, 10, 0, 9, 8, 7, 6, 5, 4, 3, 2];
const ALPHABET = Object.keys(VALUES);

function regulationCheckDigit(vin: string): string {
  const r = vin.split('').reduce((sum, ch, i) => sum + VALUES[ch] * WEIGHTS[i], 0) % 11;
  return r === 10 ? 'X' : String(r);
}

function withCorrectCheckDigit(vin: string): string {
  return vin.slice(0, 8) + regulationCheckDigit(vin) + vin.slice(9);
}

const REF = { referenceYear: 2025 };

describe('worked rows of domain reference §5 (49 CFR 565.15(c); MY per 49 CFR 565.15 and 73 FR 23367)', () => {
  // [VIN, Σ, check digit, model year, note]
  const rows: [string, number, string, number][] = [
    ['1HGCM82633A004352', 311, '3', 2003],
    ['1M8GDM9AXKP042788', 351, 'X', 1989], // remainder 10 → X
    ['1J9RP1A36A1644345', 314, '6', 2010], // NHTSA "Outline for New Manufacturer Information" example
    ['11111111111111111', 89, '1', 2001], // edge case
  ];

  it.each(rows)('%s: Σ %d, check digit %s, model year %d', (vin, sum, digit, year) => {
    expect(vinWeightedSum(vin)).toBe(sum);
    expect(sum % 11).toBe(digit === 'X' ? 10 : Number(digit));
    expect(vinCheckDigit(vin)).toBe(digit);
    const result = validateVin(vin, REF);
    expect(result.valid).toBe(true);
    expect(result.issues).toEqual([]);
    expect(result.checkDigit).toEqual({ expected: digit, actual: digit, applies: true });
    expect(result.modelYear).toBe(year);
    expect(result.modelYearCandidates).toContain(year);
    expect(result.region).toBe('north-america');
    expect(result.wmi).toBe(vin.slice(0, 3));
  });

  it('1HGCM82643A004352 (Σ 311, check digit 3, position 9 says 4) is invalid, at position 9', () => {
    const result = validateVin('1HGCM82643A004352', REF);
    expect(result.valid).toBe(false);
    expect(result.checkDigit).toEqual({ expected: '3', actual: '4', applies: true });
    expect(result.issues).toEqual([expect.objectContaining({ position: 9, severity: 'error', message: expect.stringMatching(/'4'.*'3'/) })]);
  });
});

describe('where the check digit applies (domain reference §5)', () => {
  it('WDBEA30D3HA391172 (EU) passes, region other, check digit not required (ISO 3779)', () => {
    const result = validateVin('WDBEA30D3HA391172', REF);
    expect(result.valid).toBe(true);
    expect(result.issues).toEqual([]);
    expect(result.region).toBe('other');
    expect(result.checkDigit).toEqual({ expected: '3', actual: '3', applies: false });
    expect(result.modelYear).toBe(1987); // position 10 H, numeric position 7 → 1980–2009 cycle
  });

  it('a mismatch outside North America and China is a warning, not an error', () => {
    const result = validateVin('WDBEA30D5HA391172', REF);
    expect(result.valid).toBe(true);
    expect(result.issues).toEqual([
      expect.objectContaining({ position: 9, severity: 'warning', message: expect.stringMatching(/need not carry one/) }),
    ]);
  });

  it('a mismatch on a Chinese VIN (L…, GB 16735 — from memory) is an error', () => {
    const good = withCorrectCheckDigit('LVSHCAMB0CE000001');
    expect(validateVin(good, REF).valid).toBe(true);
    const wrong = good.slice(0, 8) + (good[8] === '7' ? '8' : '7') + good.slice(9);
    const result = validateVin(wrong, REF);
    expect(result.valid).toBe(false);
    expect(result.checkDigit?.applies).toBe(true);
    expect(result.region).toBe('other');
  });

  it.each(['1', '2', '3', '4', '5'])('first character %s (North America) requires it', (first) => {
    const vin = withCorrectCheckDigit(`${first}HGCM82603A004352`);
    expect(validateVin(vin, REF).checkDigit?.applies).toBe(true);
    expect(validateVin(vin, REF).region).toBe('north-america');
  });
});

describe('every single-character change to a North-American VIN', () => {
  // Changing one character at a weighted position shifts the sum by Δvalue × weight. The weights
  // (1–10) are non-zero modulo the prime 11 and |Δvalue| ≤ 9, so the shift is never 0 mod 11 —
  // unless Δvalue = 0, i.e. the new character transliterates to the same value (A↔J↔1, B↔K↔S↔2, …),
  // which the standard cannot detect by design. A change to position 9 itself always shows.
  const base = '1HGCM82633A004352';

  it('is caught exactly when it changes position 9 or the transliterated value of another position', () => {
    let caught = 0;
    let undetectable = 0;
    const wrong: string[] = [];
    for (let i = 0; i < 17; i++) {
      for (const ch of ALPHABET) {
        if (ch === base[i]) continue;
        const changed = base.slice(0, i) + ch + base.slice(i + 1);
        const result = validateVin(changed, REF);
        const detectable = i === 8 || VALUES[ch] !== VALUES[base[i]];
        const detected = result.checkDigit !== null && result.checkDigit.expected !== result.checkDigit.actual;
        // A change of the first character to one outside 1–5 and L leaves North America (and China),
        // where a mismatch is only a warning; everywhere else a detected change makes the VIN invalid.
        const stillRequired = /^[1-5L]/.test(changed);
        const severityRight = stillRequired ? result.valid === !detectable : result.valid;
        if (detected !== detectable || !severityRight) wrong.push(`${changed} (position ${i + 1} → ${ch})`);
        if (detectable) caught++;
        else undetectable++;
      }
    }
    expect(wrong).toEqual([]);
    expect(caught + undetectable).toBe(17 * (ALPHABET.length - 1));
    expect(caught).toBeGreaterThan(undetectable);
  });

  it('a same-value substitution (A for J) goes unnoticed, as the standard allows', () => {
    const vin = '1J9RP1A36A1644345';
    expect(validateVin(vin.replace('1J9', '1A9'), REF).valid).toBe(true);
  });
});

describe('characters and length', () => {
  it('normalises case, spaces and dashes', () => {
    const result = validateVin('  1hgcm-8263 3a004352 ', REF);
    expect(result.vin).toBe('1HGCM82633A004352');
    expect(result.valid).toBe(true);
  });

  it.each([
    ['1HGCM8263A004352', 16],
    ['1HGCM82633A0043522', 18],
  ])('names the length of %s', (vin, length) => {
    const result = validateVin(vin, REF);
    expect(result.valid).toBe(false);
    expect(result.checkDigit).toBeNull();
    expect(result.issues[0]).toEqual(
      expect.objectContaining({ position: null, severity: 'error', message: expect.stringContaining(`has ${length}`) }),
    );
  });

  // 49 CFR 565.15(b): I, O and Q are never used.
  it.each([
    ['1HGCM82633AOO4352', 12, /letter O.*'0'/],
    ['1HGCM8I633A004352', 7, /letter I.*'1'/],
    ['1HGCM82633A0Q4352', 13, /letter Q/],
    ['1HGCM82633A00435*', 17, /'\*' is not allowed/],
    ['1HGCM82633A00435é', 17, /U\+00C9/], // reported after upper-casing: é → É
  ])('%s: error at position %d', (vin, position, pattern) => {
    const result = validateVin(vin, REF);
    expect(result.valid).toBe(false);
    expect(result.issues).toContainEqual(expect.objectContaining({ position, severity: 'error', message: expect.stringMatching(pattern) }));
  });

  it('never throws for any input, and valid means 17 allowed characters with no error', () => {
    expect(validateVin(undefined as unknown as string).valid).toBe(false);
    expect(validateVin(42 as unknown as string).issues[0].message).toMatch(/expected text/i);
    expect(validateVin('').issues[0].message).toMatch(/empty/i);
    fc.assert(
      fc.property(fc.oneof(fc.string(), fc.string({ unit: 'binary' }), fc.stringMatching(/^[0-9A-Z]{15,19}$/)), (input) => {
        const result = validateVin(input, REF);
        if (result.valid) {
          expect(result.vin).toMatch(/^[0-9A-HJ-NPR-Z]{17}$/);
          expect(result.issues.every((issue) => issue.severity === 'warning')).toBe(true);
        } else {
          expect(result.issues.some((issue) => issue.severity === 'error' && issue.message.length > 0)).toBe(true);
        }
      }),
    );
  });

  it('accepts any VIN whose check digit follows the regulation', () => {
    const vinChar = fc.constantFrom(...ALPHABET);
    fc.assert(
      fc.property(fc.constantFrom('1', '2', '3', '4', '5'), fc.array(vinChar, { minLength: 16, maxLength: 16 }), (first, rest) => {
        const vin = withCorrectCheckDigit(first + rest.join(''));
        const result = validateVin(vin, REF);
        expect(result.issues.filter((issue) => issue.severity === 'error')).toEqual([]);
        expect(vinCheckDigit(vin)).toBe(vin[8]);
      }),
    );
  });

  it('vinCheckDigit refuses what it cannot compute, naming the problem', () => {
    expect(() => vinCheckDigit('1HGCM82633A00435')).toThrow(/17 characters, got 16/);
    expect(() => vinCheckDigit('1HGCM82633AOO4352')).toThrow(/position 12/);
  });
});

describe('model year (49 CFR 565.15 position 10, from memory; NHTSA 73 FR 23367 position-7 rule)', () => {
  it('position 7 numeric → 1980–2009, alphabetic → 2010–2039', () => {
    // 1J9RP1A36A1644345: position 7 'A' and position 10 'A' → 2010 (domain reference §5)
    expect(vinModelYear('1J9RP1A36A1644345', REF)).toEqual({ year: 2010, candidates: [1980, 2010] });
    // same position 10 with numeric position 7 → 1980
    expect(vinModelYear('1J9RP11A6A1644345', REF).year).toBe(1980);
  });

  it('lists every candidate up to the reference year + 1', () => {
    expect(vinModelYear('1HGCM82633A004352', { referenceYear: 2025 }).candidates).toEqual([2003]);
    expect(vinModelYear('1HGCM82633A004352', { referenceYear: 2032 }).candidates).toEqual([2003, 2033]);
    expect(vinModelYear('1HGCM82633A004352', { referenceYear: 2032 }).year).toBe(2003);
  });

  it('gives no year where the position-7 cycle lies in the future', () => {
    // alphabetic position 7 with '9' in position 10 → 2039, beyond 2026
    const vin = withCorrectCheckDigit('1HGCM8A63' + '9' + 'A004352');
    expect(vinModelYear(vin, REF)).toEqual({ year: null, candidates: [2009] });
  });

  it('without the light-vehicle rule, gives a year only when one candidate remains', () => {
    expect(vinModelYear('1J9RP1A36A1644345', { referenceYear: 2025, lightVehicle: false })).toEqual({
      year: null,
      candidates: [1980, 2010],
    });
    expect(vinModelYear('1HGCM82633A004352', { referenceYear: 2025, lightVehicle: false }).year).toBe(2003);
  });

  it.each(['U', 'Z', '0'])('position 10 %s is not a year code: a warning, no year', (ch) => {
    const vin = withCorrectCheckDigit('1HGCM8263' + ch + 'A004352');
    const result = validateVin(vin, REF);
    expect(result.valid).toBe(true);
    expect(result.modelYear).toBeNull();
    expect(result.modelYearCandidates).toEqual([]);
    expect(result.issues).toEqual([expect.objectContaining({ position: 10, severity: 'warning' })]);
  });

  it('refuses a reference year that is not a whole year', () => {
    expect(() => validateVin('1HGCM82633A004352', { referenceYear: 2025.5 })).toThrow(/referenceYear/);
    expect(() => vinModelYear('1HGCM82633A004352', { referenceYear: 1900 })).toThrow(/referenceYear/);
  });
});
