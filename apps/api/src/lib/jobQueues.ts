import { Queue } from 'bullmq';
import type { Logger } from 'pino';
import {
  analyseDielineJobId,
  deliverEmailJobId,
  jobNames,
  queueNames,
  redisOptions,
  type AnalyseDielineJob,
  type DeliverEmailJob,
  type PlanRemindersJob,
} from '@kerfmark/contracts';
import type { AnalysisDispatcher, EmailDispatcher, ReminderPlanner } from './dispatchers';

/**
 * The API's side of the job queues. Adding a job never holds a request: with Redis down the
 * add fails at once, is logged, and the worker's sweep finds the work in PostgreSQL instead.
 */
export function createJobQueues(redisUrl: string, logger: Logger) {
  const connection = { ...redisOptions(redisUrl), enableOfflineQueue: false, maxRetriesPerRequest: 1 };
  const emailQueue = new Queue<DeliverEmailJob>(queueNames.email, { connection });
  const dielineQueue = new Queue<AnalyseDielineJob>(queueNames.dieline, { connection });
  const reminderQueue = new Queue<PlanRemindersJob>(queueNames.reminders, { connection });
  for (const queue of [emailQueue, dielineQueue, reminderQueue])
    queue.on('error', (error) => logger.warn({ err: error.message }, 'job queue unavailable'));
  const keep = { removeOnComplete: 1000, removeOnFail: 5000 };

  const emails: EmailDispatcher = {
    deliver(outboxIds) {
      for (const outboxId of outboxIds) {
        emailQueue
          .add(jobNames.deliverEmail, { outboxId }, { jobId: deliverEmailJobId(outboxId), ...keep })
          .catch((error: unknown) => logger.warn({ err: error, outboxId }, 'e-mail left for the outbox sweep'));
      }
    },
  };
  const analyses: AnalysisDispatcher = {
    analyse(fileId, run) {
      dielineQueue
        .add(
          jobNames.analyseDieline,
          { fileId },
          {
            jobId: analyseDielineJobId(fileId, run),
            attempts: 3,
            backoff: { type: 'exponential', delay: 2000 },
            ...keep,
          },
        )
        .catch((error: unknown) => logger.warn({ err: error, fileId }, 'analysis left for the sweep'));
    },
  };
  const reminders: ReminderPlanner = {
    plan(requestId) {
      // A new id each time: every change is planned; planning itself is idempotent.
      reminderQueue
        .add(jobNames.planReminders, { requestId }, { jobId: `plan-${requestId}-${Date.now()}`, ...keep })
        .catch((error: unknown) => logger.warn({ err: error, requestId }, 'reminders left for the sweep'));
    },
  };
  return {
    emails,
    analyses,
    reminders,
    close: () => Promise.all([emailQueue.close(), dielineQueue.close(), reminderQueue.close()]).then(() => undefined),
  };
}
