import { describe, expect, it } from 'vitest';
import { tQuantile } from './tQuantile';

describe('tQuantile', () => {
  // Reference t(0.975) quantiles to 10 decimals, computed with a reference statistics library
  // (the project's table of trade facts); here from @stdlib.
  it.each([
    [9, 2.2621571628],
    [10, 2.228138852],
    [20, 2.0859634473],
    [30, 2.0422724563],
  ])('t(0.975, df %i) = %d', (df, want) => {
    expect(Math.abs(tQuantile(0.975, df) - want)).toBeLessThan(5e-11);
  });

  it('approaches the normal quantile 1.9599639845 for many degrees of freedom', () => {
    expect(Math.abs(tQuantile(0.975, 1e9) - 1.9599639845)).toBeLessThan(1e-8);
  });

  it('is symmetric about 0 (arithmetic: the t density is even)', () => {
    expect(tQuantile(0.1, 7)).toBeCloseTo(-tQuantile(0.9, 7), 12);
    expect(tQuantile(0.5, 7)).toBe(0);
  });

  it('refuses a probability or degrees of freedom out of range', () => {
    for (const p of [0, 1, -0.1, Number.NaN]) expect(() => tQuantile(p, 5)).toThrow(RangeError);
    for (const df of [0, -1, Number.NaN, Infinity]) expect(() => tQuantile(0.9, df)).toThrow(RangeError);
  });
});
