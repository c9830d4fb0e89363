import { Queue, Worker } from 'bullmq';
import { pino } from 'pino';
import {
  ConfigError,
  deliverEmailJobId,
  jobNames,
  queueNames,
  redisOptions,
  type AnalyseDielineJob,
  type DeliverEmailJob,
  type PlanRemindersJob,
  type SendReminderJob,
} from '@kerfmark/contracts';
import { createStorage } from '@kerfmark/storage';
import { analyseDielineFile } from './jobs/analyseDieline';
import { loadConfig, type WorkerConfig } from './config';
import { deliverEmail } from './jobs/deliverEmail';
import { sweepAnalyses } from './jobs/sweepAnalyses';
import { sweepOutbox } from './jobs/sweepOutbox';
import { createKnex } from './db';
import { keepJobSchedulers } from './keepJobSchedulers';
import { createMailer } from './mailer';
import { planRequestReminders } from './reminders/planRequestReminders';
import { sendReminder } from './reminders/sendReminder';
import { sweepReminders } from './reminders/sweepReminders';

let config: WorkerConfig;
try {
  config = loadConfig();
} catch (error) {
  if (!(error instanceof ConfigError)) throw error;
  console.error(`Kerfmark worker cannot start. ${error.message}`);
  process.exit(1);
}
const logger = pino({ name: 'worker', level: config.logLevel });
const knex = createKnex(config.databaseUrl);
const mailer = createMailer(config.smtpUrl);
const storage = createStorage(config.storage);
// Workers wait out a Redis outage instead of failing commands (BullMQ requires this).
const connection = { ...redisOptions(config.redisUrl), maxRetriesPerRequest: null };

const emailQueue = new Queue(queueNames.email, { connection });

const emailWorker = new Worker<DeliverEmailJob>(
  queueNames.email,
  async (job) => {
    if (job.name === jobNames.sweepOutbox) {
      const results = await sweepOutbox(knex, mailer, config.mailFrom, logger);
      if (results.length) logger.info({ results }, 'outbox sweep');
      return results.length;
    }
    if (job.name === jobNames.deliverEmail) {
      const result = await deliverEmail(knex, mailer, config.mailFrom, job.data.outboxId);
      logger.info({ outboxId: job.data.outboxId, result }, 'e-mail delivery');
      return result;
    }
    throw new Error(`Unknown job ${job.name}`);
  },
  { connection, concurrency: 4 },
);
const dielineQueue = new Queue(queueNames.dieline, { connection });

const dielineWorker = new Worker<AnalyseDielineJob>(
  queueNames.dieline,
  async (job) => {
    if (job.name === jobNames.sweepAnalyses) {
      // Only files left waiting well past a normal run: their job was lost with Redis.
      const { results, failed } = await sweepAnalyses(knex, storage, config.analysisSweepMs * 2, logger);
      if (results.length || failed) logger.info({ results, failed }, 'analysis sweep');
      return results.length;
    }
    if (job.name === jobNames.analyseDieline) {
      const result = await analyseDielineFile(knex, storage, job.data.fileId);
      logger.info({ fileId: job.data.fileId, result }, 'dieline analysis');
      return result;
    }
    throw new Error(`Unknown job ${job.name}`);
  },
  // Analysis is CPU work: one at a time per worker process; run more workers to scale out.
  { connection, concurrency: 1 },
);

/** Hands committed outbox rows to the e-mail worker; the outbox sweep covers a failed add. */
function dispatchEmails(outboxIds: number[]) {
  for (const outboxId of outboxIds) {
    emailQueue
      .add(jobNames.deliverEmail, { outboxId }, { jobId: deliverEmailJobId(outboxId), removeOnComplete: 1000 })
      .catch(() => undefined);
  }
}

const reminderQueue = new Queue<SendReminderJob>(queueNames.reminders, { connection });
const reminderWorker = new Worker<SendReminderJob | PlanRemindersJob>(
  queueNames.reminders,
  async (job) => {
    if (job.name === jobNames.sweepReminders) return sweepReminders(knex, reminderQueue, new Date(), logger);
    if (job.name === jobNames.planReminders) return planRequestReminders(knex, reminderQueue, job.data.requestId);
    if (job.name === jobNames.sendReminder) {
      const { key, requestId } = job.data as SendReminderJob;
      const { result, outboxIds } = await sendReminder(
        knex,
        { appUrl: config.appUrl, now: new Date() },
        requestId,
        key,
      );
      dispatchEmails(outboxIds);
      logger.info({ key, result }, 'reminder');
      return result;
    }
    throw new Error(`Unknown job ${job.name}`);
  },
  { connection, concurrency: 2 },
);

// The sweeps are what catch up after Redis lost its data, and their schedules are in Redis too.
const stopKeepingSchedules = await keepJobSchedulers(
  [
    { queue: emailQueue, id: 'email-outbox-sweep', name: jobNames.sweepOutbox, every: config.outboxSweepMs },
    { queue: dielineQueue, id: 'dieline-analysis-sweep', name: jobNames.sweepAnalyses, every: config.analysisSweepMs },
    { queue: reminderQueue, id: 'reminder-sweep', name: jobNames.sweepReminders, every: config.reminderSweepMs },
  ],
  {
    checkMs: config.scheduleCheckMs,
    onRestored: (id) => logger.warn({ sweep: id }, 'sweep schedule was lost with Redis: scheduled again'),
  },
);

for (const worker of [emailWorker, dielineWorker, reminderWorker]) {
  worker.on('failed', (job, error) =>
    logger.warn({ queue: worker.name, job: job?.id, err: error.message }, 'job failed'),
  );
  worker.on('error', (error) => logger.warn({ queue: worker.name, err: error.message }, 'worker error'));
}
logger.info('worker running: e-mail delivery, dieline analysis, deadline reminders and their sweeps');

/** Takes no new jobs, lets the ones running finish (Worker.close waits for them), then closes. */
async function shutdown(signal: string) {
  logger.info({ signal }, 'shutting down: finishing the jobs in hand');
  stopKeepingSchedules();
  await Promise.allSettled([emailWorker.close(), dielineWorker.close(), reminderWorker.close()]);
  await Promise.allSettled([emailQueue.close(), dielineQueue.close(), reminderQueue.close()]);
  await knex.destroy();
  mailer.close();
  logger.info('shut down');
  process.exit(0);
}
process.once('SIGTERM', () => void shutdown('SIGTERM'));
process.once('SIGINT', () => void shutdown('SIGINT'));
