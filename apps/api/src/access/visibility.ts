import { isAwardedShop, isBidder, isOwner, type Actor, type RequestFacts } from './facts';
import { bidsOpened } from './sealed';

/** Statuses in which a request is on offer to the shops it is open to. */
export const ON_OFFER = ['open', 'bidding_closed'] as const;

/**
 * May the actor see the request at all? A printer sees its own; a die shop sees one on offer
 * that is public or to which it was invited, and keeps seeing one it bid on, to learn the
 * outcome. Anything else is the same 404 as a request that does not exist.
 */
export function maySee(actor: Actor, f: RequestFacts): boolean {
  if (actor.orgKind === 'printer') return isOwner(actor, f);
  const onOffer = (ON_OFFER as readonly string[]).includes(f.status);
  const openToShop = f.visibility === 'public' || f.invitedShopIds.includes(actor.organisationId);
  return (onOffer && openToShop) || isBidder(actor, f);
}

/** Which parts of a request the actor may see, once it may see the request. */
export interface VisibleParts {
  /** Every question, or only the answered ones and the actor's own. */
  questions: 'all' | 'answered-and-own';
  invitedShops: boolean;
  /** Every bid with its shop (the comparison), only the actor's own, or none. */
  bids: 'all' | 'own' | 'none';
  /** The award in full, the awarded shop's own terms, or only whether the actor won. */
  award: 'whole' | 'own-terms' | 'outcome' | 'none';
  purchaseOrder: boolean;
  /** The Open Contracting release: every bid with its shop, so only once bids are opened and awarded. */
  ocdsRelease: boolean;
  /** The delivery address and the die's way there: for the printer and the shop that makes it. */
  delivery: boolean;
  /** The home page may reckon with the bids' figures (the lowest bid's promised ship date). */
  bidFiguresOnDashboard: boolean;
}

const NOTHING: VisibleParts = {
  questions: 'answered-and-own',
  invitedShops: false,
  bids: 'none',
  award: 'none',
  purchaseOrder: false,
  ocdsRelease: false,
  delivery: false,
  bidFiguresOnDashboard: false,
};

export function visibleParts(actor: Actor, f: RequestFacts, now: Date): VisibleParts {
  if (!maySee(actor, f)) return NOTHING;
  const awarded = f.awardedShopId !== null;
  if (isOwner(actor, f)) {
    const opened = bidsOpened(f, now);
    return {
      questions: 'all',
      invitedShops: true,
      bids: opened ? 'all' : 'none',
      award: awarded ? 'whole' : 'none',
      purchaseOrder: awarded,
      ocdsRelease: awarded && opened,
      delivery: true,
      bidFiguresOnDashboard: opened,
    };
  }
  const won = isAwardedShop(actor, f);
  return {
    ...NOTHING,
    bids: 'own',
    // After the award a shop learns only whether it won; the winner gets its own terms back.
    award: won ? 'own-terms' : awarded ? 'outcome' : 'none',
    purchaseOrder: won,
    delivery: won,
  };
}
