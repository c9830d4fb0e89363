import type { DieRequestSummary, OpenRequestRow, OpenRequestsQuery, Page, RequestListQuery } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { AuthUser } from '../../auth/passport';
import { containsPattern } from '../../lib/containsPattern';
import { distanceMiles } from '../../lib/distanceMiles';
import { postcodeCentre } from '../../lib/postcodeCentre';
import { DieRequest } from '../../models';
import { openRequestsPage } from './openRequestsPage';
import { toSummary } from '../../dto/requestViews';

/** The printer's own requests: filtered, sorted and paged. */
export async function listOwnRequests(
  actor: AuthUser,
  q: z.output<typeof RequestListQuery>,
): Promise<Page<DieRequestSummary>> {
  const base = DieRequest.query().where('die_requests.organisationId', actor.organisationId);
  if (q.status) base.where('die_requests.status', q.status);
  if (q.pressId) base.where('die_requests.pressId', q.pressId);
  if (q.needByFrom) base.where('die_requests.needByDate', '>=', q.needByFrom);
  if (q.needByTo) base.where('die_requests.needByDate', '<=', q.needByTo);
  if (q.q) {
    const like = containsPattern(q.q);
    base.where((b) => b.whereILike('die_requests.title', like).orWhereILike('die_requests.jobReference', like));
  }
  const desc = q.sort.startsWith('-');
  const column = q.sort.replace('-', '');
  const result = await base
    .withGraphFetched('[organisation, press, files(byUpload)]')
    .orderByRaw(`?? ${desc ? 'DESC' : 'ASC'} NULLS LAST, die_requests.id DESC`, [
      `die_requests.${column.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`)}`,
    ])
    .page(q.page - 1, q.pageSize);
  return { items: result.results.map(toSummary), total: result.total, page: q.page, pageSize: q.pageSize };
}

/** The open requests a die shop may bid on: filtered, sorted and paged by the database. */
export async function openRequestsFor(
  knex: Knex,
  actor: AuthUser,
  q: z.output<typeof OpenRequestsQuery>,
  knownTotal?: number,
): Promise<Page<OpenRequestRow>> {
  const from = postcodeCentre(actor.orgPostcode);
  // Distances to the delivery postcodes open requests use, only those the dataset places.
  const miles: Array<{ postcode: string; miles: number }> = [];
  if (from) {
    const postcodes = await knex('dieRequests')
      .where({ status: 'open' })
      .whereNotNull('deliveryPostcode')
      .distinct('deliveryPostcode');
    for (const { deliveryPostcode: postcode } of postcodes) {
      const centre = postcodeCentre(postcode);
      if (centre) miles.push({ postcode, miles: distanceMiles(from, centre) });
    }
  }
  const { rows, total } = await openRequestsPage(knex, actor.organisationId, q, miles, knownTotal);
  return { items: rows, total, page: q.page, pageSize: q.pageSize };
}
