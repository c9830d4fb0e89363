import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addWorkingDays, checkArrival, checkNeedBy, isWorkingDay, runHours, workingDaysBetween } from './schedule';

// Weekdays of the dates below are from the Gregorian calendar (ISO 8601): 2026-12-04 is a
// Friday, 2026-12-07 a Monday, 2026-12-25 a Friday.
describe('working days', () => {
  it('skips weekends', () => {
    expect(isWorkingDay('2026-12-04')).toBe(true);
    expect(isWorkingDay('2026-12-05')).toBe(false);
    expect(addWorkingDays('2026-12-04', 1)).toBe('2026-12-07');
    expect(addWorkingDays('2026-12-07', 5)).toBe('2026-12-14');
    expect(addWorkingDays('2026-12-07', -1)).toBe('2026-12-04');
    expect(addWorkingDays('2026-12-07', 0)).toBe('2026-12-07');
  });

  it('skips a shop’s holidays', () => {
    const holidays = new Set(['2026-12-25']);
    expect(addWorkingDays('2026-12-24', 1, holidays)).toBe('2026-12-28');
    expect(workingDaysBetween('2026-12-21', '2026-12-28', holidays)).toBe(4);
  });

  it('counts between two dates, signed', () => {
    expect(workingDaysBetween('2026-12-04', '2026-12-07')).toBe(1);
    expect(workingDaysBetween('2026-12-07', '2026-12-04')).toBe(-1);
    expect(workingDaysBetween('2026-12-07', '2026-12-07')).toBe(0);
  });

  // Gregorian calendar: 2027 is a common year of 365 days that begins on a Friday, so it has
  // 52 whole weeks (260 weekdays) and one day over, Friday 31 December: 261 weekdays.
  it('counts a whole year in one step', () => {
    expect(workingDaysBetween('2026-12-31', '2027-12-31')).toBe(261);
    expect(workingDaysBetween('2027-12-31', '2026-12-31')).toBe(-261);
    // 1 January 2027 and 25 December 2027 (a Saturday: no working day lost) as holidays.
    expect(workingDaysBetween('2026-12-31', '2027-12-31', new Set(['2027-01-01', '2027-12-25', 'not a date']))).toBe(
      260,
    );
  });

  it('counts back exactly what adding working days stepped over, day by day', () => {
    const day = fc
      .integer({ min: 0, max: 3000 })
      .map((n) => new Date(Date.UTC(2025, 0, 1) + n * 86_400_000).toISOString().slice(0, 10));
    fc.assert(
      fc.property(
        day,
        fc.integer({ min: -400, max: 400 }),
        fc.uniqueArray(day, { maxLength: 12 }),
        (start, n, holidays) => {
          const set = new Set(holidays);
          expect(workingDaysBetween(start, addWorkingDays(start, n, set), set)).toBe(n);
        },
      ),
      { seed: 2026, numRuns: 500 },
    );
  });

  it('refuses what is not a date', () => {
    expect(() => addWorkingDays('2026-13-01', 1)).toThrow(RangeError);
    expect(() => addWorkingDays('tomorrow', 1)).toThrow(RangeError);
  });
});

describe('die-cutting run and need-by date', () => {
  // Common practice: a run of 10,000 sheets at 5,000 sheets an hour takes 2 hours.
  it('times the run from the press’s typical speed', () => {
    expect(runHours(10_000, 5_000)).toBe(2);
    expect(() => runHours(10, 0)).toThrow(RangeError);
  });

  it('finds the latest arrival and the slack', () => {
    // Today Mon 7 Dec, lead 5 working days → die ready Mon 14 Dec. A 20-hour run is 3 shifts
    // of 8 hours; need-by Fri 18 Dec → latest arrival 3 working days before: Tue 15 Dec.
    const check = checkNeedBy({ today: '2026-12-07', needByDate: '2026-12-18', leadDays: 5, runHours: 20 });
    expect(check).toEqual({
      dieReadyBy: '2026-12-14',
      runDays: 3,
      latestArrival: '2026-12-15',
      slackDays: 1,
      ok: true,
    });
  });

  it('flags a need-by date that is too close', () => {
    const check = checkNeedBy({ today: '2026-12-07', needByDate: '2026-12-11', leadDays: 5, runHours: 2 });
    // Ready Mon 14 Dec, but the die must arrive by Thu 10 Dec: 2 working days late.
    expect(check.latestArrival).toBe('2026-12-10');
    expect(check.slackDays).toBe(-2);
    expect(check.ok).toBe(false);
  });
});

describe('checkArrival', () => {
  it('judges a known ship date against the need-by date and the run', () => {
    // Ships Wed 16 Dec; a 16-hour run is 2 shifts; need-by Fri 18 Dec → latest arrival Wed 16 Dec.
    expect(checkArrival({ needByDate: '2026-12-18', dieReadyBy: '2026-12-16', runHours: 16 })).toMatchObject({
      latestArrival: '2026-12-16',
      slackDays: 0,
      ok: true,
    });
    expect(checkArrival({ needByDate: '2026-12-18', dieReadyBy: '2026-12-17', runHours: 16 })).toMatchObject({
      slackDays: -1,
      ok: false,
    });
  });

  // Common practice: presses run on working days, so a run due on a Saturday (or a holiday) has to
  // finish the working day before; the run starts the working day after the die arrives.
  it('ends the run on the last working day on or before a weekend or holiday need-by date', () => {
    // Need-by Sat 5 Dec, one 8-hour shift: the run is Fri 4 Dec, so the die must arrive Thu 3 Dec.
    expect(checkArrival({ needByDate: '2026-12-05', dieReadyBy: '2026-12-04', runHours: 8 })).toMatchObject({
      latestArrival: '2026-12-03',
      slackDays: -1,
      ok: false,
    });
    // Need-by Fri 25 Dec, a holiday: the run is Thu 24 Dec, the die due Wed 23 Dec.
    const holidays = new Set(['2026-12-25']);
    expect(checkArrival({ needByDate: '2026-12-25', dieReadyBy: '2026-12-23', runHours: 8, holidays })).toMatchObject({
      latestArrival: '2026-12-23',
      slackDays: 0,
    });
  });
});
