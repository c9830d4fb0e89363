import type { DieRequestDetail } from '@kerfmark/contracts';
import type { AuthUser } from '../auth/passport';
import type { DieRequest } from '../models';
import { openActions } from './actions';
import type { RequestFacts } from './facts';
import { questionDto, requestFields } from './presentRequest';
import { biddingOpen } from './sealed';

/**
 * A request's page for the printer that posted it: every field of its own, every question, the
 * shops it invited and the award. Nothing of a bid: the comparison opens those, once the rule lets it.
 */
export function presentToOwner(request: DieRequest, facts: RequestFacts, actor: AuthUser, now: Date): DieRequestDetail {
  const award = request.award ?? null;
  return {
    ...requestFields(request, actor),
    deliveryAddress: request.deliveryAddress,
    invitedShops: (request.invitedShops ?? []).map((s) => ({ id: s.id, name: s.name })),
    questions: (request.questions ?? []).map((q) => questionDto(actor, q)),
    allowedActions: openActions(actor, facts, now),
    isOwner: true,
    biddingOpen: biddingOpen(facts, now),
    myBid: null,
    outcome: null,
    award: award
      ? {
          id: award.id,
          poNumber: award.poNumber,
          shopName: award.shop?.name ?? null,
          totalCents: award.totalCents,
          currency: award.currency,
          promisedShipDate: award.promisedShipDate,
          reason: award.reason,
        }
      : null,
    trackingNote: request.trackingNote,
    receivedAt: request.receivedAt?.toISOString() ?? null,
    receivedCondition: request.receivedCondition,
    lateFlaggedAt: request.lateFlaggedAt?.toISOString() ?? null,
  };
}
