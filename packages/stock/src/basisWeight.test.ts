import { describe, expect, it } from 'vitest';
import { BASIS_SIZES_IN, basisWeightToGsm, GRAMS_PER_POUND, gsmToBasisWeight, type PaperGrade } from './basisWeight';

/** True when a and b agree to `digits` significant digits. */
const agreesTo = (a: number, b: number, digits: number) =>
  Math.abs(a - b) <= 0.5 * 10 ** (Math.floor(Math.log10(Math.abs(b))) - digits + 1);

describe('basisWeightToGsm', () => {
  it('matches the published g/m² per pound of each grade to 5 significant digits', () => {
    // Published conversion tables (common practice) give g/m² per lb of basis weight:
    // text 25 × 38 in 1.48015; cover 20 × 26 in 2.70411; bristol 22.5 × 28.5 in 2.19281;
    // index 25.5 × 30.5 in 1.80796; bond 17 × 22 in 3.75973.
    const table: Record<PaperGrade, number> = {
      text: 1.48015,
      cover: 2.70411,
      bristol: 2.19281,
      index: 1.80796,
      bond: 3.75973,
    };
    for (const [grade, perPound] of Object.entries(table) as Array<[PaperGrade, number]>) {
      expect(agreesTo(basisWeightToGsm(1, grade), perPound, 5), `${grade}: ${basisWeightToGsm(1, grade)}`).toBe(true);
    }
  });

  it('follows from the basis size, the international pound and the international inch', () => {
    // The international pound (1959): 1 lb = 453.59237 g; the international inch: 1 in = 25.4 mm,
    // so 1 in² = 0.00064516 m². Arithmetic for 50 lb cover: 50 × 453.59237 g / 500 sheets over
    // 20 × 26 in² × 0.00064516 m²/in² = 0.3354832 m² → 135.2057 g/m².
    expect(GRAMS_PER_POUND).toBe(453.59237);
    expect(BASIS_SIZES_IN.cover).toEqual([20, 26]);
    expect(basisWeightToGsm(50, 'cover')).toBeCloseTo((50 * 453.59237) / 500 / (20 * 26 * 0.00064516), 10);
    expect(basisWeightToGsm(50, 'cover')).toBeCloseTo(135.2057, 4);
  });

  it('gives the well-known everyday weights', () => {
    // Common practice: 50 lb cover is about 135 g/m², 50 lb text about 74 g/m².
    expect(Math.round(basisWeightToGsm(50, 'cover'))).toBe(135);
    expect(Math.round(basisWeightToGsm(50, 'text'))).toBe(74);
  });

  it('refuses weights that are not positive, not numbers or absurd, and unknown grades', () => {
    expect(() => basisWeightToGsm(0, 'text')).toThrow(RangeError);
    expect(() => basisWeightToGsm(-10, 'cover')).toThrow(/lb must be more than 0/);
    expect(() => basisWeightToGsm(Number.POSITIVE_INFINITY, 'cover')).toThrow(/lb must be a number/);
    // 5000 g/m² is the limit: arithmetic, 5000 / 2.70411 = 1849.03 lb cover.
    expect(basisWeightToGsm(1849, 'cover')).toBeLessThan(5000);
    expect(() => basisWeightToGsm(1850, 'cover')).toThrow(/at most 1849 lb cover/);
    expect(() => basisWeightToGsm(50, 'card' as PaperGrade)).toThrow(
      /grade must be one of text, cover, bristol, index, bond/,
    );
  });
});

describe('gsmToBasisWeight', () => {
  it('is the inverse of basisWeightToGsm', () => {
    // Arithmetic: 300 g/m² / 2.70411 = 110.94 lb cover; 80 lb text round-trips.
    expect(gsmToBasisWeight(300, 'cover')).toBeCloseTo(110.942, 3);
    expect(gsmToBasisWeight(basisWeightToGsm(80, 'text'), 'text')).toBeCloseTo(80, 10);
    expect(gsmToBasisWeight(135.2057, 'cover')).toBeCloseTo(50, 4);
  });

  it('refuses weights that are not positive, not numbers or absurd', () => {
    expect(() => gsmToBasisWeight(0, 'bond')).toThrow(/gsm must be more than 0/);
    expect(() => gsmToBasisWeight(Number.NaN, 'bond')).toThrow(/gsm must be a number/);
    expect(() => gsmToBasisWeight(5001, 'bond')).toThrow(/at most 5000 g\/m²/);
  });
});
