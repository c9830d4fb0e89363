import type { z } from 'zod';
import {
  PublishReady,
  type DieRequestCreate,
  type DieRequestDetail,
  type DieRequestUpdate,
  OpenRequestsQuery,
  RequestListQuery,
  type BidDto,
} from '@kerfmark/contracts';
import type { Knex } from 'knex';
import {
  assertMay,
  deadlineMoveRefusal,
  factsOf,
  loadFacts,
  presentToOwner,
  presentToShop,
  refuse,
  sealOnCancel,
  visibleTo,
  type RequestFacts,
} from '../access';
import type { AuthUser } from '../auth/passport';
import { badRequest, HttpError, notFound } from '../lib/httpError';
import { parse } from '../lib/parse';
import { Bid, BidRevision, DieRequest, Organisation, Press } from '../models';
import { recordAudit } from './auditService';
import type { ServiceDeps } from './deps';
import { transitionRequest } from './requestStatus';
import { readRequestGraph } from './requestGraph';
import { toBidDto } from './requestViews';
import { tellBidders } from './tellBidders';
import { tellOfDeadline } from './tellOfDeadline';
import { openRequestsFor, dieShops, listOwnRequests } from './requestLists';
import { answerQuestion, askQuestion } from './requestQuestions';

async function bidDto(bid: Bid): Promise<BidDto> {
  return toBidDto(bid, await BidRevision.query().where({ bidId: bid.id }).orderBy('id'));
}

