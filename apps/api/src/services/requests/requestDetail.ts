import type { DieRequestDetail } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import { factsOf, presentToOwner, presentToShop } from '../../access';
import type { AuthUser } from '../../auth/passport';
import { notFound } from '../../lib/httpError';
import { Bid } from '../../models';
import { readRequestGraph } from './requestGraph';
import { visibleQuery } from './requestLookup';
import { bidWithRevisions } from '../bids/bidWithRevisions';

/** A request's page as this user may see it: the owner's view, or a die shop's with its own bid. */
export async function requestDetail(knex: Knex, actor: AuthUser, id: number): Promise<DieRequestDetail> {
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
    : presentToShop(request, facts, actor, ownBid ? await bidWithRevisions(ownBid) : null, now);
}
