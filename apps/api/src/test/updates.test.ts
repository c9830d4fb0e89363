import fc from 'fast-check';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { bidBody, inDays } from './fixtures';
import { app, createOpenRequest, createPress, createShop, createUser, createWorld, knex, type World } from './harness';
import { routeList } from './routeList';

// An update changes exactly the fields it names (property-based, fast-check): for random subsets of
// a route's fields, every column the update did not name reads back unchanged from the database.

let w: World;

interface UpdateCase {
  as: keyof World['tokens'];
  /** The record to change, made fresh for this case. */
  make: () => Promise<number>;
  /** A new value for every field the route takes (the row is made with other values). */
  fields: (id: number) => Record<string, unknown>;
  /** Fields every body must carry (a bid revision restates its price). */
  always?: (id: number) => Record<string, unknown>;
  /** What the update touches, read back from the database. */
  read: (id: number) => Promise<Record<string, unknown>>;
  method: 'patch' | 'put';
  path: (id: number) => string;
}

let secondPress = 0;
let secondShop = 0;

/** An invited-only draft whose every field is set and none is at its default. */
async function makeRequest(): Promise<number> {
  const press = await createPress(w.printer);
  const res = await request(app)
    .post('/api/requests')
    .set(bearer(w.tokens.buyer))
    .send({
      title: 'Pocket folder',
      jobReference: 'J-1',
      quantity: 1,
      ups: 2,
      pieceWidthIn: 9,
      pieceHeightIn: 12,
      stockName: '14 pt C1S',
      caliperIn: 0.014,
      stockWeightGsm: 300,
      grain: 'long',
      stockKind: 'paper',
      stockWeightEntry: '80 lb cover',
      foldAcrossGrain: true,
      heavyInkOnFold: true,
      colourBreakOnFold: true,
      pressId: press.id,
      runSheets: 20_000,
      plannedLeadDays: 12,
      ruleTypes: ['cut', 'crease'],
      counterWanted: true,
      ejectionRubberWanted: false,
      needByDate: inDays(40),
      bidDeadline: new Date(Date.now() + 10 * 86_400_000).toISOString(),
      deliveryAddress: '1 Mill Road',
      deliveryPostcode: '60614',
      notes: 'First notes',
      visibility: 'invited',
      invitedShopIds: [w.shop.id],
    });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.id;
}

// Both clocks move on every update: updatedAt as the app sets it, changedAt as the database stamps it.
const withoutClock = (row: Record<string, unknown>) => {
  const { updatedAt: _updatedAt, changedAt: _changedAt, ...rest } = row;
  return rest;
};

