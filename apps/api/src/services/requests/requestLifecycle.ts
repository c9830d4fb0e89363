import { PublishReady } from '@kerfmark/contracts';
import { badRequest, HttpError } from '../../lib/httpError';
import { sealOnCancel } from '../../access';
import type { AuthUser } from '../../auth/passport';
import { parse } from '../../lib/parse';
import type { ServiceDeps } from '../deps';
import { factsFor, findOwned } from './requestLookup';
import { transitionRequest } from './requestStatus';
import { tellBidders } from '../tellBidders';

/** Opens a complete draft for bids: dates, stock and at least one measured dieline. */
export async function publishRequest(deps: ServiceDeps, actor: AuthUser, id: number): Promise<void> {
  await deps.knex.transaction(async (trx) => {
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
    await transitionRequest(trx, actor, id, 'publish', { reminders: deps.reminders });
  });
}

/** Cancels the request. Bids still sealed stay sealed for good (`sealOnCancel`); every bidder is told. */
export async function cancelRequest(deps: ServiceDeps, actor: AuthUser, id: number, reason: string): Promise<void> {
  await deps.knex.transaction(async (trx) => {
    const { request, facts } = await factsFor(actor, id, trx);
    await transitionRequest(trx, actor, id, 'cancel', {
      reminders: deps.reminders,
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
}
