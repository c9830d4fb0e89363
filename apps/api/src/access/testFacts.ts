import type { RequestStatus, Role } from '@kerfmark/contracts';
import type { Actor, RequestFacts } from './facts';

// Plain data for the unit tests of the access rules: printer 10, die shops 20 (bid, invited),
// 21 (bid on nothing) and 22 (invited only); the request's deadline is NOW plus a week.
export const NOW = new Date('2026-12-02T12:00:00Z');
export const HOUR = 3_600_000;

export const printer = (role: Role, organisationId = 10): Actor => ({ organisationId, orgKind: 'printer', role });
export const shop = (organisationId: number, role: Role = 'estimator'): Actor => ({
  organisationId,
  orgKind: 'die_shop',
  role,
});

export const facts = (status: RequestStatus, over: Partial<RequestFacts> = {}): RequestFacts => ({
  organisationId: 10,
  status,
  visibility: 'public',
  bidDeadline: new Date(NOW.getTime() + 7 * 24 * HOUR),
  biddingClosedAt: null,
  invitedShopIds: [20, 22],
  bidderShopIds: [20],
  awardedShopId: null,
  ...over,
});

/** The request of `facts(status)` once its deadline passed by the clock. */
export const pastDeadline = (status: RequestStatus, over: Partial<RequestFacts> = {}) =>
  facts(status, { bidDeadline: new Date(NOW.getTime() - HOUR), ...over });
