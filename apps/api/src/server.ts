import { pino } from 'pino';
import { createApp } from './app';
import { loadConfig } from './config';
import { bindModels, createKnex } from './db/knex';
import { createEmailDispatcher } from './lib/emailDispatcher';
import { createRedis } from './lib/redis';

const logger = pino({ name: 'api', level: process.env.LOG_LEVEL ?? 'info' });
const config = loadConfig();
const knex = createKnex(config.databaseUrl);
bindModels(knex);
const redis = createRedis(config.redisUrl);
redis.on('error', (error) => logger.warn({ err: error.message }, 'redis unavailable'));
const emails = createEmailDispatcher(config.redisUrl, logger);

const app = createApp({ config, knex, redis, logger, emails });
const server = app.listen(config.port, '127.0.0.1', () => {
  logger.info(`API listening on ${config.appUrl}`);
});

async function shutdown() {
  server.close();
  await Promise.allSettled([emails.close(), knex.destroy(), redis.quit()]);
  process.exit(0);
}
process.once('SIGTERM', shutdown);
process.once('SIGINT', shutdown);
