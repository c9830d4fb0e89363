import { describe, expect, it } from 'vitest';
import { receivedDiePriceRecord } from './receivedDiePriceRecord';
import type { DielineMetrics } from '@kerfmark/contracts';

describe('receivedDiePriceRecord', () => {
  it('prices the cutting, creasing, perforating and kiss-cut rule, not the other lines', () => {
    const length = { cut: 30, crease: 12, perf: 4, kiss: 2, other: 50, total: 98 };
    const metrics = {
      length,
      bends: 8,
      curves: 4,
      joints: 3,
      punches: 1,
      board: { width: 10, height: 6 },
      complexity: 'simple',
    } as unknown as DielineMetrics;
    const row = receivedDiePriceRecord({
      organisationId: 1,
      requestId: 2,
      awardId: 3,
      shopId: 4,
      shopName: 'A shop',
      totalCents: 90_000,
      dieCents: 84_500,
      currency: 'USD',
      pricedOn: '2026-11-30',
      metrics,
    });
    // Common practice: a die is priced by its steel rule; construction lines are not rule.
    expect(row.ruleLengthIn).toBe(48);
    expect(row.boardAreaSqIn).toBe(60);
    expect(row).toMatchObject({ requestId: 2, awardId: 3, shopName: 'A shop', bends: 8, complexity: 'simple' });
    expect(row).not.toHaveProperty('metrics');
  });
});
