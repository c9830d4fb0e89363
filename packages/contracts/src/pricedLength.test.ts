import { describe, expect, it } from 'vitest';
import { pricedLength } from './pricedLength';

describe('pricedLength', () => {
  it('prices every rule type but other, in inches or millimetres', () => {
    // 10 in of cutting rule and 4 in of creasing rule, plus 3 in of dimension lines on an unnamed layer.
    const inches = { cut: 10, crease: 4, perf: 0, kiss: 0, other: 3, total: 17 };
    expect(pricedLength(inches)).toBe(14);
    // The same in millimetres (ISO 80000: 1 in = 25.4 mm exactly).
    expect(pricedLength({ cut: 254, crease: 101.6, perf: 0, kiss: 0, other: 76.2, total: 431.8 })).toBeCloseTo(
      14 * 25.4,
      9,
    );
  });
});
