import type { Knex } from 'knex';
import type { ServiceDeps } from './deps';
import { notifyOrganisation, type Notice } from './notificationService';

/**
 * Tells every shop that bid on the request (withdrawn or not), in the app and by e-mail, inside
 * the caller's transaction. `notice` may depend on the shop (won or not).
 */
export async function tellBidders(
  trx: Knex.Transaction,
  deps: Pick<ServiceDeps, 'emails' | 'config'>,
  requestId: number,
  notice: Notice | ((shopId: number) => Notice),
): Promise<void> {
  const bidders = (await trx('bids').where({ requestId }).select('shopId')) as Array<{ shopId: number }>;
  for (const { shopId } of bidders) {
    await notifyOrganisation(
      trx,
      { emails: deps.emails, appUrl: deps.config.appUrl },
      shopId,
      typeof notice === 'function' ? notice(shopId) : notice,
    );
  }
}
