import type { DieRequestCreate, DieRequestUpdate } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import { assertMay, deadlineMoveRefusal, refuse, type RequestFacts } from '../../access';
import type { AuthUser } from '../../auth/passport';
import { badRequest } from '../../lib/httpError';
import { DieRequest, Organisation, Press } from '../../models';
import { recordAudit } from '../auditService';
import type { ServiceDeps } from '../deps';
import { changesMeasurement, remeasureFiles, withUpsOfLayout } from './requestLayout';
import { factsFor } from './requestLookup';
import { tellOfDeadline } from './tellOfDeadline';

/** The press is the printer's own and every invited organisation is a die shop. */
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

/** The invitation list becomes exactly `shopIds`. */
async function setInvitations(trx: Knex.Transaction, requestId: number, shopIds: number[]) {
  await trx('request_invitations').where({ requestId }).whereNotIn('shopId', shopIds).delete();
  if (shopIds.length) {
    await trx('request_invitations')
      .insert([...new Set(shopIds)].map((shopId) => ({ requestId, shopId })))
      .onConflict(['requestId', 'shopId'])
      .ignore();
  }
}

/** A new draft request of the printer's, with its invitations. Returns its id. */
export async function createRequest(knex: Knex, actor: AuthUser, input: DieRequestCreate): Promise<number> {
  const { invitedShopIds = [], ...entered } = input;
  const fields = withUpsOfLayout({}, entered);
  return knex.transaction(async (trx) => {
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
}

/** Whether the patch moves the bid deadline, checked against who may move it and how far. */
function deadlineMove(
  actor: AuthUser,
  request: DieRequest,
  facts: RequestFacts,
  patch: DieRequestUpdate,
  now: Date,
): boolean {
  if (!('bidDeadline' in patch)) return false;
  const to = patch.bidDeadline ? new Date(patch.bidDeadline) : null;
  if ((to?.getTime() ?? null) === (request.bidDeadline?.getTime() ?? null)) return false;
  if (request.status === 'open' && to && to.getTime() <= now.getTime()) {
    throw badRequest('The bid deadline must be in the future.', { bidDeadline: 'Choose a time in the future' });
  }
  const refusal = deadlineMoveRefusal(actor, facts, to, now);
  if (refusal) throw refuse(refusal);
  return true;
}

/** Changes only the fields the patch names; bidders are told of a deadline move on an open request. */
export async function updateRequest(deps: ServiceDeps, actor: AuthUser, id: number, patch: DieRequestUpdate) {
  await deps.knex.transaction(async (trx) => {
    const { request, facts } = await factsFor(actor, id, trx);
    const now = new Date();
    assertMay(actor, facts, 'edit', now);
    const movesDeadline = deadlineMove(actor, request, facts, patch, now);
    const fromDeadline = request.bidDeadline?.toISOString() ?? null; // patch() below overwrites the model's fields
    const { invitedShopIds, ...named } = patch;
    const remeasuring = changesMeasurement(request, named); // before patch() overwrites the model
    const fields = withUpsOfLayout(request, named);
    await checkReferences(trx, actor, { pressId: fields.pressId, invitedShopIds });
    if (Object.keys(fields).length) await request.$query(trx).patch(fields as Partial<DieRequest>);
    if (invitedShopIds) await setInvitations(trx, id, invitedShopIds);
    // The layout, the grain and the press go into the measuring: the dielines are measured again.
    const remeasure = remeasuring ? await remeasureFiles(trx, id) : [];
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
    trx.executionPromise
      .then(() => {
        deps.reminders.plan(id);
        for (const f of remeasure) deps.analyses.analyse(f.id, f.attempts);
      })
      .catch(() => undefined);
  });
}
