import { once } from 'node:events';
import { Router, type RequestHandler } from 'express';
import type { Redis } from 'ioredis';
import type { Knex } from 'knex';
import type { Storage } from '@kerfmark/storage';
import { pendingMigrations } from '../db/migrate';

const CHECK_TIMEOUT_MS = 1500;

type Check = { status: 'up' } | { status: 'down'; error: string } | { status: 'behind'; pending: string[] };

/** Runs one probe within the timeout; a failure says only "timeout" or "unreachable" (no internals). */
async function probe(run: () => Promise<unknown>): Promise<Check> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error('timeout')), CHECK_TIMEOUT_MS);
  });
  try {
    await Promise.race([run(), timeout]);
    return { status: 'up' };
  } catch (error) {
    return { status: 'down', error: (error as Error).message === 'timeout' ? 'timeout' : 'unreachable' };
  } finally {
    clearTimeout(timer);
  }
}

/**
 * The request path's client queues nothing while it is not connected, so a ping just after
 * start-up would fail: wait for it to connect (an 'error' first means it cannot).
 */
async function pingRedis(redis: Redis): Promise<void> {
  if (redis.status !== 'ready') await once(redis, 'ready', { signal: AbortSignal.timeout(CHECK_TIMEOUT_MS) });
  await redis.ping();
}

/**
 * For the start scripts, a load balancer and an orchestrator:
 * - `/live`: the process answers (restart it if not); checks nothing else.
 * - `/ready`: PostgreSQL, Redis and S3 reachable and the schema migrated; 503 until then, so that
 *   no traffic is sent to an instance that cannot serve it. `/` is the same as `/ready`.
 */
export function healthRoutes(deps: { knex: Knex; redis: Redis; storage: Storage }): Router {
  const router = Router();
  router.get('/live', (_req, res) => {
    res.json({ status: 'live' });
  });
  const ready: RequestHandler = async (_req, res) => {
    let pending: string[] = [];
    const [database, redis, storage] = await Promise.all([
      probe(async () => {
        pending = await pendingMigrations(deps.knex);
      }),
      probe(() => pingRedis(deps.redis)),
      probe(() => deps.storage.ping()),
    ]);
    const migrations: Check =
      database.status !== 'up'
        ? { status: 'down', error: 'database unreachable' }
        : pending.length
          ? { status: 'behind', pending }
          : { status: 'up' };
    const checks = { database, redis, storage, migrations };
    const isReady = Object.values(checks).every((check) => check.status === 'up');
    res
      .status(isReady ? 200 : 503)
      .set('Cache-Control', 'no-store')
      .json({ status: isReady ? 'ready' : 'not_ready', checks });
  };
  router.get('/ready', ready);
  router.get('/', ready);
  return router;
}
