import { describe, expect, it } from 'vitest';
import { loadConfig } from './config';

const base = {
  DATABASE_URL: 'postgres://kerfmark@127.0.0.1:5432/kerfmark',
  REDIS_URL: 'rediss://worker:pw@cache.example:6380/2',
  SMTP_URL: 'smtp://127.0.0.1:2525',
};

describe('the worker configuration', () => {
  it('takes the sweeps of production by default', () => {
    expect(loadConfig(base)).toMatchObject({
      redisUrl: base.REDIS_URL,
      outboxSweepMs: 30_000,
      analysisSweepMs: 30_000,
      reminderSweepMs: 300_000,
      appUrl: 'http://127.0.0.1:4100',
    });
  });

  it('stops on a missing or malformed variable with one line naming it', () => {
    expect(() => loadConfig({ ...base, SMTP_URL: undefined })).toThrow(/^Configuration: SMTP_URL is not set$/);
    expect(() => loadConfig({ ...base, SMTP_URL: 'mail.example:25' })).toThrow(
      'Configuration: SMTP_URL must be a smtp:// or smtps:// URL',
    );
    expect(() => loadConfig({ ...base, OUTBOX_SWEEP_MS: '5s' })).toThrow(
      'Configuration: OUTBOX_SWEEP_MS must be a whole number',
    );
    expect(() => loadConfig({ ...base, REDIS_URL: 'cache.example:6379' })).toThrow(
      'Configuration: REDIS_URL must start with redis:// or rediss://',
    );
  });

  it('needs APP_URL in production: every e-mail links to it', () => {
    expect(() => loadConfig({ ...base, NODE_ENV: 'production' })).toThrow(/APP_URL is not set/);
    expect(loadConfig({ ...base, NODE_ENV: 'production', APP_URL: 'https://dies.example' }).appUrl).toBe(
      'https://dies.example',
    );
  });
});
