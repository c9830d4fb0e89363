import { instantOfWallClock } from '@kerfmark/contracts';

const DAY = 86_400_000;

/**
 * The instant at which a wall-clock hour happens on a calendar date in a time zone, `days`
 * calendar days from that date: 09:00 on 2026-12-18 in America/Chicago → 15:00Z. The days are
 * counted on the calendar (as UTC dates, which have no clock changes), never as 24-hour steps
 * across a change; the hour is placed at the zone's offset at that time.
 */
export function zonedTime(date: string, hour: number, timeZone: string, days = 0): Date {
  const day = new Date(Date.parse(`${date}T00:00:00Z`) + days * DAY).toISOString().slice(0, 10);
  return instantOfWallClock(`${day}T${String(hour).padStart(2, '0')}:00`, timeZone);
}
