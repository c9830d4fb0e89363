import { defineProject } from 'vitest/config';

// Integration tests run against the real PostgreSQL, Redis and mail catcher that `npm test` starts.
export default defineProject({
  test: { name: 'api', environment: 'node', testTimeout: 30_000, hookTimeout: 30_000 },
});
