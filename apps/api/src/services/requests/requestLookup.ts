import type { Knex } from 'knex';
import { loadFacts, visibleTo, type RequestFacts } from '../../access';
import type { AuthUser } from '../../auth/passport';
import { notFound } from '../../lib/httpError';
import { DieRequest } from '../../models';

/** The query for a request this user may see. */
export function visibleQuery(actor: AuthUser, id: number, trx?: Knex.Transaction) {
  return visibleTo(DieRequest.query(trx).findById(id), actor);
}

/** The request if this user may see it; anything else is the same 404. */
export async function findVisible(actor: AuthUser, id: number, trx?: Knex.Transaction): Promise<DieRequest> {
  const request = await visibleQuery(actor, id, trx);
  if (!request) throw notFound('That die request');
  return request;
}

/** The printer's own request; a die shop's or another printer's look is a 404. */
export async function findOwned(actor: AuthUser, id: number, trx?: Knex.Transaction): Promise<DieRequest> {
  if (actor.orgKind !== 'printer') throw notFound('That die request');
  const request = await DieRequest.query(trx).findOne({ id, organisationId: actor.organisationId });
  if (!request) throw notFound('That die request');
  return request;
}

/** The request and its facts, locked for the change the caller makes; another organisation's is a 404. */
export async function factsFor(
  actor: AuthUser,
  id: number,
  trx: Knex.Transaction,
): Promise<{ request: DieRequest; facts: RequestFacts }> {
  const found = await loadFacts(trx, id, 'update');
  if (!found || actor.orgKind !== 'printer' || found.request.organisationId !== actor.organisationId)
    throw notFound('That die request');
  return found;
}
