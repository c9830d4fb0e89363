import Holidays from 'date-holidays';
import { badRequest } from '../../lib/httpError';

/**
 * The public-holiday calendar (the date-holidays package) of a country, or of one of its regions,
 * naming holidays in English where its data has English names (US English for the US, and so on),
 * else in the country's own language. An unknown country or region is a 400 naming the field.
 */
export function holidayCalendar(country: string, region: string | null = null): Holidays {
  const calendar = new Holidays();
  // init() accepts any code without complaint, so the code is checked against the lists first.
  if (!Object.hasOwn(calendar.getCountries(), country)) {
    throw badRequest(`There is no public-holiday calendar for the country "${country}".`, {
      country: 'Choose a country from the list',
    });
  }
  if (region !== null && !Object.hasOwn(calendar.getStates(country) ?? {}, region)) {
    throw badRequest(`The country ${country} has no region "${region}" in the public-holiday calendar.`, {
      region: 'Choose a region of that country from the list, or none',
    });
  }
  calendar.init(country, region ?? undefined);
  const own = calendar.getLanguages();
  calendar.setLanguages([...own.filter((l) => l.startsWith('en-')), 'en', ...own]);
  return calendar;
}
