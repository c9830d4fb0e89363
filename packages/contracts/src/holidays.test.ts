import { describe, expect, it } from 'vitest';
import { HolidayCreate, HolidayRegionsQuery, HolidayYearQuery, PublicHolidaysLoad } from './index';

describe('holiday inputs', () => {
  // The Gregorian calendar (ISO 8601): February has 29 days in a year divisible by 4, except
  // centuries not divisible by 400; April, June, September and November have 30.
  it.each([
    ['2028-02-29', true],
    ['2027-02-29', false],
    ['2000-02-29', true],
    ['2100-02-29', false],
    ['2027-04-31', false],
    ['2027-12-31', true],
    ['2027-13-01', false],
    ['27-07-05', false],
  ])('a closure on %s is a real calendar date: %s', (date, ok) => {
    const result = HolidayCreate.safeParse({ date, name: 'Stocktaking day' });
    expect(result.success).toBe(ok);
    if (!ok) expect(result.error!.issues[0]!.path).toEqual(['date']);
  });

  it('names a closure, trimmed, and refuses a blank name', () => {
    expect(HolidayCreate.parse({ date: '2027-03-12', name: '  Stocktaking day ' }).name).toBe('Stocktaking day');
    const blank = HolidayCreate.safeParse({ date: '2027-03-12', name: '   ' });
    expect(blank.error!.issues[0]!.message).toBe('Enter a name');
  });

  it('takes a country code in either case and a blank region as the whole country', () => {
    expect(PublicHolidaysLoad.parse({ country: 'us', region: ' il ', year: 2027 })).toEqual({
      country: 'US',
      region: 'IL',
      year: 2027,
    });
    expect(PublicHolidaysLoad.parse({ country: 'US', region: '', year: 2027 }).region).toBeNull();
    expect(PublicHolidaysLoad.parse({ country: 'US', year: 2027 }).region).toBeNull();
  });

  it.each([
    [{ country: 'USA', year: 2027 }, 'country'],
    [{ country: 'US', region: 'IL; drop', year: 2027 }, 'region'],
    [{ country: 'US', year: 2027.5 }, 'year'],
    [{ country: 'US', year: 1899 }, 'year'],
    [{ country: 'US', year: '2027' }, 'year'],
  ])('refuses %j naming %s', (input, field) => {
    const result = PublicHolidaysLoad.safeParse(input);
    expect(result.error!.issues.map((i) => i.path[0])).toEqual([field]);
  });

  it('reads the year and the country from a query string', () => {
    expect(HolidayYearQuery.parse({ year: '2027' })).toEqual({ year: 2027 });
    expect(HolidayYearQuery.parse({})).toEqual({});
    expect(HolidayYearQuery.safeParse({ year: 'next' }).success).toBe(false);
    expect(HolidayYearQuery.safeParse({ year: ['2027', '2028'] }).success).toBe(false);
    expect(HolidayRegionsQuery.parse({ country: 'de' })).toEqual({ country: 'DE' });
  });
});
