import type { OrgKind, RequestStatus, Role, Visibility } from '@kerfmark/contracts';

/** Who is asking: a signed-in user's role and organisation. */
export interface Actor {
  organisationId: number;
  orgKind: OrgKind;
  role: Role;
}

/** What the rules read about one request: plain data from its row and the shops tied to it. */
export interface RequestFacts {
  organisationId: number;
  status: RequestStatus;
  visibility: Visibility;
  bidDeadline: Date | null;
  /**
   * When bidding ended before the clock did (purchasing's early close), or, on a cancelled
   * request, when its bids had been opened before it was cancelled (see `sealOnCancel`).
   */
  biddingClosedAt: Date | null;
  invitedShopIds: readonly number[];
  /** Shops with a bid on the request, withdrawn or not. */
  bidderShopIds: readonly number[];
  awardedShopId: number | null;
}

export const isOwner = (actor: Actor, f: Pick<RequestFacts, 'organisationId'>) =>
  actor.orgKind === 'printer' && actor.organisationId === f.organisationId;

export const isBidder = (actor: Actor, f: Pick<RequestFacts, 'bidderShopIds'>) =>
  actor.orgKind === 'die_shop' && f.bidderShopIds.includes(actor.organisationId);

export const isAwardedShop = (actor: Actor, f: Pick<RequestFacts, 'awardedShopId'>) =>
  actor.orgKind === 'die_shop' && f.awardedShopId !== null && actor.organisationId === f.awardedShopId;

/** Purchasing's powers at a printer: its purchasing users and its admins. */
export const isPurchasing = (actor: Actor) =>
  actor.orgKind === 'printer' && (actor.role === 'purchasing' || actor.role === 'admin');
