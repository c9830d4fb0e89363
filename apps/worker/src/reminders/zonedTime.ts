import { DateTime } from 'luxon';

/**
 * The instant at which a wall-clock hour happens on a calendar date in a time zone, `days`
 * calendar days from that date: 09:00 on 2026-12-18 in America/Chicago → 15:00Z. Luxon reads
 * the zone's offset at that wall-clock time, so the hour holds on the days clocks change; and
 * days are counted on the calendar, never as 24-hour steps across a change.
 */
export function zonedTime(date: string, hour: number, timeZone: string, days = 0): Date {
  const local = DateTime.fromISO(date, { zone: timeZone })
    .plus({ days })
    .set({ hour, minute: 0, second: 0, millisecond: 0 });
  if (!local.isValid) throw new Error(`No ${hour}:00 on ${date} in ${timeZone}: ${local.invalidExplanation}`);
  return local.toJSDate();
}
