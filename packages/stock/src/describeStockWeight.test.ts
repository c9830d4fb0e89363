import { describe, expect, it } from 'vitest';
import { describeStockWeight } from './describeStockWeight';

describe('describeStockWeight', () => {
  it('gives a basis weight with its g/m²', () => {
    // Common practice: 50 lb cover is about 135 g/m², 50 lb text about 74 g/m².
    expect(describeStockWeight({ lb: 50, grade: 'cover' })).toBe('50 lb cover (135 g/m²)');
    expect(describeStockWeight({ lb: 50, grade: 'text' })).toBe('50 lb text (74 g/m²)');
  });

  it('gives g/m² with the basis weight of a grade when one is named', () => {
    // Arithmetic: 300 g/m² / (453.59237 / 500 / (20 × 26 × 0.00064516)) = 110.94 → about 111 lb cover.
    expect(describeStockWeight({ gsm: 300, grade: 'cover' })).toBe('300 g/m² (about 111 lb cover)');
    expect(describeStockWeight({ gsm: 300 })).toBe('300 g/m²');
  });

  it('refuses bad weights', () => {
    expect(() => describeStockWeight({ gsm: -1 })).toThrow(/gsm must be more than 0/);
    expect(() => describeStockWeight({ lb: 0, grade: 'index' })).toThrow(/lb must be more than 0/);
  });
});
