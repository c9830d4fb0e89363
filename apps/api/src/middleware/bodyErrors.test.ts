// A body the JSON parser cannot read is the sender's fault: a 4xx in the usual error shape, on
// every route, sign-in included, never a 500. Kinds from body-parser's documented error types.
import { deflateSync, gzipSync } from 'node:zlib';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { app } from '../test/harness';
import { routeList } from '../test/routeList';

const json = JSON.stringify({ email: 'nobody@test.example', password: 'whatever' });

// Over real HTTP: supertest re-encodes a Buffer sent as JSON, which would corrupt even a good gzip body.
let base: string;
let server: ReturnType<typeof app.listen>;
beforeAll(
  () =>
    new Promise<void>(
      (resolve) =>
        (server = app.listen(0, '127.0.0.1', () => {
          base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
          resolve();
        })),
    ),
);
afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

async function post(path: string, headers: Record<string, string>, body: Buffer | string) {
  const res = await fetch(base + path, { method: 'POST', headers, body });
  return {
    status: res.status,
    body: (await res.json()) as { error: { code: string; message: string; requestId: string } },
  };
}

describe('bodies the parser cannot read', () => {
  const cases: Array<[string, Record<string, string>, Buffer | string, number, string]> = [
    ['an unknown charset', { 'Content-Type': 'application/json; charset=klingon' }, json, 415, 'unsupported_charset'],
    [
      'an unknown Content-Encoding',
      { 'Content-Type': 'application/json', 'Content-Encoding': 'zstd-of-our-own' },
      json,
      415,
      'unsupported_encoding',
    ],
    [
      'a corrupt gzip body',
      { 'Content-Type': 'application/json', 'Content-Encoding': 'gzip' },
      Buffer.concat([gzipSync(json).subarray(0, 12), Buffer.from('not gzip at all')]),
      400,
      'unreadable_body',
    ],
    [
      'a corrupt deflate body',
      { 'Content-Type': 'application/json', 'Content-Encoding': 'deflate' },
      Buffer.from('plainly not deflate'),
      400,
      'unreadable_body',
    ],
    ['malformed JSON', { 'Content-Type': 'application/json' }, '{"email": ', 400, 'malformed_json'],
  ];
  for (const path of ['/api/auth/login', '/api/requests', '/api/presses']) {
    it.each(cases)(`${path}: %s`, async (_label, headers, body, status, code) => {
      const res = await post(path, headers, body);
      expect(res.status).toBe(status);
      expect(res.body.error).toMatchObject({ code, requestId: expect.any(String) });
      expect(res.body.error.message).toBeTruthy();
    });
  }

  it('answers every route that takes a body likewise, before anything else reads it', async () => {
    const writes = routeList(app).filter((r) => /^(POST|PATCH|PUT) /.test(r));
    expect(writes.length).toBeGreaterThan(25);
    for (const route of writes) {
      const [method, path] = route.split(' ') as [string, string];
      for (const [, headers, body, status, code] of cases) {
        const res = await fetch(base + path.replace(/:\w+(\([^)]*\))?/g, '1'), { method, headers, body });
        const answer = (await res.json()) as { error?: { code: string } };
        expect(`${route} ${res.status} ${answer.error?.code}`).toBe(`${route} ${status} ${code}`);
      }
    }
  }, 60_000);

  it('still reads a body that is gzipped or deflated properly', async () => {
    for (const [encoding, body] of [
      ['gzip', gzipSync(json)],
      ['deflate', deflateSync(json)],
    ] as const) {
      const res = await post(
        '/api/auth/login',
        { 'Content-Type': 'application/json', 'Content-Encoding': encoding },
        body,
      );
      expect(res.status, `${encoding}: ${JSON.stringify(res.body)}`).toBe(401); // read, then refused as a wrong sign-in
    }
  });
});
