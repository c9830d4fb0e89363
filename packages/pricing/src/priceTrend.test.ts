import { describe, expect, it } from 'vitest';
import type { PriceObservation } from './observations';
import { priceTrend } from './priceTrend';

const die = (
  pricedOn: string,
  centsPerInch: number,
  complexity: PriceObservation['complexity'] = 'simple',
): PriceObservation => ({
  dieCents: centsPerInch * 10,
  currency: 'USD',
  ruleLengthIn: 10,
  features: 4,
  complexity,
  pricedOn,
});

describe('priceTrend', () => {
  it('gives each calendar quarter its median price per inch and the change in percent', () => {
    const trend = priceTrend([
      die('2026-01-05', 100),
      die('2026-02-10', 300),
      die('2026-03-31', 200),
      die('2026-07-01', 220),
      die('2026-09-30', 260),
      die('2026-10-01', 180),
    ]);
    expect(trend.currency).toBe('USD');
    // Arithmetic: Q3's median 240 is 20 % above Q1's 200 (Q2 has no dies); Q4's 180 is 25 % below 240.
    expect(trend.quarters).toEqual([
      { quarter: '2026-Q1', n: 3, medianCentsPerInch: 200, changePct: null, comparedWith: null },
      { quarter: '2026-Q2', n: 0, medianCentsPerInch: null, changePct: null, comparedWith: null },
      { quarter: '2026-Q3', n: 2, medianCentsPerInch: 240, changePct: 20, comparedWith: '2026-Q1' },
      { quarter: '2026-Q4', n: 1, medianCentsPerInch: 180, changePct: -25, comparedWith: '2026-Q3' },
    ]);
  });

  it('crosses the year and rounds medians to whole cents', () => {
    // Dies of 10 in at 1,004 and 1,009 cents: 100.4 and 100.9 cents an inch, median 100.65 → 101.
    const records: PriceObservation[] = [
      { ...die('2025-12-31', 0), dieCents: 1_004 },
      { ...die('2025-11-02', 0), dieCents: 1_009 },
      die('2026-01-01', 202),
    ];
    const { quarters } = priceTrend(records);
    expect(quarters.map((q) => [q.quarter, q.medianCentsPerInch])).toEqual([
      ['2025-Q4', 101],
      ['2026-Q1', 202],
    ]);
    expect(quarters[1]!.changePct).toBeCloseTo(100, 10);
  });

  it('can keep one complexity class, and is empty without records', () => {
    const records = [die('2026-04-01', 100), die('2026-04-02', 500, 'complex'), die('2026-08-01', 110)];
    expect(priceTrend(records, { complexity: 'simple' }).quarters.map((q) => q.medianCentsPerInch)).toEqual([100, 110]);
    expect(priceTrend(records, { complexity: 'complex' }).quarters).toHaveLength(1);
    expect(priceTrend([])).toEqual({ currency: null, quarters: [] });
  });

  it('refuses mixed currencies and bad dates', () => {
    expect(() => priceTrend([die('2026-01-01', 1), { ...die('2026-01-01', 1), currency: 'JPY' }])).toThrow(
      /mix currencies/,
    );
    expect(() => priceTrend([die('2026-1-1', 1)])).toThrow(/pricedOn/);
  });
});
