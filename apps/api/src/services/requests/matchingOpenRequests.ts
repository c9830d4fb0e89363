import type { OpenRequestsQuery } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { z } from 'zod';
import { biddableByShop } from '../../access';
import type { AuthUser } from '../../auth/passport';
import { containsPattern } from '../../lib/containsPattern';
import { shopCanMake } from './shopCanMake';

/** The open requests that match a shop's board query, as a query of `die_requests as r` to build on. */
export function matchingOpenRequests(knex: Knex, actor: AuthUser, q: z.output<typeof OpenRequestsQuery>) {
  const shopId = actor.organisationId;
  const query = knex('dieRequests as r').where(biddableByShop(knex, shopId, 'r'));
  if (q.minIn !== undefined) query.where('r.measuredRuleIn', '>=', q.minIn);
  if (q.maxIn !== undefined) query.where('r.measuredRuleIn', '<=', q.maxIn);
  if (q.complexity) query.where('r.measuredComplexity', q.complexity);
  // Against the database's clock, as the deadline itself is: the query's text and values then
  // stay the same from one reload to the next, so its compiled form can be kept.
  if (q.withinDays) query.whereRaw('r.bid_deadline <= now() + make_interval(days => ?)', [q.withinDays]);
  if (q.ruleTypes?.length) query.whereRaw('r.rule_types @> ?::text[]', [q.ruleTypes]);
  if (q.canMake && actor.shopCapabilities) query.where(shopCanMake(knex, actor.shopCapabilities, 'r'));
  if (q.hideDeclined) query.whereNotIn('r.id', knex('requestDeclines').where({ shopId }).select('requestId'));
  if (q.q) {
    const like = containsPattern(q.q);
    query
      .join('organisations as o', 'o.id', 'r.organisationId')
      .where((b) => b.whereILike('r.title', like).orWhereILike('r.jobReference', like).orWhereILike('o.name', like));
  }
  return query;
}
