import { formatCalendarDate } from '@kerfmark/contracts';
import { dieSummary, type DieFigures } from '@kerfmark/notices';
import { awardReason, formatMoney } from '@kerfmark/pricing';
import type { Knex } from 'knex';
import { assertMay } from '../access';
import type { AuthUser } from '../auth/passport';
import { badRequest, conflict, HttpError, notFound } from '../lib/httpError';
import { todayIn } from '../lib/todayIn';
import { Award, Bid, type DieRequest } from '../models';
import { closeBiddingInside } from './bids/closeBidding';
import type { ServiceDeps } from './deps';
import { nextPurchaseOrderNumber } from './purchaseOrderNumber';
import type { createPurchaseDocumentService } from './purchaseDocumentService';
import type { createRequestService } from './requestService';
import { transitionRequest } from './requests/requestStatus';
import { tellBidders } from './tellBidders';

type Requests = Pick<ReturnType<typeof createRequestService>, 'factsFor' | 'detail'>;
type Documents = Pick<ReturnType<typeof createPurchaseDocumentService>, 'purchaseOrder'>;

/** The bid chosen for an award, checked: submitted, still valid, and explained when not the lowest. */
export async function chosenBid(
  trx: Knex.Transaction,
  actor: AuthUser,
  requestId: number,
  input: { bidId: number; reason?: string },
): Promise<{ bid: Bid; reason: string | null }> {
  const bid = await Bid.query(trx).findOne({ id: input.bidId, requestId }).withGraphFetched('shop');
  if (!bid || bid.status !== 'submitted') throw notFound('That bid');
  if (bid.validUntil < todayIn(actor.timeZone)) {
    throw new HttpError(
      409,
      'bid_expired',
      `That bid’s price held until ${bid.validUntil}. Ask the shop to confirm it before awarding.`,
    );
  }
  const submitted = await Bid.query(trx).where({ requestId, status: 'submitted' });
  const { needsReason, lowestCents } = awardReason(bid, submitted);
  const reason = input.reason?.trim() || null;
  if (needsReason && !reason) {
    throw badRequest('Say why you chose a bid that is not the lowest total.', {
      reason: `The lowest total is ${formatMoney({ cents: lowestCents, currency: bid.currency })}: write the reason for this choice`,
    });
  }
  return { bid, reason };
}

/** Records the award with its purchase-order number; the unique award per request refuses a second. */
export async function insertAward(
  trx: Knex.Transaction,
  actor: AuthUser,
  requestId: number,
  bid: Bid,
  reason: string | null,
): Promise<Award> {
  const poNumber = await nextPurchaseOrderNumber(trx, new Date());
  try {
    return await Award.query(trx).insertAndFetch({
      requestId,
      bidId: bid.id,
      shopId: bid.shopId,
      revision: bid.revision,
      totalCents: bid.totalCents,
      dieCents: bid.dieCents,
      currency: bid.currency,
      leadDays: bid.leadDays,
      promisedShipDate: bid.promisedShipDate,
      reason,
      awardedBy: actor.id,
      poNumber,
    });
  } catch (error) {
    if ((error as { name?: string }).name === 'UniqueViolationError')
      throw conflict('This request has already been awarded.');
    throw error;
  }
}

/** Every bidder hears the outcome: the winner with its purchase order, the others with thanks. */
export async function tellOutcome(
  trx: Knex.Transaction,
  deps: Pick<ServiceDeps, 'emails' | 'config'>,
  request: DieRequest,
  bid: Bid,
  poNumber: string,
): Promise<void> {
  const link = `/requests/${request.id}`;
  const die = (await trx('dieRequests')
    .where({ id: request.id })
    .first(
      'measuredRuleIn as ruleIn',
      'measuredBoardWidthIn as boardWidthIn',
      'measuredBoardHeightIn as boardHeightIn',
    )) as DieFigures;
  await tellBidders(trx, deps, request.id, (shopId) =>
    shopId === bid.shopId
      ? {
          kind: 'award_won',
          title: `Awarded to you: ${request.title} (${poNumber})`,
          body: (reader) =>
            [
              `Your bid of ${formatMoney({ cents: bid.totalCents, currency: bid.currency }, reader.locale)} on "${request.title}" ` +
                `was awarded. Purchase order ${poNumber} is attached to the request; the promised ship date is ` +
                `${formatCalendarDate(bid.promisedShipDate, reader.locale)}.`,
              dieSummary(die, reader),
            ]
              .filter(Boolean)
              .join(' '),
          link,
        }
      : {
          kind: 'award_lost',
          title: `Not awarded: ${request.title}`,
          body: `Thank you for bidding on "${request.title}". This job was not awarded to your shop.`,
          link,
        },
  );
}

/**
 * Awards one bid, once: the request row is locked, so a second award waits and then finds the
 * request awarded (409); the unique award per request backs that up.
 */
export async function awardBid(
  deps: ServiceDeps,
  requests: Requests,
  documents: Documents,
  actor: AuthUser,
  requestId: number,
  input: { bidId: number; reason?: string },
) {
  const awardId = await deps.knex.transaction(async (trx) => {
    const { request, facts } = await requests.factsFor(actor, requestId, trx);
    // Before any bid is read: a request whose bids are sealed (or sealed for good) says nothing of them.
    assertMay(actor, facts, 'award');
    if (request.status === 'open') await closeBiddingInside(trx, deps, actor, request);
    const { bid, reason } = await chosenBid(trx, actor, requestId, input);
    const award = await insertAward(trx, actor, requestId, bid, reason);
    await transitionRequest(trx, actor, requestId, 'award', {
      reminders: deps.reminders,
      detail: { bidId: bid.id, poNumber: award.poNumber, reason },
    });
    await tellOutcome(trx, deps, request, bid, award.poNumber);
    return award.id;
  });
  // The PDF is made and kept now; should the store be down, it is made again when opened.
  documents
    .purchaseOrder(actor, awardId)
    .catch((error: unknown) => deps.logger.warn({ err: error, awardId }, 'purchase order PDF not stored yet'));
  return requests.detail(actor, requestId);
}

/** Purchasing's award of a bid. */
export function createAwardService(deps: ServiceDeps, requests: Requests, documents: Documents) {
  return {
    award: (actor: AuthUser, requestId: number, input: { bidId: number; reason?: string }) =>
      awardBid(deps, requests, documents, actor, requestId, input),
  };
}
