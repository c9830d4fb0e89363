import { createHash } from 'node:crypto';
import type { OpenRequestsQuery } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { AuthUser } from '../../auth/passport';
import { matchingOpenRequests } from './matchingOpenRequests';

// A restart may bring another shape of answer: tags made before it never match.
const BOOT = `${process.pid}-${Date.now()}`;

/** What a board's tag is made of, as `boardVersionQuery` reads it. */
export interface BoardVersionRow {
  total: number;
  requests: string;
  printers: string | null;
  shop: string | null;
  bids: string;
  declines: string;
}

/**
 * One pass over the requests that match a shop's board query, reading no row: their count, ids
 * and newest change and their printers' newest change (migration 20261204000800 stamps every
 * update, the measure trigger's included), the shop's own newest change (its profile), and its
 * bids and declines. Whatever the page shows changes one of these.
 */
export function boardVersionQuery(knex: Knex, actor: AuthUser, q: z.output<typeof OpenRequestsQuery>) {
  const shopId = actor.organisationId;
  return matchingOpenRequests(knex, actor, q)
    .join('organisations as printer', 'printer.id', 'r.organisationId')
    .select(
      knex.raw('count(*)::int as total'),
      knex.raw("coalesce(sum(r.id), 0) || ':' || coalesce(max(r.changed_at)::text, '') as requests"),
      knex.raw('max(printer.changed_at)::text as printers'),
      knex('organisations').where('id', shopId).select(knex.raw('changed_at::text')).as('shop'),
      knex('bids')
        .where({ shopId })
        .select(
          knex.raw("count(*) || ':' || coalesce(sum(request_id), 0) || ':' || coalesce(max(changed_at)::text, '')"),
        )
        .as('bids'),
      knex('requestDeclines')
        .where({ shopId })
        .select(knex.raw("count(*) || ':' || coalesce(sum(request_id), 0)"))
        .as('declines'),
    );
}

/** The weak tag of one page of a shop's board, from its version row. */
export function boardTag(actor: AuthUser, q: z.output<typeof OpenRequestsQuery>, row: BoardVersionRow): string {
  const { total, requests, printers, shop, bids, declines } = row;
  const parts = [
    BOOT,
    actor.organisationId,
    actor.orgPostcode,
    JSON.stringify(actor.shopCapabilities),
    JSON.stringify(q),
    JSON.stringify([total, requests, printers, shop, bids, declines]),
  ];
  return `W/"${createHash('sha256').update(parts.join('|')).digest('base64url').slice(0, 27)}"`;
}

/**
 * The tag of one page of a shop's board alone, for a reload that sends the tag it has: one
 * that finds nothing new is answered 304 from this, without reading a row.
 */
export async function boardVersion(knex: Knex, actor: AuthUser, q: z.output<typeof OpenRequestsQuery>) {
  const [row] = (await boardVersionQuery(knex, actor, q).options({ prepare: true })) as BoardVersionRow[];
  return boardTag(actor, q, row!);
}
