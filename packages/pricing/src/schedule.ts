// Dates for planning a die: working days, the die-cutting run, and whether a need-by date holds.
// Dates are plain 'YYYY-MM-DD' strings (a need-by date is a date, not an instant).

const DAY_MS = 86_400_000;

function toUtc(date: string): number {
  const ms = Date.parse(`${date}T00:00:00Z`);
  if (!/^\d{4}-\d{2}-\d{2}$/.test(date) || Number.isNaN(ms)) throw new RangeError(`Not a date: ${date}`);
  return ms;
}

const fromUtc = (ms: number) => new Date(ms).toISOString().slice(0, 10);
/** Day of the week of a UTC midnight, 0 Sunday to 6 Saturday (1970-01-01 was a Thursday). */
const weekday = (ms: number) => (Math.floor(ms / DAY_MS) + 4) % 7;
const isWeekend = (ms: number) => {
  const d = weekday(ms);
  return d === 0 || d === 6;
};

/**
 * Monday-to-Friday days after `a` up to and including `b` (UTC midnights, a <= b): five for every
 * whole week, then the few days left one by one. Constant time, where a comparison of many bids
 * over months of dates would otherwise step through every day.
 */
function weekdaysAfter(a: number, b: number): number {
  const days = Math.round((b - a) / DAY_MS);
  let count = Math.floor(days / 7) * 5;
  for (let i = 1, d = weekday(a); i <= days % 7; i++) if ((d + i) % 7 !== 0 && (d + i) % 7 !== 6) count++;
  return count;
}

/** Holidays on a weekday after `a` up to and including `b`; a holiday that is not a date never counts. */
function holidaysAfter(a: number, b: number, holidays: ReadonlySet<string>): number {
  let count = 0;
  for (const holiday of holidays) {
    const ms = Date.parse(`${holiday}T00:00:00Z`);
    if (ms > a && ms <= b && !isWeekend(ms)) count++;
  }
  return count;
}

export function isWorkingDay(date: string, holidays: ReadonlySet<string> = new Set()): boolean {
  return !isWeekend(toUtc(date)) && !holidays.has(date);
}

/** The date `days` working days after `start` (Saturdays, Sundays and the holidays skipped). */
export function addWorkingDays(start: string, days: number, holidays: ReadonlySet<string> = new Set()): string {
  let ms = toUtc(start);
  const step = days >= 0 ? DAY_MS : -DAY_MS;
  let left = Math.abs(days);
  while (left > 0) {
    ms += step;
    if (!isWeekend(ms) && (holidays.size === 0 || !holidays.has(fromUtc(ms)))) left--;
  }
  return fromUtc(ms);
}

/** `date` itself if it is a working day, else the working day before it. */
export function lastWorkingDayOnOrBefore(date: string, holidays: ReadonlySet<string> = new Set()): string {
  return isWorkingDay(date, holidays) ? date : addWorkingDays(date, -1, holidays);
}

/** Working days from `from` to `to`, counting `to` but not `from`; negative when `to` is earlier. */
export function workingDaysBetween(from: string, to: string, holidays: ReadonlySet<string> = new Set()): number {
  const a = toUtc(from);
  const b = toUtc(to);
  // Going back, the days counted are `to` up to the day before `from`.
  const [after, upTo, sign] = b >= a ? [a, b, 1] : [b - DAY_MS, a - DAY_MS, -1];
  return sign * (weekdaysAfter(after, upTo) - holidaysAfter(after, upTo, holidays)) || 0;
}

/** Hours to run `sheets` on a press at `sheetsPerHour` (its typical speed). */
export function runHours(sheets: number, sheetsPerHour: number): number {
  if (!(sheets >= 0) || !(sheetsPerHour > 0)) throw new RangeError('Sheets must be 0 or more and the speed above 0');
  return sheets / sheetsPerHour;
}

export interface NeedByCheck {
  /** When the die can be here at the earliest: today plus the die's lead time in working days. */
  dieReadyBy: string;
  /** Working days the die-cutting run takes, in shifts of `hoursPerDay`, rounded up. */
  runDays: number;
  /** The last date the die can arrive for the run to finish by the need-by date. */
  latestArrival: string;
  /** Working days to spare (negative: late by that many). */
  slackDays: number;
  ok: boolean;
}

/**
 * Does the need-by date leave time for the die maker's lead time plus the die-cutting run?
 * The run starts the working day after the die arrives and uses whole shifts.
 */
export function checkNeedBy(opts: {
  today: string;
  needByDate: string;
  leadDays: number;
  runHours: number;
  hoursPerDay?: number;
  holidays?: ReadonlySet<string>;
}): NeedByCheck {
  const dieReadyBy = addWorkingDays(opts.today, opts.leadDays, opts.holidays ?? new Set<string>());
  return checkArrival({ ...opts, dieReadyBy });
}

/** The same check when the die's date is already known (a bid's or an award's promised ship date). */
export function checkArrival(opts: {
  needByDate: string;
  dieReadyBy: string;
  runHours: number;
  hoursPerDay?: number;
  holidays?: ReadonlySet<string>;
}): NeedByCheck {
  const holidays = opts.holidays ?? new Set<string>();
  const runDays = Math.ceil(opts.runHours / (opts.hoursPerDay ?? 8));
  // The run needs working days: a need-by date on a weekend or holiday ends it the working day before.
  const latestArrival = addWorkingDays(lastWorkingDayOnOrBefore(opts.needByDate, holidays), -runDays, holidays);
  const slackDays = workingDaysBetween(opts.dieReadyBy, latestArrival, holidays);
  return { dieReadyBy: opts.dieReadyBy, runDays, latestArrival, slackDays, ok: slackDays >= 0 };
}
