import { defineProject } from 'vitest/config';

// The start and test scripts' own pieces, against the real PostgreSQL and Redis servers.
export default defineProject({
  test: {
    name: 'scripts',
    environment: 'node',
    include: ['lib/**/*.test.ts'],
    testTimeout: 60_000,
    hookTimeout: 60_000,
  },
});
