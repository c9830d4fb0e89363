import { defineConfig } from 'vitest/config';

// One run over every workspace; each project has its own vitest.config.ts where it needs one.
export default defineConfig({
  test: {
    projects: ['packages/*', 'apps/api', 'apps/worker', 'apps/web', 'tests', 'scripts'],
  },
});
