import { createHash } from 'node:crypto';
import type { OpenRequestsQuery } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { AuthUser } from '../../auth/passport';
import { matchingOpenRequests } from './openRequestsPage';

// A restart may bring another shape of answer: tags made before it never match.
const BOOT = `${process.pid}-${Date.now()}`;

/**
 * A tag for one page of a shop's board that changes whenever what the page shows may have:
 * the matching requests' count, ids and newest change (migration 20261204000800 stamps every
 * update, the measure trigger's included), the newest change to their printers (a name) and to
 * the shop (its profile), and the shop's own bids and declines. One aggregate query, no
 * row read: a reload that finds nothing new is answered 304 from it.
 */
export async function boardVersion(
  knex: Knex,
  actor: AuthUser,
  q: z.output<typeof OpenRequestsQuery>,
): Promise<string> {
  const shopId = actor.organisationId;
  const requests = matchingOpenRequests(knex, shopId, q)
    .select(knex.raw("count(*) || ':' || coalesce(sum(r.id), 0) || ':' || coalesce(max(r.changed_at)::text, '')"))
    .as('requests');
  const [row] = (await knex
    .select(
      requests,
      knex('organisations').where('id', shopId).select('changedAt').as('shop'),
      knex('organisations')
        .whereIn('id', matchingOpenRequests(knex, shopId, q).select('r.organisationId'))
        .max('changedAt')
        .as('printers'),
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
    .options({ prepare: true })) as Array<Record<string, unknown>>;
  const parts = [BOOT, shopId, actor.orgPostcode, JSON.stringify(q), JSON.stringify(row)];
  return `W/"${createHash('sha256').update(parts.join('|')).digest('base64url').slice(0, 27)}"`;
}
