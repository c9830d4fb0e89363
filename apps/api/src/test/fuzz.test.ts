import fc from 'fast-check';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { app, createOpenRequest, createWorld, type World } from './harness';

// Property-based bad input (fast-check): whatever JSON arrives, no route answers 500.
let w: World;
let requestId: number;

beforeAll(async () => {
  w = await createWorld();
  requestId = (await createOpenRequest(w)).id;
});

const anyJson = fc.oneof(
  fc.jsonValue(),
  fc.dictionary(
    fc.constantFrom('title', 'email', 'password', 'name', 'role', 'kind', 'lines', 'currency', 'leadDays', 'validUntil', 'bidId', 'reason', 'maxSheetWidthIn', 'typicalSpeedSph', 'needByDate', 'bidDeadline', 'ruleTypes', 'ups', 'quantity', 'layerMap', 'email', 'question', 'condition'),
    fc.oneof(fc.string(), fc.integer(), fc.double(), fc.boolean(), fc.constant(null), fc.array(fc.jsonValue(), { maxLength: 3 }), fc.constant("'; DROP TABLE users; --")),
  ),
);

describe('fuzzing every JSON route', () => {
  const routes: Array<[string, () => string, keyof World['tokens'] | null, string]> = [
    ['post', () => '/api/auth/login', null, 'POST /api/auth/login'],
    ['post', () => '/api/invitations/accept', null, 'POST /api/invitations/accept'],
    ['post', () => '/api/users', 'printerAdmin', 'POST /api/users'],
    ['patch', () => `/api/users/${w.users.buyer.id}`, 'printerAdmin', 'PATCH /api/users/:id'],
    ['post', () => '/api/presses', 'printerAdmin', 'POST /api/presses'],
    ['post', () => '/api/requests', 'buyer', 'POST /api/requests'],
    ['patch', () => `/api/requests/${requestId}`, 'buyer', 'PATCH /api/requests/:id'],
    ['post', () => `/api/requests/${requestId}/bids`, 'estimator', 'POST /api/requests/:id/bids'],
    ['post', () => `/api/requests/${requestId}/questions`, 'estimator', 'POST /api/requests/:id/questions'],
    ['post', () => `/api/requests/${requestId}/decline`, 'estimator', 'POST /api/requests/:id/decline'],
    ['post', () => `/api/requests/${requestId}/award`, 'purchasing', 'POST /api/requests/:id/award'],
    ['post', () => `/api/requests/${requestId}/cancel`, 'buyer', 'POST /api/requests/:id/cancel'],
    ['put', () => '/api/me/preferences', 'buyer', 'PUT /api/me/preferences'],
  ];
  for (const [method, path, actor, title] of routes) {
    it(`${title} never answers 500`, async () => {
      await fc.assert(
        fc.asyncProperty(anyJson, async (body) => {
          let req = (request(app) as unknown as Record<string, (p: string) => request.Test>)[method]!(path()).set('Content-Type', 'application/json');
          if (actor) req = req.set('Authorization', `Bearer ${w.tokens[actor]}`);
          const res = await req.send(JSON.stringify(body));
          expect(res.status, JSON.stringify(res.body)).toBeLessThan(500);
        }),
        { numRuns: 40, seed: 20261202 },
      );
    });
  }

  it('refuses SQL-injection-shaped filters with a 400 and never a 500', async () => {
    await fc.assert(
      fc.asyncProperty(fc.constantFrom('status', 'pressId', 'needByFrom', 'sort', 'page', 'q'), fc.constantFrom("' OR 1=1 --", '1; DROP TABLE die_requests', '%27%3B', '\\x00', "Robert'); --"), async (key, value) => {
        const res = await request(app).get(`/api/requests?${key}=${encodeURIComponent(value)}`).set('Authorization', `Bearer ${w.tokens.buyer}`);
        expect(res.status).toBeLessThan(500);
      }),
      { numRuns: 30, seed: 7 },
    );
  });
});
