import { describe, expect, it } from 'vitest';
import { ConfigError } from '@kerfmark/contracts';
import { LOCAL_JWT_SECRET_PREFIX, loadConfig } from './config';

const base = {
  DATABASE_URL: 'postgres://kerfmark@127.0.0.1:5432/kerfmark',
  REDIS_URL: 'redis://127.0.0.1:6379',
  JWT_SECRET: `${LOCAL_JWT_SECRET_PREFIX}0123456789abcdef`,
};
const production = { ...base, NODE_ENV: 'production', APP_URL: 'https://dies.example', JWT_SECRET: 'k'.repeat(32) };

function problem(env: Record<string, string | undefined>): string {
  try {
    loadConfig(env);
  } catch (error) {
    expect(error).toBeInstanceOf(ConfigError);
    return (error as Error).message;
  }
  throw new Error('loadConfig accepted it');
}

describe('the API configuration', () => {
  it('takes the defaults of a local run', () => {
    const config = loadConfig(base);
    expect(config).toMatchObject({
      production: false,
      host: '127.0.0.1',
      port: 4100,
      appUrl: 'http://127.0.0.1:4100',
      shutdownGraceMs: 10_000,
      trustProxy: 'loopback',
    });
    expect(config.storage).toEqual({
      bucket: 'kerfmark-files',
      region: 'us-east-1',
      endpoint: undefined,
      accessKeyId: undefined,
      secretAccessKey: undefined,
    });
  });

  it('reads HOST, PORT and the numbers as given', () => {
    const config = loadConfig({
      ...base,
      HOST: '0.0.0.0',
      PORT: '8080',
      SHUTDOWN_GRACE_MS: '2500',
      MAX_UPLOAD_BYTES: '1048576',
      S3_ENDPOINT: 'http://s3.local:9000',
    });
    expect(config).toMatchObject({
      host: '0.0.0.0',
      port: 8080,
      appUrl: 'http://127.0.0.1:8080',
      shutdownGraceMs: 2500,
      maxUploadBytes: 1_048_576,
    });
    expect(config.storage.endpoint).toBe('http://s3.local:9000');
  });

  it('reads TRUST_PROXY as Express takes it: a hop count, true or false, or addresses', () => {
    expect(loadConfig({ ...base, TRUST_PROXY: '1' }).trustProxy).toBe(1);
    expect(loadConfig({ ...base, TRUST_PROXY: 'false' }).trustProxy).toBe(false);
    expect(loadConfig({ ...base, TRUST_PROXY: '10.0.0.0/8, loopback' }).trustProxy).toBe('10.0.0.0/8, loopback');
  });

  it('names a missing variable, on one line', () => {
    const message = problem({ ...base, REDIS_URL: undefined });
    expect(message).toBe('Configuration: REDIS_URL is not set');
    // An empty variable is as good as unset.
    expect(problem({ ...base, DATABASE_URL: ' ' })).toBe('Configuration: DATABASE_URL is not set');
  });

  it('names every malformed variable and what is wrong, never its value', () => {
    const message = problem({
      ...base,
      PORT: '80a',
      REDIS_URL: 'http://:hunter2@cache:6379',
      DATABASE_URL: 'mysql://db',
      BCRYPT_ROUNDS: '40',
    });
    expect(message).not.toContain('\n');
    expect(message).toContain('PORT must be a whole number');
    expect(message).toContain('REDIS_URL must start with redis:// or rediss://');
    expect(message).toContain('DATABASE_URL must be a postgres:// or postgresql:// URL');
    expect(message).toContain('BCRYPT_ROUNDS must be at most 15');
    expect(message).not.toContain('hunter2');
    expect(problem({ ...base, PORT: '70000' })).toBe('Configuration: PORT must be at most 65535');
    expect(problem({ ...base, REDIS_URL: 'redis://h:1/two' })).toMatch(/REDIS_URL has a database that is not a number/);
    expect(problem({ ...base, LOG_LEVEL: 'loud' })).toMatch(/LOG_LEVEL must be fatal, error/);
  });

  it('in production refuses the derived local secret, a short secret, and a missing APP_URL', () => {
    expect(loadConfig(production).production).toBe(true);
    expect(problem({ ...production, JWT_SECRET: `${LOCAL_JWT_SECRET_PREFIX}${'a'.repeat(64)}` })).toBe(
      'Configuration: JWT_SECRET is the local development secret; set a random one in production',
    );
    expect(problem({ ...production, JWT_SECRET: 'k'.repeat(31) })).toBe(
      'Configuration: JWT_SECRET must be at least 32 characters in production',
    );
    expect(problem({ ...production, APP_URL: undefined })).toMatch(/^Configuration: APP_URL is not set/);
    expect(problem({ ...production, NODE_ENV: 'prod' })).toMatch(/NODE_ENV must be development, test or production/);
  });

  it('keeps the local secret outside production', () => {
    expect(loadConfig({ ...base, NODE_ENV: 'development' }).jwtSecret).toBe(base.JWT_SECRET);
  });
});
