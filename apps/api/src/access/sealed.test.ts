import { requestStatuses } from '@kerfmark/contracts';
import { describe, expect, it } from 'vitest';
import { bidsOpened, biddingOpen, sealOnCancel } from './sealed';
import { facts, HOUR, NOW, pastDeadline } from './testFacts';

// The sealed-bid rule, common purchasing practice for sealed tenders: nothing of a bid opens
// before the deadline, which passes by the clock or by an early close.
describe('sealed bids', () => {
  it('stay sealed on a draft and on an open request until the deadline, to the millisecond', () => {
    expect(bidsOpened(facts('draft'), NOW)).toBe(false);
    expect(bidsOpened(facts('open'), NOW)).toBe(false);
    const deadline = facts('open', { bidDeadline: NOW });
    expect(bidsOpened(deadline, new Date(NOW.getTime() - 1))).toBe(false);
    expect(bidsOpened(deadline, NOW)).toBe(true);
    expect(biddingOpen(deadline, new Date(NOW.getTime() - 1))).toBe(true);
    expect(biddingOpen(deadline, NOW)).toBe(false);
  });

  it('open once bidding closed, by the clock or early, and at every later stage', () => {
    expect(bidsOpened(pastDeadline('open'), NOW)).toBe(true);
    for (const status of ['bidding_closed', 'awarded', 'in_production', 'shipped', 'received'] as const) {
      expect(bidsOpened(facts(status), NOW), status).toBe(true);
      expect(biddingOpen(facts(status), NOW), status).toBe(false);
    }
  });

  it('stay sealed for good when the request is cancelled before its deadline', () => {
    const open = facts('open');
    const cancelled = facts('cancelled', sealOnCancel(open, NOW));
    expect(cancelled.biddingClosedAt).toBeNull();
    // A year later, long past the old deadline, still sealed.
    expect(bidsOpened(cancelled, new Date(NOW.getTime() + 365 * 24 * HOUR))).toBe(false);
  });

  it('stay open to the printer that saw them when cancelled after bidding closed', () => {
    const byClock = pastDeadline('open');
    expect(sealOnCancel(byClock, NOW).biddingClosedAt).toEqual(byClock.bidDeadline);
    const closedEarly = facts('bidding_closed', { biddingClosedAt: new Date(NOW.getTime() - HOUR) });
    expect(bidsOpened(facts('cancelled', sealOnCancel(closedEarly, NOW)), NOW)).toBe(true);
  });

  it('has an answer for every status', () => {
    for (const status of requestStatuses) expect(typeof bidsOpened(facts(status), NOW)).toBe('boolean');
  });
});
