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

export interface PlannedReminder {
  /** Names the rule, the request and the moment: a new deadline makes new keys. */
  key: string;
  kind: ReminderKind;
  requestId: number;
  fireAt: Date;
  /** Past this the reminder is pointless and is not sent late. */
  expiresAt: Date | null;
}

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
const MORNING = 9; // reminders about dates go out at 09:00 in the reader's zone

/**
 * Every reminder a request should get, from its state now. The rules:
 * - shops that were invited or asked a question and have not bid: 48 h and 24 h before the bid deadline;
 * - the buyer and purchasing: when bids are due and ready to compare (the deadline, or an early close);
 * - the awarded shop and the buyer: 7 and 2 days before the need-by date while the die is not shipped;
 * - both: a late flag the day after the promised ship date passes unshipped;
 * - purchasing: 2 days before the best bid's validity ends while nothing is awarded.
 * A reminder that would fall before its rule applied (the request published, the die awarded) is left out.
 */
export function planReminders(state: ReminderState): PlannedReminder[] {
  const { request, award } = state;
  const out: PlannedReminder[] = [];
  const add = (kind: ReminderKind, fireAt: Date, expiresAt: Date | null, notBefore: Date | null) => {
    if (notBefore && fireAt.getTime() < notBefore.getTime()) return;
    out.push({ key: `${kind}-${request.id}-${fireAt.getTime()}`, kind, requestId: request.id, fireAt, expiresAt });
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
      add(
        'validity_ending',
        new Date(zonedTime(state.bestBidValidUntil, MORNING, request.timeZone).getTime() - 2 * DAY),
        lapses,
        due,
      );
    }
  }
  if (award && (request.status === 'awarded' || request.status === 'in_production') && !request.shippedAt) {
    if (request.needByDate) {
      const needBy = zonedTime(request.needByDate, MORNING, request.timeZone);
      add('need_by_7d', new Date(needBy.getTime() - 7 * DAY), needBy, award.awardedAt);
      add('need_by_2d', new Date(needBy.getTime() - 2 * DAY), needBy, award.awardedAt);
    }
    const dayAfter = new Date(Date.parse(`${award.promisedShipDate}T00:00:00Z`) + DAY).toISOString().slice(0, 10);
    add('late_shipment', zonedTime(dayAfter, MORNING, award.shopTimeZone), null, award.awardedAt);
  }
  return out;
}

/** Due now: its time has come, it has not expired. */
export function isDue(reminder: PlannedReminder, now: Date): boolean {
  return (
    reminder.fireAt.getTime() <= now.getTime() && (!reminder.expiresAt || reminder.expiresAt.getTime() > now.getTime())
  );
}
