import { createHash } from 'node:crypto';
import type { OpenRequestsQuery } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { AuthUser } from '../../auth/passport';
import { matchingOpenRequests } from './openRequestsPage';

// A restart may bring another shape of answer: tags made before it never match.
const BOOT = `${process.pid}-${Date.now()}`;

/**
 * A tag for one page of a shop's board that changes whenever what the page shows may have, and
 * the count of every match, from one pass over the matching requests: their count, ids and
 * newest change and their printers' newest change (migration 20261204000800 stamps every update,
 * the measure trigger's included), the shop's own newest change (its profile), and its bids and
 * declines. No row is read: a reload that finds nothing new is answered 304 from this alone,
 * and a full answer takes its total from here.
 */
export async function boardVersion(
  knex: Knex,
  actor: AuthUser,
  q: z.output<typeof OpenRequestsQuery>,
): Promise<{ tag: string; total: number }> {
  const shopId = actor.organisationId;
  const [row] = (await matchingOpenRequests(knex, shopId, q)
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
    )
    .options({ prepare: true })) as Array<Record<string, unknown> & { total: number }>;
  const parts = [BOOT, shopId, actor.orgPostcode, JSON.stringify(q), JSON.stringify(row)];
  return {
    tag: `W/"${createHash('sha256').update(parts.join('|')).digest('base64url').slice(0, 27)}"`,
    total: row?.total ?? 0,
  };
}
