import type { Knex } from 'knex';
import { biddingOpen } from '../../access';
import type { AuthUser } from '../../auth/passport';
import type { DieRequest } from '../../models';
import type { ServiceDeps } from '../deps';
import { transitionRequest } from '../requests/requestStatus';
import { tellBidders } from '../tellBidders';

/**
 * Closes bidding on a locked request inside the caller's transaction. Purchasing's early close is
 * the only way, besides the clock, that sealed bids open: every bidder is told.
 */
export async function closeBiddingInside(
  trx: Knex.Transaction,
  deps: Pick<ServiceDeps, 'reminders' | 'emails' | 'config'>,
  actor: AuthUser,
  request: DieRequest,
): Promise<void> {
  const early = biddingOpen(request, new Date());
  await transitionRequest(trx, actor, request.id, 'close-bidding', {
    reminders: deps.reminders,
    patch: { biddingClosedAt: new Date(), closedEarly: early },
    detail: { early },
  });
  await tellBidders(trx, deps, request.id, {
    kind: 'bidding_closed',
    title: `Bidding closed: ${request.title}`,
    body: early
      ? `The buyer closed bidding on "${request.title}" before the deadline. Bids can no longer be changed.`
      : `Bidding on "${request.title}" has closed. Bids can no longer be changed.`,
    link: `/requests/${request.id}`,
  });
}
