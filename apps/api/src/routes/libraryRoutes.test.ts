import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { app, createWorld, knex } from '../test/harness';

const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

async function storedDie(organisationId: number, over: Record<string, unknown> = {}) {
  const [row] = await knex('libraryDies')
    .insert({ organisationId, name: 'Sleeve die', ups: 1, ruleTypes: ['cut'], impressionLimit: 100_000, ...over })
    .returning('id');
  return row.id as number;
}

describe('the die library', () => {
  it('logs runs, adds up impressions and flags a die near the end of its life', async () => {
    const w = await createWorld();
    const id = await storedDie(w.printer.id, { impressions: 85_000 });
    const run = await request(app)
      .post(`/api/library/${id}/runs`)
      .set(bearer(w.tokens.buyer))
      .send({ runOn: '2026-11-30', impressions: 6_000, jobReference: 'J-1' });
    expect(run.status, JSON.stringify(run.body)).toBe(201);
    // 91,000 of a 100,000 limit is past 90 %: flagged.
    expect(run.body).toMatchObject({ impressions: 91_000, nearEndOfLife: true, lastUsedOn: '2026-11-30' });
    expect(run.body.runs).toHaveLength(1);
    const bad = await request(app)
      .post(`/api/library/${id}/runs`)
      .set(bearer(w.tokens.buyer))
      .send({ runOn: 'yesterday', impressions: -5 });
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['impressions', 'runOn']);
  });

  it('keeps a printer’s dies to itself but shows die shops’ listed stock dies to every printer', async () => {
    const w = await createWorld();
    const other = await createWorld();
    const mine = await storedDie(w.printer.id);
    const stock = await storedDie(other.shop.id, { name: 'Stock 6 × 9 pocket folder', listed: true });
    const list = await request(app).get('/api/library').set(bearer(w.tokens.buyer));
    const ids = list.body.map((d: { id: number }) => d.id);
    expect(ids).toEqual(expect.arrayContaining([mine, stock]));
    const theirs = await request(app).get('/api/library').set(bearer(other.tokens.buyer));
    expect(theirs.body.map((d: { id: number }) => d.id)).not.toContain(mine);
    expect((await request(app).get(`/api/library/${mine}`).set(bearer(other.tokens.buyer))).status).toBe(404);
    expect(
      (await request(app).patch(`/api/library/${stock}`).set(bearer(w.tokens.buyer)).send({ name: 'mine now' })).status,
    ).toBe(404);
    expect(
      (
        await request(app)
          .post(`/api/library/${mine}/runs`)
          .set(bearer(other.tokens.buyer))
          .send({ runOn: '2026-11-30', impressions: 1 })
      ).status,
    ).toBe(404);
  });
});
