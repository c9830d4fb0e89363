import type { Queue } from 'bullmq';
import type { Knex } from 'knex';
import { jobNames, reminderJobId, type SendReminderJob } from '@kerfmark/contracts';
import { loadReminderState } from './loadReminderState';
import { planReminders } from './planReminders';

/**
 * Puts a request's reminders on the queue as delayed jobs with ids made from their keys, so
 * planning twice changes nothing; jobs of this request that no longer apply are removed.
 */
export async function planRequestReminders(knex: Knex, queue: Queue<SendReminderJob>, requestId: number, now = new Date()): Promise<string[]> {
  const state = await loadReminderState(knex, requestId);
  const planned = state ? planReminders(state).filter((r) => !r.expiresAt || r.expiresAt.getTime() > now.getTime()) : [];
  const sent = new Set<string>(
    planned.length ? (await knex('reminders_sent').whereIn('key', planned.map((r) => r.key)).select('key')).map((r: { key: string }) => r.key) : [],
  );
  const wanted = new Set<string>();
  for (const reminder of planned) {
    if (sent.has(reminder.key)) continue;
    const jobId = reminderJobId(reminder.key);
    wanted.add(jobId);
    await queue.add(
      jobNames.sendReminder,
      { requestId, key: reminder.key },
      { jobId, delay: Math.max(0, reminder.fireAt.getTime() - now.getTime()), removeOnComplete: 1000, removeOnFail: 5000, attempts: 5, backoff: { type: 'exponential', delay: 5000 } },
    );
  }
  for (const job of await queue.getJobs(['delayed', 'waiting'])) {
    if (job?.name === jobNames.sendReminder && job.data.requestId === requestId && job.id && !wanted.has(job.id)) await job.remove();
  }
  return [...wanted];
}
