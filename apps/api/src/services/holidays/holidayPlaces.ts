import type { HolidayPlace, HolidayPlacesDto } from '@kerfmark/contracts';
import Holidays from 'date-holidays';
import { holidayCalendar } from './holidayCalendar';

const byName = (places: Record<string, string>): HolidayPlace[] =>
  Object.entries(places)
    .map(([code, name]) => ({ code, name }))
    .sort((a, b) => a.name.localeCompare(b.name, 'en'));

// The list of countries is the package's data and does not change while the API runs.
let countries: HolidayPlace[] | undefined;

/** The countries of the public-holiday calendar, and the regions of one of them, for the picker. */
export function holidayPlaces(country: string): HolidayPlacesDto {
  holidayCalendar(country);
  countries ??= byName(new Holidays().getCountries('en'));
  return { countries, country, regions: byName(new Holidays().getStates(country, 'en') ?? {}) };
}
