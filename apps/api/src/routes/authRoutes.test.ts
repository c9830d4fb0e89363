import jwt from 'jsonwebtoken';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { app, createOrg, createUser, createWorld, PASSWORD, signIn, testConfig } from '../test/harness';

describe('sign-in', () => {
  it('signs in with the right password and answers /api/me', async () => {
    const org = await createOrg('printer');
    const user = await createUser(org, 'buyer');
    const login = await request(app)
      .post('/api/auth/login')
      .send({ email: user.email.toUpperCase(), password: PASSWORD });
    expect(login.status).toBe(200);
    expect(new Date(login.body.expiresAt).getTime()).toBeGreaterThan(Date.now());
    const me = await request(app).get('/api/me').set('Authorization', `Bearer ${login.body.token}`);
    expect(me.status).toBe(200);
    expect(me.body).toMatchObject({ id: user.id, role: 'buyer', organisation: { id: org.id, kind: 'printer' } });
    expect(me.body).not.toHaveProperty('passwordHash');
  });

  it('refuses a wrong password and an unknown e-mail with the same answer', async () => {
    const org = await createOrg('printer');
    const user = await createUser(org, 'buyer');
    const wrong = await request(app).post('/api/auth/login').send({ email: user.email, password: 'not the password' });
    const unknown = await request(app)
      .post('/api/auth/login')
      .send({ email: 'nobody-here@test.example', password: 'whatever' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    // The same answer but for each request's own id.
    const { requestId: wrongId, ...wrongError } = wrong.body.error;
    const { requestId: unknownId, ...unknownError } = unknown.body.error;
    expect(wrongError).toEqual(unknownError);
    expect(wrongId).not.toBe(unknownId);
    expect(wrong.body.error.code).toBe('invalid_credentials');
  });

  it('names the fields of an invalid sign-in', async () => {
    const res = await request(app).post('/api/auth/login').send({ email: 'not-an-address' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'password']);
  });

  it('refuses a disabled account', async () => {
    const org = await createOrg('die_shop');
    const user = await createUser(org, 'estimator', { status: 'disabled' });
    const res = await request(app).post('/api/auth/login').send({ email: user.email, password: PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('account_disabled');
  });

  it('limits repeated failures with a clear 429 and a Retry-After, kept in Redis', async () => {
    const org = await createOrg('printer');
    const user = await createUser(org, 'buyer');
    for (let i = 0; i < testConfig.login.maxAttempts; i++) {
      const res = await request(app)
        .post('/api/auth/login')
        .send({ email: user.email, password: `wrong ${i}` });
      expect(res.status).toBe(401);
    }
    // Even the right password is refused while the account is blocked from this address.
    const blocked = await request(app).post('/api/auth/login').send({ email: user.email, password: PASSWORD });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('too_many_attempts');
    expect(blocked.body.error.message).toMatch(/Try again in \d+ minute/);
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
  });
});

describe('tokens', () => {
  const claims = (sub: number) => ({ sub: String(sub), jti: crypto.randomUUID() });

  it('refuses an expired token with token_expired', async () => {
    const org = await createOrg('printer');
    const user = await createUser(org, 'buyer');
    const token = jwt.sign({ ...claims(user.id), exp: Math.floor(Date.now() / 1000) - 60 }, testConfig.jwtSecret, {
      algorithm: 'HS256',
      issuer: 'kerfmark',
    });
    const res = await request(app).get('/api/me').set('Authorization', `Bearer ${token}`);
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('token_expired');
  });

  it('refuses a forged signature, the "none" algorithm and another algorithm', async () => {
    const org = await createOrg('printer');
    const user = await createUser(org, 'buyer');
    const forged = jwt.sign(claims(user.id), 'not-our-secret', {
      algorithm: 'HS256',
      issuer: 'kerfmark',
      expiresIn: 600,
    });
    const none = jwt.sign(claims(user.id), '', { algorithm: 'none', issuer: 'kerfmark', expiresIn: 600 });
    const hs512 = jwt.sign(claims(user.id), testConfig.jwtSecret, {
      algorithm: 'HS512',
      issuer: 'kerfmark',
      expiresIn: 600,
    });
    for (const token of [forged, none, hs512, 'garbage', '']) {
      const res = await request(app).get('/api/me').set('Authorization', `Bearer ${token}`);
      expect(res.status).toBe(401);
    }
  });

  it('revokes the token on sign-out, and only that token', async () => {
    const { users } = await createWorld();
    const first = await signIn(users.buyer);
    const second = await signIn(users.buyer);
    expect((await request(app).post('/api/auth/logout').set('Authorization', `Bearer ${first}`)).status).toBe(204);
    expect((await request(app).get('/api/me').set('Authorization', `Bearer ${first}`)).status).toBe(401);
    expect((await request(app).get('/api/me').set('Authorization', `Bearer ${second}`)).status).toBe(200);
  });

  it('stops a disabled user’s live token at once', async () => {
    const { users, tokens } = await createWorld();
    const res = await request(app)
      .patch(`/api/users/${users.buyer.id}`)
      .set('Authorization', `Bearer ${tokens.printerAdmin}`)
      .send({ status: 'disabled' });
    expect(res.status).toBe(200);
    expect((await request(app).get('/api/me').set('Authorization', `Bearer ${tokens.buyer}`)).status).toBe(401);
  });
});
