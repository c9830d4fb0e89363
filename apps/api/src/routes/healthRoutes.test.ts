import { copyFile, mkdtemp, readdir, rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { createStorage } from '@kerfmark/storage';
import { pino } from 'pino';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { createApp } from '../app';
import { createKnex } from '../db/knex';
import { migrationsDir, pendingMigrations } from '../db/migrate';
import { createJobQueues } from '../lib/jobQueues';
import { createRedis } from '../lib/redis';
import { app, knex, storage, testConfig } from '../test/harness';

// Dependencies that are down, stood in for by loopback port 9 (discard), where nothing listens.
const DEAD_PORT = 9;
const closers: Array<() => Promise<unknown>> = [];
afterAll(async () => {
  for (const close of closers) await close().catch(() => undefined);
});

function appWith(down: 'database' | 'redis' | 'storage') {
  const appKnex = down === 'database' ? createKnex(`postgres://kerfmark@127.0.0.1:${DEAD_PORT}/kerfmark_test`) : knex;
  const redis = createRedis(down === 'redis' ? `redis://127.0.0.1:${DEAD_PORT}` : testConfig.redisUrl);
  redis.on('error', () => undefined);
  const queues = createJobQueues(testConfig.redisUrl, pino({ level: 'silent' }));
  const appStorage =
    down === 'storage' ? createStorage({ ...testConfig.storage, endpoint: `http://127.0.0.1:${DEAD_PORT}` }) : storage;
  closers.push(
    () => queues.close(),
    () => redis.quit(),
    ...(down === 'database' ? [() => appKnex.destroy()] : []),
  );
  return createApp({
    config: testConfig,
    knex: appKnex,
    redis,
    logger: pino({ level: 'silent' }),
    emails: queues.emails,
    analyses: queues.analyses,
    reminders: queues.reminders,
    storage: appStorage,
  });
}

describe('health', () => {
  it('is live and ready with every dependency up and the schema current', async () => {
    const live = await request(app).get('/api/health/live');
    expect(live.status).toBe(200);
    expect(live.body).toEqual({ status: 'live' });
    for (const url of ['/api/health/ready', '/api/health']) {
      const ready = await request(app).get(url);
      expect(ready.status, JSON.stringify(ready.body)).toBe(200);
      expect(ready.headers['cache-control']).toBe('no-store');
      expect(ready.body).toEqual({
        status: 'ready',
        checks: {
          database: { status: 'up' },
          redis: { status: 'up' },
          storage: { status: 'up' },
          migrations: { status: 'up' },
        },
      });
    }
  });

  it.each(['database', 'redis', 'storage'] as const)(
    'is not ready (503) while the %s is down, and still live',
    async (down) => {
      const broken = appWith(down);
      const ready = await request(broken).get('/api/health/ready');
      expect(ready.status).toBe(503);
      expect(ready.body.status).toBe('not_ready');
      expect(ready.body.checks[down]).toEqual({ status: 'down', error: 'unreachable' });
      for (const other of (['database', 'redis', 'storage'] as const).filter((name) => name !== down))
        expect(ready.body.checks[other]).toEqual({ status: 'up' });
      // Without the database the migrations cannot be compared: not ready either way.
      expect(ready.body.checks.migrations.status).toBe(down === 'database' ? 'down' : 'up');
      expect((await request(broken).get('/api/health')).status).toBe(503);
      expect((await request(broken).get('/api/health/live')).status).toBe(200);
    },
  );
});

describe('pendingMigrations', () => {
  it('lists the migration files the database has not applied, and nothing when it is current', async () => {
    expect(await pendingMigrations(knex)).toEqual([]);
    const dir = await mkdtemp(path.join(os.tmpdir(), 'kerfmark-migrations-'));
    try {
      for (const name of await readdir(migrationsDir))
        await copyFile(path.join(migrationsDir, name), path.join(dir, name));
      await writeFile(
        path.join(dir, '29991231000000_next.ts'),
        'export async function up() {}\nexport async function down() {}\n',
      );
      expect(await pendingMigrations(knex, dir)).toEqual(['29991231000000_next.ts']);
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });
});