export function createRequestService(deps: ServiceDeps) {
  const { knex, reminders } = deps;
  /** The query for a request this user may see. */
  function visibleQuery(actor: AuthUser, id: number, trx?: Knex.Transaction) {
    return visibleTo(DieRequest.query(trx).findById(id), actor);
  }

  /** The request if this user may see it; anything else is the same 404. */
  async function findVisible(actor: AuthUser, id: number, trx?: Knex.Transaction): Promise<DieRequest> {
    const request = await visibleQuery(actor, id, trx);
    if (!request) throw notFound('That die request');
    return request;
  }

  /** The request and its facts, locked for the change the caller makes; another organisation's is a 404. */
  async function factsFor(
    actor: AuthUser,
    id: number,
    trx: Knex.Transaction,
  ): Promise<{ request: DieRequest; facts: RequestFacts }> {
    const found = await loadFacts(trx, id, 'update');
    if (!found || actor.orgKind !== 'printer' || found.request.organisationId !== actor.organisationId)
      throw notFound('That die request');
    return found;
  }

  async function findOwned(actor: AuthUser, id: number, trx?: Knex.Transaction): Promise<DieRequest> {
    if (actor.orgKind !== 'printer') throw notFound('That die request');
    const request = await DieRequest.query(trx).findOne({ id, organisationId: actor.organisationId });
    if (!request) throw notFound('That die request');
    return request;
  }

  async function checkReferences(
    trx: Knex.Transaction,
    actor: AuthUser,
    input: { pressId?: number | null; invitedShopIds?: number[] },
  ) {
    if (input.pressId) {
      const press = await Press.query(trx).findOne({ id: input.pressId, organisationId: actor.organisationId });
      if (!press) throw badRequest('Choose one of your presses.', { pressId: 'Choose one of your presses' });
    }
    if (input.invitedShopIds?.length) {
      const shops = await Organisation.query(trx).whereIn('id', input.invitedShopIds).where({ kind: 'die_shop' });
      if (shops.length !== new Set(input.invitedShopIds).size) {
        throw badRequest('Invite die shops only.', { invitedShopIds: 'Choose die shops from the list' });
      }
    }
  }

  async function setInvitations(trx: Knex.Transaction, requestId: number, shopIds: number[]) {
    await trx('request_invitations').where({ requestId }).whereNotIn('shopId', shopIds).delete();
    if (shopIds.length) {
      await trx('request_invitations')
        .insert([...new Set(shopIds)].map((shopId) => ({ requestId, shopId })))
        .onConflict(['requestId', 'shopId'])
        .ignore();
    }
  }

  async function detail(actor: AuthUser, id: number): Promise<DieRequestDetail> {
    const isOwner = actor.orgKind === 'printer';
    const [request, ownBid] = await Promise.all([
      readRequestGraph(knex, visibleQuery(actor, id), [
        'organisation',
        'press',
        'award',
        'files',
        'questions',
        'ties',
        ...(isOwner ? (['invitedShops'] as const) : []),
      ]),
      isOwner ? undefined : Bid.query().findOne({ requestId: id, shopId: actor.organisationId }),
    ]);
    if (!request) throw notFound('That die request');
    const facts = factsOf(request, request.ties!);
    const now = new Date();
    return isOwner
      ? presentToOwner(request, facts, actor, now)
      : presentToShop(request, facts, actor, ownBid ? await bidDto(ownBid) : null, now);
  }

  return {
    visibleQuery,
    findVisible,
    findOwned,
    factsFor,
    detail,

    list: (actor: AuthUser, q: z.output<typeof RequestListQuery>) => listOwnRequests(actor, q),
    dieShops,
    /** The open requests a die shop may bid on: filtered, sorted and paged by the database. */
    openRequests: (actor: AuthUser, q: z.output<typeof OpenRequestsQuery>) => openRequestsFor(knex, actor, q),

    async create(actor: AuthUser, input: DieRequestCreate): Promise<DieRequestDetail> {
      const { invitedShopIds = [], ...fields } = input;
      const id = await knex.transaction(async (trx) => {
        await checkReferences(trx, actor, { pressId: fields.pressId, invitedShopIds });
        const request = await DieRequest.query(trx).insertAndFetch({
          ...fields,
          organisationId: actor.organisationId,
          createdBy: actor.id,
          status: 'draft',
        } as Partial<DieRequest>);
        await setInvitations(trx, request.id, invitedShopIds);
        await recordAudit(trx, {
          organisationId: actor.organisationId,
          actorUserId: actor.id,
          entity: 'die_request',
          entityId: request.id,
          action: 'created',
        });
        return request.id;
      });
      return detail(actor, id);
    },

    async update(actor: AuthUser, id: number, patch: DieRequestUpdate): Promise<DieRequestDetail> {
      await knex.transaction(async (trx) => {
        const { request, facts } = await factsFor(actor, id, trx);
        const now = new Date();
        assertMay(actor, facts, 'edit', now);
        const movesDeadline =
          'bidDeadline' in patch &&
          (patch.bidDeadline ? new Date(patch.bidDeadline).getTime() : null) !==
            (request.bidDeadline?.getTime() ?? null);
        if (movesDeadline) {
          const to = patch.bidDeadline ? new Date(patch.bidDeadline) : null;
          if (request.status === 'open' && to && to.getTime() <= now.getTime()) {
            throw badRequest('The bid deadline must be in the future.', { bidDeadline: 'Choose a time in the future' });
          }
          const refusal = deadlineMoveRefusal(actor, facts, to, now);
          if (refusal) throw refuse(refusal);
        }
        const fromDeadline = request.bidDeadline?.toISOString() ?? null; // patch() below overwrites the model's fields
        const { invitedShopIds, ...fields } = patch;
        await checkReferences(trx, actor, { pressId: fields.pressId, invitedShopIds });
        if (Object.keys(fields).length) await request.$query(trx).patch(fields as Partial<DieRequest>);
        if (invitedShopIds) await setInvitations(trx, id, invitedShopIds);
        await recordAudit(trx, {
          organisationId: actor.organisationId,
          actorUserId: actor.id,
          entity: 'die_request',
          entityId: id,
          action: 'updated',
          detail: {
            fields: Object.keys(patch),
            ...(movesDeadline ? { bidDeadline: { from: fromDeadline, to: patch.bidDeadline } } : {}),
          },
        });
        if (movesDeadline && request.status === 'open')
          await tellOfDeadline(trx, deps, request, new Date(patch.bidDeadline!));
        trx.executionPromise.then(() => reminders.plan(id)).catch(() => undefined);
      });
      return detail(actor, id);
    },

    /** Opens a complete draft for bids: dates, stock and at least one measured dieline. */
    async publish(actor: AuthUser, id: number): Promise<DieRequestDetail> {
      await knex.transaction(async (trx) => {
        const request = await findOwned(actor, id, trx);
        await request.$fetchGraph('files', { transaction: trx });
        parse(PublishReady, { ...request, bidDeadline: request.bidDeadline?.toISOString() });
        if (!(request.files ?? []).some((f) => f.analysisStatus === 'done')) {
          throw new HttpError(409, 'dieline_missing', 'Add a dieline that Kerfmark could measure before publishing.');
        }
        if (request.visibility === 'invited') {
          const invited = await trx('request_invitations')
            .where({ requestId: id })
            .count<{ count: number }[]>('* as count');
          if (Number(invited[0]?.count ?? 0) === 0) {
            throw badRequest('Invite at least one die shop, or open the request to every shop.', {
              invitedShopIds: 'Invite at least one die shop',
            });
          }
        }
        await transitionRequest(trx, actor, id, 'publish', { reminders });
      });
      return detail(actor, id);
    },

    /** Cancels the request. Bids still sealed stay sealed for good (`sealOnCancel`); every bidder is told. */
    async cancel(actor: AuthUser, id: number, reason: string): Promise<DieRequestDetail> {
      await knex.transaction(async (trx) => {
        const { request, facts } = await factsFor(actor, id, trx);
        await transitionRequest(trx, actor, id, 'cancel', {
          reminders,
          detail: { reason },
          patch: sealOnCancel(facts, new Date()),
        });
        await tellBidders(trx, deps, id, {
          kind: 'request_cancelled',
          title: `Cancelled: ${request.title}`,
          body: `The buyer cancelled "${request.title}", so it will not be awarded. Bids on it stay sealed.${reason ? ` The reason given: ${reason}` : ''}`,
          link: `/requests/${id}`,
        });
      });
      return detail(actor, id);
    },

    ask: (actor: AuthUser, id: number, question: string) => askQuestion(knex, actor, id, question),
    answer: async (actor: AuthUser, id: number, questionId: number, answer: string) => {
      await findOwned(actor, id);
      return answerQuestion(actor, id, questionId, answer);
    },
  };
}
