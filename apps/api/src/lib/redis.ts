import { Redis } from 'ioredis';
import { redisOptions } from '@kerfmark/contracts';

/**
 * A Redis client for request paths: with no offline queue, a command fails at once while Redis
 * is down instead of holding the request; ioredis keeps reconnecting in the background.
 */
export function createRedis(url: string): Redis {
  return new Redis({
    ...redisOptions(url),
    maxRetriesPerRequest: 1,
    enableOfflineQueue: false,
    retryStrategy: (times) => Math.min(times * 200, 2000),
  });
}
