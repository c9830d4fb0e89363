import type { z } from 'zod';
import {
  PublishReady,
  type DieRequestCreate,
  type DieRequestDetail,
  type DieRequestSummary,
  type DieRequestUpdate,
  type Page,
  MarketplaceQuery,
  RequestListQuery,
  type RequestQuestionDto,
  type BidDto,
} from '@kerfmark/contracts';
import { checkNeedBy, runHours } from '@kerfmark/pricing';
import type { Knex } from 'knex';
import type { QueryBuilder } from 'objection';
import type { AuthUser } from '../auth/passport';
import { badRequest, conflict, forbidden, HttpError, notFound } from '../lib/httpError';
import { parse } from '../lib/parse';
import { Bid, BidRevision, DieRequest, Organisation, Press, RequestQuestion } from '../models';
import { todayIn } from '../lib/todayIn';
import { distanceMiles } from '../lib/distanceMiles';
import { knownPostcodes, postcodeCentre } from '../lib/postcodeCentre';
import { biddingOpen } from './bidService';
import { recordAudit } from './auditService';
import type { ServiceDeps } from './deps';
import { transitionRequest, allowedActions, isEditable } from './requestStatus';
import { boardPage } from './boardPage';
import { openToShop } from './openToShop';
import { readRequestGraph } from './requestGraph';
import { primaryFile, toBidDto, toFileDto, toPressDto, toSummary } from './requestViews';
import { containsPattern } from '../lib/containsPattern';

/** Statuses a die shop may look at, when the request is open to it. */
const SHOP_VISIBLE = ['open', 'bidding_closed'] as const;

