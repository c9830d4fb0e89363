import { z } from 'zod';

/**
 * The dates Kerfmark takes, in bodies, filters and imports. PostgreSQL refuses a year 0000
 * (ISO 8601's 1 BC; PostgreSQL counts 1 BC, 1 AD with no year 0), and no die is needed, priced
 * or run outside these years: a sane range that every column can store.
 */
export const earliestDate = '1900-01-01';
export const latestDate = '2200-12-31';
const outOfRange = `Enter a date from ${earliestDate} to ${latestDate}`;

/** A YYYY-MM-DD date string within the range (text order is date order at a fixed width). */
export const dateInRange = (date: string) => date >= earliestDate && date <= latestDate;

/** A calendar date, YYYY-MM-DD, from `earliestDate` to `latestDate`. */
export const calendarDate = (error = 'Enter a date as YYYY-MM-DD') =>
  z.iso.date({ error }).refine(dateInRange, { error: outOfRange });

/** Whether an instant's UTC date is in the range; text that is no instant is left to the format check. */
function instantInRange(text: string): boolean {
  const time = Date.parse(text);
  return !Number.isFinite(time) || dateInRange(new Date(time).toISOString().slice(0, 10));
}

/**
 * An instant with its offset, whose UTC date is from `earliestDate` to `latestDate`. zod 4 runs
 * a refinement even after the format check failed, so it must not assume a valid instant.
 */
export const instant = (error = 'Enter a date and time') =>
  z.iso.datetime({ offset: true, error }).refine(instantInRange, { error: outOfRange });
