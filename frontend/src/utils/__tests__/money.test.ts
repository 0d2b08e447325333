// @vitest-environment node
import { describe, expect, it } from 'vitest';
import {
  basisPointsToPercent,
  currencyFractionDigits,
  formatMoney,
  fromMinorUnits,
  grossFromNet,
  percentToBasisPoints,
  toMinorUnits,
} from '@/utils/money';

describe('money', () => {
  it('adds tax in integer minor units: 120.00 at 20 % is 144.00', () => {
    expect(grossFromNet(12_000, 2_000)).toBe(14_400);
    expect(grossFromNet(9_550, 1_900)).toBe(11_365); // 1814.5 rounds half up
    expect(grossFromNet(12_345, 0)).toBe(12_345);
  });

  it('converts typed decimals to minor units by the currency, without floating-point error', () => {
    expect(toMinorUnits('120', 'GBP')).toBe(12_000);
    expect(toMinorUnits('0.29', 'GBP')).toBe(29); // 0.29 × 100 = 28.999… in floating point
    expect(toMinorUnits('95,5', 'EUR')).toBe(9_550);
    expect(toMinorUnits('12000', 'JPY')).toBe(12_000);
    expect(toMinorUnits('1.2345', 'KWD')).toBe(1_235);
    expect(toMinorUnits('abc', 'GBP')).toBeNull();
    expect(toMinorUnits('', 'GBP')).toBeNull();
    expect(currencyFractionDigits('JPY')).toBe(0);
  });

  it('converts back for the form, and percentages to basis points and back', () => {
    expect(fromMinorUnits(9_999, 'GBP')).toBe('99.99');
    expect(fromMinorUnits(5, 'GBP')).toBe('0.05');
    expect(fromMinorUnits(12_000, 'JPY')).toBe('12000');
    expect(percentToBasisPoints('17.5')).toBe(1_750);
    expect(percentToBasisPoints('20')).toBe(2_000);
    expect(basisPointsToPercent(1_750)).toBe('17.5');
    expect(basisPointsToPercent(2_000)).toBe('20');
    expect(basisPointsToPercent(0)).toBe('0');
  });

  it("formats in the shop's locale and currency", () => {
    expect(formatMoney(14_400, 'GBP', 'en-GB')).toBe('£144.00');
    expect(formatMoney(12_000, 'JPY', 'ja-JP')).toBe('￥12,000');
  });
});
