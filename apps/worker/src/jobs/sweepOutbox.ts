import type { Knex } from 'knex';
import type { Mailer } from '../mailer';
import { deliverEmail, type DeliveryResult } from './deliverEmail';
import { consoleLog, sweepEach, type SweepLog } from './sweepEach';

/**
 * Delivers every outbox e-mail that is due: those whose job was lost (Redis down or flushed)
 * and those waiting out a retry. PostgreSQL is the source of truth, not the queue.
 */
export async function sweepOutbox(
  knex: Knex,
  mailer: Mailer,
  from: string,
  log: SweepLog = consoleLog,
  limit = 100,
): Promise<DeliveryResult[]> {
  const due = await knex('email_outbox')
    .where({ status: 'pending' })
    .andWhere('next_attempt_at', '<=', new Date())
    .orderBy('id')
    .limit(limit)
    .pluck('id');
  return (await sweepEach('outbox', due, (id) => deliverEmail(knex, mailer, from, Number(id)), log)).results;
}
