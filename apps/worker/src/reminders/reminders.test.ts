import { randomUUID } from 'node:crypto';
import { Queue } from 'bullmq';
import { afterAll, describe, expect, it } from 'vitest';
import { redisOptions, reminderJobId } from '@kerfmark/contracts';
import { createKnex } from '../db';
import { planReminders } from './planReminders';
import { loadReminderState } from './loadReminderState';
import { planRequestReminders } from './planRequestReminders';
import { sendReminder } from './sendReminder';
import { sweepReminders } from './sweepReminders';

// Against the real PostgreSQL and Redis that `npm test` starts. Each test uses a queue of its
// own, so the running worker never takes its jobs; time is passed in explicitly.
const knex = createKnex(process.env.DATABASE_URL!);
const connection = redisOptions(process.env.REDIS_URL!);
const queues: Queue[] = [];
const testQueue = () => {
  const queue = new Queue(`test-reminders-${randomUUID()}`, { connection });
  queues.push(queue);
  return queue;
};
const APP = { appUrl: 'http://127.0.0.1:4200' };
const HOUR = 3_600_000;

afterAll(async () => {
  for (const q of queues) await q.obliterate({ force: true }).then(() => q.close());
  await knex.destroy();
});

async function org(kind: 'printer' | 'die_shop') {
  const timeZone = kind === 'printer' ? 'America/Chicago' : 'America/Indiana/Indianapolis';
  const [row] = await knex('organisations')
    .insert({ name: `${kind} ${randomUUID().slice(0, 8)}`, kind, time_zone: timeZone })
    .returning('id');
  return row.id as number;
}
async function user(organisationId: number, role: string, preferences = {}) {
  const [row] = await knex('users')
    .insert({
      organisation_id: organisationId,
      email: `${role}-${randomUUID().slice(0, 8)}@test.example`,
      name: `Test ${role}`,
      role,
      password_hash: 'x',
      preferences: JSON.stringify(preferences),
    })
    .returning(['id', 'email']);
  return row as { id: number; email: string };
}

/** An open request with its deadline at `deadline`, one invited shop that has not bid. */
async function openRequest(deadline: Date, opts: { preferences?: Record<string, boolean> } = {}) {
  const printer = await org('printer');
  const buyer = await user(printer, 'buyer');
  const purchasing = await user(printer, 'purchasing');
  const shop = await org('die_shop');
  const estimator = await user(shop, 'estimator', opts.preferences);
  const [request] = await knex('die_requests')
    .insert({
      organisation_id: printer,
      created_by: buyer.id,
      title: `Carton ${randomUUID().slice(0, 6)}`,
      status: 'open',
      visibility: 'invited',
      bid_deadline: deadline,
      published_at: new Date(deadline.getTime() - 10 * 24 * HOUR),
      need_by_date: '2027-03-01',
    })
    .returning('id');
  await knex('request_invitations').insert({ request_id: request.id, shop_id: shop });
  return { id: request.id as number, printer, buyer, purchasing, shop, estimator };
}

const keyOf = async (requestId: number, kind: string, audience = 'all') =>
  planReminders((await loadReminderState(knex, requestId))!).find((r) => r.kind === kind && r.audience === audience)!
    .key;
const outboxTo = (email: string) => knex('email_outbox').where({ to_address: email });

