import { DateTime } from 'luxon';

const WALL = "yyyy-MM-dd'T'HH:mm:ss";

/**
 * The wall-clock time an instant shows in a time zone, as YYYY-MM-DDTHH:mm:ss with no zone:
 * what a date picker holds when deadlines are picked in the organisation's zone, not the browser's.
 */
export function wallClockIn(instant: Date | string, timeZone: string): string {
  const at = typeof instant === 'string' ? DateTime.fromISO(instant) : DateTime.fromJSDate(instant);
  return at.setZone(timeZone).toFormat(WALL);
}

/**
 * The instant a wall-clock time (YYYY-MM-DDTHH:mm[:ss]) names in a time zone, at the zone's
 * offset at that time. A time the clocks skip moves forward by the skipped hour, as clocks do.
 */
export function instantOfWallClock(wallClock: string, timeZone: string): Date {
  const at = DateTime.fromISO(wallClock, { zone: timeZone });
  if (!at.isValid) throw new Error(`No ${wallClock} in ${timeZone}: ${at.invalidExplanation}`);
  return at.toJSDate();
}
