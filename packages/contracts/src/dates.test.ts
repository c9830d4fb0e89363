import { describe, expect, it } from 'vitest';
import { formatCalendarDate, formatInZone } from './dates';

describe('formatInZone', () => {
  // IANA tz database: America/Chicago is UTC−6 (CST) in December, UTC−5 (CDT) in July.
  it('shows a UTC instant in the organisation’s zone', () => {
    expect(formatInZone(new Date('2026-12-05T20:30:00Z'), 'America/Chicago')).toBe('Dec 5, 2026, 14:30 CST');
    expect(formatInZone(new Date('2026-07-05T20:30:00Z'), 'America/Chicago')).toBe('Jul 5, 2026, 15:30 CDT');
  });

  it('crosses the date line when the zone does', () => {
    expect(formatInZone(new Date('2026-12-05T23:30:00Z'), 'Asia/Tokyo')).toMatch(/^Dec 6, 2026, 08:30/);
  });
});

describe('formatCalendarDate', () => {
  // Gregorian calendar: 8 December 2026 is a Tuesday; a date is shown as written, in any zone.
  it('names the weekday and never shifts the day', () => {
    expect(formatCalendarDate('2026-12-08')).toBe('Tue, Dec 8, 2026');
    expect(formatCalendarDate('2027-01-01')).toBe('Fri, Jan 1, 2027');
  });
});
