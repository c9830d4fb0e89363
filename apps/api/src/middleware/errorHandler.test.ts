import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { app, createWorld } from '../test/harness';

describe('error answers', () => {
  it('answers malformed JSON with a 400, not a 500', async () => {
    const { tokens } = await createWorld();
    const res = await request(app)
      .post('/api/presses')
      .set('Authorization', `Bearer ${tokens.printerAdmin}`)
      .set('Content-Type', 'application/json')
      .send('{"name": "Platen 2",');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('malformed_json');
  });

  it('answers a body over the JSON limit with a 413', async () => {
    const res = await request(app)
      .post('/api/auth/login')
      .send({ email: 'a@b.example', password: 'x'.repeat(200_000) });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
  });

  it('answers an unknown API route with a JSON 404', async () => {
    const res = await request(app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('sets the usual security headers', async () => {
    const res = await request(app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});

describe('a backing service that is down', () => {
  it('answers 503 with a clear message for a refused database connection', async () => {
    const express = (await import('express')).default;
    const { pino } = await import('pino');
    const { errorHandler } = await import('./errorHandler');
    const broken = express();
    broken.get('/x', () => {
      throw Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:5432'), { code: 'ECONNREFUSED' });
    });
    broken.use(errorHandler(pino({ level: 'silent' })));
    const res = await request(broken).get('/x');
    expect(res.status).toBe(503);
    expect(res.headers['retry-after']).toBe('5');
    expect(res.body.error.code).toBe('service_unavailable');
  });
});
