import request from 'supertest';
import { describe, expect, it } from 'vitest';
import type { Request, Response } from 'express';
import { app } from '../test/harness';
import { requestId } from './requestId';

// RFC 9562's textual UUID (version 4 from crypto.randomUUID).
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/;

describe('request ids', () => {
  it('gives a request without one a new UUID, in the X-Request-Id header', async () => {
    const res = await request(app).get('/api/health/live');
    expect(res.headers['x-request-id']).toMatch(UUID);
    const again = await request(app).get('/api/health/live');
    expect(again.headers['x-request-id']).not.toBe(res.headers['x-request-id']);
  });

  it('echoes a well-formed incoming id', async () => {
    for (const id of ['lb-7f3a.2026_12', 'a', 'x'.repeat(64), '0af7651916cd43dd8448eb211c80319c']) {
      const res = await request(app).get('/api/health/live').set('X-Request-Id', id);
      expect(res.headers['x-request-id']).toBe(id);
    }
  });

  it('replaces a malformed one (too long, spaces, other characters) with a UUID', async () => {
    for (const id of ['x'.repeat(65), 'two words', 'semi;colon', '<script>', 'ünïcode']) {
      const res = await request(app).get('/api/health/live').set('X-Request-Id', id);
      expect(res.headers['x-request-id'], id).toMatch(UUID);
    }
  });

  it('replaces an id with CR or LF in it (a header or log line split) with a UUID', () => {
    // Node's HTTP parser refuses most of these on the wire; the middleware must not rely on it.
    for (const incoming of ['abc\r\nSet-Cookie: x=1', 'abc\ndef', 'abc\r']) {
      const headers: Record<string, string> = {};
      const req = { get: () => incoming } as unknown as Request;
      const res = { set: (name: string, value: string) => (headers[name] = value) } as unknown as Response;
      let nextCalled = false;
      requestId(req, res, () => (nextCalled = true));
      expect(nextCalled).toBe(true);
      expect(req.id).toMatch(UUID);
      expect(headers['X-Request-Id']).toBe(req.id);
    }
  });

  it('puts the id in every error body, so a report can be found in the logs', async () => {
    const notFound = await request(app).get('/api/no-such-thing').set('X-Request-Id', 'report-42');
    expect(notFound.status).toBe(404);
    expect(notFound.body.error).toMatchObject({ code: 'not_found', requestId: 'report-42' });
    const unauthorised = await request(app).get('/api/me');
    expect(unauthorised.status).toBe(401);
    expect(unauthorised.body.error.requestId).toBe(unauthorised.headers['x-request-id']);
    expect(unauthorised.body.error.requestId).toMatch(UUID);
    const malformed = await request(app)
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .send('{"email":');
    expect(malformed.status).toBe(400);
    expect(malformed.body.error).toMatchObject({
      code: 'malformed_json',
      requestId: malformed.headers['x-request-id'],
    });
  });
});
