import type { Queue } from 'bullmq';
import type { Knex } from 'knex';
import type { SendReminderJob } from '@kerfmark/contracts';
import { consoleLog, sweepEach, type SweepLog } from '../jobs/sweepEach';
import { planRequestReminders } from './planRequestReminders';

const ACTIVE = ['open', 'bidding_closed', 'awarded', 'in_production'];

/**
 * Rebuilds the reminder jobs of every active request from PostgreSQL: after Redis loses its
 * data, nothing is lost; reminders whose time has come while it was down go out now.
 */
export async function sweepReminders(
  knex: Knex,
  queue: Queue<SendReminderJob>,
  now = new Date(),
  log: SweepLog = consoleLog,
): Promise<number> {
  const ids = (await knex('die_requests').whereIn('status', ACTIVE).select('id')).map((r: { id: number }) => r.id);
  // Adding is enough here: a reminder that no longer applies checks the request and stays silent.
  const { results } = await sweepEach(
    'reminders',
    ids,
    async (id) => (await planRequestReminders(knex, queue, id, now, { prune: false })).length,
    log,
  );
  return results.reduce((sum, jobs) => sum + jobs, 0);
}
