import type { Queue } from 'bullmq';
import type { Knex } from 'knex';
import { jobNames, reminderJobId, type SendReminderJob } from '@kerfmark/contracts';
import { loadReminderState } from './loadReminderState';
import { planReminders } from './planReminders';

/**
 * Puts a request's reminders on the queue as delayed jobs with ids made from their keys, so
 * planning twice changes nothing; jobs of this request that no longer apply are removed.
 */
export async function planRequestReminders(
  knex: Knex,
  queue: Queue<SendReminderJob>,
  requestId: number,
  now = new Date(),
  opts: { prune?: boolean } = {},
): Promise<string[]> {
  const state = await loadReminderState(knex, requestId);
  const planned = state
    ? planReminders(state).filter((r) => !r.expiresAt || r.expiresAt.getTime() > now.getTime())
    : [];
  const sent = new Set<string>(
    planned.length
      ? (
          await knex('reminders_sent')
            .whereIn(
              'key',
              planned.map((r) => r.key),
            )
            .select('key')
        ).map((r: { key: string }) => r.key)
      : [],
  );
  const wanted = new Set<string>();
  for (const reminder of planned) {
    if (sent.has(reminder.key)) continue;
    const jobId = reminderJobId(reminder.key);
    wanted.add(jobId);
    await queue.add(
      jobNames.sendReminder,
      { requestId, key: reminder.key },
      {
        jobId,
        delay: Math.max(0, reminder.fireAt.getTime() - now.getTime()),
        removeOnComplete: 1000,
        removeOnFail: 5000,
        attempts: 5,
        backoff: { type: 'exponential', delay: 5000 },
      },
    );
  }
  // The jobs last planned for this request are kept in PostgreSQL, so pruning touches this
  // request's jobs only (scanning every delayed job would make the sweep quadratic).
  if (opts.prune !== false) {
    const before = (await knex('reminders_planned').where({ request_id: requestId }).select('job_id')).map(
      (r: { job_id: string }) => r.job_id,
    );
    for (const jobId of before) if (!wanted.has(jobId)) await queue.remove(jobId).catch(() => 0);
    await knex('reminders_planned')
      .where({ request_id: requestId })
      .whereNotIn('job_id', [...wanted])
      .delete();
  }
  if (wanted.size) {
    await knex('reminders_planned')
      .insert([...wanted].map((job_id) => ({ request_id: requestId, job_id })))
      .onConflict(['request_id', 'job_id'])
      .ignore();
  }
  return [...wanted];
}
