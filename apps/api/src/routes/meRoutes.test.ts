import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { app, createOpenRequest, createShop, createWorld, knex } from '../test/harness';
import { bidBody, inDays } from '../test/fixtures';

const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

describe('notification preferences', () => {
  it('starts with every e-mail on, and keeps what the user turns off', async () => {
    const w = await createWorld();
    const start = await request(app).get('/api/me/preferences').set(bearer(w.tokens.estimator));
    expect(Object.values(start.body.email).every(Boolean)).toBe(true);
    const saved = await request(app)
      .put('/api/me/preferences')
      .set(bearer(w.tokens.estimator))
      .send({ email: { bid_deadline_24h: false } });
    expect(saved.body.email.bid_deadline_24h).toBe(false);
    expect(saved.body.email.award_won).toBe(true);
    const bad = await request(app)
      .put('/api/me/preferences')
      .set(bearer(w.tokens.estimator))
      .send({ email: { no_such_kind: false } });
    expect(bad.status).toBe(400);
  });
});

describe('length units', () => {
  it('shows lengths in the organisation’s units until the user chooses otherwise, and back', async () => {
    const w = await createWorld();
    const me = async () => (await request(app).get('/api/me').set(bearer(w.tokens.buyer))).body;
    expect((await me()).lengthUnits).toBe('in'); // a US organisation
    const chosen = await request(app)
      .put('/api/me/preferences')
      .set(bearer(w.tokens.buyer))
      .send({ lengthUnits: 'mm' });
    expect(chosen.status).toBe(200);
    expect(chosen.body).toMatchObject({ lengthUnits: 'mm', organisationLengthUnits: 'in' });
    expect(Object.values(chosen.body.email).every(Boolean)).toBe(true); // the e-mail choices untouched
    expect((await me()).lengthUnits).toBe('mm');
    // Another user of the same organisation keeps the default.
    expect((await request(app).get('/api/me').set(bearer(w.tokens.purchasing))).body.lengthUnits).toBe('in');
    await request(app).put('/api/me/preferences').set(bearer(w.tokens.buyer)).send({ lengthUnits: null });
    expect((await me()).lengthUnits).toBe('in');
    const bad = await request(app).put('/api/me/preferences').set(bearer(w.tokens.buyer)).send({ lengthUnits: 'cm' });
    expect(bad.status).toBe(400);
  });

  it('keeps a locale of the user’s own beside the organisation’s', async () => {
    const w = await createWorld();
    const me = async () => (await request(app).get('/api/me').set(bearer(w.tokens.buyer))).body;
    expect((await me()).locale).toBe('en-US');
    const chosen = await request(app).put('/api/me/preferences').set(bearer(w.tokens.buyer)).send({ locale: 'en-GB' });
    expect(chosen.body).toMatchObject({ locale: 'en-GB', organisationLocale: 'en-US', lengthUnits: null });
    expect((await me()).locale).toBe('en-GB');
    const bad = await request(app).put('/api/me/preferences').set(bearer(w.tokens.buyer)).send({ locale: 'fr-FR' });
    expect(bad.status).toBe(400);
  });

  it('follows an organisation whose default is millimetres (those outside the US, from the migration)', async () => {
    const w = await createWorld();
    await knex('organisations').where({ id: w.printer.id }).update({ country: 'DE', lengthUnits: 'mm' });
    expect((await request(app).get('/api/me').set(bearer(w.tokens.buyer))).body.lengthUnits).toBe('mm');
  });
});

describe('the buyer’s dashboard', () => {
  it('lists a request whose need-by date the lead time cannot meet, and the coming deadlines', async () => {
    const w = await createWorld();
    // Needed in 3 days with 5 working days of lead time allowed and no bid yet: at risk.
    const tight = await createOpenRequest(w, { needByDate: inDays(3), deadline: new Date(Date.now() + 86_400_000) });
    const easy = await createOpenRequest(w, { needByDate: inDays(60) });
    const res = await request(app).get('/api/me/dashboard').set(bearer(w.tokens.buyer));
    expect(res.status).toBe(200);
    const risky = res.body.atRisk.map((r: { requestId: number }) => r.requestId);
    expect(risky).toContain(tight.id);
    expect(risky).not.toContain(easy.id);
    expect(res.body.atRisk[0].reason).toMatch(/5 working days of lead time/);
    expect(
      res.body.upcoming
        .filter((u: { requestId: number; kind: string }) => u.requestId === tight.id)
        .map((u: { kind: string }) => u.kind)
        .sort(),
    ).toEqual(['bid_deadline', 'need_by']);
    const other = await createWorld();
    const theirs = await request(app).get('/api/me/dashboard').set(bearer(other.tokens.buyer));
    expect(theirs.body.atRisk.map((r: { requestId: number }) => r.requestId)).not.toContain(tight.id);
  });
});

describe('the die shop’s record', () => {
  it('counts open bids, wins and losses, and says of a lost job only that it went elsewhere', async () => {
    const w = await createWorld();
    const rival = await createShop();
    const bid = (requestId: number, token: string, dieCents: number) =>
      request(app).post(`/api/requests/${requestId}/bids`).set(bearer(token)).send(bidBody(dieCents));
    const award = async (requestId: number, bidId: number) => {
      await request(app).post(`/api/requests/${requestId}/close-bidding`).set(bearer(w.tokens.purchasing));
      const res = await request(app)
        .post(`/api/requests/${requestId}/award`)
        .set(bearer(w.tokens.purchasing))
        .send({ bidId, reason: 'Chosen for the lead time.' });
      expect(res.status, JSON.stringify(res.body)).toBe(200);
    };
    const won = await createOpenRequest(w);
    const lost = await createOpenRequest(w);
    const pending = await createOpenRequest(w);
    const mine = await bid(won.id, w.tokens.estimator, 60_000);
    await bid(lost.id, w.tokens.estimator, 70_000);
    const theirs = await bid(lost.id, rival.token, 65_000);
    await bid(pending.id, w.tokens.estimator, 50_000);
    await award(won.id, mine.body.id);
    await award(lost.id, theirs.body.id);

    const res = await request(app).get('/api/me/dashboard').set(bearer(w.tokens.estimator));
    expect(res.status).toBe(200);
    // Won 1 of 2 decided (both awarded today), one bid still open, nothing shipped yet.
    expect(res.body.shopRecord).toMatchObject({
      openBids: 1,
      won: 1,
      lost: 1,
      winRate90: 0.5,
      winRate365: 0.5,
      shipped: 0,
      onTimeRate: null,
    });
    const gone = res.body.shopRecord.recent.find((j: { requestId: number }) => j.requestId === lost.id);
    expect(gone).toMatchObject({ outcome: 'elsewhere', myDieCents: 70_000, band: null });
    // Nothing of the winner reaches the losing shop: not its name, not its price.
    const text = JSON.stringify(res.body);
    expect(text).not.toContain(rival.shop.name);
    expect(text).not.toContain('65000');
    expect((await request(app).get('/api/me/dashboard').set(bearer(w.tokens.buyer))).body.shopRecord).toBeNull();
  });
});
