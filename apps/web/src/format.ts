import {
  formatCalendarDate,
  formatInZone,
  requestStatusLabels,
  type DisplayLocale,
  type LengthUnits,
  type RequestStatus,
} from '@kerfmark/contracts';
import { inchesToMm } from '@kerfmark/dieline';
import { ref } from 'vue';

/** The signed-in user's length units (the auth store sets it from /me); lengths arrive in inches. */
export const lengthUnits = ref<LengthUnits>('in');
/** The signed-in user's locale for dates and numbers (the auth store sets it from /me). */
export const displayLocale = ref<DisplayLocale>('en-US');

/** Small display helpers shared by the views. Lengths arrive in inches. */
export const inches = (value: number | null | undefined, digits = 2) =>
  value === null || value === undefined
    ? '—'
    : `${value.toLocaleString(displayLocale.value, { maximumFractionDigits: digits, minimumFractionDigits: digits })} in`;

export const millimetres = (inchValue: number | null | undefined, digits = 0) =>
  inchValue === null || inchValue === undefined
    ? '—'
    : `${inchesToMm(inchValue).toLocaleString(displayLocale.value, { maximumFractionDigits: digits, minimumFractionDigits: digits })} mm`;

/** A length in the given units: inches to `digits` places, millimetres to one fewer (0.01 in ≈ 0.25 mm). */
const inUnits = (units: LengthUnits, inchValue: number | null | undefined, digits: number) =>
  units === 'mm' ? millimetres(inchValue, Math.max(0, digits - 1)) : inches(inchValue, digits);
const otherUnits = (): LengthUnits => (lengthUnits.value === 'mm' ? 'in' : 'mm');
const sizeIn = (units: LengthUnits, w: number | null | undefined, h: number | null | undefined, digits: number) =>
  w && h ? `${inUnits(units, w, digits).replace(` ${units}`, '')} × ${inUnits(units, h, digits)}` : '—';

/** A length in the user's units: "26.79 in" or "680.4 mm". */
export const length = (inchValue: number | null | undefined, digits = 2) =>
  inUnits(lengthUnits.value, inchValue, digits);

/** The same length in the other unit, for beside it: "680.4 mm" or "26.79 in". */
export const otherLength = (inchValue: number | null | undefined, digits = 2) =>
  inUnits(otherUnits(), inchValue, digits);

/** A width × height in the user's units: "22.00 × 30.00 in" or "558.8 × 762.0 mm". */
export const size = (w: number | null | undefined, h: number | null | undefined, digits = 2) =>
  sizeIn(lengthUnits.value, w, h, digits);

/** The same size in the other unit. */
export const otherSize = (w: number | null | undefined, h: number | null | undefined, digits = 2) =>
  sizeIn(otherUnits(), w, h, digits);

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

/** Caliper is given in points (thousandths of an inch) in North America. */
export const caliper = (inchValue: number | null | undefined) =>
  inchValue ? `${Math.round(inchValue * 1000 * 10) / 10} pt (${inchesToMm(inchValue).toFixed(2)} mm)` : '—';

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
