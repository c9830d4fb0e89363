import type { DieRequestSummary, OpenRequestRow, OpenRequestsQuery, Page, RequestListQuery } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { AuthUser } from '../../auth/passport';
import { containsPattern } from '../../lib/containsPattern';
import { distanceMiles, type LatLon } from '../../lib/distanceMiles';
import { postcodeCentre } from '../../lib/postcodeCentre';
import { DieRequest } from '../../models';
import { boardTag } from './boardVersion';
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

/** Miles from a shop's centre to a postcode, or null when either is not placed by the dataset. */
function milesTo(from: LatLon | null, postcode: string | null): number | null {
  const centre = from && postcodeCentre(postcode);
  return centre ? distanceMiles(from!, centre) : null;
}

/** The distances from a shop to each delivery postcode of the open requests that the dataset places. */
async function deliveryMiles(knex: Knex, from: LatLon | null): Promise<Array<{ postcode: string; miles: number }>> {
  if (!from) return [];
  const postcodes = await knex('dieRequests')
    .where({ status: 'open' })
    .whereNotNull('deliveryPostcode')
    .distinct('deliveryPostcode');
  return postcodes.flatMap(({ deliveryPostcode: postcode }) => {
    const miles = milesTo(from, postcode);
    return miles === null ? [] : [{ postcode, miles }];
  });
}

/**
 * The open requests a die shop may bid on, filtered, sorted and paged by the database, with the
 * page's tag. Distances are worked out for the page's rows alone, unless the page is sorted by
 * distance, when the database needs them all.
 */
export async function openRequestsFor(
  knex: Knex,
  actor: AuthUser,
  q: z.output<typeof OpenRequestsQuery>,
): Promise<{ page: Page<OpenRequestRow>; tag: string }> {
  const from = postcodeCentre(actor.orgPostcode);
  const miles = q.sort.replace('-', '') === 'distance' ? await deliveryMiles(knex, from) : null;
  const { rows, version } = await openRequestsPage(knex, actor, q, miles);
  const roundMiles = (miles: number | null) => (miles === null ? null : Math.round(miles));
  // Each row written out field by field: the answer carries exactly what the board shows.
  const items = rows.map((row): OpenRequestRow => ({
    id: row.id,
    title: row.title,
    jobReference: row.jobReference,
    organisationName: row.organisationName,
    quantity: row.quantity,
    ups: row.ups,
    ruleTypes: row.ruleTypes,
    needByDate: row.needByDate,
    bidDeadline: row.bidDeadline?.toISOString() ?? null,
    deliveryPostcode: row.deliveryPostcode,
    length: row.length,
    complexity: row.complexity,
    analysisStatus: row.analysisStatus,
    distanceMiles: roundMiles(
      row.distanceMiles === undefined ? milesTo(from, row.deliveryPostcode) : row.distanceMiles,
    ),
    declined: row.declined,
    hasBid: row.hasBid,
  }));
  return {
    page: { items, total: version.total, page: q.page, pageSize: q.pageSize },
    tag: boardTag(actor, q, version),
  };
}
