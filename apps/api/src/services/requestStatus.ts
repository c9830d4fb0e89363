import { findTransition, requestStatusLabels, requestTransitions, type RequestStatus, type Transition } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { AuthUser } from '../auth/passport';
import { conflict, forbidden } from '../lib/httpError';
import { DieRequest } from '../models';
import { recordAudit } from './auditService';
import type { ReminderPlanner } from './deps';

/** A draft or an open request: its fields and dieline files may still change; after that the bids rest on them. */
export function isEditable(status: RequestStatus): boolean {
  return status === 'draft' || status === 'open';
}

/**
 * The one place a request changes status: the move must be in the transition table, made by
 * the right side (the printer, or the awarded die shop) and role. Locks the row and audits.
 */
export async function transitionRequest(
  trx: Knex.Transaction,
  actor: AuthUser,
  requestId: number,
  action: string,
  opts: { reminders: ReminderPlanner; awardedShopId?: number | null; detail?: Record<string, unknown>; patch?: Partial<DieRequest> },
): Promise<DieRequest> {
  const request = await DieRequest.query(trx).findById(requestId).forUpdate().throwIfNotFound();
  const transition = checkTransition(actor, request, action, opts.awardedShopId ?? null);
  const updated = await request
    .$query(trx)
    .patchAndFetch({ ...opts.patch, status: transition.to, ...(transition.to === 'open' && !request.publishedAt ? { publishedAt: new Date() } : {}) });
  await recordAudit(trx, {
    organisationId: request.organisationId,
    actorUserId: actor.id,
    entity: 'die_request',
    entityId: request.id,
    action: `status:${transition.from}->${transition.to}`,
    detail: opts.detail ?? {},
  });
  // Deadlines and recipients follow the status: the worker plans the reminders again.
  trx.executionPromise.then(() => opts.reminders.plan(requestId)).catch(() => undefined);
  return updated;
}

export function checkTransition(actor: AuthUser, request: DieRequest, action: string, awardedShopId: number | null): Transition {
  const transition = findTransition(request.status, action);
  if (!transition) {
    throw conflict(`A request that is ${requestStatusLabels[request.status].toLowerCase()} cannot be moved that way.`);
  }
  const side =
    transition.actor === 'printer' ? actor.orgKind === 'printer' && actor.organisationId === request.organisationId : actor.orgKind === 'die_shop' && actor.organisationId === awardedShopId;
  if (!side) throw forbidden('Your organisation cannot make this change.');
  if (!transition.roles.includes(actor.role)) throw forbidden(`Only ${transition.roles.join(', ')} users can do this.`);
  return transition;
}

/** The actions this user may take on the request now, for the web app's buttons. */
export function allowedActions(actor: AuthUser, status: RequestStatus, ownerOrgId: number, awardedShopId: number | null): string[] {
  // The same rule as checkTransition, without building an error for every action not allowed.
  return requestTransitions
    .filter((t) => t.from === status)
    .filter((t) =>
      t.actor === 'printer'
        ? actor.orgKind === 'printer' && actor.organisationId === ownerOrgId
        : actor.orgKind === 'die_shop' && actor.organisationId === awardedShopId,
    )
    .filter((t) => t.roles.includes(actor.role))
    .map((t) => t.action)
    .filter((action, i, all) => all.indexOf(action) === i);
}
