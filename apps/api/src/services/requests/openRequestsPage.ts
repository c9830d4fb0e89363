import type { OpenRequestsQuery } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { z } from 'zod';
import { containsPattern } from '../../lib/containsPattern';
import { DieRequest } from '../../models';
import { biddableByShop } from '../../access';
import { readRequestGraph } from './requestGraph';
import { shopCanMake } from './shopCanMake';
import { SUMMARY_COLUMNS } from '../../dto/requestViews';

export interface BoardRow {
  distanceMiles: number | null;
  declined: boolean;
  hasBid: boolean;
}

const ORDER: Record<string, string> = {
  bidDeadline: 'r.bid_deadline',
  needByDate: 'r.need_by_date',
  ruleLength: 'r.measured_rule_in',
  distance: 'd.miles',
};

/** The open requests that match a shop's board query, as a query of `die_requests as r` to build on. */
export function matchingOpenRequests(knex: Knex, shopId: number, q: z.output<typeof OpenRequestsQuery>) {
  const query = knex('dieRequests as r').where(biddableByShop(knex, shopId, 'r'));
  if (q.minIn !== undefined) query.where('r.measuredRuleIn', '>=', q.minIn);
  if (q.maxIn !== undefined) query.where('r.measuredRuleIn', '<=', q.maxIn);
  if (q.complexity) query.where('r.measuredComplexity', q.complexity);
  if (q.withinDays) query.where('r.bidDeadline', '<=', new Date(Date.now() + q.withinDays * 86_400_000));
  if (q.ruleTypes?.length) query.whereRaw('r.rule_types @> ?::text[]', [q.ruleTypes]);
  if (q.canMake) query.where(shopCanMake(knex, shopId, 'r'));
  if (q.hideDeclined) query.whereNotIn('r.id', knex('requestDeclines').where({ shopId }).select('requestId'));
  if (q.q) {
    const like = containsPattern(q.q);
    query
      .join('organisations as o', 'o.id', 'r.organisationId')
      .where((b) => b.whereILike('r.title', like).orWhereILike('r.jobReference', like).orWhereILike('o.name', like));
  }
  return query;
}

/**
 * One page of the requests open to this die shop, filtered and sorted by the database
 * and read in full, with the count of every match. The request rows carry their measured
 * dieline's figures (migration 009); `miles` gives the distance from the shop to each delivery
 * postcode it knows.
 */
export async function openRequestsPage(
  knex: Knex,
  shopId: number,
  q: z.output<typeof OpenRequestsQuery>,
  miles: Array<{ postcode: string; miles: number }>,
): Promise<{ rows: Array<BoardRow & { request: DieRequest }>; total: number }> {
  // The requests that match, as a fresh query each time it is needed.
  const matching = () => matchingOpenRequests(knex, shopId, q);
  const page = matching()
    .select('r.id', 'd.miles as distanceMiles')
    .select(knex.raw('r.id in (select request_id from request_declines where shop_id = ?) as declined', [shopId]))
    .select(knex.raw('r.id in (select request_id from bids where shop_id = ?) as has_bid', [shopId]));
  if (miles.length) {
    const values = miles.map(() => '(?::text, ?::float8)').join(', ');
    page.leftJoin(
      knex.raw(
        `(values ${values}) as d (postcode, miles)`,
        miles.flatMap((m) => [m.postcode, m.miles]),
      ),
      'd.postcode',
      'r.deliveryPostcode',
    );
  } else {
    page.crossJoin(knex.raw('(select null::float8 as miles) as d'));
  }
  const desc = q.sort.startsWith('-');
  // Unknown values last either way; ties by the bid deadline, then id, so that pages are stable.
  const order = `${ORDER[q.sort.replace('-', '')]} ${desc ? 'desc' : 'asc'} nulls last, r.bid_deadline, r.id`;
  page
    .select(knex.raw(`row_number() over (order by ${order}) as position`))
    .orderByRaw(order)
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize);
  // The page's requests in full and the count of every match, in one query: the count is a
  // subquery of its own, which PostgreSQL works out once (a window count over the page's query
  // would sort every match to number 25 of them). Only a page past the end asks for it alone.
  const count = () => matching().count('*');
  const requests = (await readRequestGraph(
    knex,
    DieRequest.query()
      .join(page.as('page'), 'page.id', 'die_requests.id')
      .select('page.distanceMiles', 'page.declined', 'page.hasBid', count().as('totalMatches'))
      .orderBy('page.position'),
    ['organisation', 'press', 'fileSummaries'],
    SUMMARY_COLUMNS,
  )) as Array<DieRequest & BoardRow & { totalMatches: number }>;
  const total =
    requests[0]?.totalMatches ??
    Number(((await count().options({ prepare: true })) as Array<{ count: number }>)[0]?.count ?? 0);
  return {
    rows: requests.map((request) => {
      const { distanceMiles, declined, hasBid } = request;
      for (const key of ['distanceMiles', 'declined', 'hasBid', 'totalMatches'] as const)
        delete (request as Partial<typeof request>)[key];
      return { request, distanceMiles: distanceMiles === null ? null : Math.round(distanceMiles), declined, hasBid };
    }),
    total,
  };
}
