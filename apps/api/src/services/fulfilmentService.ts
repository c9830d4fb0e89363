import type { Knex } from 'knex';
import type { AuthUser } from '../auth/passport';
import { conflict, notFound } from '../lib/httpError';
import { todayIn } from '../lib/todayIn';
import { Award, DieRequest, Organisation } from '../models';
import type { ServiceDeps } from './deps';
import type { createLibraryService } from './libraryService';
import { notifyOrganisation, type Notice } from './notificationService';
import type { createPriceHistoryService } from './priceHistoryService';
import { receivedDiePriceRecord } from './priceHistory/receivedDiePriceRecord';
import type { createRequestService } from './requestService';
import { transitionRequest } from './requests/requestStatus';
import { primaryFile } from '../dto/requestViews';

type Requests = Pick<ReturnType<typeof createRequestService>, 'findOwned' | 'detail'>;
type Library = Pick<ReturnType<typeof createLibraryService>, 'addReceived'>;
type PriceHistory = Pick<ReturnType<typeof createPriceHistoryService>, 'forget'>;
export interface ReceiveInput {
  condition: 'good' | 'damaged';
  notes?: string;
}

function notify(deps: ServiceDeps, trx: Knex.Transaction, orgId: number, notice: Notice) {
  return notifyOrganisation(trx, { emails: deps.emails, appUrl: deps.config.appUrl }, orgId, notice);
}

/** The award of a request, when the actor is the shop it went to (the only one that makes the die). */
async function awardToActor(trx: Knex.Transaction, actor: AuthUser, requestId: number): Promise<Award> {
  const award = await Award.query(trx).findOne({ requestId });
  if (!award || award.shopId !== actor.organisationId) throw notFound('That die request');
  return award;
}

/** The awarded shop starts making the die; the printer is told. */
export async function startProduction(deps: ServiceDeps, actor: AuthUser, requestId: number): Promise<void> {
  await deps.knex.transaction(async (trx) => {
    const award = await awardToActor(trx, actor, requestId);
    await transitionRequest(trx, actor, requestId, 'start-production', {
      reminders: deps.reminders,
      awardedShopId: award.shopId,
      patch: { productionStartedAt: new Date() },
    });
    const request = await DieRequest.query(trx).findById(requestId).throwIfNotFound();
    await notify(deps, trx, request.organisationId, {
      kind: 'in_production',
      title: `In production: ${request.title}`,
      body: `${actor.name} started making the die for "${request.title}".`,
      link: `/requests/${requestId}`,
    });
  });
}

/** The awarded shop ships the die with a tracking note; the printer is told. */
export async function shipDie(deps: ServiceDeps, actor: AuthUser, requestId: number, trackingNote: string) {
  await deps.knex.transaction(async (trx) => {
    const award = await awardToActor(trx, actor, requestId);
    await transitionRequest(trx, actor, requestId, 'ship', {
      reminders: deps.reminders,
      awardedShopId: award.shopId,
      patch: { shippedAt: new Date(), trackingNote },
      detail: { trackingNote },
    });
    const request = await DieRequest.query(trx).findById(requestId).throwIfNotFound();
    await notify(deps, trx, request.organisationId, {
      kind: 'shipped',
      title: `Shipped: ${request.title}`,
      body: `The die for "${request.title}" has shipped. ${trackingNote}`,
      link: `/requests/${requestId}`,
    });
  });
}

/** The die is in: its awarded price and the dieline's metrics join the price history, the die the library. */
export async function receiveDie(
  deps: ServiceDeps,
  services: { requests: Requests; library: Library; priceHistory: PriceHistory },
  actor: AuthUser,
  requestId: number,
  input: ReceiveInput,
): Promise<void> {
  await deps.knex.transaction(async (trx) => {
    await services.requests.findOwned(actor, requestId, trx);
    const award = await Award.query(trx).findOne({ requestId });
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
    const metrics = primaryFile(request.files)?.metrics;
    const shop = await Organisation.query(trx).findById(award.shopId);
    if (metrics) {
      await trx('priceRecords').insert(
        receivedDiePriceRecord({
          organisationId: request.organisationId,
          requestId,
          awardId: award.id,
          shopId: award.shopId,
          shopName: shop?.name ?? '',
          totalCents: award.totalCents,
          dieCents: award.dieCents,
          currency: award.currency,
          pricedOn: todayIn(actor.timeZone, award.awardedAt),
          metrics,
        }),
      );
    }
    await services.library.addReceived(trx, requestId);
    trx.executionPromise.then(() => services.priceHistory.forget(request.organisationId)).catch(() => undefined);
    await notify(deps, trx, award.shopId, {
      kind: 'received',
      title: `Received: ${request.title}`,
      body: `The buyer received the die for "${request.title}" in ${input.condition} condition.`,
      link: `/requests/${requestId}`,
    });
  });
}

/** The die's way from the awarded shop back to the printer: production, shipping, receiving. */
export function createFulfilmentService(
  deps: ServiceDeps,
  services: { requests: Requests; library: Library; priceHistory: PriceHistory },
) {
  const { requests } = services;
  return {
    startProduction: async (actor: AuthUser, requestId: number) => {
      await startProduction(deps, actor, requestId);
      return requests.detail(actor, requestId);
    },
    ship: async (actor: AuthUser, requestId: number, trackingNote: string) => {
      await shipDie(deps, actor, requestId, trackingNote);
      return requests.detail(actor, requestId);
    },
    receive: async (actor: AuthUser, requestId: number, input: ReceiveInput) => {
      await receiveDie(deps, services, actor, requestId, input);
      return requests.detail(actor, requestId);
    },
  };
}
