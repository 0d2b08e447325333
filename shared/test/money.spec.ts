import fc from 'fast-check';
import {
  applyTaxMinor,
  currencyMinorDigits,
  formatMoney,
  formatPercent,
  fromKm,
  isIsoCurrency,
  labourCostMinor,
  toKm,
} from '../src/money';

// Reference rounding: ECMA-402 Intl.NumberFormat with roundingMode 'halfExpand' (half away from
// zero) applied to an exact decimal string, as the specification formats strings without a binary
// detour. The ES2022 typings predate both features, hence the casts.
const halfExpand = new Intl.NumberFormat('en-US', {
  maximumFractionDigits: 0,
  useGrouping: false,
  roundingMode: 'halfExpand',
} as Intl.NumberFormatOptions);
const formatDecimal = halfExpand.format.bind(halfExpand) as unknown as (value: string) => string;

/** round half away from zero of integer × 10^exponent, by the reference formatter */
function referenceRound(integer: bigint, exponent: number): number {
  // + 0 turns the '-0' printed for small negative values into 0
  return Number(formatDecimal(`${integer}E${exponent}`)) + 0;
}

describe('applyTaxMinor', () => {
  it('rate 120.00 per hour before tax is 144.00 with 20 % VAT (product brief, "Who uses it")', () => {
    expect(applyTaxMinor(12000, 2000)).toEqual({ net: 12000, tax: 2400, gross: 14400 });
  });

  // Worked by hand: tax = net × bp / 10 000, halves away from zero.
  it.each([
    [1, 5000, 1], // 0.5 → 1
    [-1, 5000, -1], // −0.5 → −1 (a refund rounds outwards too)
    [5, 1000, 1], // 0.5 → 1
    [3, 1500, 0], // 0.45 → 0
    [2, 2500, 1], // 0.5 → 1
    [1234, 2000, 247], // 246.8 → 247
    [12345, 1750, 2160], // 2160.375 → 2160
    [-12345, 1750, -2160], // −2160.375 → −2160
    [999, 0, 0],
  ])('net %d at %d bp → tax %d', (net, bp, tax) => {
    const result = applyTaxMinor(net, bp);
    expect(result.tax).toBe(tax);
    expect(result.gross).toBe(net + tax);
    expect(result.tax).toBe(referenceRound(BigInt(net) * BigInt(bp), -4));
  });

  it('matches half-away-from-zero rounding of the exact product (ECMA-402 halfExpand), even for huge amounts', () => {
    fc.assert(
      fc.property(fc.integer({ min: -(2 ** 49), max: 2 ** 49 }), fc.integer({ min: 0, max: 10_000 }), (net, bp) => {
        const result = applyTaxMinor(net, bp);
        expect(result.tax).toBe(referenceRound(BigInt(net) * BigInt(bp), -4));
      }),
    );
  });

  it('keeps money in integers and net + tax = gross', () => {
    fc.assert(
      fc.property(fc.integer({ min: -1e12, max: 1e12 }), fc.integer({ min: 0, max: 100_000 }), (net, bp) => {
        const { tax, gross } = applyTaxMinor(net, bp);
        expect(Number.isInteger(tax) && Number.isInteger(gross)).toBe(true);
        expect(net + tax).toBe(gross);
      }),
    );
  });

  it('tax never falls when the net amount rises', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: -1e9, max: 1e9 }),
        fc.integer({ min: 0, max: 1e6 }),
        fc.integer({ min: 0, max: 10_000 }),
        (net, step, bp) => {
          expect(applyTaxMinor(net + step, bp).tax).toBeGreaterThanOrEqual(applyTaxMinor(net, bp).tax);
        },
      ),
    );
  });

  it('names the field it refuses', () => {
    expect(() => applyTaxMinor(1.5, 2000)).toThrow(/netMinor/);
    expect(() => applyTaxMinor(Number.NaN, 2000)).toThrow(/netMinor/);
    expect(() => applyTaxMinor(2 ** 53, 2000)).toThrow(/netMinor/);
    expect(() => applyTaxMinor(100, -1)).toThrow(/taxRateBp/);
    expect(() => applyTaxMinor(100, 0.5)).toThrow(/taxRateBp/);
    expect(() => applyTaxMinor(Number.MAX_SAFE_INTEGER, 10_000)).toThrow(/gross/);
  });
});

describe('labourCostMinor', () => {
  // Worked by hand in decimal: hours × rate, halves rounded up.
  it.each([
    [1, 12000, 12000],
    [1.3, 12000, 15600], // floating point gives 15600.000000000002
    [0.1, 4550, 455],
    [1.005, 100, 101], // 100.5; floating point gives 100.49999999999999
    [0.25, 4999, 1250], // 1249.75
    [2.5, 1, 3], // 2.5
    [0.15, 3, 0], // 0.45
    [0, 9999, 0],
    [1e-7, 10_000_000, 1], // 1
  ])('%d h at %d per hour → %d', (hours, rate, cost) => {
    expect(labourCostMinor(hours, rate)).toBe(cost);
  });

  it('rounds hours in 0.1 and 0.01 steps exactly as decimal arithmetic does (ECMA-402 halfExpand)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 100_000 }), fc.constantFrom(1, 2), fc.integer({ min: 0, max: 10_000_000 }), (k, places, rate) => {
        const hours = k / 10 ** places;
        const cost = labourCostMinor(hours, rate);
        expect(Number.isInteger(cost)).toBe(true);
        expect(cost).toBe(referenceRound(BigInt(k) * BigInt(rate), -places));
      }),
    );
  });

  it('names the field it refuses', () => {
    expect(() => labourCostMinor(-1, 100)).toThrow(/hours/);
    expect(() => labourCostMinor(Number.POSITIVE_INFINITY, 100)).toThrow(/hours/);
    expect(() => labourCostMinor(1, 1.5)).toThrow(/ratePerHourMinor/);
    expect(() => labourCostMinor(1, -100)).toThrow(/ratePerHourMinor/);
  });
});

