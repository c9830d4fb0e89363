import {
  formatCalendarDate,
  formatInZone,
  requestStatusLabels,
  type DisplayLocale,
  type LengthUnits,
  type RequestStatus,
} from '@kerfmark/contracts';
import { formatLength, formatSize, inchesOf, inchesToMm } from '@kerfmark/dieline';
import { ref } from 'vue';

/** The signed-in user's length units (the auth store sets it from /me); lengths arrive in inches. */
export const lengthUnits = ref<LengthUnits>('in');
/** The signed-in user's locale for dates and numbers (the auth store sets it from /me). */
export const displayLocale = ref<DisplayLocale>('en-US');

/** The signed-in user's way of reading lengths, for the shared formatters. */
const style = (units: LengthUnits = lengthUnits.value) => ({ units, locale: displayLocale.value });
const otherUnits = (): LengthUnits => (lengthUnits.value === 'mm' ? 'in' : 'mm');

/** Small display helpers shared by the views. Lengths arrive in inches. */
export const inches = (value: number | null | undefined, digits = 2) => formatLength(value, style('in'), digits);

/** Millimetres to `digits` places (not one fewer, as `length` does). */
export const millimetres = (inchValue: number | null | undefined, digits = 0) =>
  formatLength(inchValue, style('mm'), digits + 1);

/** A length in the user's units: "26.79 in" or "680.4 mm". */
export const length = (inchValue: number | null | undefined, digits = 2) => formatLength(inchValue, style(), digits);

/** The same length in the other unit, for beside it: "680.4 mm" or "26.79 in". */
export const otherLength = (inchValue: number | null | undefined, digits = 2) =>
  formatLength(inchValue, style(otherUnits()), digits);

/** A width × height in the user's units: "22.00 × 30.00 in" or "558.8 × 762.0 mm". */
export const size = (w: number | null | undefined, h: number | null | undefined, digits = 2) =>
  formatSize(w, h, style(), digits);

/** The same size in the other unit. */
export const otherSize = (w: number | null | undefined, h: number | null | undefined, digits = 2) =>
  formatSize(w, h, style(otherUnits()), digits);

/** A length in the user's units with the other beside: "0.937 in (23.80 mm)". */
export const bothLengths = (inchValue: number, digits = 2) =>
  `${length(inchValue, digits)} (${otherLength(inchValue, digits)})`;

/** A size in the user's units with the other beside: "22.00 × 30.00 in (558.8 × 762.0 mm)". */
export const bothSizes = (w: number, h: number, digits = 2) => `${size(w, h, digits)} (${otherSize(w, h, digits)})`;

/** What a price of rule is quoted per: an inch, or a metre for metric readers. */
export const perLengthName = () => (lengthUnits.value === 'mm' ? 'metre' : 'inch');

/** A price per inch as a price per `perLengthName()`: per metre is per inch × 1000 / 25.4. */
export const perLengthCents = (centsPerInch: number) =>
  lengthUnits.value === 'mm' ? centsPerInch * inchesOf(1000, 'mm') : centsPerInch;

/**
 * The date pickers' formats in the user's locale: the first is how a date is shown, and any of
 * them may be typed (dayjs cannot read a weekday back, so each has a form without it).
 */
export const pickerFormats = (withTime: boolean): string[] => {
  const time = withTime ? ' HH:mm' : '';
  const shown = displayLocale.value === 'en-GB' ? ['ddd D MMM YYYY', 'D MMM YYYY'] : ['ddd MMM D, YYYY', 'MMM D, YYYY'];
  return [...shown, 'YYYY-MM-DD'].map((f) => `${f}${time}`);
};

/** A distance in miles, in kilometres for metric readers (1 mi = 1.609344 km exactly): "12 mi", "19 km". */
export const distanceText = (miles: number) =>
  lengthUnits.value === 'mm'
    ? `${Math.round(miles * 1.609344).toLocaleString(displayLocale.value)} km`
    : `${Math.round(miles).toLocaleString(displayLocale.value)} mi`;

/** A calendar date (YYYY-MM-DD) for people: "Fri, Dec 18, 2026". */
export const calendarDate = (date: string | null | undefined) =>
  date ? formatCalendarDate(date, displayLocale.value) : '—';

export const instant = (iso: string | null | undefined, timeZone: string) =>
  iso ? formatInZone(new Date(iso), timeZone, displayLocale.value) : '—';

export const statusColor: Record<RequestStatus, string> = {
  draft: 'default',
  open: 'blue',
  bidding_closed: 'purple',
  awarded: 'cyan',
  in_production: 'gold',
  shipped: 'orange',
  received: 'green',
  cancelled: 'red',
};
export const statusLabel = (status: RequestStatus) => requestStatusLabels[status];

export const bytes = (n: number) =>
  n < 1024 ? `${n} B` : n < 1048576 ? `${(n / 1024).toFixed(0)} KB` : `${(n / 1048576).toFixed(1)} MB`;

/** A caliper in points (thousandths of an inch, as North America sells board) and millimetres, the user’s unit first. */
export const caliper = (inchValue: number | null | undefined) => {
  if (!inchValue) return '—';
  const points = `${Math.round(inchValue * 1000 * 10) / 10} pt`;
  const mm = `${inchesToMm(inchValue).toLocaleString(displayLocale.value, { minimumFractionDigits: 2, maximumFractionDigits: 2 })} mm`;
  return lengthUnits.value === 'mm' ? `${mm} (${points})` : `${points} (${mm})`;
};

/** A gutter as typed: "0 in", "0.125 in". */
export const gutter = (value: number) =>
  lengthUnits.value === 'mm'
    ? `${inchesToMm(value).toLocaleString(displayLocale.value, { maximumFractionDigits: 2 })} mm`
    : `${value.toLocaleString(displayLocale.value, { maximumFractionDigits: 4 })} in`;

/** What the dieline file shows: "Whole die", or "One up, laid out 3 across × 4 along, gutter 0 in". */
export function dielineLayout(r: {
  dielineShows: 'whole-die' | 'one-up';
  upsAcross: number | null;
  upsAlong: number | null;
  gutterIn: number | null;
}): string {
  if (r.dielineShows !== 'one-up') return 'Whole die';
  return `One up, laid out ${r.upsAcross ?? '?'} across × ${r.upsAlong ?? '?'} along, gutter ${gutter(r.gutterIn ?? 0)}`;
}
