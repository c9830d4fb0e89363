import type { BidDto, DieRequestDetail } from '@kerfmark/contracts';
import type { AuthUser } from '../auth/passport';
import type { DieRequest } from '../models';
import { openActions } from './actions';
import type { RequestFacts } from './facts';
import { questionDto, requestFields } from './presentRequest';
import { biddingOpen } from './sealed';
import { visibleParts } from './visibility';

const MAKING: readonly string[] = ['in_production', 'shipped', 'received'];

/**
 * A request's page for a die shop: the job, the answered questions and its own, its own bid, and
 * after the award only whether it won; the winner also gets its terms, the delivery address and
 * the die's way there. Never another shop's anything, nor the invited shops.
 */
export function presentToShop(
  request: DieRequest,
  facts: RequestFacts,
  actor: AuthUser,
  myBid: BidDto | null,
  now: Date,
): DieRequestDetail {
  const parts = visibleParts(actor, facts, now);
  const award = request.award ?? null;
  const won = parts.award === 'own-terms';
  const awarded = award !== null;
  const fields = requestFields(request, actor);
  return {
    ...fields,
    // A shop that did not win learns that the job was awarded, not how the winner is getting on.
    status: awarded && !won && MAKING.includes(request.status) ? 'awarded' : request.status,
    shippedAt: parts.delivery ? fields.shippedAt : null,
    deliveryAddress: parts.delivery ? request.deliveryAddress : null,
    invitedShops: [],
    questions: (request.questions ?? [])
      .filter((q) => q.answer !== null || q.shopId === actor.organisationId)
      .map((q) => questionDto(actor, q)),
    allowedActions: openActions(actor, facts, now),
    isOwner: false,
    biddingOpen: biddingOpen(facts, now),
    myBid,
    outcome: parts.award === 'none' ? null : won ? 'won' : 'not_awarded',
    award:
      award && won
        ? {
            id: award.id,
            poNumber: award.poNumber,
            shopName: null,
            totalCents: award.totalCents,
            currency: award.currency,
            promisedShipDate: award.promisedShipDate,
            reason: null,
          }
        : null,
    trackingNote: parts.delivery ? request.trackingNote : null,
    receivedAt: parts.delivery ? (request.receivedAt?.toISOString() ?? null) : null,
    receivedCondition: parts.delivery ? request.receivedCondition : null,
    lateFlaggedAt: parts.delivery ? (request.lateFlaggedAt?.toISOString() ?? null) : null,
  };
}
