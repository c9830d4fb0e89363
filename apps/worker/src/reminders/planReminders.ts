import { zonedTime } from './zonedTime';

export const reminderKinds = [
  'bid_deadline_48h',
  'bid_deadline_24h',
  'bids_ready',
  'need_by_7d',
  'need_by_2d',
  'late_shipment',
  'validity_ending',
] as const;
export type ReminderKind = (typeof reminderKinds)[number];

/** What the reminder rules read about one request; PostgreSQL is where it comes from. */
export interface ReminderState {
  request: {
    id: number;
    status: string;
    timeZone: string;
    publishedAt: Date | null;
    bidDeadline: Date | null;
    biddingClosedAt: Date | null;
    needByDate: string | null;
    shippedAt: Date | null;
  };
  award: { awardedAt: Date; promisedShipDate: string; shopTimeZone: string } | null;
  /** The valid-until date of the lowest bid still standing, when bidding is over and nothing is awarded. */
  bestBidValidUntil: string | null;
}

/**
 * Whom a reminder is for, where the two sides each get it at their own local hour: the printer's
 * people, the awarded shop's, or everyone the rule names (reminders set by an instant, not a date).
 */
export type ReminderAudience = 'all' | 'printer' | 'shop';

export interface PlannedReminder {
  /** Names the rule, the side, the request and the moment: a new deadline makes new keys. */
  key: string;
  kind: ReminderKind;
  audience: ReminderAudience;
  requestId: number;
  fireAt: Date;
  /** Past this the reminder is pointless and is not sent late. */
  expiresAt: Date | null;
}

const HOUR = 3_600_000;
const MORNING = 9; // reminders about dates go out at 09:00 in the reader's zone

/**
 * Every reminder a request should get, from its state now. The rules:
 * - shops that were invited or asked a question and have not bid: 48 h and 24 h before the bid deadline;
 * - the buyer and purchasing: when bids are due and ready to compare (the deadline, or an early close);
 * - the awarded shop and the buyer: 7 and 2 days before the need-by date while the die is not shipped;
 * - both: a late flag the day after the promised ship date passes unshipped;
 * - purchasing: 2 days before the best bid's validity ends while nothing is awarded.
 * Those set by a date go out at 09:00 on that day in each side's own zone, counted in calendar
 * days (so a week before is 09:00 a week before, across a change of the clocks).
 * A reminder that would fall before its rule applied (the request published, the die awarded) is left out.
 */
export function planReminders(state: ReminderState): PlannedReminder[] {
  const { request, award } = state;
  const out: PlannedReminder[] = [];
  const add = (
    kind: ReminderKind,
    fireAt: Date,
    expiresAt: Date | null,
    notBefore: Date | null,
    audience: ReminderAudience = 'all',
  ) => {
    if (notBefore && fireAt.getTime() < notBefore.getTime()) return;
    const side = audience === 'all' ? '' : `${audience}-`;
    out.push({
      key: `${kind}-${side}${request.id}-${fireAt.getTime()}`,
      kind,
      audience,
      requestId: request.id,
      fireAt,
      expiresAt,
    });
  };

  if (request.status === 'open' && request.bidDeadline) {
    add(
      'bid_deadline_48h',
      new Date(request.bidDeadline.getTime() - 48 * HOUR),
      request.bidDeadline,
      request.publishedAt,
    );
    add(
      'bid_deadline_24h',
      new Date(request.bidDeadline.getTime() - 24 * HOUR),
      request.bidDeadline,
      request.publishedAt,
    );
  }
  if ((request.status === 'open' || request.status === 'bidding_closed') && !award) {
    const due = request.biddingClosedAt ?? request.bidDeadline;
    if (due) add('bids_ready', due, null, null);
    if (state.bestBidValidUntil && due) {
      const lapses = zonedTime(state.bestBidValidUntil, 23, request.timeZone);
      const twoDaysBefore = zonedTime(state.bestBidValidUntil, MORNING, request.timeZone, -2);
      add('validity_ending', twoDaysBefore, lapses, due);
    }
  }
  if (award && (request.status === 'awarded' || request.status === 'in_production') && !request.shippedAt) {
    const sides = [
      ['printer', request.timeZone],
      ['shop', award.shopTimeZone],
    ] as const;
    for (const [side, zone] of sides) {
      if (request.needByDate) {
        const needBy = zonedTime(request.needByDate, MORNING, zone);
        add('need_by_7d', zonedTime(request.needByDate, MORNING, zone, -7), needBy, award.awardedAt, side);
        add('need_by_2d', zonedTime(request.needByDate, MORNING, zone, -2), needBy, award.awardedAt, side);
      }
      add('late_shipment', zonedTime(award.promisedShipDate, MORNING, zone, 1), null, award.awardedAt, side);
    }
  }
  return out;
}

/** Due now: its time has come, it has not expired. */
export function isDue(reminder: PlannedReminder, now: Date): boolean {
  return (
    reminder.fireAt.getTime() <= now.getTime() && (!reminder.expiresAt || reminder.expiresAt.getTime() > now.getTime())
  );
}
