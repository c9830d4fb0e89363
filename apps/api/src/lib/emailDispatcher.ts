import { Queue } from 'bullmq';
import type { Logger } from 'pino';
import { deliverEmailJobId, jobNames, queueNames, type DeliverEmailJob } from '@kerfmark/contracts';
import type { EmailDispatcher } from '../services/deps';

/** Hands outbox rows to the worker through BullMQ; when Redis is down the worker's sweep finds them. */
export function createEmailDispatcher(redisUrl: string, logger: Logger): EmailDispatcher & { close(): Promise<void> } {
  const url = new URL(redisUrl);
  const queue = new Queue<DeliverEmailJob>(queueNames.email, {
    connection: { host: url.hostname, port: Number(url.port || 6379), enableOfflineQueue: false, maxRetriesPerRequest: 1 },
  });
  queue.on('error', (error) => logger.warn({ err: error }, 'e-mail queue unavailable'));
  return {
    deliver(outboxIds) {
      for (const outboxId of outboxIds) {
        queue
          .add(jobNames.deliverEmail, { outboxId }, { jobId: deliverEmailJobId(outboxId), removeOnComplete: 1000, removeOnFail: 5000 })
          .catch((error: unknown) => logger.warn({ err: error, outboxId }, 'e-mail left for the outbox sweep'));
      }
    },
    close: () => queue.close(),
  };
}
