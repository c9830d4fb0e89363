import type { QueryBuilder } from 'objection';
import { Bid, DieRequest } from '../models';
import type { Actor } from './facts';
import { openToShop } from './openToShop';
import { ON_OFFER } from './visibility';

/**
 * `maySee` as a condition on a query of die_requests, for lists and lookups that let the
 * database filter; `visibleQuery.test.ts` holds the two to the same answers.
 */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export function visibleTo<Q extends QueryBuilder<DieRequest, any>>(query: Q, actor: Actor): Q {
  if (actor.orgKind === 'printer') return query.where('die_requests.organisationId', actor.organisationId) as Q;
  const shopId = actor.organisationId;
  return query.where((visible) =>
    visible
      .where((open) => open.whereIn('die_requests.status', [...ON_OFFER]).where(openToShop(DieRequest.knex(), shopId)))
      .orWhereExists(Bid.query().whereColumn('bids.requestId', 'die_requests.id').where('bids.shopId', shopId)),
  ) as Q;
}
