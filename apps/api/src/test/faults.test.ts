import { createStorage } from '@kerfmark/storage';
import { pino } from 'pino';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { createApp } from '../app';
import { bindModels, createKnex } from '../db/knex';
import { createJobQueues } from '../lib/jobQueues';
import { createRedis } from '../lib/redis';
import { DielineFile } from '../models';
import { rectangleDxf } from './fixtures';
import { app, createWorld, knex, testConfig } from './harness';

// Services that are down, stood in for by loopback ports nothing listens on (port 9, discard).
const DEAD = 'http://127.0.0.1:9';
const logger = pino({ level: 'silent' });
const closers: Array<() => Promise<unknown>> = [];
afterAll(async () => {
  for (const close of closers) await close().catch(() => undefined);
  bindModels(knex); // the shared harness's models again
});

let brokenKnex: ReturnType<typeof createKnex> | undefined;

function appWith(over: { databaseUrl?: string; redisUrl?: string; s3?: string }) {
  const appKnex = over.databaseUrl ? createKnex(over.databaseUrl) : knex;
  if (over.databaseUrl) brokenKnex = appKnex;
  const redis = createRedis(over.redisUrl ?? testConfig.redisUrl);
  redis.on('error', () => undefined);
  const queues = createJobQueues(over.redisUrl ?? testConfig.redisUrl, logger);
  const storage = createStorage({
    endpoint: over.s3 ?? process.env.S3_ENDPOINT,
    bucket: process.env.S3_BUCKET!,
    region: 'us-east-1',
    accessKeyId: 'S3RVER',
    secretAccessKey: 'S3RVER',
  });
  closers.push(
    () => queues.close(),
    () => redis.quit(),
    ...(over.databaseUrl ? [() => appKnex.destroy()] : []),
  );
  return createApp({
    config: testConfig,
    knex: appKnex,
    redis,
    logger,
    emails: queues.emails,
    analyses: queues.analyses,
    reminders: queues.reminders,
    storage,
  });
}

describe('a backing service that is down', () => {
  it('answers 503 with a clear message while the database is unreachable', async () => {
    const broken = appWith({ databaseUrl: 'postgres://kerfmark@127.0.0.1:9/kerfmark_test' });
    // Objection models read one bound knex: bind them to the unreachable database for this request.
    bindModels(brokenKnex!);
    const res = await request(broken)
      .post('/api/auth/login')
      .send({ email: 'maya@larkspur.example', password: 'kerfmark-demo-2026' });
    expect(res.status).toBe(503);
    expect(res.body.error).toMatchObject({ code: 'service_unavailable' });
    expect(res.headers['retry-after']).toBe('5');
    bindModels(knex);
    const health = await request(app).get('/api/health');
    expect(health.status).toBe(200);
  });

  it('keeps signing in and serving requests while Redis is down, the rate limit falling back to memory', async () => {
    const w = await createWorld();
    const noRedis = appWith({ redisUrl: 'redis://127.0.0.1:9' });
    const login = await request(noRedis)
      .post('/api/auth/login')
      .send({ email: w.users.buyer.email, password: 'correct horse battery' });
    expect(login.status).toBe(200);
    const me = await request(noRedis).get('/api/me').set('Authorization', `Bearer ${login.body.token}`);
    expect(me.status).toBe(200);
    const health = await request(noRedis).get('/api/health/ready');
    expect(health.status).toBe(503);
    expect(health.body).toMatchObject({
      status: 'not_ready',
      checks: { database: { status: 'up' }, redis: { status: 'down' } },
    });
  });

  it('refuses an upload with a clear 503 while S3 is down, and leaves no row pointing at a missing file', async () => {
    const w = await createWorld();
    const draft = await request(app)
      .post('/api/requests')
      .set('Authorization', `Bearer ${w.tokens.buyer}`)
      .send({ title: 'No store', quantity: 1, ups: 1, ruleTypes: ['cut'] });
    const noS3 = appWith({ s3: DEAD });
    const res = await request(noS3)
      .post(`/api/requests/${draft.body.id}/files`)
      .set('Authorization', `Bearer ${w.tokens.buyer}`)
      .attach('file', Buffer.from(rectangleDxf), 'c.dxf');
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('storage_unavailable');
    expect(res.body.error.message).toMatch(/not saved/);
    expect(await DielineFile.query().where({ requestId: draft.body.id })).toHaveLength(0);
  });
});
