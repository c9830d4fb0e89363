import { holidayCalendar } from './holidayCalendar';

export interface PublicHoliday {
  /** The calendar date, 'YYYY-MM-DD', in the country's own reckoning. */
  date: string;
  name: string;
}

const DAY_MS = 86_400_000;
const nextDay = (date: string) => new Date(Date.parse(`${date}T00:00:00Z`) + DAY_MS).toISOString().slice(0, 10);

/**
 * The public holidays (type "public" only: not bank, school, optional days or observances) of a
 * country or region in a year, one per date in date order. A holiday of several days gives each
 * day ("Eid al-Fitr (day 2 of 3)"); one that starts in the afternoon says from when; two holidays
 * on one date share it ("A / B"). Only the year's dates are given, a holiday that began in the year
 * before included.
 */
export function publicHolidaysOf(place: { country: string; region: string | null }, year: number): PublicHoliday[] {
  const calendar = holidayCalendar(place.country, place.region);
  const byDate = new Map<string, string[]>();
  for (const holiday of [...calendar.getHolidays(year - 1), ...calendar.getHolidays(year)]) {
    if (holiday.type !== 'public') continue;
    // `date` is "YYYY-MM-DD hh:mm:ss" in the country's time, whatever the zone of `start`.
    const [first, time] = holiday.date.split(' ') as [string, string];
    const days = Math.max(1, Math.round((holiday.end.getTime() - holiday.start.getTime()) / DAY_MS));
    const from = time && time !== '00:00:00' ? ` (from ${time.slice(0, 5)})` : '';
    let date = first;
    for (let day = 1; day <= days; day++, date = nextDay(date)) {
      if (!date.startsWith(`${year}-`)) continue;
      const name = days > 1 ? `${holiday.name} (day ${day} of ${days})` : `${holiday.name}${from}`;
      byDate.set(date, [...(byDate.get(date) ?? []), name]);
    }
  }
  return [...byDate]
    .sort(([a], [b]) => (a < b ? -1 : 1))
    .map(([date, names]) => ({ date, name: [...new Set(names)].join(' / ') }));
}
