// Scale out, proven: two API processes and two worker processes on one PostgreSQL and one
// Redis, as production runs them behind a load balancer. Nothing is sent twice, nothing is
// measured twice, and what one API knows of sign-ins the other knows too.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hashPassword } from '../auth/passwords';
import type { createKnex } from '../db/knex';
import { Organisation, User } from '../models';
import { rectangleDxf } from './fixtures';
import { insertOpenRequest } from './insertOpenRequest';
import { freePort, ProcessHarness, until, type Run } from './processHarness';

const harness = new ProcessHarness();
const PASSWORD = 'correct horse battery';
const MAX_ATTEMPTS = 6;
const COUNT = 200;
const run = Date.now().toString(36);
let knex: ReturnType<typeof createKnex>;
let apis: Array<{ base: string }>;
let workers: Run[];
let printer: { id: number; buyerId: number; buyerEmail: string; purchasingEmail: string };

async function messagesTo(to: string): Promise<Array<{ subject: string }>> {
  const res = await fetch(`${process.env.MAIL_CATCHER_URL}/api/messages?to=${encodeURIComponent(to)}`);
  return (await res.json()) as Array<{ subject: string }>;
}

const login = (base: string, email: string, password: string) =>
  fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });

beforeAll(async () => {
  const redisUrl = await harness.redis((port) => `redis://127.0.0.1:${port}/1`);
  const db = await harness.database('kerfmark_scale_out');
  knex = db.knex;
  const env = (port: number) => ({
    NODE_ENV: 'test',
    HOST: '127.0.0.1',
    PORT: String(port),
    APP_URL: `http://127.0.0.1:${port}`,
    DATABASE_URL: db.databaseUrl,
    REDIS_URL: redisUrl,
    LOGIN_MAX_ATTEMPTS: String(MAX_ATTEMPTS),
    // Both workers sweep the outbox and the reminders every second, racing each other.
    OUTBOX_SWEEP_MS: '1000',
    REMINDER_SWEEP_MS: '1000',
    // Only the job the API queued may measure a dieline within the test.
    ANALYSIS_SWEEP_MS: '600000',
    LOG_LEVEL: 'info',
  });
  const ports = [await freePort(), await freePort()];
  apis = ports.map((port) => {
    harness.start('apps/api/src/server.ts', env(port));
    return { base: `http://127.0.0.1:${port}` };
  });
  workers = [
    harness.start('apps/worker/src/index.ts', env(ports[0]!)),
    harness.start('apps/worker/src/index.ts', env(ports[1]!)),
  ];
  for (const api of apis)
    await until('an API is ready', async () => (await fetch(`${api.base}/api/health/ready`)).ok, 60_000);
  for (const worker of workers)
    await until('a worker runs', async () => worker.output().includes('worker running'), 60_000);

  const org = await Organisation.query().insertAndFetch({
    name: `Scale printer ${run}`,
    kind: 'printer',
    timeZone: 'America/Chicago',
    postcode: '60614',
    country: 'US',
  });
  const passwordHash = await hashPassword(PASSWORD, 4);
  const buyerEmail = `scale-buyer-${run}@test.example`;
  const purchasingEmail = `scale-purchasing-${run}@test.example`;
  const buyer = await User.query().insertAndFetch({
    organisationId: org.id,
    email: buyerEmail,
    name: 'Scale Buyer',
    role: 'buyer',
    status: 'active',
    passwordHash,
  });
  await User.query().insert({
    organisationId: org.id,
    email: purchasingEmail,
    name: 'Scale Purchasing',
    role: 'purchasing',
    status: 'active',
    passwordHash,
  });
  printer = { id: org.id, buyerId: buyer.id, buyerEmail, purchasingEmail };
}, 180_000);

afterAll(() => harness.close(), 30_000);

