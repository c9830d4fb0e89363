import { pricedLength, type BidComparisonDto } from '@kerfmark/contracts';
import { compareBids } from '@kerfmark/pricing';
import type { Knex } from 'knex';
import { factsOf, visibleParts } from '../../access';
import type { AuthUser } from '../../auth/passport';
import { HttpError, notFound } from '../../lib/httpError';
import { todayIn } from '../../lib/todayIn';
import type { createPriceHistoryService } from '../priceHistoryService';
import { visibleQuery } from '../requests/requestLookup';
import { readRequestGraph } from '../requests/requestGraph';
import { primaryFile } from '../../dto/requestViews';

/**
 * The sealed bids, opened, side by side: only the printer, and only once the sealed-bid rule
 * opens them; each row says whether awarding it needs a written reason.
 */
export async function compareSubmittedBids(
  knex: Knex,
  priceHistory: Pick<ReturnType<typeof createPriceHistoryService>, 'fairPriceFor'>,
  actor: AuthUser,
  requestId: number,
): Promise<BidComparisonDto> {
  if (actor.orgKind !== 'printer') throw notFound('That die request');
  // For a printer, the requests it may see are its own.
  const request = await readRequestGraph(knex, visibleQuery(actor, requestId), [
    'award',
    'fileSummaries',
    'submittedBids',
    'ties',
  ]);
  if (!request) throw notFound('That die request');
  const bids = request.submittedBids ?? [];
  if (visibleParts(actor, factsOf(request, request.ties!), new Date()).bids !== 'all') {
    throw new HttpError(
      404,
      'bids_sealed',
      'Bids stay sealed until the bid deadline, unless purchasing closes bidding early.',
    );
  }
  const metrics = primaryFile(request.files)?.metrics;
  const ruleLengthIn = metrics ? pricedLength(metrics.length) : null;
  const rows = compareBids(
    bids.map((b) => ({ ...b, bidId: b.id })),
    { ruleLengthIn, needByDate: request.needByDate, today: todayIn(actor.timeZone) },
  );
  const award = request.award ?? null;
  const fair = await priceHistory.fairPriceFor(actor.organisationId, metrics, bids[0]?.currency ?? 'USD');
  return {
    requestId,
    needByDate: request.needByDate,
    priceRuleIn: ruleLengthIn,
    fairPrice: fair.enough
      ? {
          lowCents: fair.band.lowCents,
          typicalCents: fair.band.typicalCents,
          highCents: fair.band.highCents,
          currency: fair.band.currency,
        }
      : null,
    award: award
      ? {
          id: award.id,
          bidId: award.bidId,
          shopName: award.shop?.name ?? '',
          totalCents: award.totalCents,
          currency: award.currency,
          reason: award.reason,
          poNumber: award.poNumber,
          awardedAt: award.awardedAt.toISOString(),
        }
      : null,
    bids: rows.map((row) => ({
      bidId: row.bid.id,
      shopId: row.bid.shopId,
      shopName: row.bid.shopName,
      lines: row.bid.lines,
      currency: row.bid.currency,
      totalCents: row.bid.totalCents,
      dieCents: row.bid.dieCents,
      overLowestCents: row.overLowestCents,
      centsPerInch: row.centsPerInch,
      leadDays: row.bid.leadDays,
      promisedShipDate: row.bid.promisedShipDate,
      daysLate: row.daysLate,
      validUntil: row.bid.validUntil,
      expired: row.expired,
      needsReason: row.needsReason,
      onTimeRate: row.bid.onTimeRate,
      pastJobs: row.bid.pastJobs,
      revision: row.bid.revision,
      best: row.best,
    })),
  };
}