const cases: Record<string, UpdateCase> = {
  'PATCH /api/requests/:id': {
    as: 'buyer',
    make: makeRequest,
    fields: () => ({
      title: 'Pocket folder, revised',
      jobReference: 'J-2',
      quantity: 2,
      ups: 4,
      pieceWidthIn: 9.5,
      pieceHeightIn: 12.5,
      stockName: '16 pt C1S',
      caliperIn: 0.016,
      stockWeightGsm: 350,
      grain: 'short',
      stockKind: 'corrugated',
      stockWeightEntry: '100 lb cover',
      foldAcrossGrain: false,
      heavyInkOnFold: false,
      colourBreakOnFold: false,
      pressId: secondPress,
      runSheets: 30_000,
      plannedLeadDays: 8,
      ruleTypes: ['cut', 'perf'],
      counterWanted: false,
      ejectionRubberWanted: true,
      needByDate: inDays(45),
      bidDeadline: new Date(Date.now() + 12 * 86_400_000).toISOString(),
      deliveryAddress: '2 Mill Road',
      deliveryPostcode: '60615',
      notes: 'Second notes',
      visibility: 'public',
      invitedShopIds: [secondShop],
    }),
    read: async (id) => ({
      ...withoutClock(await knex('dieRequests').where({ id }).first()),
      // The invitations are read back as the field that names them.
      invitedShopIds: (await knex('requestInvitations').where({ requestId: id }).select('shopId')).map((r) => r.shopId),
    }),
    method: 'patch',
    path: (id) => `/api/requests/${id}`,
  },
  'PATCH /api/presses/:id': {
    as: 'printerAdmin',
    make: async () => (await createPress(w.printer)).id,
    fields: () => ({
      name: `Platen ${Math.random()}`,
      kind: 'flatbed',
      maxSheetWidthIn: 28,
      maxSheetLengthIn: 40,
      typicalSpeedSph: 3000,
      maxSpeedSph: 6000,
      active: false,
    }),
    read: async (id) => withoutClock(await knex('presses').where({ id }).first()),
    method: 'patch',
    path: (id) => `/api/presses/${id}`,
  },
  'PATCH /api/users/:id': {
    as: 'printerAdmin',
    make: async () => (await createUser(w.printer, 'buyer')).id,
    fields: () => ({ role: 'purchasing', status: 'disabled' }),
    read: async (id) => withoutClock(await knex('users').where({ id }).first()),
    method: 'patch',
    path: (id) => `/api/users/${id}`,
  },
  'PATCH /api/organisation/profile': {
    as: 'printerAdmin',
    make: async () => {
      await knex('organisations')
        .where({ id: w.printer.id })
        .update({
          legalName: 'First Cartons LLC',
          officeAddress: '1 Mill Road',
          contactEmail: 'first@test.example',
          paymentTerms: 'Net 30',
          paymentNetDays: 30,
          deliveryPoints: JSON.stringify([{ name: 'Dock 1', address: '1 Mill Road', postcode: '60614' }]),
        });
      return w.printer.id;
    },
    fields: () => ({
      legalName: 'Second Cartons LLC',
      officeAddress: '2 Mill Road\nUnit 4',
      postcode: '60615',
      contactEmail: 'second@test.example',
      paymentTerms: 'Net 45',
      paymentNetDays: 21,
      deliveryPoints: [{ name: 'Dock 2', address: '2 Mill Road', postcode: '60615' }],
    }),
    read: async (id) => withoutClock(await knex('organisations').where({ id }).first()),
    method: 'patch',
    path: () => '/api/organisation/profile',
  },
  'PATCH /api/organisation/profile (a die shop)': {
    as: 'shopAdmin',
    // Both sides of the largest board are set first: an update may then name either alone.
    make: async () => {
      await knex('organisations')
        .where({ id: w.shop.id })
        .update({
          legalName: 'First Dies Inc.',
          dieKinds: ['flat'],
          maxBoardWidthIn: 40,
          maxBoardLengthIn: 60,
          ruleHeightsIn: [0.937],
          makesCounters: false,
          fitsEjectionRubber: false,
          laserCutBoards: false,
        });
      return w.shop.id;
    },
    fields: () => ({
      legalName: 'Second Dies Inc.',
      dieKinds: ['flat', 'rotary'],
      maxBoardWidthIn: 48,
      maxBoardLengthIn: 72,
      ruleHeightsIn: [0.937, 0.918],
      makesCounters: true,
      fitsEjectionRubber: true,
      laserCutBoards: true,
    }),
    read: async (id) => withoutClock(await knex('organisations').where({ id }).first()),
    method: 'patch',
    path: () => '/api/organisation/profile',
  },
  'PATCH /api/library/:id': {
    as: 'buyer',
    make: async () =>
      Number(
        (
          await knex('libraryDies')
            .insert({
              organisationId: w.printer.id,
              name: 'Sleeve die',
              ups: 1,
              ruleTypes: ['cut'],
              storageLocation: 'Rack A',
              condition: 'good',
              impressionLimit: 100_000,
              listed: true,
            })
            .returning('id')
        )[0].id,
      ),
    fields: () => ({
      name: 'Sleeve die, long',
      storageLocation: 'Rack B',
      condition: 'worn',
      impressionLimit: 200_000,
      listed: false,
    }),
    read: async (id) => withoutClock(await knex('libraryDies').where({ id }).first()),
    method: 'patch',
    path: (id) => `/api/library/${id}`,
  },
  'PUT /api/me/preferences': {
    as: 'purchasing',
    make: async () => w.users.purchasing.id,
    fields: () => ({ bids_ready: false, shipped: false, award_won: true, need_by_2d: false }),
    read: async (id) => (await knex('users').where({ id }).first()).preferences ?? {},
    method: 'put',
    path: () => '/api/me/preferences',
  },
  'PATCH /api/bids/:id': {
    as: 'estimator',
    make: async () => {
      const open = await createOpenRequest(w);
      const res = await request(app)
        .post(`/api/requests/${open.id}/bids`)
        .set(bearer(w.tokens.estimator))
        .send(bidBody(50_000, { notes: 'Steel from stock' }));
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      return res.body.id;
    },
    // A revision restates its price; the notes are the one field it may leave out.
    always: () => bidBody(52_000),
    fields: () => ({ notes: 'Revised: rubber included' }),
    read: async (id) => {
      const { notes } = await knex('bids').where({ id }).first();
      return { notes };
    },
    method: 'patch',
    path: (id) => `/api/bids/${id}`,
  },
};

const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
/** Routes whose body replaces one whole value: there is no field left out to keep. */
const wholeValue = ['PUT /api/files/:id/layers', 'PUT /api/files/:id/page', 'PUT /api/rate-card'];

beforeAll(async () => {
  w = await createWorld();
  secondPress = (await createPress(w.printer)).id;
  secondShop = (await createShop()).shop.id;
}, 60_000);

describe('an update changes exactly the fields it names', () => {
  it('has a case for every PATCH and PUT route', () => {
    const updates = routeList(app).filter((r) => /^(PATCH|PUT) /.test(r));
    expect(updates.filter((r) => !cases[r] && !wholeValue.includes(r))).toEqual([]);
  });

  for (const [name, c] of Object.entries(cases)) {
    it(`${name}: every field not named is unchanged`, async () => {
      const id = await c.make();
      const all = Object.keys(c.fields(id));
      await fc.assert(
        fc.asyncProperty(fc.subarray(all, { minLength: c.always ? 0 : 1 }), async (named) => {
          const before = await c.read(id);
          const values = c.fields(id);
          const fields = Object.fromEntries(named.map((k) => [k, values[k]]));
          const body = name === 'PUT /api/me/preferences' ? { email: fields } : { ...c.always?.(id), ...fields };
          const res = await request(app)[c.method](c.path(id)).set(bearer(w.tokens[c.as])).send(body);
          expect(res.status, JSON.stringify(res.body)).toBe(200);
          const after = await c.read(id);
          for (const key of Object.keys(before)) {
            if (!named.includes(key))
              expect(after[key], `${key} after naming ${named.join(', ')}`).toEqual(before[key]);
          }
        }),
        { numRuns: 12 },
      );
    }, 60_000);
  }
});
