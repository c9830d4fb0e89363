import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { AuditEntry } from '../models';
import { app, createWorld } from '../test/harness';

describe('users', () => {
  it('lets an admin change a role, with an audit entry', async () => {
    const { tokens, users } = await createWorld();
    const res = await request(app)
      .patch(`/api/users/${users.buyer.id}`)
      .set('Authorization', `Bearer ${tokens.printerAdmin}`)
      .send({ role: 'purchasing' });
    expect(res.status).toBe(200);
    expect(res.body.role).toBe('purchasing');
    // The new role applies to the live token at once: roles are read per request.
    const me = await request(app).get('/api/me').set('Authorization', `Bearer ${tokens.buyer}`);
    expect(me.body.role).toBe('purchasing');
    const audit = await AuditEntry.query().where({ entity: 'user', entityId: users.buyer.id });
    expect(audit).toHaveLength(1);
    expect(audit[0]!.detail).toMatchObject({ from: { role: 'buyer' }, to: { role: 'purchasing' } });
  });

  it('refuses a role of the other kind of organisation', async () => {
    const { tokens, users } = await createWorld();
    const res = await request(app)
      .patch(`/api/users/${users.estimator.id}`)
      .set('Authorization', `Bearer ${tokens.shopAdmin}`)
      .send({ role: 'buyer' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.role).toBeTruthy();
  });

  it('keeps at least one active admin, even when two admins demote each other at once', async () => {
    const { tokens, users } = await createWorld();
    const self = await request(app)
      .patch(`/api/users/${users.printerAdmin.id}`)
      .set('Authorization', `Bearer ${tokens.printerAdmin}`)
      .send({ role: 'buyer' });
    expect(self.status).toBe(409);

    await request(app)
      .patch(`/api/users/${users.purchasing.id}`)
      .set('Authorization', `Bearer ${tokens.printerAdmin}`)
      .send({ role: 'admin' });
    const [first, second] = await Promise.all([
      request(app)
        .patch(`/api/users/${users.purchasing.id}`)
        .set('Authorization', `Bearer ${tokens.printerAdmin}`)
        .send({ role: 'buyer' }),
      request(app)
        .patch(`/api/users/${users.printerAdmin.id}`)
        .set('Authorization', `Bearer ${tokens.purchasing}`)
        .send({ role: 'buyer' }),
    ]);
    expect([first.status, second.status].sort()).toEqual([200, 409]);
    const list = await request(app).get('/api/users').set('Authorization', `Bearer ${tokens.buyer}`);
    expect(list.body.filter((u: { role: string }) => u.role === 'admin')).toHaveLength(1);
  });
});
