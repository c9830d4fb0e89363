import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { app, testConfig } from './test/harness';

describe('the web app served by the API', () => {
  it.skipIf(!testConfig.webDist)(
    'answers every client route with its index page, sends its files gzipped, and API answers as they are',
    async () => {
      const page = await request(app).get('/open-requests');
      expect(page.status).toBe(200);
      expect(page.text).toContain('<div id="app">');
      const entry = /<script type="module"[^>]*src="([^"]+)"/.exec(page.text)?.[1];
      expect(entry).toBeTruthy();
      const script = await request(app).get(entry!).set('Accept-Encoding', 'gzip');
      expect(script.status).toBe(200);
      expect(script.headers['content-encoding']).toBe('gzip');
      const health = await request(app).get('/api/health').set('Accept-Encoding', 'gzip');
      expect(health.headers['content-encoding']).toBeUndefined();
    },
  );
});
