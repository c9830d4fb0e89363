import type { Transition } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import { factsOf, refuse, transitionRefusal } from '../../access';
import type { AuthUser } from '../../auth/passport';
import { DieRequest } from '../../models';
import { recordAudit } from '../auditService';
import type { ReminderPlanner } from '../deps';

/**
 * The one place a request changes status: the move must be in the transition table, made by
 * the right side (the printer, or the awarded die shop) and role. Locks the row and audits.
 */
export async function transitionRequest(
  trx: Knex.Transaction,
  actor: AuthUser,
  requestId: number,
  action: string,
  opts: {
    reminders: ReminderPlanner;
    awardedShopId?: number | null;
    detail?: Record<string, unknown>;
    patch?: Partial<DieRequest>;
  },
): Promise<DieRequest> {
  const request = await DieRequest.query(trx).findById(requestId).forUpdate().throwIfNotFound();
  const transition = checkTransition(actor, request, action, opts.awardedShopId ?? null);
  const updated = await request.$query(trx).patchAndFetch({
    ...opts.patch,
    status: transition.to,
    ...(transition.to === 'open' && !request.publishedAt ? { publishedAt: new Date() } : {}),
  });
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

/** The transition-table rule of the access module, as the API answers a refusal. */
export function checkTransition(
  actor: AuthUser,
  request: DieRequest,
  action: string,
  awardedShopId: number | null,
): Transition {
  const answer = transitionRefusal(
    actor,
    factsOf(request, { invitedShopIds: [], bidderShopIds: [], awardedShopId }),
    action,
  );
  if (answer.refusal) throw refuse(answer.refusal);
  return answer.transition!;
}
