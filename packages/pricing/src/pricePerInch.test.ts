import { describe, expect, it } from 'vitest';
import type { PriceObservation } from './observations';
import { pricePerInch } from './pricePerInch';

const die = (
  dieCents: number,
  ruleLengthIn: number,
  complexity: PriceObservation['complexity'] = 'simple',
  currency = 'USD',
): PriceObservation => ({
  dieCents,
  currency,
  ruleLengthIn,
  features: 10,
  complexity,
  pricedOn: '2026-06-01',
});

describe('pricePerInch', () => {
  it('gives R-7 quartiles of price per inch, in whole cents', () => {
    // d3-array's own tests: R-7 quantiles of [3,6,7,8,8,10,13,15,16,20] are 7.25 / 9 / 14.5 at
    // p = .25 / .5 / .75. Dies of 2 in priced 200 × those values cost 100 × them per inch.
    const values = [3, 6, 7, 8, 8, 10, 13, 15, 16, 20];
    const result = pricePerInch(values.map((v) => die(200 * v, 2)));
    expect(result.simple).toEqual({ enough: true, n: 10, q1Cents: 725, medianCents: 900, q3Cents: 1450 });
    expect(result.currency).toBe('USD');
  });

  it('rounds to whole cents', () => {
    // Arithmetic: $10.00 over 3 in is 333.33… cents an inch → 333.
    const result = pricePerInch([1000, 1000, 1000, 1000].map((c) => die(c, 3)));
    expect(result.simple).toMatchObject({ q1Cents: 333, medianCents: 333, q3Cents: 333 });
  });

  it('keeps simple and complex dies apart and says when a class has too few', () => {
    const records = [
      ...[3, 6, 7, 8, 8].map((v) => die(200 * v, 2)),
      die(5_000, 10, 'complex'),
      die(9_000, 10, 'complex'),
    ];
    const result = pricePerInch(records);
    expect(result.simple).toMatchObject({ enough: true, n: 5, medianCents: 700 });
    expect(result.complex).toEqual({
      enough: false,
      reason: '2 complex dies; price per inch needs at least 4',
      needed: 4,
    });
    expect(pricePerInch(records, { minPerClass: 2 }).complex).toMatchObject({ enough: true, n: 2, medianCents: 700 });
    expect(pricePerInch([]).simple).toMatchObject({ enough: false, needed: 4 });
  });

  it('refuses mixed currencies, bad records and a bad minimum', () => {
    expect(() => pricePerInch([die(100, 1), die(100, 1, 'simple', 'GBP')])).toThrow(/mix currencies/);
    expect(() => pricePerInch([die(100, -1)])).toThrow(/ruleLengthIn/);
    expect(() => pricePerInch([], { minPerClass: 0 })).toThrow(/minPerClass/);
  });
});
