import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { DieRequest } from '../models';
import { errorsText, validateRelease } from '../test/ocdsValidator';
import { app, createOpenRequest, createShop, createWorld, knex, waitForEmail, type World } from '../test/harness';
import { inDays, bidBody } from '../test/fixtures';
import { addDieline, createRequestAt } from '../test/requestStages';

const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

let w: World;
let second: Awaited<ReturnType<typeof createShop>>;

beforeAll(async () => {
  w = await createWorld();
  second = await createShop();
});

async function pastDeadline(requestId: number) {
  await DieRequest.query()
    .patch({ bidDeadline: new Date(Date.now() - 60_000) })
    .findById(requestId);
}

describe('sealed bids', () => {
  it('computes totals on the server, keeps every revision, and lets a shop withdraw until the deadline', async () => {
    const open = await createOpenRequest(w);
    // A total sent by the client is ignored: the server adds the lines (84,500 + 3,500 cents).
    const bid = await request(app)
      .post(`/api/requests/${open.id}/bids`)
      .set(bearer(w.tokens.estimator))
      .send({ ...bidBody(84_500), totalCents: 1 });
    expect(bid.status, JSON.stringify(bid.body)).toBe(201);
    expect(bid.body).toMatchObject({ totalCents: 88_000, revision: 1, status: 'submitted' });
    expect(bid.body.promisedShipDate > new Date().toISOString().slice(0, 10)).toBe(true);

    const again = await request(app)
      .post(`/api/requests/${open.id}/bids`)
      .set(bearer(w.tokens.estimator))
      .send(bidBody(80_000));
    expect(again.status).toBe(409);

    const revised = await request(app)
      .patch(`/api/bids/${bid.body.id}`)
      .set(bearer(w.tokens.estimator))
      .send(bidBody(79_000, { leadDays: 7 }));
    expect(revised.body).toMatchObject({ totalCents: 82_500, revision: 2 });
    const withdrawn = await request(app).post(`/api/bids/${bid.body.id}/withdraw`).set(bearer(w.tokens.estimator));
    expect(withdrawn.body.status).toBe('withdrawn');
    expect(
      withdrawn.body.revisions.map((r: { revision: number; action: string; totalCents: number }) => [
        r.revision,
        r.action,
        r.totalCents,
      ]),
    ).toEqual([
      [1, 'submitted', 88_000],
      [2, 'revised', 82_500],
      [2, 'withdrawn', 82_500],
    ]);
  });

  it('refuses fractions of a cent, a missing die line, and a price that lapses before the deadline', async () => {
    const open = await createOpenRequest(w);
    const post = (body: object) =>
      request(app).post(`/api/requests/${open.id}/bids`).set(bearer(w.tokens.estimator)).send(body);
    const fraction = await post(bidBody(845.5));
    expect(fraction.status).toBe(400);
    expect(fraction.body.error.fields['lines.0.amountCents']).toMatch(/whole cents/);
    const noDie = await post({ ...bidBody(1), lines: [{ kind: 'shipping', amountCents: 100 }] });
    expect(noDie.body.error.fields.lines).toMatch(/price of the die/);
    const lapses = await post(bidBody(1000, { validUntil: inDays(1) }));
    expect(lapses.status).toBe(400);
    expect(lapses.body.error.fields.validUntil).toBeTruthy();
  });

  it('keeps bids from the printer until the deadline, and from other shops always', async () => {
    const open = await createOpenRequest(w);
    const mine = await request(app)
      .post(`/api/requests/${open.id}/bids`)
      .set(bearer(w.tokens.estimator))
      .send(bidBody(90_000));
    const sealed = await request(app).get(`/api/requests/${open.id}/bids`).set(bearer(w.tokens.purchasing));
    expect(sealed.status).toBe(404);
    expect(sealed.body.error.code).toBe('bids_sealed');
    expect(JSON.stringify(sealed.body)).not.toContain('90000');

    // Another shop: no way to read, change or count the first shop's bid.
    expect(
      (await request(app).patch(`/api/bids/${mine.body.id}`).set(bearer(second.token)).send(bidBody(1))).status,
    ).toBe(404);
    expect((await request(app).post(`/api/bids/${mine.body.id}/withdraw`).set(bearer(second.token))).status).toBe(404);
    expect((await request(app).get(`/api/requests/${open.id}/bids`).set(bearer(second.token))).status).toBe(403);
    const seen = await request(app).get(`/api/requests/${open.id}`).set(bearer(second.token));
    expect(seen.body.myBid).toBeNull();
    expect(JSON.stringify(seen.body)).not.toContain('90000');
    // Another printer sees nothing at all.
    const other = await createWorld();
    expect((await request(app).get(`/api/requests/${open.id}/bids`).set(bearer(other.tokens.purchasing))).status).toBe(
      404,
    );
  });

  it('refuses a bid after the deadline with a clear error', async () => {
    const open = await createOpenRequest(w);
    await pastDeadline(open.id);
    const late = await request(app)
      .post(`/api/requests/${open.id}/bids`)
      .set(bearer(w.tokens.estimator))
      .send(bidBody(1000));
    expect(late.status).toBe(409);
    expect(late.body.error.message).toMatch(/Bidding on this request closed at .*(CST|CDT)/);
  });
});

