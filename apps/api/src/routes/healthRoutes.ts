import { Router } from 'express';
import type { Redis } from 'ioredis';
import type { Knex } from 'knex';

/** Liveness of the API and its backing services, for the start script and a load balancer. */
export function healthRoutes(knex: Knex, redis: Redis): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    const check = async (probe: () => Promise<unknown>) => {
      try {
        await Promise.race([probe(), new Promise((_, reject) => setTimeout(() => reject(new Error('timeout')), 1500))]);
        return 'up';
      } catch {
        return 'down';
      }
    };
    const [database, queue] = await Promise.all([check(() => knex.raw('select 1')), check(() => redis.ping())]);
    res.status(database === 'up' ? 200 : 503).json({ status: database === 'up' ? 'ok' : 'degraded', database, queue });
  });
  return router;
}
