// Payment terms and due dates of invoices. Dates are plain 'YYYY-MM-DD' strings, as in schedule.ts:
// an invoice date and a due date are dates, not instants.

const DAY_MS = 86_400_000;

function dayNumber(date: string): number {
  const ms = Date.parse(`${date}T00:00:00Z`);
  if (!/^\d{4}-\d{2}-\d{2}$/.test(date) || Number.isNaN(ms) || new Date(ms).toISOString().slice(0, 10) !== date)
    throw new RangeError(`Not a date: ${date}`);
  return ms / DAY_MS;
}

const dateOf = (day: number) => new Date(day * DAY_MS).toISOString().slice(0, 10);

/** Longest net period the terms may give: a year, well past any terms in use. */
export const MAX_NET_DAYS = 365;

/**
 * The net days of payment terms as people write them, or null when the text names none.
 * "Net 30", "net 45 days", "30 days net", "2/10 Net 30" (a discount for paying in 10 days, the
 * whole sum due in 30: the net period is what makes an invoice due), "Due on receipt" and
 * "Cash on delivery" (0). Terms counted from the end of the month ("Net 30 EOM") are not a
 * plain net period and give null. Common purchasing practice; the printer can always set the
 * days themselves.
 */
export function netDaysOf(terms: string | null | undefined): number | null {
  const text = (terms ?? '').trim().toLowerCase();
  if (!text) return null;
  // Counted from the end of the month, not the invoice date: not a plain net period.
  if (/\beom\b|end of (the )?month|\bprox/.test(text)) return null;
  if (/\b(due (up)?on receipt|on receipt|cash on delivery|c\.?o\.?d\.?)\b/.test(text)) return 0;
  const net = /\bnet\s*(\d{1,3})\b/.exec(text) ?? /\b(\d{1,3})\s*days?\s*net\b/.exec(text);
  if (!net) {
    const plain = /^(\d{1,3})\s*days?$/.exec(text);
    if (!plain) return null;
    return Number(plain[1]) <= MAX_NET_DAYS ? Number(plain[1]) : null;
  }
  const days = Number(net[1]);
  return days <= MAX_NET_DAYS ? days : null;
}

/** The date `days` calendar days after `date`. */
export function addCalendarDays(date: string, days: number): string {
  if (!Number.isInteger(days)) throw new RangeError(`Not a whole number of days: ${days}`);
  return dateOf(dayNumber(date) + days);
}

/** Calendar days from `from` to `to` (negative when `to` is earlier). */
export function calendarDaysBetween(from: string, to: string): number {
  return dayNumber(to) - dayNumber(from);
}

/** An invoice's due date: net days after the invoice date, counted in calendar days. */
export function dueDateOf(invoiceDate: string, netDays: number): string {
  if (!Number.isInteger(netDays) || netDays < 0 || netDays > MAX_NET_DAYS)
    throw new RangeError(`Net days must be a whole number from 0 to ${MAX_NET_DAYS}, not ${netDays}`);
  return addCalendarDays(invoiceDate, netDays);
}

export type PaymentState = 'paid' | 'not_due' | 'due_today' | 'overdue';

export interface PaymentStanding {
  state: PaymentState;
  /** Days after the due date it was paid (paid) or is now (overdue); 0 or less when not late. */
  daysLate: number;
  /** Days until the due date while not paid and not yet due. */
  daysLeft: number;
}

/**
 * Where an invoice stands on `today` (a date in the payer's time zone): paid, not due yet, due
 * today or overdue; an invoice paid on or before its due date was paid on time.
 */
export function paymentStanding(dueDate: string, today: string, paidOn: string | null): PaymentStanding {
  if (paidOn) return { state: 'paid', daysLate: calendarDaysBetween(dueDate, paidOn), daysLeft: 0 };
  const left = calendarDaysBetween(today, dueDate);
  if (left > 0) return { state: 'not_due', daysLate: 0, daysLeft: left };
  return left === 0
    ? { state: 'due_today', daysLate: 0, daysLeft: 0 }
    : { state: 'overdue', daysLate: -left, daysLeft: 0 };
}

export interface PaidInvoice {
  invoiceDate: string;
  dueDate: string;
  /** Null while not paid. */
  paidOn: string | null;
}

export interface PaymentRecord {
  paid: number;
  /** Paid on or before the due date. */
  paidOnTime: number;
  /** paidOnTime ÷ paid; null before any payment. */
  onTimeRate: number | null;
  /** Mean calendar days from invoice date to payment, over the paid ones; null before any payment. */
  averageDaysToPay: number | null;
  /** Not paid and past the due date on `today`. */
  overdue: number;
}

/** A payer's record over its invoices: how often it paid on time and how long it took. */
export function paymentRecord(invoices: readonly PaidInvoice[], today: string): PaymentRecord {
  let paid = 0;
  let paidOnTime = 0;
  let daysToPay = 0;
  let overdue = 0;
  for (const invoice of invoices) {
    const standing = paymentStanding(invoice.dueDate, today, invoice.paidOn);
    if (standing.state === 'paid') {
      paid++;
      if (standing.daysLate <= 0) paidOnTime++;
      daysToPay += calendarDaysBetween(invoice.invoiceDate, invoice.paidOn!);
    } else if (standing.state === 'overdue') overdue++;
  }
  return {
    paid,
    paidOnTime,
    onTimeRate: paid ? paidOnTime / paid : null,
    averageDaysToPay: paid ? daysToPay / paid : null,
    overdue,
  };
}
