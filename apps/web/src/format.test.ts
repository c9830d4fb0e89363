import { afterEach, describe, expect, it } from 'vitest';
import { gutter, length, lengthUnits, otherLength, otherSize, size } from './format';

afterEach(() => {
  lengthUnits.value = 'in';
});

describe('lengths in the user’s units', () => {
  // 1 in = 25.4 mm exactly (the international inch of 1959).
  it('shows inches by default, millimetres beside', () => {
    expect(length(26.786, 2)).toBe('26.79 in');
    expect(otherLength(26.786, 2)).toBe('680.4 mm');
    expect(size(22, 30)).toBe('22.00 × 30.00 in');
    expect(gutter(0.125)).toBe('0.125 in');
  });

  it('shows millimetres when the user chooses them, inches beside', () => {
    lengthUnits.value = 'mm';
    expect(length(26.786, 2)).toBe('680.4 mm');
    expect(otherLength(26.786, 2)).toBe('26.79 in');
    expect(size(22, 30)).toBe('558.8 × 762.0 mm');
    expect(otherSize(22, 30)).toBe('22.00 × 30.00 in');
    expect(gutter(0.125)).toBe('3.18 mm');
  });
});
