import { formatInZone } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { DieRequest } from '../../models';
import type { ServiceDeps } from '../deps';
import { tellBidders } from '../tellBidders';

/** Every bidder hears of a new deadline, each reader in their own zone and locale. */
export async function tellOfDeadline(
  trx: Knex.Transaction,
  deps: Pick<ServiceDeps, 'emails' | 'config'>,
  request: DieRequest,
  to: Date,
): Promise<void> {
  await tellBidders(trx, deps, request.id, {
    kind: 'deadline_changed',
    title: `New bid deadline: ${request.title}`,
    body: (reader) =>
      `The bid deadline on "${request.title}" is now ${formatInZone(to, reader.timeZone, reader.locale)}. You can revise or withdraw your bid until then.`,
    link: `/requests/${request.id}`,
  });
}
