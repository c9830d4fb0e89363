import { describe, expect, it } from 'vitest';
import { areaIn, formatLength, formatSize, inchesAndMm, inchesOf, lengthIn } from './lengthText';

// The international inch is exactly 25.4 mm (ISO 80000-3; the 1959 agreement), so these are exact.
describe('lengths for people', () => {
  it('shows inches to the asked digits and millimetres to one fewer', () => {
    expect(formatLength(26.79, { units: 'in' })).toBe('26.79 in');
    expect(formatLength(26.79, { units: 'mm' })).toBe('680.5 mm'); // 26.79 × 25.4 = 680.466
    expect(formatLength(0.937, { units: 'in' }, 3)).toBe('0.937 in');
    expect(formatLength(0.937, { units: 'mm' }, 3)).toBe('23.80 mm'); // 23.7998
  });

  it('groups digits as the locale does', () => {
    expect(formatLength(1000, { units: 'in', locale: 'en-US' }, 1)).toBe('1,000.0 in');
    expect(formatLength(1000, { units: 'mm', locale: 'en-GB' }, 1)).toBe('25,400 mm');
  });

  it('writes the unit once in a size and a dash for what is missing', () => {
    expect(formatSize(22, 30, { units: 'in' })).toBe('22.00 × 30.00 in');
    expect(formatSize(22, 30, { units: 'mm' })).toBe('558.8 × 762.0 mm');
    expect(formatSize(null, 30, { units: 'mm' })).toBe('—');
    expect(formatLength(undefined, { units: 'in' })).toBe('—');
    expect(formatLength(Number.NaN, { units: 'in' })).toBe('—');
  });

  it('converts typed millimetres to inches and back without drift', () => {
    expect(inchesOf(25.4, 'mm')).toBe(1);
    expect(inchesOf(3, 'in')).toBe(3);
    expect(lengthIn('mm', inchesOf(762, 'mm'))).toBeCloseTo(762, 10);
  });

  it('gives board area in square centimetres for metric readers (1 sq in = 6.4516 cm², exactly)', () => {
    expect(areaIn('mm', 1)).toBeCloseTo(6.4516, 12);
    expect(areaIn('in', 660)).toBe(660);
  });
});

describe('limits in messages', () => {
  it('names both units, the millimetres exact to a tenth (a hundredth under 0.1 in)', () => {
    expect(inchesAndMm(120)).toBe('120 in (3,048 mm)');
    expect(inchesAndMm(1)).toBe('1 in (25.4 mm)');
    expect(inchesAndMm(0.001)).toBe('0.001 in (0.03 mm)');
  });
});
