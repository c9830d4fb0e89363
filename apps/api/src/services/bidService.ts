import { formatInZone, type BidDto } from '@kerfmark/contracts';
import { addWorkingDays, sumCents } from '@kerfmark/pricing';
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { BidInput as BidInputSchema } from '@kerfmark/contracts';
import { assertMay, biddingOpen, loadFacts, maySee } from '../access';
import type { AuthUser } from '../auth/passport';
import { badRequest, HttpError, notFound } from '../lib/httpError';
import { todayIn } from '../lib/todayIn';
import { Bid, BidRevision, DieRequest } from '../models';
import { recordAudit } from './auditService';
import type { ServiceDeps } from './deps';
import type { createPriceHistoryService } from './priceHistoryService';
import type { createRequestService } from './requestService';
import { compareSubmittedBids } from './bidComparison';
import { closeBiddingInside } from './closeBidding';
import { toBidDto } from './requestViews';

type ParsedBid = z.output<typeof BidInputSchema>;

export function createBidService(
  deps: ServiceDeps,
  requests: ReturnType<typeof createRequestService>,
  priceHistory: ReturnType<typeof createPriceHistoryService>,
) {
  const { knex, reminders } = deps;
  const closedError = (request: DieRequest, timeZone: string) =>
    new HttpError(
      409,
      'bidding_closed',
      request.bidDeadline && request.status === 'open'
        ? `Bidding on this request closed at ${formatInZone(request.bidDeadline, timeZone)}.`
        : 'This request is not open for bids.',
    );

  /** The terms of a bid as the server computes them: totals from the lines, the ship date from the lead time. */
  async function terms(trx: Knex.Transaction, actor: AuthUser, request: DieRequest, input: ParsedBid) {
    const today = todayIn(actor.timeZone);
    if (input.validUntil < today)
      throw badRequest('The price must hold until today at least.', { validUntil: 'Choose today or later' });
    const deadlineDay = request.bidDeadline ? todayIn(actor.timeZone, request.bidDeadline) : today;
    if (input.validUntil < deadlineDay) {
      throw badRequest('The price must hold at least until the bid deadline.', {
        validUntil: `Choose ${deadlineDay} or later`,
      });
    }
    const holidays = new Set<string>(
      // knex's pluck() misses columns under the snake-case mappers, so select and map instead.
      (await trx('shopHolidays').where({ shopId: actor.organisationId }).select('date')).map((h: { date: string }) =>
        String(h.date),
      ),
    );
    return {
      lines: input.lines,
      currency: input.currency,
      totalCents: sumCents(input.lines.map((l) => l.amountCents)),
      dieCents: sumCents(input.lines.filter((l) => l.kind === 'die').map((l) => l.amountCents)),
      leadDays: input.leadDays,
      promisedShipDate: addWorkingDays(today, input.leadDays, holidays),
      validUntil: input.validUntil,
      notes: input.notes ?? null,
    };
  }

  /** The shop's own bid, locked, if it may still change it: no other shop's bid is ever found. */
  async function ownBid(trx: Knex.Transaction, actor: AuthUser, bidId: number, action: 'revise' | 'withdraw') {
    const bid = await Bid.query(trx).findOne({ id: bidId, shopId: actor.organisationId }).forUpdate();
    const found = bid && (await loadFacts(trx, bid.requestId, 'share'));
    if (!bid || !found) throw notFound('That bid');
    if (!biddingOpen(found.facts, new Date())) throw closedError(found.request, actor.timeZone);
    assertMay(actor, found.facts, action);
    return { bid, request: found.request };
  }

  async function withRevisions(bid: Bid): Promise<BidDto> {
    return toBidDto(bid, await BidRevision.query().where({ bidId: bid.id }).orderBy('id'));
  }

  const revisionRow = (bid: Bid, action: BidRevision['action'], actor: AuthUser) => ({
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
  });

  return {
    async submit(actor: AuthUser, requestId: number, input: ParsedBid): Promise<BidDto> {
      const bid = await knex.transaction(async (trx) => {
        const found = await loadFacts(trx, requestId, 'share');
        if (!found || !maySee(actor, found.facts)) throw notFound('That die request');
        const { request, facts } = found;
        if (!biddingOpen(facts, new Date())) throw closedError(request, actor.timeZone);
        assertMay(actor, facts, 'bid', new Date(), 'bid_exists');
        let created: Bid;
        try {
          created = await Bid.query(trx).insertAndFetch({
            requestId,
            shopId: actor.organisationId,
            status: 'submitted',
            revision: 1,
            ...(await terms(trx, actor, request, input)),
          });
        } catch (error) {
          // Two submissions from one shop at once: the unique key lets one through.
          if ((error as { name?: string }).name === 'UniqueViolationError') {
            throw new HttpError(
              409,
              'bid_exists',
              'Your shop has already bid on this request: revise that bid instead.',
            );
          }
          throw error;
        }
        await BidRevision.query(trx).insert(revisionRow(created, 'submitted', actor));
        await recordAudit(trx, {
          organisationId: actor.organisationId,
          actorUserId: actor.id,
          entity: 'bid',
          entityId: created.id,
          action: 'submitted',
          detail: { requestId, revision: 1 },
        });
        return created;
      });
      reminders.plan(requestId);
      return withRevisions(bid);
    },
    async revise(actor: AuthUser, bidId: number, input: ParsedBid): Promise<BidDto> {
      const bid = await knex.transaction(async (trx) => {
        const { bid, request } = await ownBid(trx, actor, bidId, 'revise');
        // A revision restates the price; notes it leaves out stay as they were (null clears them).
        const restated = input.notes === undefined ? { ...input, notes: bid.notes } : input;
        const revised = await bid.$query(trx).patchAndFetch({
          ...(await terms(trx, actor, request, restated)),
          status: 'submitted',
          revision: bid.revision + 1,
          updatedAt: new Date(),
        });
        await BidRevision.query(trx).insert(revisionRow(revised, 'revised', actor));
        await recordAudit(trx, {
          organisationId: actor.organisationId,
          actorUserId: actor.id,
          entity: 'bid',
          entityId: bid.id,
          action: 'revised',
          detail: { revision: revised.revision },
        });
        return revised;
      });
      reminders.plan(bid.requestId);
      return withRevisions(bid);
    },

    async withdraw(actor: AuthUser, bidId: number): Promise<BidDto> {
      const bid = await knex.transaction(async (trx) => {
        const { bid } = await ownBid(trx, actor, bidId, 'withdraw');
        if (bid.status === 'withdrawn') return bid;
        const withdrawn = await bid.$query(trx).patchAndFetch({ status: 'withdrawn', updatedAt: new Date() });
        await BidRevision.query(trx).insert(revisionRow(withdrawn, 'withdrawn', actor));
        await recordAudit(trx, {
          organisationId: actor.organisationId,
          actorUserId: actor.id,
          entity: 'bid',
          entityId: bid.id,
          action: 'withdrawn',
        });
        return withdrawn;
      });
      reminders.plan(bid.requestId);
      return withRevisions(bid);
    },

    /**
     * The shop's own past prices, from the dies it made that were received: the middle (median)
     * die price per inch of rule and per bend, per currency. Only its own awards count.
     */
    async estimateAid(
      actor: AuthUser,
    ): Promise<Array<{ currency: string; dies: number; centsPerInch: number | null; centsPerBend: number | null }>> {
      const rows = await knex('priceRecords')
        .where({ shopId: actor.organisationId })
        .groupBy('currency')
        .select('currency')
        .count('* as dies')
        .select(
          knex.raw(
            'percentile_cont(0.5) within group (order by die_cents / nullif(rule_length_in, 0)) as cents_per_inch',
          ),
        )
        .select(
          knex.raw(
            'percentile_cont(0.5) within group (order by die_cents / nullif(bends, 0)::numeric) as cents_per_bend',
          ),
        );
      return (
        rows as Array<{ currency: string; dies: number; centsPerInch: number | null; centsPerBend: number | null }>
      ).map((r) => ({
        currency: r.currency,
        dies: Number(r.dies),
        centsPerInch: r.centsPerInch === null ? null : Math.round(Number(r.centsPerInch)),
        centsPerBend: r.centsPerBend === null ? null : Math.round(Number(r.centsPerBend)),
      }));
    },

    async mine(actor: AuthUser, requestId: number): Promise<BidDto | null> {
      if (actor.orgKind !== 'die_shop') return null;
      // A request the shop may not see is the same 404 as everywhere else, not an empty answer.
      await requests.findVisible(actor, requestId);
      const bid = await Bid.query().findOne({ requestId, shopId: actor.organisationId });
      return bid ? withRevisions(bid) : null;
    },

    async decline(actor: AuthUser, requestId: number, reason: string): Promise<void> {
      const found = await loadFacts(knex, requestId);
      if (!found) throw notFound('That die request');
      assertMay(actor, found.facts, 'decline');
      await knex('requestDeclines')
        .insert({ requestId, shopId: actor.organisationId, reason, createdBy: actor.id })
        .onConflict(['requestId', 'shopId'])
        .merge(['reason', 'createdBy']);
    },

    /** The sealed bids, opened: only the printer, and only once the sealed-bid rule opens them. */
    compare: (actor: AuthUser, requestId: number) =>
      compareSubmittedBids(knex, requests, priceHistory, actor, requestId),

    /** Purchasing closes bidding (early, or after the deadline before awarding). */
    async closeBidding(actor: AuthUser, requestId: number) {
      await knex.transaction(async (trx) => {
        await requests.findOwned(actor, requestId, trx);
        const request = await DieRequest.query(trx).findById(requestId).forUpdate().throwIfNotFound();
        await closeBiddingInside(trx, deps, actor, request);
      });
      return requests.detail(actor, requestId);
    },
  };
}
