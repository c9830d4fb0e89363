import { pino } from 'pino';
import { createApp } from './app';
import { loadConfig } from './config';
import { bindModels, createKnex } from './db/knex';
import { createStorage, storageConfigFromEnv } from '@kerfmark/storage';
import { createJobQueues } from './lib/jobQueues';
import { createRedis } from './lib/redis';

const logger = pino({ name: 'api', level: process.env.LOG_LEVEL ?? 'info' });
const config = loadConfig();
const knex = createKnex(config.databaseUrl);
bindModels(knex);
const redis = createRedis(config.redisUrl);
redis.on('error', (error) => logger.warn({ err: error.message }, 'redis unavailable'));
const queues = createJobQueues(config.redisUrl, logger);
const storage = createStorage(storageConfigFromEnv());

const app = createApp({ config, knex, redis, logger, emails: queues.emails, analyses: queues.analyses, reminders: queues.reminders, storage });
const server = app.listen(config.port, '127.0.0.1', () => {
  logger.info(`API listening on ${config.appUrl}`);
});

async function shutdown() {
  server.close();
  await Promise.allSettled([queues.close(), knex.destroy(), redis.quit()]);
  process.exit(0);
}
process.once('SIGTERM', shutdown);
process.once('SIGINT', shutdown);
