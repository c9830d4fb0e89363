import { describe, expect, it } from 'vitest';
import {
  addCalendarDays,
  calendarDaysBetween,
  dueDateOf,
  netDaysOf,
  paymentRecord,
  paymentStanding,
} from './paymentTerms';

describe('netDaysOf', () => {
  // The way payment terms are written on invoices and purchase orders (common purchasing
  // practice): "Net N" is the whole sum due N days after the invoice date; "2/10 Net 30" offers
  // 2 % off for paying within 10 days, the whole sum being due in 30.
  it.each([
    ['Net 30', 30],
    ['net 45 days', 45],
    ['NET60', 60],
    ['30 days net', 30],
    ['2/10 Net 30', 30],
    ['1% 10, net 45', 45],
    ['Due on receipt', 0],
    ['Due upon receipt', 0],
    ['Cash on delivery', 0],
    ['COD', 0],
    ['14 days', 14],
  ])('reads "%s" as %i days', (terms, days) => {
    expect(netDaysOf(terms)).toBe(days);
  });

  it.each([null, '', 'Net 30 EOM', '30 days end of month', 'Pay when you can', 'Net 400'])(
    'gives no net period for %j',
    (terms) => {
      expect(netDaysOf(terms)).toBeNull();
    },
  );
});

describe('due dates, in calendar days', () => {
  it('counts over the end of the month and the year', () => {
    // 10 December + 30 days: 21 days to 31 December, 9 more into January.
    expect(dueDateOf('2026-12-10', 30)).toBe('2027-01-09');
    expect(dueDateOf('2026-12-10', 0)).toBe('2026-12-10');
  });

  it('counts 29 February in a leap year and not in a common year', () => {
    // Gregorian calendar: 2028 is divisible by 4 and not by 100, so it is a leap year; 2027 is not.
    expect(addCalendarDays('2028-02-15', 15)).toBe('2028-03-01');
    expect(addCalendarDays('2027-02-15', 15)).toBe('2027-03-02');
    // 2100 is divisible by 100 and not by 400: a common year.
    expect(addCalendarDays('2100-02-28', 1)).toBe('2100-03-01');
    expect(addCalendarDays('2000-02-28', 1)).toBe('2000-02-29');
  });

  it('counts days between dates either way', () => {
    expect(calendarDaysBetween('2026-12-10', '2027-01-09')).toBe(30);
    expect(calendarDaysBetween('2027-01-09', '2026-12-10')).toBe(-30);
  });

  it('refuses what is not a date or not a net period', () => {
    expect(() => dueDateOf('2026-02-30', 30)).toThrow(RangeError);
    expect(() => dueDateOf('10/12/2026', 30)).toThrow(RangeError);
    expect(() => dueDateOf('2026-12-10', -1)).toThrow(RangeError);
    expect(() => dueDateOf('2026-12-10', 2.5)).toThrow(RangeError);
  });
});

describe('paymentStanding', () => {
  it('is not due, due today, then overdue by the day; paid on or before the due date is on time', () => {
    expect(paymentStanding('2027-01-09', '2027-01-04', null)).toEqual({ state: 'not_due', daysLate: 0, daysLeft: 5 });
    expect(paymentStanding('2027-01-09', '2027-01-09', null)).toEqual({ state: 'due_today', daysLate: 0, daysLeft: 0 });
    expect(paymentStanding('2027-01-09', '2027-01-12', null)).toEqual({ state: 'overdue', daysLate: 3, daysLeft: 0 });
    expect(paymentStanding('2027-01-09', '2027-02-01', '2027-01-09').daysLate).toBe(0);
    expect(paymentStanding('2027-01-09', '2027-02-01', '2027-01-11')).toEqual({
      state: 'paid',
      daysLate: 2,
      daysLeft: 0,
    });
  });
});

describe('paymentRecord', () => {
  it('averages the days to pay over the paid invoices and counts the overdue ones', () => {
    // Worked example: paid after 28 days (on time) and 35 days (5 days late, net 30); one overdue,
    // one not yet due. Average (28 + 35) / 2 = 31.5 days; on time 1 of 2.
    const record = paymentRecord(
      [
        { invoiceDate: '2026-10-01', dueDate: '2026-10-31', paidOn: '2026-10-29' },
        { invoiceDate: '2026-11-01', dueDate: '2026-12-01', paidOn: '2026-12-06' },
        { invoiceDate: '2026-11-01', dueDate: '2026-12-01', paidOn: null },
        { invoiceDate: '2026-12-01', dueDate: '2026-12-31', paidOn: null },
      ],
      '2026-12-05',
    );
    expect(record).toEqual({ paid: 2, paidOnTime: 1, onTimeRate: 0.5, averageDaysToPay: 31.5, overdue: 1 });
  });

  it('says nothing of speed before any payment', () => {
    expect(paymentRecord([], '2026-12-05')).toEqual({
      paid: 0,
      paidOnTime: 0,
      onTimeRate: null,
      averageDaysToPay: null,
      overdue: 0,
    });
  });
});
