import { formatInZone } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { DieRequest } from '../../models';
import type { ServiceDeps } from '../deps';
import { tellBidders } from '../tellBidders';

/** Every bidder hears of a new deadline, in its own time zone. */
export async function tellOfDeadline(
  trx: Knex.Transaction,
  deps: Pick<ServiceDeps, 'emails' | 'config'>,
  request: DieRequest,
  to: Date,
): Promise<void> {
  const zones = new Map(
    (
      (await trx('organisations')
        .whereIn('id', trx('bids').where({ requestId: request.id }).select('shopId'))
        .select('id', 'timeZone')) as Array<{ id: number; timeZone: string }>
    ).map((o) => [o.id, o.timeZone]),
  );
  await tellBidders(trx, deps, request.id, (shopId) => ({
    kind: 'deadline_changed',
    title: `New bid deadline: ${request.title}`,
    body: `The bid deadline on "${request.title}" is now ${formatInZone(to, zones.get(shopId) ?? 'UTC')}. You can revise or withdraw your bid until then.`,
    link: `/requests/${request.id}`,
  }));
}
