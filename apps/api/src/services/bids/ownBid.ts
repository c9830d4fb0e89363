import { formatInZone } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import { assertMay, biddingOpen, loadFacts } from '../../access';
import type { AuthUser } from '../../auth/passport';
import { HttpError, notFound } from '../../lib/httpError';
import { Bid, type DieRequest } from '../../models';

/** Why a bid may not be sent or changed now, in the bidder's time zone. */
export function biddingClosed(request: DieRequest, timeZone: string): HttpError {
  return new HttpError(
    409,
    'bidding_closed',
    request.bidDeadline && request.status === 'open'
      ? `Bidding on this request closed at ${formatInZone(request.bidDeadline, timeZone)}.`
      : 'This request is not open for bids.',
  );
}

/** The shop's own bid, locked, if it may still change it: no other shop's bid is ever found. */
export async function ownBid(trx: Knex.Transaction, actor: AuthUser, bidId: number, action: 'revise' | 'withdraw') {
  const bid = await Bid.query(trx).findOne({ id: bidId, shopId: actor.organisationId }).forUpdate();
  const found = bid && (await loadFacts(trx, bid.requestId, 'share'));
  if (!bid || !found) throw notFound('That bid');
  if (!biddingOpen(found.facts, new Date())) throw biddingClosed(found.request, actor.timeZone);
  assertMay(actor, found.facts, action);
  return { bid, request: found.request };
}
