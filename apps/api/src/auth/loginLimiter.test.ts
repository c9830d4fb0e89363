import RedisMock from 'ioredis-mock';
import type { Redis } from 'ioredis';
import { describe, expect, it } from 'vitest';
import { createLoginLimiter } from './loginLimiter';

// Unit test on ioredis-mock: the counters are plain Redis keys, so several API instances
// sharing one Redis share them.
describe('login limiter', () => {
  const make = (redis = new RedisMock() as unknown as Redis) => ({
    redis,
    limiter: createLoginLimiter(redis, { maxAttempts: 3, windowSeconds: 60 }),
  });

  it('allows tries until the failures reach the limit, then names a wait', async () => {
    const { limiter } = make();
    for (let i = 0; i < 3; i++) {
      expect(await limiter.blockedFor('a@x.example', '10.0.0.1')).toBe(0);
      await limiter.recordFailure('a@x.example', '10.0.0.1');
    }
    const wait = await limiter.blockedFor('a@x.example', '10.0.0.1');
    expect(wait).toBeGreaterThan(0);
    expect(wait).toBeLessThanOrEqual(60);
  });

  it('counts per account and address, case-insensitively', async () => {
    const { limiter } = make();
    for (let i = 0; i < 3; i++) await limiter.recordFailure('B@x.example', '10.0.0.2');
    expect(await limiter.blockedFor('b@x.example', '10.0.0.2')).toBeGreaterThan(0);
    expect(await limiter.blockedFor('c@x.example', '10.0.0.2')).toBe(0);
    expect(await limiter.blockedFor('b@x.example', '10.0.0.3')).toBe(0);
  });

  it('shares counts between two instances on one Redis', async () => {
    const redis = new RedisMock() as unknown as Redis;
    const first = createLoginLimiter(redis, { maxAttempts: 3, windowSeconds: 60 });
    const second = createLoginLimiter(redis, { maxAttempts: 3, windowSeconds: 60 });
    await first.recordFailure('d@x.example', '10.0.0.4');
    await second.recordFailure('d@x.example', '10.0.0.4');
    await first.recordFailure('d@x.example', '10.0.0.4');
    expect(await second.blockedFor('d@x.example', '10.0.0.4')).toBeGreaterThan(0);
  });

  it('forgets an account’s failures after a successful sign-in', async () => {
    const { limiter } = make();
    await limiter.recordFailure('e@x.example', '10.0.0.5');
    await limiter.recordFailure('e@x.example', '10.0.0.5');
    await limiter.recordSuccess('e@x.example', '10.0.0.5');
    await limiter.recordFailure('e@x.example', '10.0.0.5');
    expect(await limiter.blockedFor('e@x.example', '10.0.0.5')).toBe(0);
  });

  it('blocks an address that tries many accounts', async () => {
    const { limiter } = make();
    for (let i = 0; i < 18; i++) await limiter.recordFailure(`user${i}@x.example`, '10.0.0.6');
    expect(await limiter.blockedFor('fresh@x.example', '10.0.0.6')).toBeGreaterThan(0);
  });
});
