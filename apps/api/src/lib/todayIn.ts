// Intl formatters are costly to build; one per time zone serves every request.
const formatters = new Map<string, Intl.DateTimeFormat>();

/** The calendar date (YYYY-MM-DD) in a time zone, now or at a given instant. */
export function todayIn(timeZone: string, at: Date = new Date()): string {
  let format = formatters.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' });
    formatters.set(timeZone, format);
  }
  return format.format(at);
}
