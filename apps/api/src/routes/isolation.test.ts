import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { Invitation } from '../models';
import { app, createPress, createWorld, type World } from '../test/harness';

let a: World;
let b: World;
let pressOfA: number;
let invitationOfA: number;

beforeAll(async () => {
  [a, b] = await Promise.all([createWorld(), createWorld()]);
  pressOfA = (await createPress(a.printer)).id;
  const invited = await request(app)
    .post('/api/users')
    .set('Authorization', `Bearer ${a.tokens.printerAdmin}`)
    .send({ email: `isolated-${Date.now()}@test.example`, name: 'Isolated Person', role: 'buyer' });
  invitationOfA = invited.body.id;
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
    expect(res.body).toEqual({ error: { code: 'not_found', message: 'That press was not found.' } });
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
      const res = await request(app).patch(`/api/presses/${id}`).set('Authorization', `Bearer ${a.tokens.printerAdmin}`).send({ name: 'x' });
      expect(res.status).toBe(404);
    }
  });
});
