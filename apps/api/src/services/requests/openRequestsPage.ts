import type { OpenRequestRow, OpenRequestsQuery } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { AuthUser } from '../../auth/passport';
import { boardVersionQuery, type BoardVersionRow } from './boardVersion';
import { matchingOpenRequests } from './matchingOpenRequests';

const ORDER: Record<string, string> = {
  bidDeadline: 'r.bid_deadline',
  needByDate: 'r.need_by_date',
  ruleLength: 'r.measured_rule_in',
  distance: 'd.miles',
};

export type PageRow = Omit<OpenRequestRow, 'bidDeadline' | 'distanceMiles'> & {
  bidDeadline: Date | null;
  /** Only when sorting by distance: from the `miles` given. */
  distanceMiles?: number | null;
};

/**
 * One page of the requests open to this die shop, filtered and sorted by the database, each
 * row with only what the board shows, and the board's version (the count of every match and
 * what its tag is made of), all in one query: a page is one round trip to the database. The
 * request rows carry their measured dieline's figures (migration 009). `miles`, given only to
 * sort by distance, holds the distance from the shop to each delivery postcode it knows.
 */
export async function openRequestsPage(
  knex: Knex,
  actor: AuthUser,
  q: z.output<typeof OpenRequestsQuery>,
  miles: Array<{ postcode: string; miles: number }> | null,
): Promise<{ rows: PageRow[]; version: BoardVersionRow }> {
  // The same shop asking the same page gets the same text and values: knex builds it once.
  const key = JSON.stringify([actor.organisationId, actor.shopCapabilities, q, miles]);
  let query = compiled.get(key);
  if (!query) {
    query = boardPageQuery(knex, actor, q, miles).toSQL();
    if (compiled.size >= COMPILED_KEPT) compiled.delete(compiled.keys().next().value!);
    compiled.set(key, query);
  }
  const { rows: raw } = (await knex.raw(query.sql, query.bindings).options({ prepare: true })) as { rows: unknown[] };
  // A raw result skips the client's snake-case mappers: apply them as a built query would.
  const found = (knex.client.config.postProcessResponse?.(raw, undefined) ?? raw) as Array<
    BoardVersionRow & PageRow & { position: number | null }
  >;
  const { total, requests, printers, shop, bids, declines } = found[0]!;
  return {
    version: { total, requests, printers, shop, bids, declines },
    rows: found[0]!.position === null ? [] : found,
  };
}

// Compiled board queries kept, the oldest dropped first: one per shop and page it reloads.
const COMPILED_KEPT = 500;
const compiled = new Map<string, Knex.Sql>();

/** The board's page and version as one query (see openRequestsPage). */
function boardPageQuery(
  knex: Knex,
  actor: AuthUser,
  q: z.output<typeof OpenRequestsQuery>,
  miles: Array<{ postcode: string; miles: number }> | null,
) {
  const shopId = actor.organisationId;
  const page = matchingOpenRequests(knex, actor, q)
    .select('r.id')
    .select(knex.raw('r.id in (select request_id from request_declines where shop_id = ?) as declined', [shopId]))
    .select(knex.raw('r.id in (select request_id from bids where shop_id = ?) as has_bid', [shopId]));
  if (miles?.length) {
    const values = miles.map(() => '(?::text, ?::float8)').join(', ');
    page.leftJoin(
      knex.raw(
        `(values ${values}) as d (postcode, miles)`,
        miles.flatMap((m) => [m.postcode, m.miles]),
      ),
      'd.postcode',
      'r.deliveryPostcode',
    );
  } else if (miles) {
    page.crossJoin(knex.raw('(select null::float8 as miles) as d'));
  }
  if (miles) page.select('d.miles as distanceMiles');
  const desc = q.sort.startsWith('-');
  // Unknown values last either way; ties by the bid deadline, then id, so that pages are stable.
  const order = `${ORDER[q.sort.replace('-', '')]} ${desc ? 'desc' : 'asc'} nulls last, r.bid_deadline, r.id`;
  page
    .select(knex.raw(`row_number() over (order by ${order}) as position`))
    .orderByRaw(order)
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize);
  // The page's rows, only what the board shows. The file that stands for the request is the one
  // marked primary, else the newest measured, else the newest.
  const rows = knex
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
      'page.declined',
      'page.hasBid',
      'page.position',
    );
  if (miles) rows.select('page.distanceMiles');
  // The version's one row, with the page's rows beside it (none past the last page).
  return knex
    .select('v.*', 'rows.*')
    .from(boardVersionQuery(knex, actor, q).as('v'))
    .joinRaw('left join lateral (?) as rows on true', [rows as unknown as Knex.Raw])
    .orderBy('rows.position');
}
