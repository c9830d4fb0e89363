import { describe, expect, it } from 'vitest';
import { holidayCalendar } from './holidayCalendar';

const names = (country: string, year: number) =>
  holidayCalendar(country)
    .getHolidays(year)
    .filter((h) => h.type === 'public')
    .map((h) => h.name);

describe('holidayCalendar', () => {
  it('names holidays in the English of the country where the data has it, else in English', () => {
    // From memory: "Labor Day" is the US spelling; Germany's "Ostermontag" is Easter Monday.
    expect(names('US', 2027)).toContain('Labor Day');
    expect(names('DE', 2027)).toContain('Easter Monday');
  });

  it('refuses a country or a region the calendar does not know, naming the field', () => {
    expect(() => holidayCalendar('XX')).toThrow(expect.objectContaining({ status: 400, fields: expect.any(Object) }));
    expect(() => holidayCalendar('US', 'BY')).toThrow(
      expect.objectContaining({ fields: expect.objectContaining({ region: expect.any(String) }) }),
    );
    // Bavaria is a region of Germany, not of the US.
    expect(() => holidayCalendar('DE', 'BY')).not.toThrow();
  });
});
