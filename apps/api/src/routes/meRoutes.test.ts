import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { app, createOpenRequest, createWorld } from '../test/harness';
import { inDays } from '../test/fixtures';

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
