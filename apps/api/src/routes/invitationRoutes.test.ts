import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { app, createWorld, unique, waitForEmail } from '../test/harness';

function tokenFrom(text: string): string {
  const match = /accept-invitation\?token=([A-Za-z0-9_-]+)/.exec(text);
  if (!match) throw new Error(`no invitation link in:\n${text}`);
  return match[1]!;
}

describe('invitations', () => {
  it('e-mails an invitation through the outbox and the worker, and the link creates the account', async () => {
    const { tokens, printer } = await createWorld();
    const email = `invitee-${unique()}@test.example`;
    const created = await request(app)
      .post('/api/users')
      .set('Authorization', `Bearer ${tokens.printerAdmin}`)
      .send({ email: email.toUpperCase(), name: 'Sam Ortiz', role: 'purchasing' });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ email, role: 'purchasing', status: 'pending' });
    expect(created.body).not.toHaveProperty('tokenHash');

    // Captured from the real SMTP catcher: plain-text part, organisation, link back.
    const message = await waitForEmail(email);
    expect(message.subject).toContain(printer.name);
    expect(message.text).toContain('Hello Sam Ortiz');
    expect(message.text).toMatch(/CST|CDT/); // the organisation's time zone (America/Chicago)
    expect(message.html).toContain('Accept the invitation');
    const token = tokenFrom(message.text);

    const preview = await request(app).get(`/api/invitations/preview?token=${token}`);
    expect(preview.status).toBe(200);
    expect(preview.body).toEqual({ email, name: 'Sam Ortiz', role: 'purchasing', organisationName: printer.name });

    const weak = await request(app).post('/api/invitations/accept').send({ token, password: 'short' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.fields.password).toMatch(/10 characters/);

    const accepted = await request(app)
      .post('/api/invitations/accept')
      .send({ token, password: 'a long enough password' });
    expect(accepted.status).toBe(201);
    const me = await request(app).get('/api/me').set('Authorization', `Bearer ${accepted.body.token}`);
    expect(me.body).toMatchObject({ email, role: 'purchasing', organisation: { id: printer.id } });

    // The link is spent: a second click, or a double submit, creates nothing.
    const again = await request(app)
      .post('/api/invitations/accept')
      .send({ token, password: 'a long enough password' });
    expect(again.status).toBe(410);
    const login = await request(app).post('/api/auth/login').send({ email, password: 'a long enough password' });
    expect(login.status).toBe(200);
  });

  it('accepts two simultaneous clicks on one link once', async () => {
    const { tokens } = await createWorld();
    const email = `double-${unique()}@test.example`;
    await request(app)
      .post('/api/users')
      .set('Authorization', `Bearer ${tokens.printerAdmin}`)
      .send({ email, name: 'Double Click', role: 'buyer' });
    const token = tokenFrom((await waitForEmail(email)).text);
    const results = await Promise.all(
      [1, 2, 3].map(() =>
        request(app).post('/api/invitations/accept').send({ token, password: 'a long enough password' }),
      ),
    );
    expect(results.map((r) => r.status).sort()).toEqual([201, 410, 410]);
  });

  it('refuses a role the organisation does not have, and a second live invitation', async () => {
    const { tokens } = await createWorld();
    const wrongRole = await request(app)
      .post('/api/users')
      .set('Authorization', `Bearer ${tokens.shopAdmin}`)
      .send({ email: `x-${unique()}@test.example`, name: 'X', role: 'purchasing' });
    expect(wrongRole.status).toBe(400);
    expect(wrongRole.body.error.fields.role).toBeTruthy();

    const email = `twice-${unique()}@test.example`;
    const body = { email, name: 'Twice', role: 'buyer' };
    expect(
      (await request(app).post('/api/users').set('Authorization', `Bearer ${tokens.printerAdmin}`).send(body)).status,
    ).toBe(201);
    const second = await request(app)
      .post('/api/users')
      .set('Authorization', `Bearer ${tokens.printerAdmin}`)
      .send(body);
    expect(second.status).toBe(409);
    expect(second.body.error.fields.email).toBeTruthy();
  });

  it('answers an address with an account elsewhere as any invitation, and tells only the address', async () => {
    const { tokens, users } = await createWorld();
    const invite = (email: string) =>
      request(app)
        .post('/api/users')
        .set('Authorization', `Bearer ${tokens.printerAdmin}`)
        .send({ email, name: 'Someone', role: 'buyer' });
    // The estimator works at the die shop: the printer's admin must not learn that.
    const elsewhere = await invite(users.estimator.email);
    const fresh = await invite(`fresh-${unique()}@test.example`);
    expect(elsewhere.status).toBe(201);
    expect(Object.keys(elsewhere.body).sort()).toEqual(Object.keys(fresh.body).sort());
    expect(elsewhere.body).toMatchObject({ status: fresh.body.status, role: 'buyer' });
    const mail = await waitForEmail(users.estimator.email, 'invited you');
    expect(mail.text).toContain('already has a Kerfmark account');
    expect(mail.text).not.toContain('accept-invitation?token=');

    // Someone already in the organisation is a conflict its admin can see anyway.
    const mine = await invite(users.buyer.email);
    expect(mine.status).toBe(409);
    expect(mine.body.error.fields.email).toBe('Already in your team');
  });

  it('revokes a link, and resending issues a new one that replaces the old', async () => {
    const { tokens } = await createWorld();
    const email = `resend-${unique()}@test.example`;
    const created = await request(app)
      .post('/api/users')
      .set('Authorization', `Bearer ${tokens.printerAdmin}`)
      .send({ email, name: 'Resend Me', role: 'buyer' });
    const oldToken = tokenFrom((await waitForEmail(email)).text);
    const resent = await request(app)
      .post(`/api/invitations/${created.body.id}/resend`)
      .set('Authorization', `Bearer ${tokens.printerAdmin}`);
    expect(resent.status).toBe(200);
    expect((await request(app).get(`/api/invitations/preview?token=${oldToken}`)).status).toBe(410);

    const revoked = await request(app)
      .post(`/api/invitations/${created.body.id}/revoke`)
      .set('Authorization', `Bearer ${tokens.printerAdmin}`);
    expect(revoked.body.status).toBe('revoked');
    const list = await request(app).get('/api/invitations').set('Authorization', `Bearer ${tokens.printerAdmin}`);
    expect(list.body.find((i: { id: number }) => i.id === created.body.id).status).toBe('revoked');
  });

  it('answers a made-up token with 410 and a short one with 400', async () => {
    expect((await request(app).get(`/api/invitations/preview?token=${'x'.repeat(43)}`)).status).toBe(410);
    expect((await request(app).get('/api/invitations/preview?token=abc')).status).toBe(400);
  });
});
