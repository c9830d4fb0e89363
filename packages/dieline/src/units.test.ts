import { describe, expect, it } from 'vitest';
import { inchesPerInsunit, inchesToMm, mmToInches } from './units';

describe('units', () => {
  // ISO 80000-3 / the international inch of 1959: 1 in = 25.4 mm exactly.
  it('converts inches and millimetres both ways', () => {
    expect(inchesToMm(1)).toBe(25.4);
    expect(inchesToMm(22)).toBeCloseTo(558.8, 10);
    expect(mmToInches(762)).toBeCloseTo(30, 12);
  });

  // DXF reference, header variable $INSUNITS: 1 inches, 2 feet, 4 millimetres, 5 centimetres, 6 metres.
  it('maps $INSUNITS codes to inches per drawing unit', () => {
    expect(inchesPerInsunit[1]).toBe(1);
    expect(inchesPerInsunit[2]).toBe(12);
    expect(254 * inchesPerInsunit[4]!).toBeCloseTo(10, 12);
    expect(2.54 * inchesPerInsunit[5]!).toBeCloseTo(1, 12);
    expect(0.0254 * inchesPerInsunit[6]!).toBeCloseTo(1, 12);
    expect(inchesPerInsunit[0]).toBeUndefined();
  });
});