describe('currencies (ISO 4217)', () => {
  // Minor units from the ISO 4217 list: GBP 2, EUR 2, JPY 0, BHD 3, KWD 3.
  it.each([
    ['GBP', 2],
    ['EUR', 2],
    ['USD', 2],
    ['JPY', 0],
    ['BHD', 3],
    ['KWD', 3],
  ])('%s has %d minor digits', (code, digits) => {
    expect(currencyMinorDigits(code)).toBe(digits);
  });

  it('knows ISO 4217 codes and nothing else', () => {
    expect(isIsoCurrency('GBP')).toBe(true);
    expect(isIsoCurrency('BHD')).toBe(true);
    expect(isIsoCurrency('gbp')).toBe(false);
    expect(isIsoCurrency('GB')).toBe(false);
    expect(isIsoCurrency('ABC')).toBe(false);
    expect(isIsoCurrency(7 as unknown as string)).toBe(false);
    expect(() => currencyMinorDigits('ABC')).toThrow(/currency.*ISO 4217/);
  });
});

describe('formatting (CLDR locale data, as shipped with the runtime)', () => {
  it('formats minor units with the currency digits', () => {
    expect(formatMoney(14400, 'GBP', 'en-GB')).toBe('£144.00');
    expect(formatMoney(-5, 'BHD', 'en-GB')).toMatch(/-\s?BHD\s?0\.005|BHD\s?-0\.005/);
    expect(formatMoney(1234, 'JPY', 'en-US')).toBe('¥1,234');
    expect(formatMoney(5, 'EUR', 'en-GB')).toBe('€0.05');
  });

  it('prints the largest safe amount digit for digit', () => {
    // 9 007 199 254 740 991 minor units = 90 071 992 547 409.91
    expect(formatMoney(Number.MAX_SAFE_INTEGER, 'EUR', 'en-GB')).toBe('€90,071,992,547,409.91');
  });

  it('formats whole percentages per locale', () => {
    expect(formatPercent(0.4, 'en-GB')).toBe('40%');
    // CLDR de and fr put a no-break space before the sign (some CLDR versions a narrow one)
    expect(formatPercent(0.4, 'de-DE')).toMatch(/^40[\u00a0\u202f]%$/);
    expect(formatPercent(0.4, 'fr-FR')).toMatch(/^40[\u00a0\u202f]%$/);
    expect(formatPercent(0.125, 'en-GB')).toBe('13%');
  });

  it('names the field it refuses', () => {
    expect(() => formatMoney(1.5, 'GBP', 'en-GB')).toThrow(/minor/);
    expect(() => formatMoney(100, 'XYZ', 'en-GB')).toThrow(/currency/);
    expect(() => formatMoney(100, 'GBP', 'not a locale!')).toThrow(/locale/);
    expect(() => formatPercent(Number.NaN, 'en-GB')).toThrow(/p:/);
  });
});

describe('distance: 1 international mile = 1.609344 km exactly (international yard and pound agreement, 1959)', () => {
  // 1 yd = 0.9144 m and 1 mi = 1760 yd, so 1 mi = 1 609 344 mm.
  const MM_PER_MILE = 1760n * 9144n / 10n;

  it('derives 1 609 344 mm per mile from the yard', () => {
    expect(MM_PER_MILE).toBe(1_609_344n);
    expect(toKm(1, 'mi')).toBe(1.609344);
    expect(toKm(100, 'mi')).toBe(160.9344);
    expect(fromKm(1.609344, 'mi')).toBe(1);
    // 1 km = 0.621 371 192 237 333 969 6… mi (1 / 1.609344, to 22 digits)
    expect(fromKm(1, 'mi')).toBe(Number('0.6213711922373339696174'));
  });

  it('converts whole miles to the nearest number to the exact km, and back', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 100_000_000 }), (miles) => {
        const km = toKm(miles, 'mi');
        expect(km).toBe(Number(`${BigInt(miles) * MM_PER_MILE}e-6`));
        expect(fromKm(km, 'mi')).toBe(miles);
      }),
    );
  });

  it('leaves km as km and refuses bad input by name', () => {
    expect(toKm(123.4, 'km')).toBe(123.4);
    expect(fromKm(123.4, 'km')).toBe(123.4);
    expect(() => toKm(Number.NaN, 'mi')).toThrow(/value/);
    expect(() => fromKm(Number.POSITIVE_INFINITY, 'mi')).toThrow(/km/);
    expect(() => toKm(1, 'ft' as 'mi')).toThrow(/unit/);
    expect(() => toKm(1.5e308, 'mi')).toThrow(/beyond/);
  });
});
