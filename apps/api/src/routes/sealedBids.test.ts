import { formatInZone } from '@kerfmark/contracts';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { MIN_DEADLINE_NOTICE_MS } from '../access';
import { DieRequest, Notification } from '../models';
import { bidBody } from '../test/fixtures';
import { app, createOpenRequest, createShop, createWorld, knex, waitForEmail, type World } from '../test/harness';

// Sealed means sealed by every route: cancelling, moving the deadline and the home page included.
const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
const HOUR = 3_600_000;

let w: World;
let second: Awaited<ReturnType<typeof createShop>>;

beforeAll(async () => {
  w = await createWorld();
  second = await createShop();
});

/** An open request with a bid from each of the two shops: 80,000 + 3,500 and 70,000 + 3,500 cents. */
async function withTwoBids(opts: Parameters<typeof createOpenRequest>[1] = {}) {
  const open = await createOpenRequest(w, opts);
  const mine = await request(app)
    .post(`/api/requests/${open.id}/bids`)
    .set(bearer(w.tokens.estimator))
    .send(bidBody(80_000));
  const theirs = await request(app)
    .post(`/api/requests/${open.id}/bids`)
    .set(bearer(second.token))
    .send(bidBody(70_000, { leadDays: 30 }));
  expect([mine.status, theirs.status]).toEqual([201, 201]);
  return { id: open.id, title: open.title, bidIds: [mine.body.id as number, theirs.body.id as number] };
}

const noticesOf = (userId: number, requestId: number) =>
  Notification.query().where({ userId, link: `/requests/${requestId}` });

/** Nothing of either bid in a body: no amount, no shop name, no count. */
function expectNothingOfTheBids(body: unknown) {
  const text = JSON.stringify(body) ?? '';
  for (const figure of ['83500', '73500', '83,500', '73,500', '835.00', '735.00', w.shop.name, second.shop.name])
    expect(text).not.toContain(figure);
}

describe('cancelling before the deadline', () => {
  it('keeps the bids sealed for good and tells every bidder', async () => {
    const r = await withTwoBids();
    const cancelled = await request(app)
      .post(`/api/requests/${r.id}/cancel`)
      .set(bearer(w.tokens.buyer))
      .send({ reason: 'The job was lost.' });
    expect(cancelled.status, JSON.stringify(cancelled.body)).toBe(200);
    expectNothingOfTheBids(cancelled.body);

    for (const who of ['buyer', 'purchasing', 'printerAdmin'] as const) {
      const compare = await request(app).get(`/api/requests/${r.id}/bids`).set(bearer(w.tokens[who]));
      expect(compare.status).toBe(404);
      expect(compare.body.error.code).toBe('bids_sealed');
      expectNothingOfTheBids(compare.body);
    }
    // Awarding a guessed bid says nothing of it (its price, its validity, whether it exists).
    for (const bidId of [...r.bidIds, r.bidIds[1]! + 1_000]) {
      const award = await request(app)
        .post(`/api/requests/${r.id}/award`)
        .set(bearer(w.tokens.purchasing))
        .send({ bidId });
      expect(award.status).toBe(409);
      expectNothingOfTheBids(award.body);
    }
    const ocds = await request(app).get(`/api/requests/${r.id}/ocds`).set(bearer(w.tokens.purchasing));
    expectNothingOfTheBids(ocds.body);

    // Both bidding shops are told, in the app and by e-mail.
    for (const user of [w.users.estimator, second.estimator]) {
      const notices = await noticesOf(user.id, r.id);
      expect(notices.map((n) => n.kind)).toContain('request_cancelled');
      expect((await waitForEmail(user.email, `Cancelled: ${r.title}`)).text).toContain('The job was lost.');
    }
  });
});

describe('moving an open request’s deadline', () => {
  const patch = (token: string, id: number, at: Date) =>
    request(app).patch(`/api/requests/${id}`).set(bearer(token)).send({ bidDeadline: at.toISOString() });

  it('never brings it to seconds away: earlier only by purchasing, and with a day’s notice', async () => {
    const r = await withTwoBids();
    const soon = new Date(Date.now() + 5_000);
    const byBuyer = await patch(w.tokens.buyer, r.id, soon);
    expect(byBuyer.status).toBe(403);
    const byPurchasing = await patch(w.tokens.purchasing, r.id, soon);
    expect(byPurchasing.status).toBe(400);
    expect(byPurchasing.body.error.fields.bidDeadline).toMatch(/24 hours/);
    const stored = await DieRequest.query().findById(r.id);
    expect(stored!.bidDeadline!.getTime()).toBeGreaterThan(Date.now() + 6 * 86_400_000);

    // Purchasing may bring it forward with at least the minimum notice; every bidder hears of it.
    const earlier = new Date(Date.now() + MIN_DEADLINE_NOTICE_MS + HOUR);
    const ok = await patch(w.tokens.purchasing, r.id, earlier);
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    expect(ok.body.bidDeadline).toBe(earlier.toISOString());
    for (const user of [w.users.estimator, second.estimator]) {
      expect((await noticesOf(user.id, r.id)).map((n) => n.kind)).toContain('deadline_changed');
    }
  });

  it('lets the buyer move it later, and tells every bidder', async () => {
    const r = await withTwoBids();
    const later = new Date(Date.now() + 14 * 86_400_000);
    const res = await patch(w.tokens.buyer, r.id, later);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    for (const user of [w.users.estimator, second.estimator]) {
      expect((await noticesOf(user.id, r.id)).map((n) => n.kind)).toContain('deadline_changed');
      const mail = await waitForEmail(user.email, `New bid deadline: ${r.title}`);
      // In the reader's own zone, as the shop reads its clock.
      const { timeZone } = await knex('users as u')
        .join('organisations as o', 'o.id', 'u.organisationId')
        .where('u.id', user.id)
        .first('o.timeZone');
      expect(mail.text).toContain(`is now ${formatInZone(later, timeZone)}.`);
    }
  });

  it('refuses to take the deadline away from an open request', async () => {
    const r = await withTwoBids();
    const res = await request(app)
      .patch(`/api/requests/${r.id}`)
      .set(bearer(w.tokens.purchasing))
      .send({ bidDeadline: null });
    expect(res.status).toBe(400);
  });
});

