import request from 'supertest';
import { describe, expect, it } from 'vitest';
import type { HolidayDto, HolidayYearDto } from '@kerfmark/contracts';
import { AuditEntry } from '../models';
import { bidBody, inDays } from '../test/fixtures';
import { app, createOpenRequest, createShop, createWorld, knex, type World } from '../test/harness';

const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
const isWeekend = (day: string) => [0, 6].includes(new Date(`${day}T12:00:00Z`).getUTCDay());

async function yearOf(w: World, year: number): Promise<HolidayYearDto> {
  const res = await request(app).get('/api/holidays').query({ year }).set(bearer(w.tokens.estimator));
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body;
}

const loadUs2027 = (w: World, region?: string) =>
  request(app)
    .post('/api/holidays/public')
    .set(bearer(w.tokens.shopAdmin))
    .send({ country: 'US', year: 2027, ...(region ? { region } : {}) });

describe('public holidays', () => {
  it('loads the US federal holidays of 2027 with the days they are observed, once', async () => {
    const w = await createWorld();
    const first = await loadUs2027(w);
    expect(first.status, JSON.stringify(first.body)).toBe(200);
    const added = first.body.added as HolidayDto[];
    const byDate = new Map(added.map((h) => [h.date, h.name]));
    // US federal holiday rules, 5 U.S.C. 6103, with Executive Order 11582 for the observed days:
    // July 4, 2027 is a Sunday (checked below), so Independence Day is observed on Monday July 5;
    // Christmas Day, December 25, is a Saturday, so observed on Friday December 24; Thanksgiving
    // Day is the fourth Thursday of November, November 25.
    expect(new Date('2027-07-04T12:00:00Z').getUTCDay()).toBe(0);
    expect(new Date('2027-12-25T12:00:00Z').getUTCDay()).toBe(6);
    expect(byDate.get('2027-07-05')).toMatch(/Independence Day/);
    expect(byDate.get('2027-12-24')).toMatch(/Christmas/);
    expect(byDate.get('2027-11-25')).toMatch(/Thanksgiving/);
    // Public holidays only: Valentine's Day is an observance (from memory).
    expect(byDate.has('2027-02-14')).toBe(false);
    expect(added.every((h) => h.source === 'public' && h.country === 'US' && h.region === null)).toBe(true);
    expect(first.body.alreadyThere).toBe(0);

    const listed = await yearOf(w, 2027);
    expect(listed.holidays.map((h) => h.date)).toEqual(added.map((h) => h.date));
    expect(listed.lastLoaded).toEqual({ country: 'US', region: null });

    // A second load adds nothing: one day per shop and date.
    const second = await loadUs2027(w);
    expect(second.body).toEqual({ added: [], alreadyThere: added.length });
    expect((await yearOf(w, 2027)).holidays).toHaveLength(added.length);

    // The region adds its own: Illinois keeps Lincoln's Birthday, February 12 (from memory).
    const illinois = await loadUs2027(w, 'il');
    expect(illinois.body.added.map((h: HolidayDto) => [h.date, h.region])).toContainEqual(['2027-02-12', 'IL']);
    expect(illinois.body.alreadyThere).toBe(added.length);

    const audit = await AuditEntry.query().where({ entity: 'holiday_calendar', entityId: w.shop.id }).orderBy('id');
    expect(audit.map((a) => [a.action, a.actorUserId, a.detail.added])).toEqual([
      ['public_holidays_loaded', w.users.shopAdmin.id, added.length],
      ['public_holidays_loaded', w.users.shopAdmin.id, 0],
      ['public_holidays_loaded', w.users.shopAdmin.id, illinois.body.added.length],
    ]);
  });

  it('lists the countries and a country’s regions for the picker, the shop’s own country first asked', async () => {
    const w = await createWorld();
    const us = await request(app).get('/api/holidays/regions').set(bearer(w.tokens.estimator));
    expect(us.status).toBe(200);
    // The test shop is in the US (harness); Illinois is one of its states.
    expect(us.body.country).toBe('US');
    expect(us.body.regions).toContainEqual({ code: 'IL', name: 'Illinois' });
    expect(us.body.countries).toContainEqual({ code: 'US', name: 'United States of America' });
    const germany = await request(app).get('/api/holidays/regions?country=de').set(bearer(w.tokens.estimator));
    expect(germany.body.country).toBe('DE');
    // Bavaria is a German state (from memory).
    expect(germany.body.regions).toContainEqual({ code: 'BY', name: expect.stringMatching(/Bavaria|Bayern/) });
  });

  it('refuses an unknown country or region, and a year out of range, naming the field and adding nothing', async () => {
    const w = await createWorld();
    const post = (body: object) => request(app).post('/api/holidays/public').set(bearer(w.tokens.shopAdmin)).send(body);
    for (const [body, field] of [
      [{ country: 'ZZ', year: 2027 }, 'country'],
      [{ country: 'United States', year: 2027 }, 'country'],
      [{ country: 'US', region: 'BY', year: 2027 }, 'region'],
      [{ country: 'US', year: 1800 }, 'year'],
      [{ country: 'US' }, 'year'],
    ] as const) {
      const res = await post(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(Object.keys(res.body.error.fields)).toEqual([field]);
      expect(res.body.error.message).toBeTruthy();
    }
    const regions = await request(app).get('/api/holidays/regions?country=ZZ').set(bearer(w.tokens.estimator));
    expect(regions.status).toBe(400);
    expect(regions.body.error.fields).toHaveProperty('country');
    expect((await yearOf(w, 2027)).holidays).toEqual([]);
  });
});

describe('the shop’s own closures', () => {
  it('adds a closure that shows in its year, and refuses a second on the same day', async () => {
    const w = await createWorld();
    const date = inDays(20);
    const add = (body: object) => request(app).post('/api/holidays').set(bearer(w.tokens.shopAdmin)).send(body);
    const created = await add({ date, name: ' Stocktaking day ' });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    expect(created.body).toMatchObject({ date, name: 'Stocktaking day', source: 'own', country: null, past: false });
    const year = await yearOf(w, Number(date.slice(0, 4)));
    expect(year.holidays).toContainEqual(created.body);

    const again = await add({ date, name: 'Inventory' });
    expect(again.status).toBe(409);
    expect(again.body.error.fields).toHaveProperty('date');

    const audit = await AuditEntry.query().where({ entity: 'holiday', entityId: created.body.id });
    expect(audit.map((a) => [a.action, a.actorUserId])).toEqual([['created', w.users.shopAdmin.id]]);
  });

  it('takes only real calendar dates, today or later, and a name', async () => {
    const w = await createWorld();
    const add = (body: object) => request(app).post('/api/holidays').set(bearer(w.tokens.shopAdmin)).send(body);
    // The Gregorian calendar: 2027 is no leap year, and April has 30 days.
    for (const body of [
      { date: '2027-02-29', name: 'Leap day' },
      { date: '2027-04-31', name: 'No such day' },
      { date: '2027/07/05', name: 'Slashes' },
      { date: inDays(-3), name: 'Gone by' },
    ]) {
      const res = await add(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(Object.keys(res.body.error.fields)).toEqual(['date']);
    }
    const blank = await add({ date: inDays(20), name: '  ' });
    expect(blank.status).toBe(400);
    expect(Object.keys(blank.body.error.fields)).toEqual(['name']);
    expect((await add({ date: '2028-02-29', name: 'Leap day' })).status).toBe(201);
  });

  it('lets estimators read the calendar and only the admin change it', async () => {
    const w = await createWorld();
    const closure = { date: inDays(20), name: 'Stocktaking day' };
    expect((await request(app).post('/api/holidays').set(bearer(w.tokens.estimator)).send(closure)).status).toBe(403);
    expect((await request(app).post('/api/holidays').set(bearer(w.tokens.printerAdmin)).send(closure)).status).toBe(
      403,
    );
    expect((await request(app).get('/api/holidays').set(bearer(w.tokens.buyer))).status).toBe(403);
    expect((await request(app).get('/api/holidays').set(bearer(w.tokens.estimator))).status).toBe(200);
  });
});

describe('removing a holiday', () => {
  it('removes a closure; a removed public holiday stays off on a second load; a past day stays', async () => {
    const w = await createWorld();
    const remove = (id: number, token = w.tokens.shopAdmin) =>
      request(app).delete(`/api/holidays/${id}`).set(bearer(token));

    const closure = await request(app)
      .post('/api/holidays')
      .set(bearer(w.tokens.shopAdmin))
      .send({ date: inDays(25), name: 'Stocktaking day' });
    expect((await remove(closure.body.id, w.tokens.estimator)).status).toBe(403);
    expect((await remove(closure.body.id)).status).toBe(204);
    expect((await remove(closure.body.id)).status).toBe(404);
    const year = Number(closure.body.date.slice(0, 4));
    expect((await yearOf(w, year)).holidays.map((h) => h.id)).not.toContain(closure.body.id);

    // A public holiday to come (made one straight in the database, as the year's are fixed).
    const soon = inDays(30);
    const [publicDay] = await knex('shopHolidays')
      .insert({ shopId: w.shop.id, date: soon, name: 'A public holiday', source: 'public', country: 'US' })
      .returning('id');
    expect((await remove(publicDay.id)).status).toBe(204);
    const after = await yearOf(w, Number(soon.slice(0, 4)));
    expect(after.holidays.map((h) => h.date)).not.toContain(soon);
    expect(after.keptOpen.map((h) => h.date)).toEqual([soon]);
    // The shop may close that day after all: the closure takes the removed day's place.
    const closedAgain = await request(app)
      .post('/api/holidays')
      .set(bearer(w.tokens.shopAdmin))
      .send({ date: soon, name: 'Closed after all' });
    expect(closedAgain.status, JSON.stringify(closedAgain.body)).toBe(201);
    expect(closedAgain.body).toMatchObject({ date: soon, source: 'own' });

    const [pastDay] = await knex('shopHolidays')
      .insert({ shopId: w.shop.id, date: inDays(-10), name: 'Stocktaking day' })
      .returning('id');
    const past = await remove(pastDay.id);
    expect(past.status).toBe(409);
    expect(past.body.error.message).toMatch(/has passed/);

    const audit = await AuditEntry.query()
      .where({ entity: 'holiday', action: 'removed' })
      .whereIn('entityId', [closure.body.id, publicDay.id, pastDay.id]);
    expect(audit).toHaveLength(2);
  });

  it('answers 404 for another shop’s holiday, and 403 to a printer', async () => {
    const w = await createWorld();
    const other = await createShop();
    const [theirs] = await knex('shopHolidays')
      .insert({ shopId: other.shop.id, date: inDays(40), name: 'Their closure' })
      .returning('id');
    expect((await request(app).delete(`/api/holidays/${theirs.id}`).set(bearer(w.tokens.shopAdmin))).status).toBe(404);
    expect((await request(app).delete(`/api/holidays/${theirs.id}`).set(bearer(w.tokens.printerAdmin))).status).toBe(
      403,
    );
    expect(await knex('shopHolidays').where({ id: theirs.id }).first()).toMatchObject({ removedAt: null });
  });
});

describe('the promised ship date', () => {
  it('skips a closure entered on the calendar, and counts the day again once it is removed', async () => {
    const w = await createWorld();
    const open = await createOpenRequest(w);
    const bid = await request(app)
      .post(`/api/requests/${open.id}/bids`)
      .set(bearer(w.tokens.estimator))
      .send(bidBody(50_000, { leadDays: 3 }));
    expect(bid.status, JSON.stringify(bid.body)).toBe(201);
    const promised = bid.body.promisedShipDate as string;
    const revise = () =>
      request(app)
        .patch(`/api/bids/${bid.body.id}`)
        .set(bearer(w.tokens.estimator))
        .send(bidBody(50_000, { leadDays: 3 }));

    // The shop closes on the day it would have shipped: the promise moves to a later working day.
    const closure = await request(app)
      .post('/api/holidays')
      .set(bearer(w.tokens.shopAdmin))
      .send({ date: promised, name: 'Stocktaking day' });
    expect(closure.status).toBe(201);
    const later = (await revise()).body.promisedShipDate as string;
    expect(later > promised).toBe(true);
    expect(isWeekend(later)).toBe(false);

    // Taken off the calendar as a removed public holiday would be: the day counts again.
    await knex('shopHolidays').where({ id: closure.body.id }).update({ source: 'public' });
    expect((await request(app).delete(`/api/holidays/${closure.body.id}`).set(bearer(w.tokens.shopAdmin))).status).toBe(
      204,
    );
    expect((await revise()).body.promisedShipDate).toBe(promised);
  });
});
