import { describe, expect, it } from 'vitest';
import { BidInput, calendarDate, DieRequestUpdate, instant, PriceHistoryQuery } from './index';

// PostgreSQL's date type has no year 0 ("date/time field value out of range"); the range taken is
// 1900-01-01 to 2200-12-31, at both ends inclusive.
describe('date fields', () => {
  it.each([
    ['1900-01-01', true],
    ['2200-12-31', true],
    ['2026-12-02', true],
    ['0000-01-01', false],
    ['1899-12-31', false],
    ['2201-01-01', false],
    ['9999-12-31', false],
  ])('calendarDate %s → %s', (date, ok) => {
    const result = calendarDate().safeParse(date);
    expect(result.success).toBe(ok);
    if (!ok) expect(result.error!.issues[0]!.message).toBe('Enter a date from 1900-01-01 to 2200-12-31');
  });

  it.each([
    ['1900-01-01T00:00:00Z', true],
    ['2200-12-31T23:59:59.999Z', true],
    ['0000-01-01T00:00:00Z', false],
    // The UTC instant decides: 1900-01-01 at 00:00 in UTC+14 is still 1899 in UTC.
    ['1900-01-01T00:00:00+14:00', false],
    ['2200-12-31T23:59:59-14:00', false],
  ])('instant %s → %s', (at, ok) => {
    expect(instant().safeParse(at).success).toBe(ok);
  });

  it.each(['a\u0000b', 'next Tuesday', '', '2026-13-45T99:00:00Z'])(
    'refuses %j as a format error, without throwing',
    (text) => {
      // zod 4 runs the range refinement even after the format check failed.
      const result = instant().safeParse(text);
      expect(result.success).toBe(false);
      expect(result.error!.issues[0]!.message).toBe('Enter a date and time');
    },
  );

  it('holds in every schema that takes a date', () => {
    expect(DieRequestUpdate.safeParse({ needByDate: '0000-01-01' }).success).toBe(false);
    expect(DieRequestUpdate.safeParse({ bidDeadline: '0000-01-01T00:00:00Z' }).success).toBe(false);
    expect(PriceHistoryQuery.safeParse({ from: '0000-01-01' }).success).toBe(false);
    expect(
      BidInput.safeParse({
        lines: [{ kind: 'die', amountCents: 1 }],
        currency: 'USD',
        leadDays: 5,
        validUntil: '9999-12-31',
      }).success,
    ).toBe(false);
  });
});
