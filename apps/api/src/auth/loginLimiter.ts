import type { Redis } from 'ioredis';
import { RateLimiterMemory, RateLimiterRedis, type RateLimiterRes } from 'rate-limiter-flexible';

export interface LoginLimiter {
  /** Seconds to wait before another try, or 0 when a try is allowed. */
  blockedFor(email: string, ip: string): Promise<number>;
  recordFailure(email: string, ip: string): Promise<void>;
  recordSuccess(email: string, ip: string): Promise<void>;
}

/**
 * Counts failed sign-ins per e-mail and address in Redis, so every API instance shares the
 * counts; if Redis is down the counts fall back to this process's memory (never fail open).
 */
export function createLoginLimiter(redis: Redis, opts: { maxAttempts: number; windowSeconds: number }): LoginLimiter {
  const make = (keyPrefix: string, points: number) =>
    new RateLimiterRedis({
      storeClient: redis,
      keyPrefix,
      points,
      duration: opts.windowSeconds,
      insuranceLimiter: new RateLimiterMemory({ keyPrefix, points, duration: opts.windowSeconds }),
    });
  const perAccount = make('login-fail', opts.maxAttempts);
  // An address may try several accounts, but not a whole list of them.
  const perAddress = make('login-fail-ip', opts.maxAttempts * 6);
  const accountKey = (email: string, ip: string) => `${email.toLowerCase()}|${ip}`;

  const waitOf = (res: RateLimiterRes | null, points: number) =>
    res && res.consumedPoints >= points ? Math.max(1, Math.ceil(res.msBeforeNext / 1000)) : 0;

  return {
    async blockedFor(email, ip) {
      const [account, address] = await Promise.all([perAccount.get(accountKey(email, ip)), perAddress.get(ip)]);
      return Math.max(waitOf(account, perAccount.points), waitOf(address, perAddress.points));
    },
    async recordFailure(email, ip) {
      // consume() rejects once the points run out; the next blockedFor() reports the wait.
      await Promise.allSettled([perAccount.penalty(accountKey(email, ip)), perAddress.penalty(ip)]);
    },
    async recordSuccess(email, ip) {
      await perAccount.delete(accountKey(email, ip));
    },
  };
}
