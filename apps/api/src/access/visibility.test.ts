import { requestStatuses } from '@kerfmark/contracts';
import { describe, expect, it } from 'vitest';
import { facts, NOW, pastDeadline, printer, shop } from './testFacts';
import { maySee, visibleParts } from './visibility';

const owner = printer('buyer');
const otherPrinter = printer('purchasing', 11);

describe('who may see a request', () => {
  it('a printer: its own requests only, in every status', () => {
    for (const status of requestStatuses) {
      expect(maySee(owner, facts(status)), status).toBe(true);
      expect(maySee(otherPrinter, facts(status)), status).toBe(false);
    }
  });

  it('a die shop: a public or invited request on offer, and any it bid on', () => {
    const invitedOnly = { visibility: 'invited' as const };
    expect(maySee(shop(21), facts('open'))).toBe(true);
    expect(maySee(shop(21), facts('open', invitedOnly))).toBe(false);
    expect(maySee(shop(22), facts('open', invitedOnly))).toBe(true);
    expect(maySee(shop(22), facts('bidding_closed', invitedOnly))).toBe(true);
    for (const status of ['draft', 'awarded', 'cancelled', 'received'] as const) {
      expect(maySee(shop(22), facts(status)), status).toBe(false);
      expect(maySee(shop(20), facts(status)), `bidder, ${status}`).toBe(true);
    }
  });
});

describe('which parts of it', () => {
  it('the printer: no bid before the deadline; every bid after it; the award once made', () => {
    expect(visibleParts(owner, facts('open'), NOW)).toMatchObject({
      bids: 'none',
      bidFiguresOnDashboard: false,
      ocdsRelease: false,
      invitedShops: true,
      questions: 'all',
    });
    expect(visibleParts(owner, pastDeadline('open'), NOW)).toMatchObject({
      bids: 'all',
      bidFiguresOnDashboard: true,
      award: 'none',
    });
    expect(visibleParts(owner, facts('awarded', { awardedShopId: 20 }), NOW)).toMatchObject({
      bids: 'all',
      award: 'whole',
      purchaseOrder: true,
      ocdsRelease: true,
    });
    expect(visibleParts(owner, facts('cancelled'), NOW).bids).toBe('none');
  });

  it('a die shop: its own bid only, never the invited shops; after the award only whether it won', () => {
    const awarded = facts('awarded', { awardedShopId: 20, bidderShopIds: [20, 21] });
    expect(visibleParts(shop(20), awarded, NOW)).toMatchObject({
      bids: 'own',
      award: 'own-terms',
      purchaseOrder: true,
      delivery: true,
      invitedShops: false,
      ocdsRelease: false,
    });
    expect(visibleParts(shop(21), awarded, NOW)).toMatchObject({
      bids: 'own',
      award: 'outcome',
      purchaseOrder: false,
      delivery: false,
    });
    expect(visibleParts(shop(21), facts('open'), NOW)).toMatchObject({
      award: 'none',
      questions: 'answered-and-own',
      bidFiguresOnDashboard: false,
    });
  });

  it('nothing at all to one who may not see the request', () => {
    expect(visibleParts(otherPrinter, facts('awarded', { awardedShopId: 20 }), NOW)).toMatchObject({
      bids: 'none',
      award: 'none',
      purchaseOrder: false,
    });
    expect(visibleParts(shop(21), facts('awarded', { awardedShopId: 20 }), NOW)).toMatchObject({
      bids: 'none',
      award: 'none',
    });
  });
});