/** Narrows a query to requests this die shop may see: open to every shop, or it was invited. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export function visibleToShop<Q extends QueryBuilder<DieRequest, any>>(query: Q, shopId: number): Q {
  return query.where((visible) =>
    visible
      .where((open) =>
        open
          .whereIn('die_requests.status', [...SHOP_VISIBLE])
          .where(openToShop(DieRequest.knex(), shopId)),
      )
      // A shop that bid keeps seeing the request, to learn the outcome.
      .orWhereExists(Bid.query().whereColumn('bids.requestId', 'die_requests.id').where('bids.shopId', shopId)),
  ) as Q;
}


async function bidDto(bid: Bid): Promise<BidDto> {
  return toBidDto(bid, await BidRevision.query().where({ bidId: bid.id }).orderBy('id'));
}

export function createRequestService({ knex, reminders }: ServiceDeps) {
  /** The query for a request this user may see. */
  function visibleQuery(actor: AuthUser, id: number, trx?: Knex.Transaction) {
    const query = DieRequest.query(trx).findById(id);
    if (actor.orgKind === 'printer') query.where('die_requests.organisationId', actor.organisationId);
    else visibleToShop(query, actor.organisationId);
    return query;
  }

  /** The request if this user may see it; anything else is the same 404. */
  async function findVisible(actor: AuthUser, id: number, trx?: Knex.Transaction): Promise<DieRequest> {
    const request = await visibleQuery(actor, id, trx);
    if (!request) throw notFound('That die request');
    return request;
  }

  async function findOwned(actor: AuthUser, id: number, trx?: Knex.Transaction): Promise<DieRequest> {
    if (actor.orgKind !== 'printer') throw notFound('That die request');
    const request = await DieRequest.query(trx).findOne({ id, organisationId: actor.organisationId });
    if (!request) throw notFound('That die request');
    return request;
  }

  async function checkReferences(trx: Knex.Transaction, actor: AuthUser, input: { pressId?: number | null; invitedShopIds?: number[] }) {
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

  function questionsFor(actor: AuthUser, questions: RequestQuestion[], isOwner: boolean): RequestQuestionDto[] {
    // Answers are for every shop on the request; an unanswered question only for its asker.
    return questions
      .filter((q) => isOwner || q.answer !== null || q.shopId === actor.organisationId)
      .map((q) => ({
        id: q.id,
        question: q.question,
        askedAt: q.askedAt.toISOString(),
        askedByYou: q.shopId === actor.organisationId,
        answer: q.answer,
        answeredAt: q.answeredAt?.toISOString() ?? null,
      }));
  }

  async function detail(actor: AuthUser, id: number): Promise<DieRequestDetail> {
    const isOwner = actor.orgKind === 'printer';
    const [request, ownBid] = await Promise.all([
      readRequestGraph(knex, visibleQuery(actor, id), ['organisation', 'press', 'award', 'files', 'questions', ...(isOwner ? (['invitedShops'] as const) : [])]),
      isOwner ? undefined : Bid.query().findOne({ requestId: id, shopId: actor.organisationId }),
    ]);
    if (!request) throw notFound('That die request');
    const award = request.award ?? null;
    const questions = request.questions ?? [];
    const won = !isOwner && award?.shopId === actor.organisationId;
    const myBid = ownBid ? await bidDto(ownBid) : null;
    const file = primaryFile(request.files);
    const board = file?.analysisStatus === 'done' ? (file.metrics as { board?: { width: number; height: number } } | null)?.board : undefined;
    const press = request.press ?? null;
    const fits =
      board && press
        ? (board.width <= press.maxSheetWidthIn && board.height <= press.maxSheetLengthIn) ||
          (board.height <= press.maxSheetWidthIn && board.width <= press.maxSheetLengthIn)
        : null;
    const hours = press && request.runSheets ? runHours(request.runSheets, press.typicalSpeedSph) : null;
    const needBy = request.needByDate
      ? { runHours: hours, ...checkNeedBy({ today: todayIn(actor.timeZone), needByDate: request.needByDate, leadDays: request.plannedLeadDays, runHours: hours ?? 0 }) }
      : null;
    return {
      ...toSummary(request),
      pieceWidthIn: request.pieceWidthIn,
      pieceHeightIn: request.pieceHeightIn,
      stockName: request.stockName,
      caliperIn: request.caliperIn,
      stockWeightGsm: request.stockWeightGsm,
      grain: request.grain,
      stockKind: request.stockKind,
      stockWeightEntry: request.stockWeightEntry,
      foldAcrossGrain: request.foldAcrossGrain,
      heavyInkOnFold: request.heavyInkOnFold,
      colourBreakOnFold: request.colourBreakOnFold,
      pressId: request.pressId,
      press: press ? toPressDto(press) : null,
      runSheets: request.runSheets,
      plannedLeadDays: request.plannedLeadDays,
      counterWanted: request.counterWanted,
      ejectionRubberWanted: request.ejectionRubberWanted,
      deliveryAddress: isOwner || won ? request.deliveryAddress : null,
      notes: request.notes,
      invitedShops: isOwner ? (request.invitedShops ?? []).map((s) => ({ id: s.id, name: s.name })) : [],
      files: (request.files ?? []).map(toFileDto),
      questions: questionsFor(actor, questions, isOwner),
      allowedActions: allowedActions(actor, request.status, request.organisationId, award?.shopId ?? null),
      isOwner,
      boardFitsPress: fits,
      needBy,
      biddingOpen: biddingOpen(request),
      myBid,
      outcome: isOwner || !award ? null : won ? 'won' : 'not_awarded',
      award:
        award && (isOwner || won)
          ? {
              id: award.id,
              poNumber: award.poNumber,
              shopName: isOwner ? (award.shop?.name ?? null) : null,
              totalCents: award.totalCents,
              currency: award.currency,
              promisedShipDate: award.promisedShipDate,
              reason: isOwner ? award.reason : null,
            }
          : null,
      trackingNote: isOwner || won ? request.trackingNote : null,
      shippedAt: request.shippedAt?.toISOString() ?? null,
      receivedAt: isOwner || won ? (request.receivedAt?.toISOString() ?? null) : null,
      receivedCondition: isOwner || won ? request.receivedCondition : null,
      lateFlaggedAt: isOwner || won ? (request.lateFlaggedAt?.toISOString() ?? null) : null,
    };
  }

  return {
    visibleQuery,
    findVisible,
    findOwned,
    detail,

    async list(actor: AuthUser, q: z.output<typeof RequestListQuery>): Promise<Page<DieRequestSummary>> {
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
        .orderByRaw(`?? ${desc ? 'DESC' : 'ASC'} NULLS LAST, die_requests.id DESC`, [`die_requests.${column.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`)}`])
        .page(q.page - 1, q.pageSize);
      return { items: result.results.map(toSummary), total: result.total, page: q.page, pageSize: q.pageSize };
    },

    /** The board of open requests a die shop may bid on: filtered, sorted and paged by the database. */
    async marketplace(actor: AuthUser, q: z.output<typeof MarketplaceQuery>): Promise<Page<DieRequestSummary>> {
      const from = postcodeCentre(actor.orgPostcode);
      const miles = from ? knownPostcodes().map(({ postcode, centre }) => ({ postcode, miles: distanceMiles(from, centre) })) : [];
      const { rows, total } = await boardPage(knex, actor.organisationId, q, miles);
      return {
        items: rows.map(({ request, ...row }) => ({ ...toSummary(request), ...row })),
        total,
        page: q.page,
        pageSize: q.pageSize,
      };
    },

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
        const request = await findOwned(actor, id, trx);
        await DieRequest.query(trx).findById(id).forUpdate();
        if (!isEditable(request.status)) {
          throw conflict('Only a draft or an open request can be changed.');
        }
        if (request.status === 'open' && patch.bidDeadline && new Date(patch.bidDeadline).getTime() <= Date.now()) {
          throw badRequest('The bid deadline must be in the future.', { bidDeadline: 'Choose a time in the future' });
        }
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
          detail: { fields: Object.keys(patch) },
        });
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
          const invited = await trx('request_invitations').where({ requestId: id }).count<{ count: number }[]>('* as count');
          if (Number(invited[0]?.count ?? 0) === 0) {
            throw badRequest('Invite at least one die shop, or open the request to every shop.', { invitedShopIds: 'Invite at least one die shop' });
          }
        }
        await transitionRequest(trx, actor, id, 'publish', { reminders });
      });
      return detail(actor, id);
    },

    async cancel(actor: AuthUser, id: number, reason: string): Promise<DieRequestDetail> {
      await knex.transaction(async (trx) => {
        await findOwned(actor, id, trx);
        await transitionRequest(trx, actor, id, 'cancel', { reminders, detail: { reason } });
      });
      return detail(actor, id);
    },

    async ask(actor: AuthUser, id: number, question: string): Promise<RequestQuestionDto> {
      if (actor.orgKind !== 'die_shop') throw forbidden('Die shops ask questions; answer them on the request.');
      const request = await findVisible(actor, id);
      if (request.status !== 'open') throw conflict('Questions close with bidding.');
      const row = await RequestQuestion.query().insertAndFetch({ requestId: id, shopId: actor.organisationId, askedBy: actor.id, question });
      return questionsFor(actor, [row], false)[0]!;
    },

    async answer(actor: AuthUser, id: number, questionId: number, answer: string): Promise<RequestQuestionDto> {
      await findOwned(actor, id);
      const question = await RequestQuestion.query().findOne({ id: questionId, requestId: id });
      if (!question) throw notFound('That question');
      const row = await question.$query().patchAndFetch({ answer, answeredBy: actor.id, answeredAt: new Date() });
      return questionsFor(actor, [row], true)[0]!;
    },
  };
}
