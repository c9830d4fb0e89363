import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { app, createOpenRequest, createPress, createWorld, unique, type World } from '../test/harness';

type Actor = 'anonymous' | 'buyer' | 'purchasing' | 'printerAdmin' | 'estimator' | 'shopAdmin';

interface RouteCase {
  name: string;
  send: (world: World, actor: Actor) => request.Test;
  expect: Record<Actor, number>;
}

const everyone = (status: number, anonymous = 401): Record<Actor, number> => ({
  anonymous,
  buyer: status,
  purchasing: status,
  printerAdmin: status,
  estimator: status,
  shopAdmin: status,
});

// Each role's access to each route: role and organisation kind, enforced by the API.
const cases: RouteCase[] = [
  { name: 'GET /api/health', send: () => request(app).get('/api/health'), expect: everyone(200, 200) },
  { name: 'GET /api/me', send: () => request(app).get('/api/me'), expect: everyone(200) },
  { name: 'GET /api/users', send: () => request(app).get('/api/users'), expect: everyone(200) },
  {
    name: 'POST /api/users',
    send: (_w, actor) =>
      request(app)
        .post('/api/users')
        .send({ email: `new-${unique()}@test.example`, name: 'New Person', role: actor === 'shopAdmin' ? 'estimator' : 'buyer' }),
    expect: { anonymous: 401, buyer: 403, purchasing: 403, printerAdmin: 201, estimator: 403, shopAdmin: 201 },
  },
  {
    name: 'PATCH /api/users/:id',
    send: (w, actor) =>
      request(app)
        .patch(`/api/users/${actor === 'shopAdmin' || actor === 'estimator' ? w.users.estimator.id : w.users.purchasing.id}`)
        .send({ role: actor === 'shopAdmin' || actor === 'estimator' ? 'estimator' : 'purchasing' }),
    expect: { anonymous: 401, buyer: 403, purchasing: 403, printerAdmin: 200, estimator: 403, shopAdmin: 200 },
  },
  {
    name: 'GET /api/invitations',
    send: () => request(app).get('/api/invitations'),
    expect: { anonymous: 401, buyer: 403, purchasing: 403, printerAdmin: 200, estimator: 403, shopAdmin: 200 },
  },
  {
    name: 'GET /api/presses',
    send: () => request(app).get('/api/presses'),
    expect: { anonymous: 401, buyer: 200, purchasing: 200, printerAdmin: 200, estimator: 403, shopAdmin: 403 },
  },
  {
    name: 'POST /api/presses',
    send: () =>
      request(app).post('/api/presses').send({
        name: `Press ${unique()}`,
        kind: 'platen',
        maxSheetWidthIn: 22,
        maxSheetLengthIn: 30,
        typicalSpeedSph: 4000,
        maxSpeedSph: 5000,
      }),
    expect: { anonymous: 401, buyer: 403, purchasing: 403, printerAdmin: 201, estimator: 403, shopAdmin: 403 },
  },
  {
    name: 'PATCH /api/presses/:id',
    send: (w) => request(app).patch(`/api/presses/${pressIds.get(w)}`).send({ typicalSpeedSph: 3500 }),
    expect: { anonymous: 401, buyer: 403, purchasing: 403, printerAdmin: 200, estimator: 403, shopAdmin: 403 },
  },
  { name: 'GET /api/me/dashboard', send: () => request(app).get('/api/me/dashboard'), expect: everyone(200) },
  { name: 'GET /api/me/preferences', send: () => request(app).get('/api/me/preferences'), expect: everyone(200) },
  { name: 'GET /api/notifications', send: () => request(app).get('/api/notifications'), expect: everyone(200) },
  { name: 'GET /api/library', send: () => request(app).get('/api/library'), expect: everyone(200) },
  {
    name: 'GET /api/requests',
    send: () => request(app).get('/api/requests'),
    expect: { anonymous: 401, buyer: 200, purchasing: 200, printerAdmin: 200, estimator: 403, shopAdmin: 403 },
  },
  {
    name: 'POST /api/requests',
    send: () => request(app).post('/api/requests').send({ title: `Access ${unique()}`, quantity: 1, ups: 1, ruleTypes: ['cut'] }),
    expect: { anonymous: 401, buyer: 201, purchasing: 201, printerAdmin: 201, estimator: 403, shopAdmin: 403 },
  },
  {
    name: 'GET /api/requests/:id',
    send: (w) => request(app).get(`/api/requests/${openIds.get(w)}`),
    expect: everyone(200),
  },
  {
    name: 'GET /api/requests/:id/bids (sealed until the deadline)',
    send: (w) => request(app).get(`/api/requests/${openIds.get(w)}/bids`),
    expect: { anonymous: 401, buyer: 404, purchasing: 404, printerAdmin: 404, estimator: 403, shopAdmin: 403 },
  },
  {
    name: 'GET /api/marketplace/requests',
    send: () => request(app).get('/api/marketplace/requests'),
    expect: { anonymous: 401, buyer: 403, purchasing: 403, printerAdmin: 403, estimator: 200, shopAdmin: 200 },
  },
  {
    name: 'GET /api/die-shops',
    send: () => request(app).get('/api/die-shops'),
    expect: { anonymous: 401, buyer: 200, purchasing: 200, printerAdmin: 200, estimator: 403, shopAdmin: 403 },
  },
  {
    name: 'GET /api/price-history',
    send: () => request(app).get('/api/price-history'),
    expect: { anonymous: 401, buyer: 200, purchasing: 200, printerAdmin: 200, estimator: 403, shopAdmin: 403 },
  },
  {
    name: 'GET /api/estimate-aid',
    send: () => request(app).get('/api/estimate-aid'),
    expect: { anonymous: 401, buyer: 403, purchasing: 403, printerAdmin: 403, estimator: 200, shopAdmin: 200 },
  },
  {
    name: 'POST /api/requests/:id/award (bids still sealed)',
    send: (w) => request(app).post(`/api/requests/${openIds.get(w)}/award`).send({ bidId: 1 }),
    expect: { anonymous: 401, buyer: 403, purchasing: 409, printerAdmin: 409, estimator: 403, shopAdmin: 403 },
  },
  {
    name: 'POST /api/auth/logout',
    send: () => request(app).post('/api/auth/logout'),
    expect: everyone(204),
  },
];

const pressIds = new WeakMap<World, number>();
const openIds = new WeakMap<World, number>();
let world: World;

beforeAll(async () => {
  world = await createWorld();
  pressIds.set(world, (await createPress(world.printer)).id);
  openIds.set(world, (await createOpenRequest(world)).id);
});

describe('role-by-route access', () => {
  const actors: Actor[] = ['anonymous', 'buyer', 'purchasing', 'printerAdmin', 'estimator', 'shopAdmin'];
  for (const route of cases) {
    for (const actor of actors) {
      it(`${route.name} as ${actor} → ${route.expect[actor]}`, async () => {
        // Sign-out revokes the token, so that case gets a fresh world of its own.
        const w = route.name.includes('logout') ? await createWorld() : world;
        let req = route.send(w, actor);
        if (actor !== 'anonymous') req = req.set('Authorization', `Bearer ${w.tokens[actor]}`);
        const res = await req;
        expect(res.status, JSON.stringify(res.body)).toBe(route.expect[actor]);
        if (res.status >= 400) expect(res.body.error.code).toBeTruthy();
      });
    }
  }
});
