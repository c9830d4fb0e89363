import { execFile } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { promisify } from 'node:util';
import { Queue } from 'bullmq';
import { pino } from 'pino';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { jobNames, queueNames, reminderJobId } from '@kerfmark/contracts';
import { createStorage } from '@kerfmark/storage';
import { assertPortFree } from '../../../../scripts/lib/net';
import { ensureDatabase, postgresCluster, type PostgresCluster } from '../../../../scripts/lib/postgres';
import { repoRoot } from '../../../../scripts/lib/profile';
import { redisServer, type RedisServer } from '../../../../scripts/lib/redis';
import { createKnex as createWorkerKnex } from '../../../worker/src/db';
import { keepJobSchedulers } from '../../../worker/src/keepJobSchedulers';
import { loadReminderState } from '../../../worker/src/reminders/loadReminderState';
import { planReminders } from '../../../worker/src/reminders/planReminders';
import { planRequestReminders } from '../../../worker/src/reminders/planRequestReminders';
import { sweepReminders } from '../../../worker/src/reminders/sweepReminders';
import { createApp } from '../app';
import { hashPassword } from '../auth/passwords';
import type { Config } from '../config';
import { bindModels, createKnex } from '../db/knex';
import { createJobQueues } from '../lib/jobQueues';
import { createRedis } from '../lib/redis';
import { Organisation, User } from '../models';
import { insertOpenRequest } from './insertOpenRequest';
import { bidBody } from './fixtures';

/*
 * Real outages: this file starts a PostgreSQL cluster and a redis-server of its own, on ports of
 * its own, and restarts and stops them under a running API. The shared test services (those in
 * DATABASE_URL and REDIS_URL) are never touched, so the rest of the suite runs on beside it.
 */
const PG_PORT = Number(process.env.KERFMARK_TEST_OUTAGE_PG_PORT ?? 54349);
const REDIS_PORT = Number(process.env.KERFMARK_TEST_OUTAGE_REDIS_PORT ?? 6399);
const DATA = path.join(repoRoot, '.data/test');
const DATABASE = 'kerfmark_outage';
const databaseUrl = `postgres://kerfmark@127.0.0.1:${PG_PORT}/${DATABASE}`;
const redisUrl = `redis://127.0.0.1:${REDIS_PORT}`;
const PASSWORD = 'correct horse battery';

// The bounds. An answer may take up to knex's acquireConnectionTimeout (5 s, db/knex.ts) while
// the pool waits for a connection; anything slower counts as a hang.
const ANSWER_WITHIN_MS = 6_000;
const RECOVER_WITHIN_MS = 10_000;
const OUTAGE_MS = 2_500;

const config: Config = {
  port: 0,
  appUrl: 'http://127.0.0.1:4999',
  databaseUrl,
  redisUrl,
  jwtSecret: randomUUID(),
  tokenTtlSeconds: 3600,
  bcryptRounds: 4,
  webDist: undefined,
  invitationTtlHours: 72,
  maxUploadBytes: 1024 * 1024,
  login: { maxAttempts: 5, windowSeconds: 900 },
  production: false,
  host: '127.0.0.1',
  trustProxy: 'loopback',
  shutdownGraceMs: 1000,
  logLevel: 'error',
  storage: {
    endpoint: 'http://127.0.0.1:9',
    bucket: 'kerfmark-outage',
    region: 'us-east-1',
    accessKeyId: 'x',
    secretAccessKey: 'x',
  },
};

// Anything the error handler calls unhandled (a 500) is kept, to show beside a failed check.
const unhandled: string[] = [];
const logger = pino(
  { level: 'error' },
  {
    write: (line: string) => {
      const { err } = JSON.parse(line) as { err?: { message?: string; nativeError?: { code?: string } } };
      unhandled.push(`${err?.nativeError?.code ?? ''} ${err?.message?.slice(-160) ?? line.slice(0, 300)}`);
    },
  },
);

let cluster: PostgresCluster;
let redisSrv: RedisServer;
let knex: ReturnType<typeof createKnex>;
let plain: ReturnType<typeof createWorkerKnex>; // no case mappers: the worker's own view of the tables
let base: string;
const closers: Array<() => Promise<unknown>> = [];