describe('two APIs and two workers on one PostgreSQL and one Redis', () => {
  it(`sends ${COUNT} e-mails and ${COUNT} reminders due at the same moment exactly once each`, async () => {
    const to = `scale-mail-${run}@test.example`;
    const due = new Date(Date.now() + 5_000);
    await knex('email_outbox').insert(
      Array.from({ length: COUNT }, (_, i) => ({
        toAddress: to,
        subject: `Scale ${run} #${i}`,
        textBody: 'One of many',
        kind: 'test',
        nextAttemptAt: due,
      })),
    );
    // Requests whose bids are ready to compare at that same moment: purchasing and the buyer are told.
    const ids: number[] = [];
    for (let i = 0; i < COUNT; i++)
      ids.push(
        (await insertOpenRequest(printer.id, printer.buyerId, { deadline: new Date(Date.now() + 3_600_000) })).id,
      );
    await knex('die_requests').whereIn('id', ids).update({ bidDeadline: due });

    await until('every e-mail arrives', async () => (await messagesTo(to)).length >= COUNT, 60_000);
    await until(
      'every reminder is sent',
      async () => Number((await knex('reminders_sent').whereIn('request_id', ids).count('* as n'))[0]!.n) >= COUNT,
      60_000,
    );
    await until(
      'every reminder e-mail arrives',
      async () => (await messagesTo(printer.purchasingEmail)).length >= COUNT,
      60_000,
    );
    // Both workers sweep every second: a few more sweeps would show any second copy.
    await new Promise((r) => setTimeout(r, 4_000));

    const mail = (await messagesTo(to)).map((m) => m.subject);
    expect(mail).toHaveLength(COUNT);
    expect(new Set(mail).size).toBe(COUNT);
    const rows = await knex('email_outbox').where({ toAddress: to });
    expect(rows.every((r) => r.status === 'sent' && r.attempts === 1)).toBe(true);

    const sent = await knex('reminders_sent').whereIn('request_id', ids).select('request_id', 'kind');
    expect(sent).toHaveLength(COUNT);
    expect(new Set(sent.map((r) => r.requestId)).size).toBe(COUNT);
    expect(sent.every((r) => r.kind === 'bids_ready')).toBe(true);
    for (const email of [printer.purchasingEmail, printer.buyerEmail]) {
      const subjects = (await messagesTo(email))
        .map((m) => m.subject)
        .filter((s) => s.startsWith('Bids ready to compare'));
      expect(subjects, email).toHaveLength(COUNT);
      expect(new Set(subjects).size, email).toBe(COUNT);
    }
    // The work was shared: each worker delivered some of it.
    for (const worker of workers) expect(worker.output()).toContain('e-mail delivery');
  }, 150_000);

  it('measures a dieline uploaded through one API once, with either worker', async () => {
    const token = ((await (await login(apis[0]!.base, printer.buyerEmail, PASSWORD)).json()) as { token: string })
      .token;
    const created = await fetch(`${apis[0]!.base}/api/requests`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}` },
      body: JSON.stringify({ title: 'Carton on two APIs', quantity: 1, ups: 1, ruleTypes: ['cut'] }),
    });
    expect(created.status).toBe(201);
    const requestId = ((await created.json()) as { id: number }).id;
    const form = new FormData();
    form.append('file', new Blob([rectangleDxf]), 'carton.dxf');
    const upload = await fetch(`${apis[0]!.base}/api/requests/${requestId}/files`, {
      method: 'POST',
      headers: { Authorization: `Bearer ${token}` },
      body: form,
    });
    expect(upload.status).toBe(201);
    const fileId = ((await upload.json()) as { id: number }).id;

    // Read back through the other API.
    const file = await until('the dieline is measured', async () => {
      const res = await fetch(`${apis[1]!.base}/api/files/${fileId}`, {
        headers: { Authorization: `Bearer ${token}` },
      });
      const body = (await res.json()) as { analysisStatus: string; metrics?: { length: { cut: number } } };
      return body.analysisStatus === 'done' ? body : undefined;
    });
    // The 4 × 3 in rectangle of cutting rule: 2 × (4 + 3) = 14 in (its geometry, fixtures.ts).
    expect(file.metrics!.length.cut).toBeCloseTo(14, 6);
    await new Promise((r) => setTimeout(r, 1_000));
    const measured = workers
      .flatMap((w) => w.output().split('\n'))
      .filter((line) => line.includes(`"fileId":${fileId}`) && line.includes('"result":"done"'));
    expect(measured).toHaveLength(1);
  }, 60_000);

  it('counts failed sign-ins made through both APIs against one limit', async () => {
    const email = printer.purchasingEmail;
    for (let i = 0; i < MAX_ATTEMPTS; i++)
      expect((await login(apis[i % 2]!.base, email, 'wrong password')).status).toBe(401);
    // The limit is reached on the sum: now even the right password waits, on either API.
    for (const api of apis) {
      const res = await login(api.base, email, PASSWORD);
      expect(res.status).toBe(429);
      expect(Number(res.headers.get('retry-after'))).toBeGreaterThan(0);
    }
  });

  it('refuses a signed-out token on both APIs', async () => {
    const token = ((await (await login(apis[1]!.base, printer.buyerEmail, PASSWORD)).json()) as { token: string })
      .token;
    const me = (base: string) => fetch(`${base}/api/me`, { headers: { Authorization: `Bearer ${token}` } });
    for (const api of apis) expect((await me(api.base)).status).toBe(200);
    expect(
      (
        await fetch(`${apis[0]!.base}/api/auth/logout`, {
          method: 'POST',
          headers: { Authorization: `Bearer ${token}` },
        })
      ).status,
    ).toBe(204);
    for (const api of apis) expect((await me(api.base)).status).toBe(401);
  });
});
