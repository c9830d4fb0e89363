import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { app, createPress, createWorld, unique } from '../test/harness';

type Actor = 'anonymous' | 'buyer' | 'purchasing' | 'printerAdmin' | 'estimator' | 'shopAdmin';
type World = Awaited<ReturnType<typeof createWorld>>;

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
  {
    name: 'POST /api/auth/logout',
    send: () => request(app).post('/api/auth/logout'),
    expect: everyone(204),
  },
];

const pressIds = new WeakMap<World, number>();
let world: World;

beforeAll(async () => {
  world = await createWorld();
  pressIds.set(world, (await createPress(world.printer)).id);
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
