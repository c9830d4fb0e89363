import type { BidDto } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import { assertMay, biddingOpen, loadFacts, maySee } from '../access';
import type { AuthUser } from '../auth/passport';
import { HttpError, notFound } from '../lib/httpError';
import { Bid, BidRevision, DieRequest } from '../models';
import { recordAudit } from './auditService';
import { compareSubmittedBids } from './bids/bidComparison';
import { bidTerms, type ParsedBid } from './bids/bidTerms';
import { bidWithRevisions } from './bids/bidWithRevisions';
import { closeBiddingInside } from './bids/closeBidding';
import type { ServiceDeps } from './deps';
import { biddingClosed, ownBid } from './bids/ownBid';
import type { createPriceHistoryService } from './priceHistoryService';
import { requestDetail } from './requests/requestDetail';
import { findOwned, findVisible } from './requests/requestLookup';
import { shopEstimateAid } from './bids/shopEstimateAid';

/** The revision history row of a bid as it now stands. */
function revisionRow(bid: Bid, action: BidRevision['action'], actor: AuthUser) {
  return {
    bidId: bid.id,
    revision: bid.revision,
    action,
    lines: bid.lines,
    currency: bid.currency,
    totalCents: bid.totalCents,
    leadDays: bid.leadDays,
    promisedShipDate: bid.promisedShipDate,
    validUntil: bid.validUntil,
    notes: bid.notes,
    createdBy: actor.id,
  };
}

/** Records the bid's new state in its history and the audit log. */
async function recordBidChange(
  trx: Knex.Transaction,
  actor: AuthUser,
  bid: Bid,
  action: BidRevision['action'],
  detail?: Record<string, unknown>,
) {
  await BidRevision.query(trx).insert(revisionRow(bid, action, actor));
  await recordAudit(trx, {
    organisationId: actor.organisationId,
    actorUserId: actor.id,
    entity: 'bid',
    entityId: bid.id,
    action,
    ...(detail ? { detail } : {}),
  });
}

/** A shop's first, sealed bid on a request it may see, while bidding is open; one per shop. */
export async function submitBid(knex: Knex, actor: AuthUser, requestId: number, input: ParsedBid): Promise<Bid> {
  return knex.transaction(async (trx) => {
    const found = await loadFacts(trx, requestId, 'share');
    if (!found || !maySee(actor, found.facts)) throw notFound('That die request');
    const { request, facts } = found;
    if (!biddingOpen(facts, new Date())) throw biddingClosed(request, actor.timeZone);
    assertMay(actor, facts, 'bid', new Date(), 'bid_exists');
    let created: Bid;
    try {
      created = await Bid.query(trx).insertAndFetch({
        requestId,
        shopId: actor.organisationId,
        status: 'submitted',
        revision: 1,
        ...(await bidTerms(trx, actor, request, input)),
      });
    } catch (error) {
      // Two submissions from one shop at once: the unique key lets one through.
      if ((error as { name?: string }).name === 'UniqueViolationError') {
        throw new HttpError(409, 'bid_exists', 'Your shop has already bid on this request: revise that bid instead.');
      }
      throw error;
    }
    await recordBidChange(trx, actor, created, 'submitted', { requestId, revision: 1 });
    return created;
  });
}

/** The shop restates its price before the deadline; notes it leaves out stay as they were (null clears them). */
export async function reviseBid(knex: Knex, actor: AuthUser, bidId: number, input: ParsedBid): Promise<Bid> {
  return knex.transaction(async (trx) => {
    const { bid, request } = await ownBid(trx, actor, bidId, 'revise');
    const restated = input.notes === undefined ? { ...input, notes: bid.notes } : input;
    const revised = await bid.$query(trx).patchAndFetch({
      ...(await bidTerms(trx, actor, request, restated)),
      status: 'submitted',
      revision: bid.revision + 1,
      updatedAt: new Date(),
    });
    await recordBidChange(trx, actor, revised, 'revised', { revision: revised.revision });
    return revised;
  });
}

/** The shop takes its bid back before the deadline; withdrawing twice changes nothing. */
export async function withdrawBid(knex: Knex, actor: AuthUser, bidId: number): Promise<Bid> {
  return knex.transaction(async (trx) => {
    const { bid } = await ownBid(trx, actor, bidId, 'withdraw');
    if (bid.status === 'withdrawn') return bid;
    const withdrawn = await bid.$query(trx).patchAndFetch({ status: 'withdrawn', updatedAt: new Date() });
    await recordBidChange(trx, actor, withdrawn, 'withdrawn');
    return withdrawn;
  });
}

/** The shop says it will not bid, with its reason; saying it again replaces the reason. */
export async function declineRequest(knex: Knex, actor: AuthUser, requestId: number, reason: string): Promise<void> {
  const found = await loadFacts(knex, requestId);
  if (!found) throw notFound('That die request');
  assertMay(actor, found.facts, 'decline');
  await knex('requestDeclines')
    .insert({ requestId, shopId: actor.organisationId, reason, createdBy: actor.id })
    .onConflict(['requestId', 'shopId'])
    .merge(['reason', 'createdBy']);
}

/** The shop's own bid on a request it may see; a request it may not see is the same 404 as elsewhere. */
export async function shopBid(actor: AuthUser, requestId: number): Promise<BidDto | null> {
  if (actor.orgKind !== 'die_shop') return null;
  await findVisible(actor, requestId);
  const bid = await Bid.query().findOne({ requestId, shopId: actor.organisationId });
  return bid ? bidWithRevisions(bid) : null;
}

/** Purchasing closes bidding (early, or after the deadline before awarding). */
export async function closeBidding(deps: ServiceDeps, actor: AuthUser, requestId: number) {
  await deps.knex.transaction(async (trx) => {
    await findOwned(actor, requestId, trx);
    const request = await DieRequest.query(trx).findById(requestId).forUpdate().throwIfNotFound();
    await closeBiddingInside(trx, deps, actor, request);
  });
}

/** Bids: a shop's sealed bid and its changes, and the printer's opening of them. */
export function createBidService(deps: ServiceDeps, priceHistory: ReturnType<typeof createPriceHistoryService>) {
  const { knex, reminders } = deps;
  /** Runs a change to a bid, then plans the request's reminders again and answers with the bid. */
  const changed = async (change: Promise<Bid>): Promise<BidDto> => {
    const bid = await change;
    reminders.plan(bid.requestId);
    return bidWithRevisions(bid);
  };
  return {
    submit: (actor: AuthUser, requestId: number, input: ParsedBid) => changed(submitBid(knex, actor, requestId, input)),
    revise: (actor: AuthUser, bidId: number, input: ParsedBid) => changed(reviseBid(knex, actor, bidId, input)),
    withdraw: (actor: AuthUser, bidId: number) => changed(withdrawBid(knex, actor, bidId)),
    estimateAid: (actor: AuthUser) => shopEstimateAid(knex, actor),
    mine: shopBid,
    decline: (actor: AuthUser, requestId: number, reason: string) => declineRequest(knex, actor, requestId, reason),
    /** The sealed bids, opened: only the printer, and only once the sealed-bid rule opens them. */
    compare: (actor: AuthUser, requestId: number) => compareSubmittedBids(knex, priceHistory, actor, requestId),
    closeBidding: async (actor: AuthUser, requestId: number) => {
      await closeBidding(deps, actor, requestId);
      return requestDetail(knex, actor, requestId);
    },
  };
}
