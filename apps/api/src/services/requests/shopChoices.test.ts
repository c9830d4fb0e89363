import type { DieShopChoices } from '@kerfmark/contracts';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { Organisation, Press } from '../../models';
import { bidBody } from '../../test/fixtures';
import { app, createOpenRequest, createPress, createShop, createWorld, knex, type World } from '../../test/harness';

const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
let w: World;
let rotary: Press;
let rival: Awaited<ReturnType<typeof createShop>>;
let far: Organisation;

async function choices(token: string, query: Record<string, string | number>) {
  const res = await request(app).get('/api/die-shops').query(query).set(bearer(token));
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  const { needs, shops } = res.body as DieShopChoices;
  const byId = (id: number) => shops.find((s) => s.id === id)!;
  return { needs, mine: byId(w.shop.id), rival: byId(rival.shop.id), far: byId(far.id) };
}

beforeAll(async () => {
  w = await createWorld();
  rival = await createShop();
  far = (await createShop()).shop;
  rotary = await Press.query().patchAndFetchById((await createPress(w.printer)).id, {
    kind: 'rotary',
    cuttingRuleHeightIn: 0.918,
  });
  await Organisation.query()
    .findById(w.shop.id)
    .patch({ dieKinds: ['flat'], maxBoardWidthIn: 40, maxBoardLengthIn: 60, makesCounters: false });
  await Organisation.query()
    .findById(rival.shop.id)
    .patch({ dieKinds: ['flat', 'rotary'], ruleHeightsIn: [0.918], maxBoardWidthIn: 28, maxBoardLengthIn: 40 });
  // ZIP 10001 is Manhattan; the world's printer and shops are at 60614, Chicago.
  await Organisation.query().findById(far.id).patch({ postcode: '10001' });

  // The rival has made one die for this printer and shipped it the day it promised.
  const job = await createOpenRequest(w);
  const bid = await request(app).post(`/api/requests/${job.id}/bids`).set(bearer(rival.token)).send(bidBody(60_000));
  await request(app).post(`/api/requests/${job.id}/close-bidding`).set(bearer(w.tokens.purchasing));
  const awarded = await request(app)
    .post(`/api/requests/${job.id}/award`)
    .set(bearer(w.tokens.purchasing))
    .send({ bidId: bid.body.id, reason: 'Chosen for the lead time.' });
  expect(awarded.status, JSON.stringify(awarded.body)).toBe(200);
  const { promisedShipDate } = await knex('awards').where({ requestId: job.id }).first('promisedShipDate');
  await knex('dieRequests')
    .where({ id: job.id })
    .update({ shippedAt: `${promisedShipDate}T12:00:00Z` });
});

describe('GET /api/die-shops', () => {
  it('says which shops can make a rotary die with a counter, and what each has not said', async () => {
    const { needs, mine, rival: theirs } = await choices(w.tokens.buyer, { pressId: rotary.id, counterWanted: 'true' });
    expect(needs).toEqual({
      dieKind: 'rotary',
      board: null,
      cuttingRuleHeightIn: 0.918,
      counterWanted: true,
      ejectionRubberWanted: false,
    });
    expect(mine.fit).toEqual({
      fits: false,
      misses: ['makes no rotary dies', 'makes no counters'],
      unstated: ['rule heights'],
    });
    expect(theirs.fit).toEqual({ fits: true, misses: [], unstated: ['counters'] });
    expect(theirs.capabilities).toMatchObject({ dieKinds: ['flat', 'rotary'], ruleHeightsIn: [0.918] });
  });

  it('puts the saved request’s measured board against each shop’s largest board', async () => {
    const saved = await createOpenRequest(w);
    await knex('dieRequests').where({ id: saved.id }).update({ measuredBoardWidthIn: 30, measuredBoardHeightIn: 50 });
    const { needs, mine, rival: theirs } = await choices(w.tokens.buyer, { requestId: saved.id });
    expect(needs.board).toEqual({ width: 30, height: 50 });
    expect(mine.fit.fits).toBe(true);
    expect(theirs.fit).toEqual({
      fits: false,
      misses: ['board 30 in × 50 in is over its largest, 28 in × 40 in'],
      unstated: [],
    });
  });

  it('gives the on-time rate over every printer, and the jobs with this printer only', async () => {
    const ours = await choices(w.tokens.buyer, {});
    expect(ours.rival).toMatchObject({ shipped: 1, onTimeRate: 1, jobsWithUs: 1 });
    expect(ours.mine).toMatchObject({ shipped: 0, onTimeRate: null, jobsWithUs: 0 });
    const other = await createWorld();
    const theirs = await choices(other.tokens.buyer, {});
    expect(theirs.rival).toMatchObject({ shipped: 1, onTimeRate: 1, jobsWithUs: 0 });
  });

  it('measures the distance from the delivery postcode, and gives none for a postcode it cannot place', async () => {
    const { mine, far: nyc } = await choices(w.tokens.buyer, { deliveryPostcode: '60614' });
    expect(mine.miles).toBeCloseTo(0, 5);
    // Chicago to Manhattan is about 710 miles as the crow flies (great-circle distance, from memory).
    expect(nyc.miles).toBeGreaterThan(680);
    expect(nyc.miles).toBeLessThan(740);
    const unknown = await choices(w.tokens.buyer, { deliveryPostcode: '00000' });
    expect(unknown.mine.miles).toBeNull();
    const none = await choices(w.tokens.buyer, {});
    expect(none.mine.miles).toBeNull();
  });

  it('does not read another printer’s press or request', async () => {
    const other = await createWorld();
    const press = await request(app)
      .get('/api/die-shops')
      .query({ pressId: rotary.id })
      .set(bearer(other.tokens.buyer));
    expect(press.status).toBe(404);
    const job = await createOpenRequest(w);
    const req = await request(app).get('/api/die-shops').query({ requestId: job.id }).set(bearer(other.tokens.buyer));
    expect(req.status).toBe(404);
    const bad = await request(app).get('/api/die-shops').query({ pressId: 'x' }).set(bearer(w.tokens.buyer));
    expect(bad.status).toBe(400);
  });
});
