import { formatMoney } from '@kerfmark/pricing';
import { pricedLength, type DielineMetrics } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { AuthUser } from '../auth/passport';
import { badRequest, conflict, HttpError, notFound } from '../lib/httpError';
import { todayIn } from '../lib/todayIn';
import { Award, Bid, DieRequest, Organisation } from '../models';
import { assertMay, biddingOpen } from '../access';
import type { ServiceDeps } from './deps';
import { createAwardDocuments } from './awardDocuments';
import { notifyOrganisation } from './notificationService';
import type { createLibraryService } from './libraryService';
import type { createPriceHistoryService } from './priceHistoryService';
import type { createRequestService } from './requestService';
import { transitionRequest } from './requestStatus';
import { tellBidders } from './tellBidders';
import { primaryFile } from './requestViews';

export function createAwardService(
  deps: ServiceDeps,
  requests: ReturnType<typeof createRequestService>,
  library: ReturnType<typeof createLibraryService>,
  priceHistory: ReturnType<typeof createPriceHistoryService>,
) {
  const { knex, config, logger } = deps;
  const notify = (trx: Knex.Transaction, orgId: number, notice: Parameters<typeof notifyOrganisation>[3]) =>
    notifyOrganisation(trx, { emails: deps.emails, appUrl: config.appUrl }, orgId, notice);

  async function closeInside(trx: Knex.Transaction, actor: AuthUser, request: DieRequest) {
    // Purchasing's early close is the only way, besides the clock, that sealed bids open: every bidder is told.
    const early = biddingOpen(request, new Date());
    await transitionRequest(trx, actor, request.id, 'close-bidding', {
      reminders: deps.reminders,
      patch: { biddingClosedAt: new Date(), closedEarly: early },
      detail: { early },
    });
    await tellBidders(trx, deps, request.id, {
      kind: 'bidding_closed',
      title: `Bidding closed: ${request.title}`,
      body: early
        ? `The buyer closed bidding on "${request.title}" before the deadline. Bids can no longer be changed.`
        : `Bidding on "${request.title}" has closed. Bids can no longer be changed.`,
      link: `/requests/${request.id}`,
    });
  }

  /** The awarded shop of a request, for the moves only that shop may make. */
  async function awardOf(trx: Knex.Transaction | Knex, requestId: number) {
    return Award.query(trx).findOne({ requestId });
  }

  const documents = createAwardDocuments(deps, requests);

  return {
    ...documents,

    async closeBidding(actor: AuthUser, requestId: number) {
      await knex.transaction(async (trx) => {
        await requests.findOwned(actor, requestId, trx);
        const request = await DieRequest.query(trx).findById(requestId).forUpdate().throwIfNotFound();
        await closeInside(trx, actor, request);
      });
      return requests.detail(actor, requestId);
    },

    /**
     * Awards one bid, once: the request row is locked, so a second award waits and then finds the
     * request awarded (409); the unique award per request backs that up.
     */
    async award(actor: AuthUser, requestId: number, input: { bidId: number; reason?: string }) {
      const awardId = await knex.transaction(async (trx) => {
        const { request, facts } = await requests.factsFor(actor, requestId, trx);
        // Before any bid is read: a request whose bids are sealed (or sealed for good) says nothing of them.
        assertMay(actor, facts, 'award');
        if (request.status === 'open') await closeInside(trx, actor, request);
        const bid = await Bid.query(trx).findOne({ id: input.bidId, requestId }).withGraphFetched('shop');
        if (!bid || bid.status !== 'submitted') throw notFound('That bid');
        if (bid.validUntil < todayIn(actor.timeZone)) {
          throw new HttpError(
            409,
            'bid_expired',
            `That bid’s price held until ${bid.validUntil}. Ask the shop to confirm it before awarding.`,
          );
        }
        const others = await Bid.query(trx).where({ requestId, status: 'submitted', currency: bid.currency });
        const lowest = Math.min(...others.map((b) => b.totalCents));
        const reason = input.reason?.trim() || null;
        // Common purchasing practice: passing over the lowest price needs a written reason.
        if (bid.totalCents > lowest && !reason) {
          throw badRequest('Say why you chose a bid that is not the lowest total.', {
            reason: `The lowest total is ${formatMoney({ cents: lowest, currency: bid.currency })}: write the reason for this choice`,
          });
        }
        const { nextval } = (await trx.raw("SELECT nextval('purchase_order_numbers') AS nextval")).rows[0] as {
          nextval: string;
        };
        const poNumber = `PO-${new Date().getUTCFullYear()}-${String(nextval).padStart(5, '0')}`;
        let award: Award;
        try {
          award = await Award.query(trx).insertAndFetch({
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
        await transitionRequest(trx, actor, requestId, 'award', {
          reminders: deps.reminders,
          detail: { bidId: bid.id, poNumber, reason },
        });
        await tellBidders(trx, deps, requestId, (shopId) =>
          shopId === bid.shopId
            ? {
                kind: 'award_won',
                title: `Awarded to you: ${request.title} (${poNumber})`,
                body: `Your bid of ${formatMoney({ cents: bid.totalCents, currency: bid.currency })} on "${request.title}" was awarded. Purchase order ${poNumber} is attached to the request; the promised ship date is ${bid.promisedShipDate}.`,
                link: `/requests/${requestId}`,
              }
            : {
                kind: 'award_lost',
                title: `Not awarded: ${request.title}`,
                body: `Thank you for bidding on "${request.title}". This job was not awarded to your shop.`,
                link: `/requests/${requestId}`,
              },
        );
        return award.id;
      });
      // The PDF is made and kept now; should the store be down, it is made again when opened.
      documents
        .purchaseOrder(actor, awardId)
        .catch((error: unknown) => logger.warn({ err: error, awardId }, 'purchase order PDF not stored yet'));
      return requests.detail(actor, requestId);
    },

    async startProduction(actor: AuthUser, requestId: number) {
      await knex.transaction(async (trx) => {
        const award = await awardOf(trx, requestId);
        if (!award || award.shopId !== actor.organisationId) throw notFound('That die request');
        await transitionRequest(trx, actor, requestId, 'start-production', {
          reminders: deps.reminders,
          awardedShopId: award.shopId,
          patch: { productionStartedAt: new Date() },
        });
        const request = await DieRequest.query(trx).findById(requestId).throwIfNotFound();
        await notify(trx, request.organisationId, {
          kind: 'in_production',
          title: `In production: ${request.title}`,
          body: `${actor.name} started making the die for "${request.title}".`,
          link: `/requests/${requestId}`,
        });
      });
      return requests.detail(actor, requestId);
    },

    async ship(actor: AuthUser, requestId: number, trackingNote: string) {
      await knex.transaction(async (trx) => {
        const award = await awardOf(trx, requestId);
        if (!award || award.shopId !== actor.organisationId) throw notFound('That die request');
        await transitionRequest(trx, actor, requestId, 'ship', {
          reminders: deps.reminders,
          awardedShopId: award.shopId,
          patch: { shippedAt: new Date(), trackingNote },
          detail: { trackingNote },
        });
        const request = await DieRequest.query(trx).findById(requestId).throwIfNotFound();
        await notify(trx, request.organisationId, {
          kind: 'shipped',
          title: `Shipped: ${request.title}`,
          body: `The die for "${request.title}" has shipped. ${trackingNote}`,
          link: `/requests/${requestId}`,
        });
      });
      return requests.detail(actor, requestId);
    },

    /** The die is in: its awarded price and the dieline's metrics join the price history. */
    async receive(actor: AuthUser, requestId: number, input: { condition: 'good' | 'damaged'; notes?: string }) {
      await knex.transaction(async (trx) => {
        await requests.findOwned(actor, requestId, trx);
        const award = await awardOf(trx, requestId);
        if (!award) throw conflict('This request has no award yet.');
        await transitionRequest(trx, actor, requestId, 'receive', {
          reminders: deps.reminders,
          awardedShopId: award.shopId,
          patch: { receivedAt: new Date(), receivedCondition: input.condition, receivedNotes: input.notes ?? null },
          detail: { condition: input.condition },
        });
        const request = await DieRequest.query(trx)
          .findById(requestId)
          .withGraphFetched('files(byUpload)')
          .throwIfNotFound();
        const metrics = primaryFile(request.files)?.metrics as DielineMetrics | null | undefined;
        const shop = await Organisation.query(trx).findById(award.shopId);
        if (metrics) {
          await trx('priceRecords').insert({
            organisationId: request.organisationId,
            requestId,
            awardId: award.id,
            shopId: award.shopId,
            shopName: shop?.name ?? '',
            totalCents: award.totalCents,
            dieCents: award.dieCents,
            currency: award.currency,
            pricedOn: todayIn(actor.timeZone, award.awardedAt),
            ruleLengthIn: pricedLength(metrics.length),
            cutIn: metrics.length.cut,
            creaseIn: metrics.length.crease,
            perfIn: metrics.length.perf,
            kissIn: metrics.length.kiss,
            bends: metrics.bends,
            curves: metrics.curves,
            joints: metrics.joints,
            punches: metrics.punches,
            boardAreaSqIn: metrics.board.width * metrics.board.height,
            complexity: metrics.complexity,
          });
        }
        await library.addReceived(trx, requestId);
        trx.executionPromise.then(() => priceHistory.forget(request.organisationId)).catch(() => undefined);
        await notify(trx, award.shopId, {
          kind: 'received',
          title: `Received: ${request.title}`,
          body: `The buyer received the die for "${request.title}" in ${input.condition} condition.`,
          link: `/requests/${requestId}`,
        });
      });
      return requests.detail(actor, requestId);
    },
  };
}
