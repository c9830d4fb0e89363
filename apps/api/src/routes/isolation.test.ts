import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { loadFacts, maySee, visibleParts } from '../access';
import { DielineFile, Invitation } from '../models';
import { app, createPress, createWorld, knex, type World } from '../test/harness';
import { createRequestAt, type StagedRequest } from '../test/requestStages';

let a: World;
let b: World;
let pressOfA: number;
let invitationOfA: number;
let awardedOfA: StagedRequest;

beforeAll(async () => {
  [a, b] = await Promise.all([createWorld(), createWorld()]);
  pressOfA = (await createPress(a.printer)).id;
  const invited = await request(app)
    .post('/api/users')
    .set('Authorization', `Bearer ${a.tokens.printerAdmin}`)
    .send({ email: `isolated-${Date.now()}@test.example`, name: 'Isolated Person', role: 'buyer' });
  invitationOfA = invited.body.id;
  awardedOfA = await createRequestAt(a, 'awarded');
  expect(await Invitation.query().findById(invitationOfA)).toBeTruthy();
});

// Another organisation's records are a plain 404 with no data: not a 403 that confirms they exist.
describe('cross-organisation isolation', () => {
  it('hides another printer’s press', async () => {
    const res = await request(app)
      .patch(`/api/presses/${pressOfA}`)
      .set('Authorization', `Bearer ${b.tokens.printerAdmin}`)
      .send({ name: 'Taken over' });
    expect(res.status).toBe(404);
    expect(res.body).toEqual({
      error: { code: 'not_found', message: 'That press was not found.', requestId: expect.any(String) },
    });
  });

  it('hides another organisation’s users', async () => {
    const res = await request(app)
      .patch(`/api/users/${a.users.buyer.id}`)
      .set('Authorization', `Bearer ${b.tokens.printerAdmin}`)
      .send({ status: 'disabled' });
    expect(res.status).toBe(404);
    expect(JSON.stringify(res.body)).not.toContain(a.users.buyer.email);
  });

  it('hides another organisation’s invitations', async () => {
    for (const action of ['resend', 'revoke']) {
      const res = await request(app)
        .post(`/api/invitations/${invitationOfA}/${action}`)
        .set('Authorization', `Bearer ${b.tokens.printerAdmin}`);
      expect(res.status).toBe(404);
    }
  });

  it('lists only the caller’s own people, presses and invitations', async () => {
    const auth = { Authorization: `Bearer ${b.tokens.printerAdmin}` };
    const users = await request(app).get('/api/users').set(auth);
    expect(users.body.map((u: { email: string }) => u.email)).not.toContain(a.users.buyer.email);
    expect(users.body).toHaveLength(3);
    const presses = await request(app).get('/api/presses').set(auth);
    expect(presses.body.map((p: { id: number }) => p.id)).not.toContain(pressOfA);
    const invitations = await request(app).get('/api/invitations').set(auth);
    expect(invitations.body.map((i: { id: number }) => i.id)).not.toContain(invitationOfA);
  });

  it('answers a malformed id like a missing one', async () => {
    for (const id of ['abc', '-1', '0', '99999999999', '1.5']) {
      const res = await request(app)
        .patch(`/api/presses/${id}`)
        .set('Authorization', `Bearer ${a.tokens.printerAdmin}`)
        .send({ name: 'x' });
      expect(res.status).toBe(404);
    }
  });

  it('hides another printer’s requests, bids, files and documents by every route, as the access module says', async () => {
    const { facts } = (await loadFacts(knex, awardedOfA.id))!;
    const outsider = { organisationId: b.printer.id, orgKind: 'printer' as const, role: 'admin' as const };
    expect(maySee(outsider, facts)).toBe(false);
    expect(visibleParts(outsider, facts, new Date())).toMatchObject({
      bids: 'none',
      award: 'none',
      purchaseOrder: false,
      ocdsRelease: false,
    });
    const file = await DielineFile.query().findOne({ requestId: awardedOfA.id }).throwIfNotFound();
    const id = awardedOfA.id;
    const calls = [
      request(app).get(`/api/requests/${id}`),
      request(app).patch(`/api/requests/${id}`).send({ notes: 'Taken over' }),
      request(app).get(`/api/requests/${id}/bids`),
      request(app).get(`/api/requests/${id}/ocds`),
      request(app).get(`/api/requests/${id}/fair-price`),
      request(app).post(`/api/requests/${id}/cancel`).send({ reason: 'x' }),
      request(app).post(`/api/requests/${id}/close-bidding`),
      request(app).post(`/api/requests/${id}/award`).send({ bidId: awardedOfA.bidId }),
      request(app).post(`/api/requests/${id}/receive`).send({ condition: 'good' }),
      request(app).get(`/api/purchase-orders/${awardedOfA.awardId}/pdf`),
      request(app).get(`/api/files/${file.id}`),
      request(app).get(`/api/files/${file.id}/download`),
    ];
    for (const [i, call] of calls.entries()) {
      const res = await call.set('Authorization', `Bearer ${b.tokens.printerAdmin}`);
      expect(res.status, `call ${i}`).toBe(404);
      expect(JSON.stringify(res.body)).not.toContain(a.shop.name);
    }
    // And the die shop of the other world: the awarded job is none of its business either.
    for (const path of [
      `/api/requests/${id}`,
      `/api/requests/${id}/my-bid`,
      `/api/purchase-orders/${awardedOfA.awardId}/pdf`,
      `/api/files/${file.id}`,
    ]) {
      const res = await request(app).get(path).set('Authorization', `Bearer ${b.tokens.estimator}`);
      expect(res.status, path).toBe(404);
    }
  });
});
