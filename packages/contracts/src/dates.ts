/**
 * An instant as people of an organisation read it: in its time zone, with the zone named,
 * e.g. "Dec 5, 2026, 14:30 CST". Dates are stored in UTC and shown this way.
 */
export function formatInZone(instant: Date, timeZone: string, locale = 'en-US'): string {
  return new Intl.DateTimeFormat(locale, {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
    timeZone,
    timeZoneName: 'short',
  }).format(instant);
}
