import { describe, expect, it } from 'vitest';
import { formatMoney, parseMoneyInput, sumCents } from './money';

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
    expect(parseMoneyInput('845.50')).toBe(84_550);
    expect(parseMoneyInput('1,234.5')).toBe(123_450);
    expect(parseMoneyInput('$0.07')).toBe(7);
    expect(parseMoneyInput('1500', 0)).toBe(1500);
    // 0.29 × 100 is 28.999999999999996 in IEEE 754 doubles; by digits it is 29.
    expect(0.29 * 100).not.toBe(29);
    expect(parseMoneyInput('0.29')).toBe(29);
  });

  it('refuses what is not an amount, or finer than a cent', () => {
    for (const bad of ['', 'abc', '-5', '1.234', '1.2.3', '1e5']) expect(parseMoneyInput(bad)).toBeNull();
    expect(parseMoneyInput('12.5', 0)).toBeNull();
  });
});
