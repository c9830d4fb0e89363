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

/** The wall clock an instant shows in a zone, read by ICU through Intl: a check independent of Luxon. */
const wallClock = (instant: Date, timeZone: string) =>
  new Intl.DateTimeFormat('sv-SE', { timeZone, dateStyle: 'short', timeStyle: 'short' }).format(instant);

describe('zonedTime', () => {
  // IANA tz database: Chicago is UTC−6 in December and UTC−5 in July.
  it('turns a wall-clock time in a zone into an instant', () => {
    expect(zonedTime('2026-12-18', 9, 'America/Chicago').toISOString()).toBe('2026-12-18T15:00:00.000Z');
    expect(zonedTime('2026-07-18', 9, 'America/Chicago').toISOString()).toBe('2026-07-18T14:00:00.000Z');
    expect(zonedTime('2026-12-18', 9, 'UTC').toISOString()).toBe('2026-12-18T09:00:00.000Z');
  });

  // The days the clocks change in 2026. US zones: the second Sunday of March and the first Sunday
  // of November (Energy Policy Act of 2005). Europe/London: the last Sundays of March and October
  // (EU Directive 2000/84/EC). Australia/Lord_Howe: the first Sundays of April and October, a
  // half-hour change between UTC+10:30 and UTC+11 (IANA tz database, australasia file).
  const changeDays: Array<[zone: string, date: string, nineAm: string]> = [
    ['America/Los_Angeles', '2026-03-08', '2026-03-08T16:00:00.000Z'], // PDT, UTC−7
    ['America/Los_Angeles', '2026-11-01', '2026-11-01T17:00:00.000Z'], // PST, UTC−8
    ['America/Anchorage', '2026-03-08', '2026-03-08T17:00:00.000Z'], // AKDT, UTC−8
    ['America/Anchorage', '2026-11-01', '2026-11-01T18:00:00.000Z'], // AKST, UTC−9
    ['Europe/London', '2026-03-29', '2026-03-29T08:00:00.000Z'], // BST, UTC+1
    ['Europe/London', '2026-10-25', '2026-10-25T09:00:00.000Z'], // GMT, UTC+0
    ['Australia/Lord_Howe', '2026-04-05', '2026-04-04T22:30:00.000Z'], // UTC+10:30 from 02:00
    ['Australia/Lord_Howe', '2026-10-04', '2026-10-03T22:00:00.000Z'], // UTC+11 from 02:00
  ];
  it.each(changeDays)('gives 09:00 in %s on %s, the day the clocks change', (zone, date, nineAm) => {
    const instant = zonedTime(date, 9, zone);
    expect(instant.toISOString()).toBe(nineAm);
    expect(wallClock(instant, zone)).toBe(`${date} 09:00`);
  });

  it('counts days on the calendar, so a week before a change is still 09:00', () => {
    // Need-by Tuesday 10 March 2026 in Los Angeles: a week before is in PST, two days before is the change day.
    expect(zonedTime('2026-03-10', 9, 'America/Los_Angeles', -7).toISOString()).toBe('2026-03-03T17:00:00.000Z');
    expect(zonedTime('2026-03-10', 9, 'America/Los_Angeles', -2).toISOString()).toBe('2026-03-08T16:00:00.000Z');
    expect(wallClock(zonedTime('2026-10-27', 9, 'Europe/London', -2), 'Europe/London')).toBe('2026-10-25 09:00');
  });

  it('refuses a zone it does not know rather than guess', () => {
    expect(() => zonedTime('2026-03-08', 9, 'Mars/Olympus_Mons')).toThrow(/Mars\/Olympus_Mons/);
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
    const planned = planReminders(state).map((r) => [r.kind, r.audience, r.fireAt.toISOString()]);
    expect(planned).toEqual([
      // 09:00 in Chicago (UTC−6 in December) for the buyer…
      ['need_by_7d', 'printer', '2026-12-24T15:00:00.000Z'],
      ['need_by_2d', 'printer', '2026-12-29T15:00:00.000Z'],
      ['late_shipment', 'printer', '2026-12-22T15:00:00.000Z'],
      // …and in Indianapolis (UTC−5) for the shop; the late flag the day after the promised ship date.
      ['need_by_7d', 'shop', '2026-12-24T14:00:00.000Z'],
      ['need_by_2d', 'shop', '2026-12-29T14:00:00.000Z'],
      ['late_shipment', 'shop', '2026-12-22T14:00:00.000Z'],
    ]);
  });

  it('reaches a buyer in Berlin and a shop in Chicago each at 09:00 their time, across the change of clocks', () => {
    // Europe/Berlin changes on 29 March 2026, America/Chicago on 8 March: a week before a need-by
    // date of 2 April falls either side of the changes.
    const award = {
      awardedAt: new Date('2026-03-01T12:00:00Z'),
      promisedShipDate: '2026-03-30',
      shopTimeZone: 'America/Chicago',
    };
    const state = base(
      { status: 'awarded', timeZone: 'Europe/Berlin', needByDate: '2026-04-02', bidDeadline: null },
      { award },
    );
    for (const r of planReminders(state)) {
      const zone = r.audience === 'shop' ? 'America/Chicago' : 'Europe/Berlin';
      expect(wallClock(r.fireAt, zone), `${r.kind} for the ${r.audience}`).toMatch(/ 09:00$/);
    }
    expect(at(state, 'need_by_7d').fireAt.toISOString()).toBe('2026-03-26T08:00:00.000Z'); // CET, UTC+1
    expect(at(state, 'need_by_2d').fireAt.toISOString()).toBe('2026-03-31T07:00:00.000Z'); // CEST, UTC+2
  });

  it('stops every reminder once the die has shipped, and for cancelled or received requests', () => {
    const award = { awardedAt: new Date('2026-12-11T16:00:00Z'), promisedShipDate: '2026-12-21', shopTimeZone: 'UTC' };
    expect(kinds(base({ status: 'shipped', shippedAt: new Date('2026-12-20T10:00:00Z') }, { award }))).toEqual([]);
    expect(kinds(base({ status: 'cancelled' }))).toEqual([]);
    expect(kinds(base({ status: 'received' }, { award }))).toEqual([]);
    expect(kinds(base({ status: 'draft' }))).toEqual([]);
  });
});