describe('open requests', () => {
  it('shows distance from the shop, and marks requests the shop bid on or passed on', async () => {
    const first = await createOpenRequest(w);
    const second2 = await createOpenRequest(w);
    const declined = await request(app)
      .post(`/api/requests/${first.id}/decline`)
      .set(bearer(w.tokens.estimator))
      .send({ reason: 'Too large for our laser' });
    expect(declined.status, JSON.stringify(declined.body)).toBe(204);
    const open = await request(app)
      .get('/api/open-requests')
      .query({ q: w.printer.name, hideDeclined: 'false' })
      .set(bearer(w.tokens.estimator));
    const row = (id: number) => open.body.items.find((r: { id: number }) => r.id === id);
    // Shop and delivery share the postcode 60614: no distance to speak of.
    expect(row(first.id)).toMatchObject({ declined: true, hasBid: false, distanceMiles: 0 });
    expect(row(second2.id)).toMatchObject({ declined: false });
  });
});

describe('award', () => {
  it('runs the loop: two bids, a revision, early close, comparison, award with a reason, PO, e-mails, shipping, receiving', async () => {
    const open = await createOpenRequest(w);
    const a = await request(app)
      .post(`/api/requests/${open.id}/bids`)
      .set(bearer(w.tokens.estimator))
      .send(bidBody(95_000, { leadDays: 4 }));
    const b = await request(app)
      .post(`/api/requests/${open.id}/bids`)
      .set(bearer(second.token))
      .send(bidBody(90_000, { leadDays: 9 }));
    await request(app)
      .patch(`/api/bids/${b.body.id}`)
      .set(bearer(second.token))
      .send(bidBody(88_000, { leadDays: 9 }));

    const closed = await request(app).post(`/api/requests/${open.id}/close-bidding`).set(bearer(w.tokens.purchasing));
    expect(closed.body.status).toBe('bidding_closed');
    // Through the running worker: the close plans the reminders, and "bids ready" is due at once.
    const ready = await waitForEmail(w.users.purchasing.email, `Bids ready to compare: ${open.title}`);
    expect(ready.text).toContain('2 bids to compare');
    const late = await request(app).patch(`/api/bids/${a.body.id}`).set(bearer(w.tokens.estimator)).send(bidBody(1));
    expect(late.status).toBe(409);

    const comparison = await request(app).get(`/api/requests/${open.id}/bids`).set(bearer(w.tokens.purchasing));
    expect(comparison.status).toBe(200);
    const [lowest, higher] = comparison.body.bids;
    expect(lowest).toMatchObject({ bidId: b.body.id, totalCents: 91_500, overLowestCents: 0, revision: 2 });
    expect(higher).toMatchObject({ bidId: a.body.id, totalCents: 98_500, overLowestCents: 7_000 });
    // Price per inch over 18 in of priced rule (14 cut + 4 crease): 98,500 / 18 = 5,472.2 → 5,472 cents.
    expect(higher.centsPerInch).toBe(5_472);
    expect(lowest.best).toContain('total');
    expect(higher.best).toContain('lead');

    const noReason = await request(app)
      .post(`/api/requests/${open.id}/award`)
      .set(bearer(w.tokens.purchasing))
      .send({ bidId: a.body.id });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.fields.reason).toMatch(/\$915\.00/);
    const buyerTries = await request(app)
      .post(`/api/requests/${open.id}/award`)
      .set(bearer(w.tokens.buyer))
      .send({ bidId: a.body.id, reason: 'x' });
    expect(buyerTries.status).toBe(403);
    const awarded = await request(app)
      .post(`/api/requests/${open.id}/award`)
      .set(bearer(w.tokens.purchasing))
      .send({ bidId: a.body.id, reason: 'Ships five working days sooner; the need-by date is tight.' });
    expect(awarded.status, JSON.stringify(awarded.body)).toBe(200);
    expect(awarded.body.status).toBe('awarded');
    expect(awarded.body.award.poNumber).toMatch(/^PO-\d{4}-\d{5}$/);

    const winnerMail = await waitForEmail(w.users.estimator.email, 'Awarded to you');
    expect(winnerMail.subject).toContain('Awarded to you');
    expect(winnerMail.text).toContain(awarded.body.award.poNumber);
    // What the die measures, in the reader's units (inches for this US shop): 14 + 4 in of rule.
    expect(winnerMail.text).toContain('Your bid of $985.00');
    expect(winnerMail.text).toMatch(/The die has 18\.0 in of rule on a [\d.]+ × [\d.]+ in board\./);
    const loserMail = await waitForEmail(second.estimator.email, 'Not awarded');
    expect(loserMail.subject).toContain('Not awarded');
    expect(loserMail.text).not.toMatch(/\$|PO-/);

    // The loser learns only that it did not win.
    const loserView = await request(app).get(`/api/requests/${open.id}`).set(bearer(second.token));
    expect(loserView.body.outcome).toBe('not_awarded');
    expect(loserView.body.award).toBeNull();
    expect(JSON.stringify(loserView.body)).not.toContain(w.shop.name);

    const pdf = await request(app)
      .get(`/api/purchase-orders/${awarded.body.award.id}/pdf`)
      .set(bearer(w.tokens.purchasing))
      .buffer(true);
    expect(pdf.status).toBe(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    expect(pdf.body.subarray(0, 5).toString()).toBe('%PDF-');
    expect(
      (await request(app).get(`/api/purchase-orders/${awarded.body.award.id}/pdf`).set(bearer(second.token))).status,
    ).toBe(404);
    expect(
      (await request(app).get(`/api/purchase-orders/${awarded.body.award.id}/pdf`).set(bearer(w.tokens.estimator)))
        .status,
    ).toBe(200);

    // Open Contracting Data Standard 1.1 release with the bids extension, validated with ajv.
    const release = await request(app).get(`/api/requests/${open.id}/ocds`).set(bearer(w.tokens.purchasing));
    expect(release.status).toBe(200);
    expect(validateRelease(release.body), errorsText(validateRelease.errors)).toBe(true);
    expect(release.body.awards[0].value).toEqual({ amount: 985, currency: 'USD' });
    expect(release.body.bids.details).toHaveLength(2);
    expect((await request(app).get(`/api/requests/${open.id}/ocds`).set(bearer(second.token))).status).toBe(403);

    const started = await request(app)
      .post(`/api/requests/${open.id}/start-production`)
      .set(bearer(w.tokens.estimator));
    expect(started.body.status).toBe('in_production');
    expect(
      (await request(app).post(`/api/requests/${open.id}/ship`).set(bearer(second.token)).send({ trackingNote: 'x y' }))
        .status,
    ).toBe(404);
    const shipped = await request(app)
      .post(`/api/requests/${open.id}/ship`)
      .set(bearer(w.tokens.estimator))
      .send({ trackingNote: 'Parcel, tracking 1Z999' });
    expect(shipped.body.status).toBe('shipped');
    const received = await request(app)
      .post(`/api/requests/${open.id}/receive`)
      .set(bearer(w.tokens.buyer))
      .send({ condition: 'good' });
    expect(received.body.status).toBe('received');
    const record = await knex('priceRecords').where({ requestId: open.id }).first();
    expect(record).toMatchObject({
      totalCents: 98_500,
      dieCents: 95_000,
      currency: 'USD',
      shopId: w.shop.id,
      complexity: expect.any(String),
    });
    expect(Number(record.ruleLengthIn)).toBeCloseTo(18, 3);

    // The received die is in the printer's library, and another request like it finds it there.
    const library = await request(app).get('/api/library').set(bearer(w.tokens.buyer));
    const stored = library.body.find((d: { requestId: number }) => d.requestId === open.id);
    expect(stored).toMatchObject({ mine: true, condition: 'good', impressions: 0 });
    const twin = await createOpenRequest(w);
    const matches = await request(app).get(`/api/requests/${twin.id}/library-matches`).set(bearer(w.tokens.buyer));
    expect(matches.body[0]).toMatchObject({ id: stored.id });
    expect(matches.body[0].match.reasons.join(' ')).toContain('within 5 %');

    // The winner's estimate aid now holds this die: 95,000 cents of die over 18 in = 5,277.8 → 5,278 a inch.
    const aid = await request(app).get('/api/estimate-aid').set(bearer(w.tokens.estimator));
    expect(aid.body).toEqual([{ currency: 'USD', dies: 1, centsPerInch: 5_278, centsPerBend: 23_750 }]);
  });

  it('gives exactly one success to 20 simultaneous awards', async () => {
    const open = await createOpenRequest(w);
    const bid = await request(app)
      .post(`/api/requests/${open.id}/bids`)
      .set(bearer(w.tokens.estimator))
      .send(bidBody(50_000));
    await pastDeadline(open.id);
    const results = await Promise.all(
      Array.from({ length: 20 }, () =>
        request(app)
          .post(`/api/requests/${open.id}/award`)
          .set(bearer(w.tokens.purchasing))
          .send({ bidId: bid.body.id }),
      ),
    );
    const statuses = results.map((r) => r.status);
    expect(statuses.filter((s) => s === 200)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(19);
    expect(await knex('awards').where({ requestId: open.id }).count('* as n')).toEqual([{ n: 1 }]);
  });

  it('loses and duplicates nothing when 50 shops bid and revise at once', async () => {
    const open = await createOpenRequest(w);
    const shops = await Promise.all(Array.from({ length: 50 }, () => createShop()));
    // Half the shops have bid already and revise; the other half send their first bid twice at once.
    const [revising, newcomers] = [shops.slice(0, 25), shops.slice(25)];
    const first = await Promise.all(
      revising.map((s, i) =>
        request(app)
          .post(`/api/requests/${open.id}/bids`)
          .set(bearer(s.token))
          .send(bidBody(60_000 + i)),
      ),
    );
    expect(first.map((r) => r.status)).toEqual(Array(25).fill(201));
    const results = await Promise.all([
      ...revising.map((s, i) =>
        request(app)
          .patch(`/api/bids/${first[i]!.body.id}`)
          .set(bearer(s.token))
          .send(bidBody(50_000 + i)),
      ),
      ...newcomers.flatMap((s, i) => [
        request(app)
          .post(`/api/requests/${open.id}/bids`)
          .set(bearer(s.token))
          .send(bidBody(70_000 + i)),
        request(app)
          .post(`/api/requests/${open.id}/bids`)
          .set(bearer(s.token))
          .send(bidBody(71_000 + i)),
      ]),
    ]);
    expect(results.slice(0, 25).map((r) => r.status)).toEqual(Array(25).fill(200));
    const sent = results.slice(25);
    expect(sent.filter((r) => r.status === 201)).toHaveLength(25);
    expect(sent.filter((r) => r.status === 409)).toHaveLength(25);

    // One bid per shop; each revision saved as the bid and kept in its history (bidBody adds 3,500 cents).
    const rows = await knex('bids').where({ requestId: open.id });
    expect(rows).toHaveLength(50);
    expect(new Set(rows.map((r) => r.shopId)).size).toBe(50);
    const byShop = new Map(rows.map((r) => [r.shopId, r]));
    revising.forEach((s, i) => expect(byShop.get(s.shop.id)).toMatchObject({ revision: 2, totalCents: 53_500 + i }));
    // A newcomer's one bid is whichever of its two arrived first.
    newcomers.forEach((s, i) => expect([73_500 + i, 74_500 + i]).toContain(byShop.get(s.shop.id)!.totalCents));
    const history = await knex('bidRevisions')
      .whereIn(
        'bidId',
        rows.map((r) => r.id),
      )
      .select('bidId')
      .count('* as n')
      .groupBy('bidId');
    const counts = new Map(history.map((h) => [h.bidId as number, Number(h.n)]));
    for (const row of rows) expect(counts.get(row.id)).toBe(row.revision);
  });
});

describe('shop holidays', () => {
  it('skips the shop’s holidays when promising a ship date', async () => {
    const shop = await createShop();
    const open = await createOpenRequest(w);
    const plain = await request(app)
      .post(`/api/requests/${open.id}/bids`)
      .set(bearer(shop.token))
      .send(bidBody(1000, { leadDays: 1 }));
    // A holiday on the promised day pushes it one working day further.
    await knex('shopHolidays').insert({ shopId: shop.shop.id, date: plain.body.promisedShipDate, name: 'Shop closed' });
    const revised = await request(app)
      .patch(`/api/bids/${plain.body.id}`)
      .set(bearer(shop.token))
      .send(bidBody(1000, { leadDays: 1 }));
    expect(revised.body.promisedShipDate > plain.body.promisedShipDate).toBe(true);
  });
});

describe('what the award rests on', () => {
  it('keeps the primary dieline once bidding has closed', async () => {
    const staged = await createRequestAt(w, 'awarded');
    const second = await addDieline(w, staged.id).catch((e: Error) => e.message);
    // No file can be added after the award either, so the one already there is tried.
    expect(second).toMatch(/409/);
    const file = await knex('dielineFiles').where({ requestId: staged.id }).first();
    const res = await request(app).post(`/api/files/${file.id}/primary`).set(bearer(w.tokens.buyer));
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/Only a draft, or an open request before its deadline, can be changed/);
  });

  it('answers a shop asking for its bid on a request it may not see with a 404, not an empty answer', async () => {
    const draft = await createOpenRequest(w);
    await DieRequest.query().patch({ status: 'draft' }).findById(draft.id);
    const res = await request(app).get(`/api/requests/${draft.id}/my-bid`).set(bearer(second.token));
    expect(res.status).toBe(404);
  });
});
