import type { Complexity } from '@kerfmark/dieline';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { app, createOpenRequest, createWorld, knex, type World } from '../test/harness';

const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
const DAY = 86_400_000;
let w: World;
let ids: { soon: number; later: number; long: number; declined: number };

/** Sets the measured priced rule of a request's dieline (the fixture's rectangle is 18 in). */
async function setRuleLength(requestId: number, inches: number, complexity: Complexity) {
  await knex.raw(
    `update dieline_files set metrics = jsonb_set(jsonb_set(metrics, '{length,total}', to_jsonb(?::float8)), '{complexity}', to_jsonb(?::text)) where request_id = ?`,
    [inches, complexity, requestId],
  );
}

async function openRequests(query: Record<string, string | number>) {
  const res = await request(app)
    .get('/api/open-requests')
    .query({ q: w.printer.name, ...query })
    .set(bearer(w.tokens.estimator));
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body as {
    items: Array<{ id: number; distanceMiles: number | null; declined: boolean }>;
    total: number;
    page: number;
    pageSize: number;
  };
}

beforeAll(async () => {
  w = await createWorld();
  const soon = await createOpenRequest(w, {
    deadline: new Date(Date.now() + DAY / 2),
    needByDate: new Date(Date.now() + 60 * DAY).toISOString().slice(0, 10),
  });
  const later = await createOpenRequest(w, { deadline: new Date(Date.now() + 5 * DAY) });
  const long = await createOpenRequest(w, { deadline: new Date(Date.now() + 9 * DAY) });
  const declined = await createOpenRequest(w, { deadline: new Date(Date.now() + 2 * DAY) });
  await setRuleLength(long.id, 240, 'complex');
  await request(app)
    .post(`/api/requests/${declined.id}/decline`)
    .set(bearer(w.tokens.estimator))
    .send({ reason: 'No capacity this week' });
  // Closed to bids: not among the open requests at all.
  await createOpenRequest(w, { deadline: new Date(Date.now() - DAY) });
  ids = { soon: soon.id, later: later.id, long: long.id, declined: declined.id };
});

describe('open requests', () => {
  it('lists open requests soonest deadline first, hiding those the shop passed on, and counts them', async () => {
    const page = await openRequests({});
    expect(page.items.map((r) => r.id)).toEqual([ids.soon, ids.later, ids.long]);
    expect(page.total).toBe(3);
    const all = await openRequests({ hideDeclined: 'false' });
    expect(all.items.map((r) => r.id)).toEqual([ids.soon, ids.declined, ids.later, ids.long]);
    expect(all.items.find((r) => r.id === ids.declined)?.declined).toBe(true);
  });

  it('filters by rule length, complexity, deadline and rule types', async () => {
    expect((await openRequests({ minIn: 100 })).items.map((r) => r.id)).toEqual([ids.long]);
    expect((await openRequests({ maxIn: 18 })).items.map((r) => r.id)).toEqual([ids.soon, ids.later]);
    expect((await openRequests({ complexity: 'complex' })).items.map((r) => r.id)).toEqual([ids.long]);
    expect((await openRequests({ withinDays: 1 })).items.map((r) => r.id)).toEqual([ids.soon]);
    expect((await openRequests({ ruleTypes: 'cut,crease' })).total).toBe(3);
    expect((await openRequests({ ruleTypes: 'perf' })).total).toBe(0);
  });

  it('sorts by rule length and need-by date, and pages', async () => {
    expect((await openRequests({ sort: '-ruleLength' })).items[0]!.id).toBe(ids.long);
    expect((await openRequests({ sort: '-needByDate' })).items[0]!.id).toBe(ids.soon);
    const first = await openRequests({ pageSize: 2, page: 1 });
    const second = await openRequests({ pageSize: 2, page: 2 });
    expect(first.items.map((r) => r.id)).toEqual([ids.soon, ids.later]);
    expect(second.items.map((r) => r.id)).toEqual([ids.long]);
    expect(second.total).toBe(3);
  });

  it('refuses filters it does not understand with a 400 naming them', async () => {
    const res = await request(app)
      .get('/api/open-requests')
      .query({ complexity: 'medium', ruleTypes: 'cut,laser', pageSize: 1000 })
      .set(bearer(w.tokens.estimator));
    expect(res.status).toBe(400);
    // The unknown rule type is named by its place in the list (ruleTypes.1).
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['complexity', 'pageSize', 'ruleTypes.1']);
  });
});
