/**
 * The instant at which a wall-clock time happens on a date in a time zone, e.g. 09:00 on
 * 2026-12-18 in America/Chicago → 2026-12-18T15:00:00Z. Uses the zone's offset on that day.
 */
export function zonedTime(date: string, hour: number, timeZone: string): Date {
  const guess = Date.parse(`${date}T${String(hour).padStart(2, '0')}:00:00Z`);
  const parts = Object.fromEntries(
    new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
    })
      .formatToParts(new Date(guess))
      .map((p) => [p.type, p.value]),
  );
  const shown = Date.parse(`${parts.year}-${parts.month}-${parts.day}T${parts.hour}:${parts.minute}:00Z`);
  return new Date(guess - (shown - guess));
}
