import type { Knex } from 'knex';
import { EmailOutbox } from '../models';
import type { EmailDispatcher } from './deps';

export interface OutgoingEmail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  kind: string;
}

/**
 * Puts an e-mail in the outbox inside the caller's transaction and hands it to the worker once
 * that transaction commits; a rollback sends nothing.
 */
export async function queueEmail(
  trx: Knex.Transaction,
  emails: EmailDispatcher,
  email: OutgoingEmail,
): Promise<number> {
  const row = await EmailOutbox.query(trx).insert({
    toAddress: email.to,
    subject: email.subject,
    textBody: email.text,
    htmlBody: email.html ?? null,
    kind: email.kind,
  });
  trx.executionPromise.then(() => emails.deliver([row.id])).catch(() => undefined);
  return row.id;
}
