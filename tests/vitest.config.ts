import { defineProject } from 'vitest/config';

// End-to-end tests drive Debian's Chromium against the app `npm test` started; one file at a time.
export default defineProject({
  test: {
    name: 'e2e',
    environment: 'node',
    include: ['e2e/**/*.test.ts', 'integration/**/*.test.ts'],
    testTimeout: 90_000,
    hookTimeout: 60_000,
    fileParallelism: false,
    // A page answers within a second on an idle machine; a loaded CI machine gets ten.
    expect: { poll: { timeout: 10_000 } },
  },
});
