import { describe, expect, it } from 'vitest';
import { isDue, planReminders, type ReminderState } from './planReminders';
import { zonedTime } from './zonedTime';

// Time travel by explicit timestamps: every case states "now" and the request's dates.
const base = (over: Partial<ReminderState['request']> = {}, rest: Partial<ReminderState> = {}): ReminderState => ({
  request: {
    id: 7,
    status: 'open',
    timeZone: 'America/Chicago',
    publishedAt: new Date('2026-12-01T15:00:00Z'),
    bidDeadline: new Date('2026-12-10T23:00:00Z'),
    biddingClosedAt: null,
    needByDate: '2026-12-31',
    shippedAt: null,
    ...over,
  },
  award: null,
  bestBidValidUntil: null,
  ...rest,
});
const kinds = (state: ReminderState) => planReminders(state).map((r) => r.kind);
const at = (state: ReminderState, kind: string) => planReminders(state).find((r) => r.kind === kind)!;

describe('zonedTime', () => {
  // IANA tz database: Chicago is UTC−6 in December and UTC−5 in July.
  it('turns a wall-clock time in a zone into an instant', () => {
    expect(zonedTime('2026-12-18', 9, 'America/Chicago').toISOString()).toBe('2026-12-18T15:00:00.000Z');
    expect(zonedTime('2026-07-18', 9, 'America/Chicago').toISOString()).toBe('2026-07-18T14:00:00.000Z');
    expect(zonedTime('2026-12-18', 9, 'UTC').toISOString()).toBe('2026-12-18T09:00:00.000Z');
  });
});

describe('reminder rules', () => {
  it('reminds shops 48 h and 24 h before the bid deadline, and the printer when bids are due', () => {
    const state = base();
    expect(kinds(state)).toEqual(['bid_deadline_48h', 'bid_deadline_24h', 'bids_ready']);
    expect(at(state, 'bid_deadline_48h').fireAt.toISOString()).toBe('2026-12-08T23:00:00.000Z');
    expect(at(state, 'bid_deadline_24h').fireAt.toISOString()).toBe('2026-12-09T23:00:00.000Z');
    expect(at(state, 'bids_ready').fireAt.toISOString()).toBe('2026-12-10T23:00:00.000Z');
  });

  it('is due only from its time until it expires', () => {
    const r = at(base(), 'bid_deadline_24h');
    expect(isDue(r, new Date('2026-12-09T22:59:59Z'))).toBe(false);
    expect(isDue(r, new Date('2026-12-09T23:00:00Z'))).toBe(true);
    expect(isDue(r, new Date('2026-12-10T23:00:00Z'))).toBe(false); // the deadline has passed
  });

  it('moves with the deadline: a new deadline gives new keys', () => {
    const before = planReminders(base()).map((r) => r.key);
    const after = planReminders(base({ bidDeadline: new Date('2026-12-12T23:00:00Z') })).map((r) => r.key);
    expect(after.some((k) => before.includes(k))).toBe(false);
  });

  it('leaves out a reminder that would fall before the request was published', () => {
    // Published 30 h before the deadline: too late for the 48-hour reminder.
    const state = base({ publishedAt: new Date('2026-12-09T17:00:00Z') });
    expect(kinds(state)).toEqual(['bid_deadline_24h', 'bids_ready']);
  });

  it('uses an early close as the moment bids are ready, and drops the deadline reminders', () => {
    const state = base({ status: 'bidding_closed', biddingClosedAt: new Date('2026-12-05T16:00:00Z') });
    expect(kinds(state)).toEqual(['bids_ready']);
    expect(at(state, 'bids_ready').fireAt.toISOString()).toBe('2026-12-05T16:00:00.000Z');
  });

  it('warns purchasing 2 days before the best bid lapses, while nothing is awarded', () => {
    const state = base({ status: 'bidding_closed' }, { bestBidValidUntil: '2026-12-20' });
    // 09:00 Chicago on 18 Dec = 15:00 UTC.
    expect(at(state, 'validity_ending').fireAt.toISOString()).toBe('2026-12-18T15:00:00.000Z');
  });

  it('reminds the awarded shop and the buyer 7 and 2 days before the need-by date, and flags a late die', () => {
    const award = {
      awardedAt: new Date('2026-12-11T16:00:00Z'),
      promisedShipDate: '2026-12-21',
      shopTimeZone: 'America/Indiana/Indianapolis',
    };
    const state = base({ status: 'awarded' }, { award });
    expect(kinds(state)).toEqual(['need_by_7d', 'need_by_2d', 'late_shipment']);
    expect(at(state, 'need_by_7d').fireAt.toISOString()).toBe('2026-12-24T15:00:00.000Z');
    expect(at(state, 'need_by_2d').fireAt.toISOString()).toBe('2026-12-29T15:00:00.000Z');
    // The day after the promised ship date, 09:00 in Indianapolis (UTC−5 in December).
    expect(at(state, 'late_shipment').fireAt.toISOString()).toBe('2026-12-22T14:00:00.000Z');
  });

  it('stops every reminder once the die has shipped, and for cancelled or received requests', () => {
    const award = { awardedAt: new Date('2026-12-11T16:00:00Z'), promisedShipDate: '2026-12-21', shopTimeZone: 'UTC' };
    expect(kinds(base({ status: 'shipped', shippedAt: new Date('2026-12-20T10:00:00Z') }, { award }))).toEqual([]);
    expect(kinds(base({ status: 'cancelled' }))).toEqual([]);
    expect(kinds(base({ status: 'received' }, { award }))).toEqual([]);
    expect(kinds(base({ status: 'draft' }))).toEqual([]);
  });
});