beforeAll(async () => {
  cluster = postgresCluster({ baseDir: path.join(DATA, 'outage-pg'), name: 'outage', port: PG_PORT, forTests: true });
  redisSrv = redisServer({ port: REDIS_PORT, dir: path.join(DATA, 'outage-redis') });
  // A run stopped half-way may have left ours running; anything else on the ports is not ours.
  await Promise.all([cluster.stop(), redisSrv.stop()]);
  await assertPortFree(PG_PORT, 'the outage test’s PostgreSQL', 'KERFMARK_TEST_OUTAGE_PG_PORT');
  await assertPortFree(REDIS_PORT, 'the outage test’s Redis', 'KERFMARK_TEST_OUTAGE_REDIS_PORT');
  await cluster.start();
  await redisSrv.start('KERFMARK_TEST_OUTAGE_REDIS_PORT');
  closers.push(
    () => cluster.stop(),
    () => redisSrv.stop(),
  );
  await ensureDatabase(PG_PORT, DATABASE, true);

  // The project's own `npm run migrate`, in a process of its own: knex loads the .ts migrations
  // with Node's import(), which vitest's module runner does not serve.
  await promisify(execFile)(
    process.execPath,
    [path.join(repoRoot, 'node_modules/tsx/dist/cli.mjs'), 'scripts/migrate.ts'],
    {
      cwd: repoRoot,
      env: { ...process.env, DATABASE_URL: databaseUrl },
    },
  );
  knex = createKnex(databaseUrl);
  plain = createWorkerKnex(databaseUrl, 2);
  // This file runs in a worker of its own: the models read this file's database only.
  bindModels(knex);

  const redis = createRedis(redisUrl);
  redis.on('error', () => undefined);
  const queues = createJobQueues(redisUrl, pino({ level: 'silent' }));
  // No file store is needed here; a purchase order PDF that cannot be kept is made again when opened.
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
  const server = http.createServer(app);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  closers.unshift(
    () => new Promise((resolve) => server.close(resolve)),
    () => queues.close(),
    () => redis.quit(),
    () => knex.destroy(),
    () => plain.destroy(),
  );
}, 60_000);

afterAll(async () => {
  for (const close of closers) await close().catch(() => undefined);
}, 60_000);

interface Answer {
  client: string;
  what: string;
  status: number; // 0: no answer within ANSWER_WITHIN_MS
  code?: string;
  retryAfter: string | null;
  body: Record<string, unknown> | null;
  startedAt: number;
  endedAt: number;
}

const answers: Answer[] = [];

async function call(
  client: string,
  what: string,
  method: string,
  url: string,
  token?: string,
  body?: unknown,
): Promise<Answer> {
  const startedAt = Date.now();
  let answer: Answer;
  try {
    const res = await fetch(`${base}${url}`, {
      method,
      headers: { 'Content-Type': 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
      body: body === undefined ? undefined : JSON.stringify(body),
      signal: AbortSignal.timeout(ANSWER_WITHIN_MS),
    });
    const text = await res.text();
    const json = text ? (JSON.parse(text) as Record<string, unknown>) : null;
    const error = json?.error as { code?: string } | undefined;
    answer = {
      client,
      what,
      status: res.status,
      code: error?.code,
      retryAfter: res.headers.get('retry-after'),
      body: json,
      startedAt,
      endedAt: Date.now(),
    };
  } catch {
    answer = { client, what, status: 0, retryAfter: null, body: null, startedAt, endedAt: Date.now() };
  }
  answers.push(answer);
  return answer;
}

const unique = () => randomUUID().slice(0, 8);

async function org(kind: 'printer' | 'die_shop') {
  return Organisation.query().insertAndFetch({
    name: `${kind} ${unique()}`,
    kind,
    timeZone: 'America/Chicago',
    postcode: '60614',
    country: 'US',
  });
}

async function userIn(organisation: Organisation, role: 'buyer' | 'purchasing' | 'estimator') {
  return User.query().insertAndFetch({
    organisationId: organisation.id,
    email: `${role}-${unique()}@outage.example`,
    name: `Test ${role}`,
    role,
    status: 'active',
    passwordHash: await hashPassword(PASSWORD, 4),
  });
}

async function signIn(user: User): Promise<string> {
  const res = await call('set-up', 'sign in', 'POST', '/api/auth/login', undefined, {
    email: user.email,
    password: PASSWORD,
  });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body!.token as string;
}

async function waitUntil(what: string, check: () => boolean | Promise<boolean>, timeoutMs: number): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if (await Promise.resolve(check()).catch(() => false)) return;
    await sleep(100);
  }
  throw new Error(`${what}: not within ${timeoutMs / 1000} s`);
}

