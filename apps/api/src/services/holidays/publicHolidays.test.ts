import { describe, expect, it } from 'vitest';
import { publicHolidaysOf } from './publicHolidays';

const weekday = (date: string) => new Date(`${date}T12:00:00Z`).getUTCDay();
const on = (days: { date: string; name: string }[], date: string) => days.find((d) => d.date === date)?.name;

describe('publicHolidaysOf', () => {
  const us2027 = publicHolidaysOf({ country: 'US', region: null }, 2027);

  it('gives the US federal holidays of 2027, with the days they are observed', () => {
    // US federal holiday rules, 5 U.S.C. 6103(a): New Year's Day, Birthday of Martin Luther King Jr.
    // (third Monday in January), Washington's Birthday (third Monday in February), Memorial Day
    // (last Monday in May), Juneteenth (June 19), Independence Day (July 4), Labor Day (first
    // Monday in September), Columbus Day (second Monday in October), Veterans Day (November 11),
    // Thanksgiving Day (fourth Thursday in November), Christmas Day (December 25). Executive
    // Order 11582 and 5 U.S.C. 6103(b): one on a Sunday is observed the Monday after, one on a
    // Saturday the Friday before.
    expect(weekday('2027-07-04')).toBe(0); // a Sunday: observed on Monday 2027-07-05
    expect(weekday('2027-12-25')).toBe(6); // a Saturday: observed on Friday 2027-12-24
    expect(weekday('2028-01-01')).toBe(6); // a Saturday: observed on Friday 2027-12-31
    expect(weekday('2027-06-19')).toBe(6); // a Saturday: observed on Friday 2027-06-18
    for (const [date, name] of [
      ['2027-01-01', /New Year/],
      ['2027-01-18', /Martin Luther King/],
      ['2027-02-15', /Washington/],
      ['2027-05-31', /Memorial/],
      ['2027-06-18', /Juneteenth/],
      ['2027-07-05', /Independence Day/],
      ['2027-09-06', /Labor Day/],
      ['2027-10-11', /Columbus/],
      ['2027-11-11', /Veterans/],
      ['2027-11-25', /Thanksgiving/],
      ['2027-12-24', /Christmas/],
      ['2027-12-31', /New Year/],
    ] as const) {
      expect(on(us2027, date), date).toMatch(name);
    }
  });

  it('keeps the holiday itself beside the day it is observed on, one entry per date, in order', () => {
    expect(on(us2027, '2027-07-04')).toBe('Independence Day');
    const dates = us2027.map((d) => d.date);
    expect(new Set(dates).size).toBe(dates.length);
    expect([...dates].sort()).toEqual(dates);
    expect(dates.every((d) => d.startsWith('2027-'))).toBe(true);
  });

  it('gives public holidays only: no observances such as Valentine’s Day or Halloween', () => {
    // From memory: February 14 and October 31 are observances in the US, not days off.
    expect(on(us2027, '2027-02-14')).toBeUndefined();
    expect(on(us2027, '2027-10-31')).toBeUndefined();
  });

  it('adds a region’s own public holidays to the country’s', () => {
    // From memory: Illinois keeps Lincoln's Birthday (February 12) as a state holiday.
    const illinois = publicHolidaysOf({ country: 'US', region: 'IL' }, 2027);
    expect(on(illinois, '2027-02-12')).toMatch(/Lincoln/);
    expect(on(us2027, '2027-02-12')).toBeUndefined();
    expect(illinois.length).toBeGreaterThan(us2027.length);
  });

  it('follows the moving feasts: Easter Monday in Germany', () => {
    // Easter Sunday 2027 is March 28 (the Gregorian computus, e.g. Gauss's Easter algorithm).
    const germany = publicHolidaysOf({ country: 'DE', region: null }, 2027);
    expect(on(germany, '2027-03-29')).toBe('Easter Monday');
    expect(on(germany, '2027-03-26')).toBe('Good Friday');
    expect(on(germany, '2027-10-03')).toBeTruthy(); // German Unity Day, fixed by the Unification Treaty
  });

  it('gives each day of a holiday of several days, and says when a half day starts', () => {
    // From memory: Armenia keeps January 1 and 2 as New Year's holidays; in Iceland Christmas Eve
    // and New Year's Eve are holidays from 13:00.
    const armenia = publicHolidaysOf({ country: 'AM', region: null }, 2027);
    expect(on(armenia, '2027-01-01')).toMatch(/\(day 1 of 2\)$/);
    expect(on(armenia, '2027-01-02')).toMatch(/\(day 2 of 2\)$/);
    const iceland = publicHolidaysOf({ country: 'IS', region: null }, 2027);
    expect(on(iceland, '2027-12-24')).toMatch(/\(from 13:00\)$/);
    expect(on(iceland, '2027-12-25')).not.toMatch(/from/);
  });

  it('refuses an unknown country or region, naming the field', () => {
    expect(() => publicHolidaysOf({ country: 'ZZ', region: null }, 2027)).toThrow(
      expect.objectContaining({ status: 400, fields: { country: 'Choose a country from the list' } }),
    );
    expect(() => publicHolidaysOf({ country: 'US', region: 'ZZ' }, 2027)).toThrow(
      expect.objectContaining({ status: 400, fields: { region: expect.stringContaining('region') } }),
    );
  });
});
