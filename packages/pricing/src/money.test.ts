import { describe, expect, it } from 'vitest';
import { formatMoney, sumCents } from './money';

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