describe('closing early', () => {
  it('is purchasing’s, and every bidder is told', async () => {
    const r = await withTwoBids();
    expect((await request(app).post(`/api/requests/${r.id}/close-bidding`).set(bearer(w.tokens.buyer))).status).toBe(
      403,
    );
    expect(
      (await request(app).post(`/api/requests/${r.id}/close-bidding`).set(bearer(w.tokens.purchasing))).status,
    ).toBe(200);
    for (const user of [w.users.estimator, second.estimator]) {
      expect((await noticesOf(user.id, r.id)).map((n) => n.kind)).toContain('bidding_closed');
    }
  });
});

describe('the buyer’s home page before the deadline', () => {
  it('flags risk from the request’s own dates only, never from a sealed bid', async () => {
    // Needed in 25 days: the planned 10 working days fit, the second shop's 30 working days would not.
    const r = await withTwoBids({ needByDate: new Date(Date.now() + 25 * 86_400_000).toISOString().slice(0, 10) });
    const home = await request(app).get('/api/me/dashboard').set(bearer(w.tokens.buyer));
    const item = (home.body.atRisk as Array<{ requestId: number }>).find((i) => i.requestId === r.id);
    expect(home.status).toBe(200);
    expect(home.body.atRisk.map((i: { requestId: number }) => i.requestId)).not.toContain(r.id);
    expectNothingOfTheBids(item);
    // Once the bids are opened, the lowest bid's 30 working days may count.
    await DieRequest.query()
      .patch({ bidDeadline: new Date(Date.now() - 60_000) })
      .findById(r.id);
    const after = await request(app).get('/api/me/dashboard').set(bearer(w.tokens.buyer));
    expect(after.body.atRisk.find((i: { requestId: number }) => i.requestId === r.id)?.reason).toMatch(
      /lowest bid’s promised ship date/,
    );
  });
});

describe('after the award', () => {
  it('a shop that did not win learns only that; the printer’s notices and e-mails name no bid before it', async () => {
    const r = await withTwoBids();
    // Before the deadline the printer's notices say nothing of the bids.
    for (const user of [w.users.buyer, w.users.purchasing]) expectNothingOfTheBids(await noticesOf(user.id, r.id));
    expect(
      (await request(app).post(`/api/requests/${r.id}/close-bidding`).set(bearer(w.tokens.purchasing))).status,
    ).toBe(200);
    // The first shop's dearer bid wins, with a reason.
    const award = await request(app)
      .post(`/api/requests/${r.id}/award`)
      .set(bearer(w.tokens.purchasing))
      .send({ bidId: r.bidIds[0], reason: 'Faster lead time.' });
    expect(award.status, JSON.stringify(award.body)).toBe(200);
    await request(app).post(`/api/requests/${r.id}/start-production`).set(bearer(w.tokens.estimator)).expect(200);

    const seen = await request(app).get(`/api/requests/${r.id}`).set(bearer(second.token));
    expect(seen.status).toBe(200);
    expect(seen.body).toMatchObject({
      outcome: 'not_awarded',
      award: null,
      status: 'awarded',
      shippedAt: null,
      deliveryAddress: null,
      trackingNote: null,
    });
    expect(JSON.stringify(seen.body)).not.toContain(w.shop.name);
    expect(JSON.stringify(seen.body)).not.toContain('83500');
    expect(
      (await request(app).get(`/api/purchase-orders/${award.body.award.id}/pdf`).set(bearer(second.token))).status,
    ).toBe(404);
    const lost = await noticesOf(second.estimator.id, r.id);
    expect(lost.map((n) => n.kind)).toContain('award_lost');
    for (const n of lost) expect(`${n.title} ${n.body}`).not.toMatch(/\$|83,500|835|Faster/);
  });
});
