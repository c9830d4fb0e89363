import { Queue, Worker } from 'bullmq';
import knexFactory from 'knex';
import { pino } from 'pino';
import { jobNames, queueNames, type DeliverEmailJob } from '@kerfmark/contracts';
import { loadConfig } from './config';
import { deliverEmail } from './jobs/deliverEmail';
import { sweepOutbox } from './jobs/sweepOutbox';
import { createMailer } from './mailer';

const logger = pino({ name: 'worker', level: process.env.LOG_LEVEL ?? 'info' });
const config = loadConfig();
const knex = knexFactory({ client: 'pg', connection: config.databaseUrl, pool: { min: 0, max: 4 } });
const mailer = createMailer(config.smtpUrl);
const redisUrl = new URL(config.redisUrl);
// Workers wait out a Redis outage instead of failing commands (BullMQ requires this).
const connection = { host: redisUrl.hostname, port: Number(redisUrl.port || 6379), maxRetriesPerRequest: null };

const emailQueue = new Queue(queueNames.email, { connection });
await emailQueue.upsertJobScheduler('email-outbox-sweep', { every: config.outboxSweepMs }, { name: jobNames.sweepOutbox });

const emailWorker = new Worker<DeliverEmailJob>(
  queueNames.email,
  async (job) => {
    if (job.name === jobNames.sweepOutbox) {
      const results = await sweepOutbox(knex, mailer, config.mailFrom);
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
emailWorker.on('failed', (job, error) => logger.warn({ job: job?.id, err: error.message }, 'job failed'));
emailWorker.on('error', (error) => logger.warn({ err: error.message }, 'worker error'));
logger.info('worker running: e-mail delivery and outbox sweep');

async function shutdown() {
  await Promise.allSettled([emailWorker.close(), emailQueue.close()]);
  await knex.destroy();
  mailer.close();
  process.exit(0);
}
process.once('SIGTERM', shutdown);
process.once('SIGINT', shutdown);
