/**
 * An instant as people of an organisation read it: in its time zone, with the zone named,
 * e.g. "Dec 5, 2026, 14:30 CST". Dates are stored in UTC and shown this way.
 */
// Building an Intl formatter costs far more than using one: keep one per zone and locale.
const zoneFormats = new Map<string, Intl.DateTimeFormat>();

export function formatInZone(instant: Date, timeZone: string, locale = 'en-US'): string {
  const key = `${locale}|${timeZone}`;
  const cached = zoneFormats.get(key);
  if (cached) return cached.format(instant);
  const format = new Intl.DateTimeFormat(locale, {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
    timeZone,
    timeZoneName: 'short',
  });
  zoneFormats.set(key, format);
  return format.format(instant);
}

/** A calendar date (YYYY-MM-DD) for people: "Tue, Dec 8, 2026". A date has no zone to convert. */
export function formatCalendarDate(date: string, locale = 'en-US'): string {
  return new Intl.DateTimeFormat(locale, {
    weekday: 'short',
    month: 'short',
    day: 'numeric',
    year: 'numeric',
    timeZone: 'UTC',
  }).format(new Date(`${date}T00:00:00Z`));
}
