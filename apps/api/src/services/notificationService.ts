import { notifyOrganisation as notify, type Notice } from '@kerfmark/notices';
import type { Knex } from 'knex';
import type { EmailDispatcher } from './deps';

export type { Notice };

/**
 * Tells an organisation's users (in-app and by e-mail, as each user chose) inside the caller's
 * transaction; the e-mails go to the worker once the transaction commits.
 */
export async function notifyOrganisation(
  trx: Knex.Transaction,
  deps: { emails: EmailDispatcher; appUrl: string },
  organisationId: number,
  notice: Notice,
  roles?: readonly string[],
): Promise<void> {
  const outboxIds = await notify(trx, { appUrl: deps.appUrl, organisationId, notice, roles });
  trx.executionPromise.then(() => deps.emails.deliver(outboxIds)).catch(() => undefined);
}
