import { defineProject } from 'vitest/config';

export default defineProject({ test: { name: 'notices', environment: 'node' } });
