import { defineProject } from 'vitest/config';

// Runs against the real S3 fake (s3rver) that `npm test` starts.
export default defineProject({ test: { name: 'storage', environment: 'node', testTimeout: 20_000 } });
