import { createHash } from 'node:crypto';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { LOCAL_JWT_SECRET_PREFIX } from '../../apps/api/src/config';

export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

/** One set of ports and one data folder: `npm start` and `npm test` each have their own. */
export interface Profile {
  name: 'dev' | 'test';
  dataDir: string;
  ports: { app: number; postgres: number; redis: number; s3: number; smtp: number; mailUi: number; vite: number };
  database: string;
  bucket: string;
}

const PORT_VARIABLES = {
  app: 'PORT',
  postgres: 'PG_PORT',
  redis: 'REDIS_PORT',
  s3: 'S3_PORT',
  smtp: 'SMTP_PORT',
  mailUi: 'MAIL_PORT',
  vite: 'VITE_PORT',
} as const;

/** The variable that moves one of a profile's ports, e.g. KERFMARK_TEST_REDIS_PORT. */
export function portVariable(p: Pick<Profile, 'name'>, key: keyof Profile['ports']): string {
  return `${p.name === 'dev' ? 'KERFMARK_' : 'KERFMARK_TEST_'}${PORT_VARIABLES[key]}`;
}

function port(envName: string, fallback: number): number {
  const value = process.env[envName];
  if (!value) return fallback;
  const n = Number(value);
  if (!Number.isInteger(n) || n < 1 || n > 65535)
    throw new Error(`${envName} must be a port number from 1 to 65535, not "${value}"`);
  return n;
}

export function profile(name: 'dev' | 'test'): Profile {
  const base = name === 'dev' ? 4100 : 4200;
  const v = (key: keyof Profile['ports']) => portVariable({ name }, key);
  return {
    name,
    dataDir: path.join(repoRoot, '.data', name),
    ports: {
      app: port(v('app'), base),
      postgres: port(v('postgres'), name === 'dev' ? 54329 : 54339),
      redis: port(v('redis'), name === 'dev' ? 6390 : 6391),
      s3: port(v('s3'), base + 10),
      smtp: port(v('smtp'), base + 25),
      mailUi: port(v('mailUi'), base + 80),
      vite: port(v('vite'), base + 73),
    },
    database: name === 'dev' ? 'kerfmark' : 'kerfmark_test',
    bucket: name === 'dev' ? 'kerfmark-files' : 'kerfmark-test-files',
  };
}

/** The environment every app process of a profile gets: the same variables production sets. */
export function serviceEnv(p: Profile): Record<string, string> {
  const host = '127.0.0.1';
  return {
    NODE_ENV: p.name === 'test' ? 'test' : 'development',
    PORT: String(p.ports.app),
    APP_URL: `http://${host}:${p.ports.app}`,
    DATABASE_URL: `postgres://kerfmark@${host}:${p.ports.postgres}/${p.database}`,
    REDIS_URL: `redis://${host}:${p.ports.redis}`,
    S3_ENDPOINT: `http://${host}:${p.ports.s3}`,
    S3_BUCKET: p.bucket,
    S3_REGION: 'us-east-1',
    S3_ACCESS_KEY_ID: 'S3RVER',
    S3_SECRET_ACCESS_KEY: 'S3RVER',
    SMTP_URL: `smtp://${host}:${p.ports.smtp}`,
    MAIL_CATCHER_URL: `http://${host}:${p.ports.mailUi}`,
    MAIL_FROM: 'Kerfmark <no-reply@kerfmark.test>',
    // A per-checkout secret for local use only, marked by its prefix: production refuses it.
    JWT_SECRET:
      LOCAL_JWT_SECRET_PREFIX + createHash('sha256').update(`kerfmark-local:${repoRoot}:${p.name}`).digest('hex'),
    WEB_DIST: path.join(repoRoot, 'apps/web/dist'),
    DATA_DIR: p.dataDir,
  };
}
