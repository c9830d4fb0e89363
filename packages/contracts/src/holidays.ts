import { z } from 'zod';
import { calendarDate, earliestDate, latestDate } from './dateFields';

/** Where a day off came from: a country's public holidays, loaded, or the shop's own closure. */
export const holidaySources = ['public', 'own'] as const;
export type HolidaySource = (typeof holidaySources)[number];

export const holidaySourceLabels: Record<HolidaySource, string> = {
  public: 'Public holiday',
  own: 'Shop closure',
};

const firstYear = Number(earliestDate.slice(0, 4));
const lastYear = Number(latestDate.slice(0, 4));
const yearRange = `Enter a year from ${firstYear} to ${lastYear}`;
const year = <N extends z.ZodNumber | z.ZodCoercedNumber>(number: N): N =>
  number.int('Enter a whole year').min(firstYear, yearRange).max(lastYear, yearRange) as N;

/** A country as ISO 3166-1 alpha-2 ("US"); whether the calendar knows it is the API's check. */
const Country = z
  .string({ error: 'Choose a country' })
  .trim()
  .toUpperCase()
  .regex(/^[A-Z]{2}$/, 'Choose a country from the list');

/** A region of a country by its code ("IL" for Illinois in the US); blank means the whole country. */
const Region = z
  .string({ error: 'Choose a region' })
  .trim()
  .toUpperCase()
  .max(10, 'Choose a region from the list')
  .regex(/^[A-Z0-9-]*$/, 'Choose a region from the list')
  .nullish()
  .transform((region) => region || null);

/** The year of the calendar to show; the shop's current year when left out. */
export const HolidayYearQuery = z.object({
  year: year(z.coerce.number({ error: 'Enter a year' })).optional(),
});
export type HolidayYearQuery = z.infer<typeof HolidayYearQuery>;

/** A day the shop closes on: a date and what it is called. */
export const HolidayCreate = z.object({
  date: calendarDate('Enter the date as YYYY-MM-DD'),
  name: z.string({ error: 'Enter a name' }).trim().min(1, 'Enter a name').max(120, 'A name has at most 120 characters'),
});
export type HolidayCreate = z.infer<typeof HolidayCreate>;

/** Load a year's public holidays of a country, or of one of its regions. */
export const PublicHolidaysLoad = z.object({
  country: Country,
  region: Region,
  year: year(z.number({ error: 'Enter a year' })),
});
export type PublicHolidaysLoad = z.input<typeof PublicHolidaysLoad>;

/** The regions of a country for the picker; the shop's own country when left out. */
export const HolidayRegionsQuery = z.object({ country: Country.optional() });

export interface HolidayDto {
  id: number;
  date: string;
  name: string;
  source: HolidaySource;
  /** The country and region a public holiday was loaded for; null for the shop's own closures. */
  country: string | null;
  region: string | null;
  /** The day has passed in the shop's time zone: it stays on the calendar as a record. */
  past: boolean;
}

export interface HolidayYearDto {
  year: number;
  /** Today in the shop's time zone. */
  today: string;
  /** The days the shop is closed in the year, in date order. */
  holidays: HolidayDto[];
  /** Public holidays of the year the shop removed: it works on them, and loading again leaves them off. */
  keptOpen: HolidayDto[];
  /** The country and region the shop last loaded public holidays for, to preselect the picker. */
  lastLoaded: { country: string; region: string | null } | null;
}

export interface PublicHolidaysLoadedDto {
  /** The days added to the calendar. */
  added: HolidayDto[];
  /** Public holidays of that year that were already on the calendar (or removed by the shop), left as they were. */
  alreadyThere: number;
}

export interface HolidayPlace {
  code: string;
  name: string;
}

export interface HolidayPlacesDto {
  /** Every country the public-holiday calendar knows, by name. */
  countries: HolidayPlace[];
  /** The country the regions are of. */
  country: string;
  /** Its regions, by name; empty when its public holidays are the same everywhere. */
  regions: HolidayPlace[];
}
