import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { app, testConfig } from './test/harness';

describe('the web app served by the API', () => {
  it.skipIf(!testConfig.webDist)(
    'answers every client route with its index page, sends its files compressed and hashed ones cached for good, and API answers as they are',
    async () => {
      const page = await request(app).get('/open-requests');
      expect(page.status).toBe(200);
      expect(page.text).toContain('<div id="app">');
      const entry = /<script type="module"[^>]*src="([^"]+)"/.exec(page.text)?.[1];
      expect(entry).toBeTruthy();
      const script = await request(app).get(entry!).set('Accept-Encoding', 'gzip');
      expect(script.status).toBe(200);
      expect(script.headers['content-encoding']).toBe('gzip');
      expect(script.headers['cache-control']).toBe('public, max-age=31536000, immutable');
      const brotli = await request(app).get(entry!).set('Accept-Encoding', 'gzip, br');
      expect(brotli.headers['content-encoding']).toBe('br');
      const favicon = await request(app).get('/favicon.svg');
      expect(favicon.headers['cache-control']).toBe('public, max-age=3600');
      const health = await request(app).get('/api/health').set('Accept-Encoding', 'gzip');
      expect(health.headers['content-encoding']).toBeUndefined();
    },
  );
});
