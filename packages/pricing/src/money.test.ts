import { describe, expect, it } from 'vitest';
import {
  formatMoney,
  isCurrencyCode,
  majorUnits,
  minorDigits,
  parseMoneyInput,
  sumCents,
  toMajorString,
} from './money';

describe('money', () => {
  it('adds whole cents exactly where floating-point dollars would drift', () => {
    // 0.1 + 0.2 !== 0.3 in IEEE 754 doubles; in cents it is 10 + 20 = 30.
    expect(0.1 + 0.2).not.toBe(0.3);
    expect(sumCents([10, 20])).toBe(30);
    expect(sumCents([])).toBe(0);
  });

  it('refuses fractions of a cent and unsafe totals', () => {
    expect(() => sumCents([10.5])).toThrow(RangeError);
    expect(() => sumCents([Number.MAX_SAFE_INTEGER, 1])).toThrow(RangeError);
  });

  // ECMA-402 Intl.NumberFormat is the reference for currency display; ISO 4217 gives
  // USD two minor digits and JPY none.
  it('formats with the currency’s own minor units', () => {
    expect(formatMoney({ cents: 123456, currency: 'USD' })).toBe('$1,234.56');
    expect(formatMoney({ cents: 1500, currency: 'JPY' })).toBe('¥1,500');
  });
});

describe('parseMoneyInput', () => {
  it('reads typed amounts into whole cents by their digits', () => {
    expect(parseMoneyInput('845.50', 'USD')).toBe(84_550);
    expect(parseMoneyInput('1,234.5', 'USD')).toBe(123_450);
    expect(parseMoneyInput('$0.07', 'USD')).toBe(7);
    expect(parseMoneyInput('1500', 'JPY')).toBe(1500);
    expect(parseMoneyInput('12.345', 'BHD')).toBe(12_345);
    // 0.29 × 100 is 28.999999999999996 in IEEE 754 doubles; by digits it is 29.
    expect(0.29 * 100).not.toBe(29);
    expect(parseMoneyInput('0.29', 'USD')).toBe(29);
  });

  it('refuses what is not an amount, or finer than a cent', () => {
    for (const bad of ['', 'abc', '-5', '1.234', '1.2.3', '1e5']) expect(parseMoneyInput(bad, 'USD')).toBeNull();
    expect(parseMoneyInput('12.5', 'JPY')).toBeNull();
    expect(parseMoneyInput('1.2345', 'KWD')).toBeNull();
  });
});

// ISO 4217 "List one" gives each currency's minor unit: USD, EUR, GBP, CAD, MXN 2; JPY, KRW 0;
// BHD, KWD, TND 3 (the published table; Intl carries the same digits).
describe('minor units', () => {
  it('knows each currency’s digits from ISO 4217', () => {
    for (const [code, digits] of [
      ['USD', 2],
      ['EUR', 2],
      ['GBP', 2],
      ['CAD', 2],
      ['MXN', 2],
      ['JPY', 0],
      ['KRW', 0],
      ['BHD', 3],
      ['KWD', 3],
      ['TND', 3],
    ] as const)
      expect(minorDigits(code), code).toBe(digits);
    expect(() => minorDigits('dollars')).toThrow(RangeError);
    expect(isCurrencyCode('JPY')).toBe(true);
    expect(isCurrencyCode('XYZ')).toBe(false);
    expect(isCurrencyCode('usd')).toBe(false);
  });

  it('writes major units digit by digit, signs and all', () => {
    expect(toMajorString(84_500, 'USD')).toBe('845.00');
    expect(toMajorString(1500, 'JPY')).toBe('1500');
    expect(toMajorString(-5, 'BHD')).toBe('-0.005');
    expect(toMajorString(-12_345, 'KWD')).toBe('-12.345');
    expect(toMajorString(-7, 'USD')).toBe('-0.07');
    expect(toMajorString(0, 'EUR')).toBe('0.00');
    expect(majorUnits(150_000, 'JPY')).toBe(150_000);
    expect(majorUnits(84_550, 'USD')).toBe(845.5);
    expect(() => toMajorString(1.5, 'USD')).toThrow(RangeError);
  });

  it('round-trips what it writes through what people type', () => {
    for (const [cents, code] of [
      [84_550, 'USD'],
      [1500, 'JPY'],
      [12_345, 'BHD'],
      [7, 'EUR'],
    ] as const)
      expect(parseMoneyInput(toMajorString(cents, code), code)).toBe(cents);
  });
});
