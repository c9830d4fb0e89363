import { pino } from 'pino';
import { ConfigError } from '@kerfmark/contracts';
import { createStorage } from '@kerfmark/storage';
import { createApp } from './app';
import { loadConfig, type Config } from './config';
import { bindModels, createKnex } from './db/knex';
import { gracefulClose } from './lib/gracefulClose';
import { createJobQueues } from './lib/jobQueues';
import { createRedis } from './lib/redis';

let config: Config;
try {
  config = loadConfig();
} catch (error) {
  if (!(error instanceof ConfigError)) throw error;
  console.error(`Kerfmark API cannot start. ${error.message}`);
  process.exit(1);
}
const logger = pino({ name: 'api', level: config.logLevel });
const knex = createKnex(config.databaseUrl);
bindModels(knex);
const redis = createRedis(config.redisUrl);
redis.on('error', (error) => logger.warn({ err: error.message }, 'redis unavailable'));
const queues = createJobQueues(config.redisUrl, logger);
const storage = createStorage(config.storage);

const app = createApp({
  config,
  knex,
  redis,
  logger,
  emails: queues.emails,
  analyses: queues.analyses,
  reminders: queues.reminders,
  storage,
});
const server = app.listen(config.port, config.host, () => {
  logger.info({ host: config.host, port: config.port }, `API listening on ${config.appUrl}`);
});
const closeServer = gracefulClose(server);
server.on('error', (error) => {
  logger.fatal({ err: error }, 'the API cannot listen');
  process.exit(1);
});

/** Answers what is in flight (up to SHUTDOWN_GRACE_MS), then closes the database, Redis and the queues. */
async function shutdown(signal: string) {
  logger.info(
    { signal, graceMs: config.shutdownGraceMs },
    'shutting down: no new connections, finishing requests in flight',
  );
  await closeServer(config.shutdownGraceMs);
  await Promise.allSettled([queues.close(), knex.destroy(), redis.quit()]);
  logger.info('shut down');
  process.exit(0);
}
process.once('SIGTERM', () => void shutdown('SIGTERM'));
process.once('SIGINT', () => void shutdown('SIGINT'));
