import type { OpenRequestRow, OpenRequestsQuery } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { z } from 'zod';
import { containsPattern } from '../../lib/containsPattern';
import { biddableByShop } from '../../access';
import { shopCanMake } from './shopCanMake';

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
 * One page of the requests open to this die shop, filtered and sorted by the database, each
 * row with only what the board shows, and the count of every match. The request rows carry their measured
 * dieline's figures (migration 009); `miles` gives the distance from the shop to each delivery
 * postcode it knows.
 */
export async function openRequestsPage(
  knex: Knex,
  shopId: number,
  q: z.output<typeof OpenRequestsQuery>,
  miles: Array<{ postcode: string; miles: number }>,
  /** The count of every match when the caller has it (the board's tag counts them). */
  knownTotal?: number,
): Promise<{ rows: OpenRequestRow[]; total: number }> {
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
  // The page's rows, only what the board shows, with the count of every match unless the caller
  // has it: the count is a subquery of its own, which PostgreSQL works out once (a window count
  // over the page's query would sort every match to number 25 of them). The file that stands
  // for the request is the one marked primary, else the newest measured, else the newest
  // (primaryFile). Only a page past the end asks for the count alone.
  const count = () => matching().count('*');
  const query = knex
    .from(page.as('page'))
    .join('dieRequests as r', 'r.id', 'page.id')
    .join('organisations as o', 'o.id', 'r.organisationId')
    .joinRaw(
      `left join lateral (
        select f.analysis_status, f.metrics from dieline_files f where f.request_id = r.id
        order by (f.is_primary and f.analysis_status = 'done') desc, (f.analysis_status = 'done') desc,
          f.uploaded_at desc, f.id desc
        limit 1) f on true`,
    )
    .select(
      'r.id',
      'r.title',
      'r.jobReference',
      'o.name as organisationName',
      'r.quantity',
      'r.ups',
      'r.ruleTypes',
      'r.needByDate',
      'r.bidDeadline',
      'r.deliveryPostcode',
      knex.raw(`case when f.analysis_status = 'done' then f.metrics->'length' end as length`),
      knex.raw(`case when f.analysis_status = 'done' then f.metrics->>'complexity' end as complexity`),
      'f.analysisStatus',
      'page.distanceMiles',
      'page.declined',
      'page.hasBid',
    )
    .orderBy('page.position')
    .options({ prepare: true });
  if (knownTotal === undefined) query.select(count().as('totalMatches'));
  const rows = (await query) as Array<
    Omit<OpenRequestRow, 'bidDeadline'> & { bidDeadline: Date | null; totalMatches?: number }
  >;
  const total =
    knownTotal ??
    rows[0]?.totalMatches ??
    Number(((await count().options({ prepare: true })) as Array<{ count: number }>)[0]?.count ?? 0);
  return {
    rows: rows.map(({ totalMatches: _total, bidDeadline, distanceMiles, ...row }) => ({
      ...row,
      bidDeadline: bidDeadline?.toISOString() ?? null,
      distanceMiles: distanceMiles === null ? null : Math.round(distanceMiles),
    })),
    total,
  };
}
