import type { Knex } from 'knex';
import { DieRequest, type RequestTies } from '../models';
import type { RequestFacts } from './facts';

export const TIES_PART = `(select json_build_object(
    'invitedShopIds', coalesce((select json_agg(i.shop_id) from request_invitations i where i.request_id = die_requests.id), '[]'),
    'bidderShopIds', coalesce((select json_agg(b.shop_id) from bids b where b.request_id = die_requests.id), '[]'),
    'awardedShopId', (select a.shop_id from awards a where a.request_id = die_requests.id)))`;

export function factsOf(request: DieRequest, ties: RequestTies): RequestFacts {
  return {
    organisationId: request.organisationId,
    status: request.status,
    visibility: request.visibility,
    bidDeadline: request.bidDeadline,
    biddingClosedAt: request.biddingClosedAt,
    ...ties,
  };
}

/** A request row (locked as asked, inside the caller's transaction) and its facts; undefined if there is none. */
export async function loadFacts(
  trx: Knex | Knex.Transaction,
  requestId: number,
  lock?: 'update' | 'share',
): Promise<{ request: DieRequest; facts: RequestFacts } | undefined> {
  const query = DieRequest.query(trx).findById(requestId);
  if (lock === 'update') query.forUpdate();
  if (lock === 'share') query.forShare();
  const request = await query;
  if (!request) return undefined;
  const [invited, bidders, award] = await Promise.all([
    trx('requestInvitations').where({ requestId }).select('shopId'),
    trx('bids').where({ requestId }).select('shopId'),
    trx('awards').where({ requestId }).first('shopId'),
  ]);
  const ids = (rows: Array<{ shopId: number }>) => rows.map((r) => r.shopId);
  return {
    request,
    facts: factsOf(request, {
      invitedShopIds: ids(invited),
      bidderShopIds: ids(bidders),
      awardedShopId: award?.shopId ?? null,
    }),
  };
}
