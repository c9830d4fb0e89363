import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { aRateCard } from '../test/aRateCard';
import { app, createOpenRequest, createWorld } from '../test/harness';

const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

describe('a die shop’s rate card', () => {
  it('is saved by the shop’s admin, read by its estimator, and closed to everyone else', async () => {
    const w = await createWorld();
    const none = await request(app).get('/api/rate-card').set(bearer(w.tokens.estimator));
    expect(none.body).toEqual({ rateCard: null });
    expect((await request(app).put('/api/rate-card').set(bearer(w.tokens.estimator)).send(aRateCard())).status).toBe(
      403,
    );
    expect((await request(app).get('/api/rate-card').set(bearer(w.tokens.buyer))).status).toBe(403);
    const saved = await request(app).put('/api/rate-card').set(bearer(w.tokens.shopAdmin)).send(aRateCard());
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    const read = await request(app).get('/api/rate-card').set(bearer(w.tokens.estimator));
    expect(read.body.rateCard).toMatchObject({ ...aRateCard(), updatedByName: expect.any(String) });
  });

  it('refuses a card with a fractional cent, a negative rate or a board given twice, naming the field', async () => {
    const w = await createWorld();
    const put = (body: object) => request(app).put('/api/rate-card').set(bearer(w.tokens.shopAdmin)).send(body);
    const half = await put(aRateCard({ perBend: 12.5 }));
    expect(half.status).toBe(400);
    expect(JSON.stringify(half.body)).toMatch(/perBend/);
    expect((await put(aRateCard({ setUp: -1 }))).status).toBe(400);
    const twice = aRateCard({
      boardPerSqIn: [
        { thicknessIn: 0.625, perSqIn: 9 },
        { thicknessIn: 0.625, perSqIn: 10 },
      ],
    });
    expect((await put(twice)).status).toBe(400);
    expect((await put({ ...aRateCard(), extra: 1 })).status).toBe(400);
  });

  it('fills bid lines from the card for a measured request, with their working', async () => {
    const w = await createWorld();
    const open = await createOpenRequest(w);
    const estimate = (token: string, query = 'leadDays=5') =>
      request(app).get(`/api/requests/${open.id}/estimate?${query}`).set(bearer(token));
    expect((await estimate(w.tokens.estimator)).status).toBe(409); // no card yet
    await request(app).put('/api/rate-card').set(bearer(w.tokens.shopAdmin)).send(aRateCard());
    const res = await estimate(w.tokens.estimator);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    // The test rectangle: 14 in cutting rule × 4.10 = 57.40; 4 in creasing × 3.20 = 12.80;
    // 4 bends × 1.50; 2 joints (the crease's ends) × 0.75; a 6 × 5 in board (1 in margins),
    // 30 sq in × 0.09 = 2.70; set-up 45.00: 125.40, topped up to the 250.00 minimum. The
    // request wants ejection rubber (the default): 30 sq in × 0.04 = 1.20.
    expect(res.body.lines.map((l: { description: string; amount: number }) => [l.description, l.amount])).toEqual([
      ['Cutting rule: 14.0 in × $4.10', 5740],
      ['Creasing rule: 4.0 in × $3.20', 1280],
      ['Bends: 4 × $1.50', 600],
      ['Joints to notch: 2 × $0.75', 150],
      ['Die board 0.625 in: 6.00 × 5.00 in = 30 sq in × $0.09', 270],
      ['Set-up', 4500],
      ['Minimum die price $250.00: the balance', 12_460],
      ['Ejection rubber: 6.00 × 5.00 in = 30 sq in × $0.04', 120],
    ]);
    expect(res.body).toMatchObject({
      currency: 'USD',
      total: 25_120,
      rushFactor: 1,
      basis: { ruleIn: 18, oneUp: false },
    });
    // Two working days is a rush: the die × 1.5.
    const rush = await estimate(w.tokens.estimator, 'leadDays=2');
    expect(rush.body.total).toBe(25_000 * 1.5 + 120);
    expect((await estimate(w.tokens.estimator, 'leadDays=5&boardThicknessIn=1.25')).status).toBe(400);
    expect((await estimate(w.tokens.buyer)).status).toBe(403);
    const other = await createWorld();
    await request(app).put('/api/rate-card').set(bearer(other.tokens.shopAdmin)).send(aRateCard());
    const draftOfOther = await request(app)
      .post('/api/requests')
      .set(bearer(other.tokens.buyer))
      .send({ title: 'Private', quantity: 1, ups: 1, ruleTypes: ['cut'] });
    const hidden = await request(app)
      .get(`/api/requests/${draftOfOther.body.id}/estimate?leadDays=5`)
      .set(bearer(w.tokens.estimator));
    expect(hidden.status).toBe(404);
  });

  it('says when there are too few received dies to check the card against', async () => {
    const w = await createWorld();
    await request(app).put('/api/rate-card').set(bearer(w.tokens.shopAdmin)).send(aRateCard());
    const res = await request(app).get('/api/rate-card/calibration').set(bearer(w.tokens.estimator));
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ currency: 'USD', dies: [], medianRatio: null, fit: { enough: false } });
  });
});