const ok = (a: Answer) => a.status >= 200 && a.status < 300;

describe('PostgreSQL and Redis really going away under a running API', () => {
  it('answers 503 while PostgreSQL restarts mid-stream, recovers on its own, and leaves no half-written bid or award', async () => {
    const printer = await org('printer');
    const buyer = await userIn(printer, 'buyer');
    const purchasing = await userIn(printer, 'purchasing');
    const shops = await Promise.all(
      [0, 1, 2, 3].map(async () => {
        const shop = await org('die_shop');
        return { shop, estimator: await userIn(shop, 'estimator') };
      }),
    );
    const tokens = {
      buyer: await signIn(buyer),
      purchasing: await signIn(purchasing),
      shops: await Promise.all(shops.map((s) => signIn(s.estimator))),
    };

    // A: every shop has bid and keeps revising. C: fresh requests to submit on mid-stream.
    // B: bidding closed on each, one bid per shop, awarded to the lowest one by one.
    const a = await insertOpenRequest(printer.id, buyer.id);
    const cs = await Promise.all(Array.from({ length: 12 }, () => insertOpenRequest(printer.id, buyer.id)));
    const bs = await Promise.all(Array.from({ length: 10 }, () => insertOpenRequest(printer.id, buyer.id)));
    const bidOnA: number[] = [];
    for (const [i, token] of tokens.shops.entries()) {
      const res = await call(
        'set-up',
        'submit',
        'POST',
        `/api/requests/${a.id}/bids`,
        token,
        bidBody(80_000 + i * 1_000),
      );
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      bidOnA.push(res.body!.id as number);
    }
    const lowestOnB = new Map<number, number>();
    for (const b of bs) {
      for (const [i, token] of tokens.shops.entries()) {
        const res = await call(
          'set-up',
          'submit',
          'POST',
          `/api/requests/${b.id}/bids`,
          token,
          bidBody(60_000 + i * 1_000),
        );
        expect(res.status, JSON.stringify(res.body)).toBe(201);
        if (i === 0) lowestOnB.set(b.id, res.body!.id as number);
      }
      expect(
        (await call('set-up', 'close bidding', 'POST', `/api/requests/${b.id}/close-bidding`, tokens.purchasing))
          .status,
      ).toBe(200);
    }
    const setUpAnswers = answers.length;

    // The stream: four shops revising and submitting, the buyer and a shop reading, purchasing awarding.
    let streaming = true;
    const revised: Array<{ bidId: number; revision: number; totalCents: number }> = [];
    const submitted: Array<{ requestId: number; shopId: number; bidId: number | null }> = [];
    const awarded = new Set<number>();
    const unexpected: Answer[] = [];
    const pace = () => sleep(40);

    const shopClient = async (i: number) => {
      const name = `shop ${i}`;
      const token = tokens.shops[i]!;
      let n = 0;
      let c = 0;
      let retrying = false; // the last try on this C got no clear answer: it may have been written
      while (streaming) {
        n += 1;
        const r = await call(name, 'revise', 'PATCH', `/api/bids/${bidOnA[i]}`, token, bidBody(80_000 + i * 1_000 - n));
        if (r.status === 200)
          revised.push({
            bidId: r.body!.id as number,
            revision: r.body!.revision as number,
            totalCents: r.body!.totalCents as number,
          });
        else if (r.status !== 503) unexpected.push(r);
        await pace();
        if (c < cs.length) {
          const s = await call(name, 'submit', 'POST', `/api/requests/${cs[c]!.id}/bids`, token, bidBody(70_000 + n));
          if (s.status === 201)
            submitted.push({ requestId: cs[c]!.id, shopId: shops[i]!.shop.id, bidId: s.body!.id as number });
          // After a 503 the bid may have committed with only the answer lost: then it exists.
          else if (s.status === 409 && s.code === 'bid_exists' && retrying)
            submitted.push({ requestId: cs[c]!.id, shopId: shops[i]!.shop.id, bidId: null });
          else if (s.status !== 503) unexpected.push(s);
          retrying = s.status === 503;
          if (!retrying) c += 1;
          await pace();
        }
      }
    };
    const reader = async (name: string, token: string, url: string) => {
      while (streaming) {
        const r = await call(name, 'read', 'GET', url, token);
        if (!ok(r) && r.status !== 503) unexpected.push(r);
        await pace();
      }
    };
    const awarder = async () => {
      let retrying = false;
      for (const b of bs) {
        while (streaming) {
          const r = await call('purchasing', 'award', 'POST', `/api/requests/${b.id}/award`, tokens.purchasing, {
            bidId: lowestOnB.get(b.id),
          });
          if (r.status === 200 || (r.status === 409 && retrying)) {
            awarded.add(b.id);
            retrying = false;
            await sleep(400);
            break;
          }
          if (r.status !== 503) unexpected.push(r);
          retrying = true;
          await sleep(200);
        }
      }
    };

    const clients = Promise.all([
      ...shops.map((_, i) => shopClient(i)),
      reader('buyer', tokens.buyer, `/api/requests/${a.id}`),
      reader('shop 0 reading', tokens.shops[0]!, `/api/requests/${a.id}`),
      awarder(),
    ]);
    const names = ['shop 0', 'shop 1', 'shop 2', 'shop 3', 'buyer', 'shop 0 reading', 'purchasing'];

    let stopping = 0;
    let down = 0;
    let starting = 0;
    let up = 0;
    // knex tells the console of each connection it could not make; here they are expected.
    const log = console.log;
    const quiet = vi.spyOn(console, 'log').mockImplementation((...args: unknown[]) => {
      if (!/Acquire connection error|Connection Error:/.test(String(args[0]))) log(...args);
    });
    try {
      await sleep(1_500); // healthy traffic first
      stopping = Date.now();
      await cluster.stop(); // fast shutdown: sessions in flight are ended mid-query
      down = Date.now();
      await sleep(OUTAGE_MS);
      starting = Date.now();
      await cluster.start(); // pg_ctl polls: the server may answer a little before this returns
      up = Date.now();
      // Every client gets through again, with the same app, knex and pool.
      await waitUntil(
        'every client answered 2xx after PostgreSQL came back',
        () => names.every((name) => answers.some((x) => x.client === name && x.startedAt >= up && ok(x))),
        RECOVER_WITHIN_MS,
      );
    } finally {
      streaming = false;
      await clients;
      await cluster.start(); // for the checks below, whatever failed above
      quiet.mockRestore();
    }

    const stream = answers.slice(setUpAnswers);
    const show = (list: Answer[]) =>
      JSON.stringify(
        list.slice(0, 5).map(({ client, what, status, code, body }) => ({ client, what, status, code, body })),
        null,
        1,
      );
    // Never a 500 and never a hang: each answer is a success, an expected conflict or a clear 503.
    expect(
      stream.filter((x) => x.status === 0 || (x.status >= 500 && x.status !== 503)),
      `${show(stream.filter((x) => x.status === 0 || (x.status >= 500 && x.status !== 503)))}\n${unhandled.join('\n')}`,
    ).toEqual([]);
    expect(unexpected.map(({ client, what, status, code }) => ({ client, what, status, code }))).toEqual([]);
    expect(Math.max(...stream.map((x) => x.endedAt - x.startedAt))).toBeLessThan(ANSWER_WITHIN_MS);
    const unavailable = stream.filter((x) => x.status === 503);
    for (const x of unavailable) {
      expect(x.code).toBe('service_unavailable');
      expect(x.retryAfter).toBe('5');
      expect((x.body!.error as { message: string }).message).toMatch(/briefly unavailable/);
    }
    // While the cluster was down nothing could succeed: every request made then was refused clearly.
    const whileDown = stream.filter((x) => x.startedAt >= down && x.endedAt <= starting);
    expect(whileDown.length).toBeGreaterThan(10);
    expect(
      whileDown
        .filter((x) => x.status !== 503)
        .map(({ client, what, status, code }) => ({ client, what, status, code })),
    ).toEqual([]);
    // So were those in flight while it shut down (sessions ended mid-query, new ones refused).
    expect(stream.filter((x) => x.startedAt < down && x.endedAt > stopping && x.status === 503).length).toBeGreaterThan(
      0,
    );
    // Healthy on both sides of the outage.
    expect(stream.filter((x) => x.endedAt < stopping && ok(x)).length).toBeGreaterThan(10);
    for (const name of names) {
      const back = stream.find((x) => x.client === name && x.startedAt >= up && ok(x));
      expect(back!.endedAt - up).toBeLessThan(RECOVER_WITHIN_MS);
    }
    expect((await call('check', 'health', 'GET', '/api/health')).body).toMatchObject({
      checks: { database: { status: 'up' } },
    });

    // Finish the awards the outage interrupted, so every B is checked as awarded below.
    for (const b of bs.filter((x) => !awarded.has(x.id))) {
      const r = await call('purchasing', 'award', 'POST', `/api/requests/${b.id}/award`, tokens.purchasing, {
        bidId: lowestOnB.get(b.id),
      });
      expect([200, 409]).toContain(r.status);
    }
    // Some awards went through before the outage and some after it.
    expect(stream.filter((x) => x.what === 'award' && x.status === 200 && x.endedAt < stopping).length).toBeGreaterThan(
      0,
    );
    expect(stream.filter((x) => x.what === 'award' && x.status === 503).length).toBeGreaterThan(0);

    // No half-written bid: a bid's revisions are 1..n, its row shows the last, and each has its audit entry.
    const bids = await plain('bids').select('id', 'request_id', 'shop_id', 'revision', 'total_cents');
    const revisions = await plain('bid_revisions').orderBy('id').select('bid_id', 'revision', 'action', 'total_cents');
    const audits = await plain('audit_log').select('entity', 'entity_id', 'action');
    expect(bids.length).toBeGreaterThan(4 + 40);
    for (const bid of bids) {
      const own = revisions.filter((r) => r.bid_id === bid.id);
      const steps = Array.from({ length: bid.revision }, (_, k) => [k + 1, k === 0 ? 'submitted' : 'revised']);
      expect(
        own.map((r) => [r.revision, r.action]),
        `bid ${bid.id}`,
      ).toEqual(steps);
      expect(Number(own.at(-1)!.total_cents)).toBe(Number(bid.total_cents));
      const trail = audits
        .filter((x) => x.entity === 'bid' && x.entity_id === bid.id)
        .map((x) => x.action)
        .sort();
      expect(trail, `audit of bid ${bid.id}`).toEqual(['submitted', ...Array(bid.revision - 1).fill('revised')].sort());
    }
    expect(audits.filter((x) => x.entity === 'bid' && !bids.some((b) => b.id === x.entity_id))).toEqual([]);
    // Nothing a shop was told was saved is missing; every bid it was told was made exists once.
    expect(revised.length).toBeGreaterThan(0);
    for (const r of revised) {
      expect(
        revisions.some(
          (x) =>
            x.bid_id === r.bidId &&
            x.revision === r.revision &&
            x.action === 'revised' &&
            Number(x.total_cents) === r.totalCents,
        ),
      ).toBe(true);
    }
    for (const s of submitted) {
      const rows = bids.filter((b) => b.request_id === s.requestId && b.shop_id === s.shopId);
      expect(rows).toHaveLength(1);
      if (s.bidId) expect(rows[0]!.id).toBe(s.bidId);
    }
    expect(revised.at(-1)!.revision).toBeGreaterThan(1);

    // No half-written award: each has its PO number, the request moved to awarded once, and
    // every bidder heard the outcome; no request is awarded without an award.
    const awards = await plain('awards').select(
      'request_id',
      'bid_id',
      'shop_id',
      'revision',
      'total_cents',
      'po_number',
    );
    expect(awards.map((x) => x.request_id).sort()).toEqual(bs.map((b) => b.id).sort());
    const notices = await plain('notifications')
      .whereIn('kind', ['award_won', 'award_lost'])
      .select('user_id', 'kind', 'link');
    for (const award of awards) {
      expect(award.po_number).toMatch(/^PO-\d{4}-\d{5}$/);
      const bid = bids.find((b) => b.id === award.bid_id)!;
      expect([bid.request_id, bid.shop_id, bid.revision, Number(bid.total_cents)]).toEqual([
        award.request_id,
        award.shop_id,
        award.revision,
        Number(award.total_cents),
      ]);
      expect(
        audits.filter(
          (x) =>
            x.entity === 'die_request' &&
            x.entity_id === award.request_id &&
            x.action === 'status:bidding_closed->awarded',
        ),
      ).toHaveLength(1);
      for (const { shop, estimator } of shops) {
        const kinds = notices
          .filter((x) => x.user_id === estimator.id && x.link === `/requests/${award.request_id}`)
          .map((x) => x.kind);
        expect(kinds).toEqual([shop.id === award.shop_id ? 'award_won' : 'award_lost']);
      }
    }
    const awardedRequests = await plain('die_requests').where({ status: 'awarded' }).select('id');
    expect(awardedRequests.map((x) => x.id).sort()).toEqual(bs.map((b) => b.id).sort());
  }, 60_000);

  it('keeps signing in, reading and taking bids while Redis is down, and the reminders catch up when it comes back empty', async () => {
    const printer = await org('printer');
    const buyer = await userIn(printer, 'buyer');
    const shop = await org('die_shop');
    const estimator = await userIn(shop, 'estimator');
    const request = await insertOpenRequest(printer.id, buyer.id);

    // The worker's side: the reminders queue on this file's Redis, with the sweep kept scheduled.
    const connection = { host: '127.0.0.1', port: REDIS_PORT, maxRetriesPerRequest: null };
    const reminders = new Queue(queueNames.reminders, { connection });
    reminders.on('error', () => undefined);
    const restored: string[] = [];
    const stopKeeping = await keepJobSchedulers(
      [{ queue: reminders, id: 'reminder-sweep', name: jobNames.sweepReminders, every: 3_600_000 }],
      {
        checkMs: 200,
        onRestored: (id) => restored.push(id),
      },
    );
    try {
      const planned = await planRequestReminders(plain, reminders, request.id);
      // Open, deadline in 7 days: 48 h and 24 h before it, and "bids ready" at it.
      expect(planned).toHaveLength(3);
      for (const id of planned) expect(await reminders.getJob(id)).toBeDefined();

      await redisSrv.stop();
      const token = await signIn(estimator);
      const read = await call('shop', 'read', 'GET', `/api/requests/${request.id}`, token);
      expect(read.status).toBe(200);
      const bid = await call('shop', 'submit', 'POST', `/api/requests/${request.id}/bids`, token, bidBody(75_000));
      expect(bid.status, JSON.stringify(bid.body)).toBe(201);
      for (const x of answers.slice(-3)) expect(x.endedAt - x.startedAt).toBeLessThan(3_000);
      expect(await plain('bid_revisions').where({ bid_id: bid.body!.id })).toHaveLength(1);
      expect((await call('check', 'health', 'GET', '/api/health')).body).toMatchObject({
        status: 'not_ready',
        checks: { database: { status: 'up' }, redis: { status: 'down' } },
      });

      // Back, and empty: it keeps nothing. The jobs are gone though reminders_planned still lists them.
      await redisSrv.start('KERFMARK_TEST_OUTAGE_REDIS_PORT');
      await waitUntil('the sweep is scheduled again', () => restored.includes('reminder-sweep'), 15_000);
      expect(await reminders.getJobScheduler('reminder-sweep')).toBeDefined();
      for (const id of planned) expect(await reminders.getJob(id)).toBeUndefined();
      expect((await plain('reminders_planned').where({ request_id: request.id })).map((x) => x.job_id).sort()).toEqual(
        [...planned].sort(),
      );

      // The sweep the restored schedule runs puts them back from PostgreSQL, due when they were due.
      const now = new Date();
      expect(await sweepReminders(plain, reminders, now)).toBeGreaterThanOrEqual(3);
      const state = await loadReminderState(plain, request.id);
      const due = planReminders(state!);
      // The bid taken while Redis was down adds the warning before its price lapses: the API's
      // request to plan again was lost with Redis, and the sweep covers it.
      expect(due.map((r) => r.kind)).toEqual(['bid_deadline_48h', 'bid_deadline_24h', 'bids_ready', 'validity_ending']);
      for (const reminder of due) {
        const job = await reminders.getJob(reminderJobId(reminder.key));
        expect(job, reminder.kind).toBeDefined();
        expect(await job!.getState()).toBe('delayed');
        expect(Math.abs(job!.opts.delay! - (reminder.fireAt.getTime() - now.getTime()))).toBeLessThan(1_000);
      }
      // And the API's own Redis client found its way back by itself.
      await waitUntil(
        'the API sees the queue again',
        async () =>
          (
            (await call('check', 'health', 'GET', '/api/health')).body?.checks as
              { redis?: { status: string } } | undefined
          )?.redis?.status === 'up',
        15_000,
      );
    } finally {
      stopKeeping();
      await redisSrv.start('KERFMARK_TEST_OUTAGE_REDIS_PORT');
      await reminders.close();
    }
  }, 60_000);
});
