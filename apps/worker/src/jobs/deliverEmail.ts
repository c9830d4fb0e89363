import type { Knex } from 'knex';
import type { Mailer } from '../mailer';

const MAX_ATTEMPTS = 12;

/** Minutes to wait after the n-th failed attempt: 1, 2, 4 … capped at an hour. */
export function retryDelayMs(attempts: number): number {
  return Math.min(60, 2 ** Math.max(0, attempts - 1)) * 60_000;
}

export type DeliveryResult = 'sent' | 'skipped' | 'retry-later' | 'gave-up';

/**
 * Sends one outbox e-mail at most once. The row is locked while it is sent, so a second worker
 * (or the same job run twice) skips it; a failed send is recorded and retried later with backoff.
 */
export async function deliverEmail(
  knex: Knex,
  mailer: Mailer,
  from: string,
  outboxId: number,
): Promise<DeliveryResult> {
  return knex.transaction(async (trx) => {
    const row = await trx('email_outbox').where({ id: outboxId, status: 'pending' }).forUpdate().skipLocked().first();
    if (!row) return 'skipped';
    try {
      await mailer.sendMail({
        from,
        to: row.to_address,
        subject: row.subject,
        text: row.text_body,
        html: row.html_body ?? undefined,
        // A stable id lets a receiving server drop a copy should we ever send one again.
        messageId: `<outbox-${row.id}@kerfmark>`,
      });
    } catch (error) {
      const attempts = row.attempts + 1;
      const gaveUp = attempts >= MAX_ATTEMPTS;
      await trx('email_outbox')
        .where({ id: outboxId })
        .update({
          attempts,
          last_error: String((error as Error).message ?? error).slice(0, 500),
          next_attempt_at: new Date(Date.now() + retryDelayMs(attempts)),
          status: gaveUp ? 'failed' : 'pending',
        });
      return gaveUp ? 'gave-up' : 'retry-later';
    }
    await trx('email_outbox')
      .where({ id: outboxId })
      .update({ status: 'sent', sent_at: new Date(), attempts: row.attempts + 1 });
    return 'sent';
  });
}