describe('reminders against PostgreSQL and Redis', () => {
  it('sends the 24-hour reminder to an invited shop that has not bid, once', async () => {
    const deadline = new Date('2027-01-15T23:00:00Z');
    const r = await openRequest(deadline);
    const key = await keyOf(r.id, 'bid_deadline_24h');
    expect(
      (await sendReminder(knex, { ...APP, now: new Date(deadline.getTime() - 30 * HOUR) }, r.id, key)).result,
    ).toBe('not-due');
    const at = new Date(deadline.getTime() - 24 * HOUR + 60_000);
    const first = await sendReminder(knex, { ...APP, now: at }, r.id, key);
    expect(first.result).toBe('sent');
    // A job that runs twice (or two workers at once) sends one e-mail.
    const again = await Promise.all([
      sendReminder(knex, { ...APP, now: at }, r.id, key),
      sendReminder(knex, { ...APP, now: at }, r.id, key),
    ]);
    expect(again.map((x) => x.result)).toEqual(['already-sent', 'already-sent']);
    const mail = await outboxTo(r.estimator.email);
    expect(mail).toHaveLength(1);
    expect(mail[0].subject).toMatch(/^Bids due in 24 hours/);
    // The date is in the reader's zone: this shop is in Indianapolis (UTC−5 in January), 18:00 EST.
    expect(mail[0].text_body).toContain('Jan 15, 2027, 18:00 EST');
    expect(mail[0].text_body).toContain(`${APP.appUrl}/requests/${r.id}`);
    expect(await outboxTo(r.buyer.email)).toHaveLength(0);
  });

  it('writes each reader their own e-mail: their units, their locale and their zone', async () => {
    const deadline = new Date('2027-01-15T23:00:00Z');
    const r = await openRequest(deadline);
    // A measured die: 412.5 in of rule on a 22 × 30 in board.
    await knex('die_requests')
      .where({ id: r.id })
      .update({ measured_rule_in: 412.5, measured_board_width_in: 22, measured_board_height_in: 30 });
    const metric = await user(r.shop, 'estimator');
    await knex('users').where({ id: metric.id }).update({ length_units: 'mm', locale: 'en-GB' });
    const key = await keyOf(r.id, 'bid_deadline_24h');
    await sendReminder(knex, { ...APP, now: new Date(deadline.getTime() - 23 * HOUR) }, r.id, key);
    const [imperialMail] = await outboxTo(r.estimator.email);
    const [metricMail] = await outboxTo(metric.email);
    // 412.5 × 25.4 = 10,477.5 mm; 22 × 25.4 = 558.8 and 30 × 25.4 = 762 (1 in = 25.4 mm exactly).
    expect(imperialMail.text_body).toContain('The die has 412.5 in of rule on a 22.00 × 30.00 in board.');
    expect(metricMail.text_body).toContain('The die has 10,478 mm of rule on a 558.8 × 762.0 mm board.');
    // en-GB writes the day before the month, and names a US zone by its offset (CLDR has no
    // British short name for it), as Intl does.
    expect(imperialMail.text_body).toContain('Jan 15, 2027, 18:00 EST');
    expect(metricMail.text_body).toContain('15 Jan 2027, 18:00 GMT-5');
  });

  it('tells purchasing when the best bid is about to lapse, and the awarded shop and buyer before the need-by date', async () => {
    const r = await openRequest(new Date('2026-12-01T23:00:00Z'));
    await knex('die_requests')
      .where({ id: r.id })
      .update({ status: 'bidding_closed', bidding_closed_at: new Date('2026-12-01T23:00:00Z') });
    await knex('bids').insert({
      request_id: r.id,
      shop_id: r.shop,
      lines: '[]',
      currency: 'USD',
      total_cents: 50_000,
      die_cents: 45_000,
      lead_days: 5,
      promised_ship_date: '2026-12-09',
      valid_until: '2026-12-20',
    });
    const lapse = await keyOf(r.id, 'validity_ending');
    // 09:00 Chicago on 18 Dec (two days before 20 Dec) = 15:00 UTC.
    expect((await sendReminder(knex, { ...APP, now: new Date('2026-12-18T15:00:00Z') }, r.id, lapse)).result).toBe(
      'sent',
    );
    // (The running worker may also have sent "bids ready" for this request: look at this rule's e-mails.)
    const lapseMail = (email: string) =>
      outboxTo(email).then((rows) => rows.filter((m) => /^Best bid lapses soon/.test(m.subject)));
    expect(await lapseMail(r.purchasing.email)).toHaveLength(1);
    expect(await lapseMail(r.buyer.email)).toHaveLength(0);

    const bid = await knex('bids').where({ request_id: r.id }).first('id');
    await knex('awards').insert({
      request_id: r.id,
      bid_id: bid.id,
      shop_id: r.shop,
      revision: 1,
      total_cents: 50_000,
      die_cents: 45_000,
      currency: 'USD',
      lead_days: 5,
      promised_ship_date: '2027-02-20',
      awarded_at: new Date('2026-12-19T15:00:00Z'),
      po_number: `PO-T-${randomUUID().slice(0, 8)}`,
    });
    await knex('die_requests').where({ id: r.id }).update({ status: 'awarded' });
    const title = (await knex('die_requests').where({ id: r.id }).first('title')).title;
    const needed = (m: { subject: string }) => m.subject === `Needed in 7 days: ${title}`;
    // Need-by 1 Mar 2027; seven days before, at 09:00 on each side: the buyer's Chicago (UTC−6) is
    // 22 Feb 15:00 UTC, the shop's Indianapolis (UTC−5) 22 Feb 14:00 UTC.
    const forShop = await keyOf(r.id, 'need_by_7d', 'shop');
    expect((await sendReminder(knex, { ...APP, now: new Date('2027-02-22T14:00:00Z') }, r.id, forShop)).result).toBe(
      'sent',
    );
    expect((await outboxTo(r.estimator.email)).filter(needed)).toHaveLength(1);
    expect((await outboxTo(r.buyer.email)).filter(needed)).toHaveLength(0);
    const forBuyer = await keyOf(r.id, 'need_by_7d', 'printer');
    expect((await sendReminder(knex, { ...APP, now: new Date('2027-02-22T14:00:00Z') }, r.id, forBuyer)).result).toBe(
      'not-due',
    );
    expect((await sendReminder(knex, { ...APP, now: new Date('2027-02-22T15:00:00Z') }, r.id, forBuyer)).result).toBe(
      'sent',
    );
    expect((await outboxTo(r.buyer.email)).filter(needed)).toHaveLength(1);
    expect((await outboxTo(r.estimator.email)).filter(needed)).toHaveLength(1);
  });

  it('checks the request again before sending: a shop that bid, or a cancelled request, gets nothing', async () => {
    const deadline = new Date('2027-01-20T23:00:00Z');
    const r = await openRequest(deadline);
    const key = await keyOf(r.id, 'bid_deadline_48h');
    await knex('die_requests').where({ id: r.id }).update({ status: 'cancelled' });
    expect(
      (await sendReminder(knex, { ...APP, now: new Date(deadline.getTime() - 47 * HOUR) }, r.id, key)).result,
    ).toBe('no-longer-applies');
    expect(await outboxTo(r.estimator.email)).toHaveLength(0);
  });

  it('keeps the in-app notice but sends no e-mail when the user turned that kind off', async () => {
    const deadline = new Date('2027-01-22T23:00:00Z');
    const r = await openRequest(deadline, { preferences: { bid_deadline_24h: false } });
    const key = await keyOf(r.id, 'bid_deadline_24h');
    expect(
      (await sendReminder(knex, { ...APP, now: new Date(deadline.getTime() - 23 * HOUR) }, r.id, key)).result,
    ).toBe('sent');
    expect(await outboxTo(r.estimator.email)).toHaveLength(0);
    expect(await knex('notifications').where({ user_id: r.estimator.id, kind: 'bid_deadline_24h' })).toHaveLength(1);
  });

  it('moves jobs when the deadline moves, and removes them when the request is cancelled', async () => {
    const queue = testQueue();
    const now = new Date('2027-01-01T12:00:00Z');
    const r = await openRequest(new Date('2027-01-25T23:00:00Z'));
    const first = await planRequestReminders(knex, queue, r.id, now);
    expect(first).toHaveLength(3);
    expect(await planRequestReminders(knex, queue, r.id, now)).toEqual(first); // planning twice is one set
    const job = await queue.getJob(reminderJobId(await keyOf(r.id, 'bid_deadline_24h')));
    // Fires 24 h before the deadline: 25 Jan 23:00 − 24 h − now = 23 days 11 h.
    expect(job?.opts.delay).toBe((23 * 24 + 11) * HOUR);

    await knex('die_requests')
      .where({ id: r.id })
      .update({ bid_deadline: new Date('2027-01-27T23:00:00Z') });
    const moved = await planRequestReminders(knex, queue, r.id, now);
    for (const id of first) expect(await queue.getJob(id)).toBeUndefined();
    for (const id of moved) expect(await queue.getJob(id)).toBeDefined();

    await knex('die_requests').where({ id: r.id }).update({ status: 'cancelled' });
    expect(await planRequestReminders(knex, queue, r.id, now)).toEqual([]);
    expect((await queue.getJobs(['delayed'])).filter((j) => j.data.requestId === r.id)).toHaveLength(0);
  });

  it('rebuilds every reminder from PostgreSQL after Redis lost its data', async () => {
    const queue = testQueue();
    const now = new Date('2027-01-01T12:00:00Z');
    const r = await openRequest(new Date('2027-02-10T23:00:00Z'));
    const planned = await planRequestReminders(knex, queue, r.id, now);
    await queue.obliterate({ force: true });
    expect(await queue.getJob(planned[0]!)).toBeUndefined();
    await sweepReminders(knex, queue, now);
    for (const id of planned) expect(await queue.getJob(id)).toBeDefined();
  });

  it('flags a die not shipped by the day after its promised date, and tells both sides', async () => {
    const r = await openRequest(new Date('2026-11-01T23:00:00Z'));
    const [bid] = await knex('bids')
      .insert({
        request_id: r.id,
        shop_id: r.shop,
        lines: '[]',
        currency: 'USD',
        total_cents: 100_000,
        die_cents: 90_000,
        lead_days: 5,
        promised_ship_date: '2026-11-10',
        valid_until: '2026-12-31',
      })
      .returning('id');
    await knex('awards').insert({
      request_id: r.id,
      bid_id: bid.id,
      shop_id: r.shop,
      revision: 1,
      total_cents: 100_000,
      die_cents: 90_000,
      currency: 'USD',
      lead_days: 5,
      promised_ship_date: '2026-11-10',
      awarded_at: new Date('2026-11-02T15:00:00Z'),
      po_number: `PO-T-${randomUUID().slice(0, 8)}`,
    });
    await knex('die_requests').where({ id: r.id }).update({ status: 'in_production' });
    const key = await keyOf(r.id, 'late_shipment', 'shop');
    // The day after 10 Nov, 09:00 in the shop's zone (Indianapolis, UTC−5): 11 Nov 14:00 UTC.
    expect((await sendReminder(knex, { ...APP, now: new Date('2026-11-11T13:59:00Z') }, r.id, key)).result).toBe(
      'not-due',
    );
    // The running worker's sweep works in real time, when this date is long past, and may send it
    // first: either way the key is recorded once and the notices exist once.
    expect(['sent', 'already-sent']).toContain(
      (await sendReminder(knex, { ...APP, now: new Date('2026-11-11T14:00:00Z') }, r.id, key)).result,
    );
    expect(await knex('reminders_sent').where({ key })).toHaveLength(1);
    expect((await knex('die_requests').where({ id: r.id }).first()).late_flagged_at).toBeTruthy();
    expect((await outboxTo(r.estimator.email)).filter((m) => /^Late:/.test(m.subject))).toHaveLength(1);
    // The printer's side hears of it at 09:00 in Chicago (UTC−6): 11 Nov 15:00 UTC.
    const forPrinter = await keyOf(r.id, 'late_shipment', 'printer');
    expect(['sent', 'already-sent']).toContain(
      (await sendReminder(knex, { ...APP, now: new Date('2026-11-11T15:00:00Z') }, r.id, forPrinter)).result,
    );
    expect((await outboxTo(r.purchasing.email)).filter((m) => /^Late:/.test(m.subject))).toHaveLength(1);
    expect((await outboxTo(r.estimator.email)).filter((m) => /^Late:/.test(m.subject))).toHaveLength(1);
  });
});
