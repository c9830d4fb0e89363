import { describe, expect, it } from 'vitest';
import { convertCaliper, MM_PER_INCH } from './caliper';

describe('convertCaliper', () => {
  it('takes the board caliper point as a thousandth of an inch', () => {
    // Common practice (North American board caliper): 24 pt board is 0.024 in thick.
    expect(convertCaliper(24, 'pt', 'in')).toBeCloseTo(0.024, 12);
    expect(convertCaliper(0.024, 'in', 'pt')).toBeCloseTo(24, 9);
  });

  it('converts inches and millimetres by the international inch', () => {
    // The international inch (1959; ISO 80000-3): 1 in = 25.4 mm exactly.
    expect(MM_PER_INCH).toBe(25.4);
    expect(convertCaliper(0.5, 'in', 'mm')).toBe(12.7);
    // Arithmetic: 24 pt = 0.024 in × 25.4 = 0.6096 mm = 609.6 µm.
    expect(convertCaliper(24, 'pt', 'mm')).toBeCloseTo(0.6096, 12);
    expect(convertCaliper(24, 'pt', 'um')).toBeCloseTo(609.6, 9);
    // Arithmetic: 0.50 mm / 25.4 = 0.019685… in = 19.685… pt.
    expect(convertCaliper(0.5, 'mm', 'in')).toBeCloseTo(0.5 / 25.4, 12);
    expect(convertCaliper(0.5, 'mm', 'pt')).toBeCloseTo(19.685, 3);
    expect(convertCaliper(500, 'um', 'mm')).toBeCloseTo(0.5, 12);
  });

  it('round-trips through every unit', () => {
    const inches = 0.0185;
    const mm = convertCaliper(inches, 'in', 'mm');
    const um = convertCaliper(mm, 'mm', 'um');
    const pt = convertCaliper(um, 'um', 'pt');
    expect(convertCaliper(pt, 'pt', 'in')).toBeCloseTo(inches, 12);
    expect(convertCaliper(0.3, 'mm', 'mm')).toBe(0.3);
  });

  it('refuses a caliper that is not positive, not a number or absurd, and unknown units', () => {
    expect(() => convertCaliper(0, 'pt', 'in')).toThrow(RangeError);
    expect(() => convertCaliper(-1, 'mm', 'in')).toThrow(/caliper must be more than 0/);
    expect(() => convertCaliper(Number.NaN, 'in', 'mm')).toThrow(/caliper must be a number/);
    // The limit is half an inch in every unit: 500 pt, 12.7 mm.
    expect(convertCaliper(500, 'pt', 'in')).toBeCloseTo(0.5, 12);
    expect(() => convertCaliper(501, 'pt', 'in')).toThrow(/at most 500 pt/);
    expect(() => convertCaliper(12.71, 'mm', 'in')).toThrow(/at most 12.7 mm/);
    expect(() => convertCaliper(1, 'cm' as 'mm', 'in')).toThrow(/from must be one of/);
    expect(() => convertCaliper(1, 'in', 'toString' as 'mm')).toThrow(/to must be one of/);
  });
});
