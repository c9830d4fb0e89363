import { afterEach, describe, expect, it } from 'vitest';
import {
  calendarDate,
  displayLocale,
  gutter,
  instant,
  length,
  lengthUnits,
  otherLength,
  otherSize,
  size,
} from './format';

afterEach(() => {
  lengthUnits.value = 'in';
  displayLocale.value = 'en-US';
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

describe('dates and numbers in the user’s locale', () => {
  // CLDR's English patterns, through Intl: month first in the US, day first in Britain.
  it('writes dates the US way by default and the British way when chosen', () => {
    expect(calendarDate('2026-12-18')).toBe('Fri, Dec 18, 2026');
    expect(instant('2026-12-18T15:00:00Z', 'America/Chicago')).toBe('Dec 18, 2026, 09:00 CST');
    displayLocale.value = 'en-GB';
    expect(calendarDate('2026-12-18')).toBe('Fri, 18 Dec 2026');
    expect(instant('2026-12-18T15:00:00Z', 'Europe/London')).toBe('18 Dec 2026, 15:00 GMT');
  });
});
