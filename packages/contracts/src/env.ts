import { z } from 'zod';
import { redisOptions } from './redisOptions';

/*
 * Building blocks for a process's configuration: each variable is read once at start-up and a
 * bad one is named with what is wrong, never with its value (URLs and secrets hold passwords).
 */

const text = (message = 'is not set') => z.string({ error: message }).trim().min(1, message);

/** A URL with one of the given schemes, e.g. `url(['postgres:', 'postgresql:'])`. */
export function envUrl(protocols: string[]) {
  const shown = protocols.map((p) => `${p}//`).join(' or ');
  return text().refine((value) => {
    try {
      return protocols.includes(new URL(value).protocol);
    } catch {
      return false;
    }
  }, `must be a ${shown} URL`);
}

/** A Redis URL as `redisOptions` reads it (user, password, TLS, database number). */
export const envRedisUrl = text().superRefine((value, ctx) => {
  try {
    redisOptions(value);
  } catch (error) {
    ctx.addIssue({ code: 'custom', message: (error as Error).message });
  }
});

/** A whole number from min to max, with a default when unset. */
export function envInt(fallback: number, min: number, max = Number.MAX_SAFE_INTEGER) {
  return z
    .string()
    .regex(/^\d+$/, 'must be a whole number')
    .transform(Number)
    .pipe(z.number().min(min, `must be at least ${min}`).max(max, `must be at most ${max}`))
    .default(fallback);
}

export const envNodeEnv = z
  .enum(['development', 'test', 'production'], { error: 'must be development, test or production' })
  .default('development');

export const envLogLevel = z
  .enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'], {
    error: 'must be fatal, error, warn, info, debug, trace or silent',
  })
  .default('info');

/** S3 (or an S3-compatible store): no endpoint means AWS itself; keys may come from the host's role. */
export const envStorage = {
  S3_ENDPOINT: envUrl(['http:', 'https:']).optional(),
  S3_BUCKET: text().default('kerfmark-files'),
  S3_REGION: text().default('us-east-1'),
  S3_ACCESS_KEY_ID: text().optional(),
  S3_SECRET_ACCESS_KEY: text().optional(),
};

/** What the API and the worker both read: the environment, the database, Redis, the app's address, logging, S3. */
export const envShared = {
  NODE_ENV: envNodeEnv,
  DATABASE_URL: envUrl(['postgres:', 'postgresql:']),
  REDIS_URL: envRedisUrl,
  APP_URL: envUrl(['http:', 'https:']).optional(),
  LOG_LEVEL: envLogLevel,
  ...envStorage,
};

/** In production the links in every e-mail and reminder (and HSTS) need the public address. */
export function requireAppUrlInProduction(
  env: { NODE_ENV: string; APP_URL?: string },
  ctx: { addIssue: (issue: { code: 'custom'; path: string[]; message: string }) => void },
) {
  if (env.NODE_ENV === 'production' && !env.APP_URL)
    ctx.addIssue({
      code: 'custom',
      path: ['APP_URL'],
      message: 'is not set (required in production: the public address of the app)',
    });
}

/** The storage settings as the storage package takes them, from variables checked by `envStorage`. */
export function storageSettings(e: {
  S3_ENDPOINT?: string;
  S3_BUCKET: string;
  S3_REGION: string;
  S3_ACCESS_KEY_ID?: string;
  S3_SECRET_ACCESS_KEY?: string;
}) {
  return {
    endpoint: e.S3_ENDPOINT,
    bucket: e.S3_BUCKET,
    region: e.S3_REGION,
    accessKeyId: e.S3_ACCESS_KEY_ID,
    secretAccessKey: e.S3_SECRET_ACCESS_KEY,
  };
}

export class ConfigError extends Error {}

/**
 * Parses the environment with a schema. Empty variables count as unset. On failure throws a
 * ConfigError whose message is one line naming every bad variable and what is wrong with it.
 */
export function readEnv<T extends z.ZodType>(schema: T, env: Record<string, string | undefined>): z.output<T> {
  const set = Object.fromEntries(Object.entries(env).filter(([, value]) => value !== undefined && value.trim() !== ''));
  const result = schema.safeParse(set);
  if (result.success) return result.data;
  const problems = result.error.issues.map((issue) => `${issue.path.join('.') || 'environment'} ${issue.message}`);
  throw new ConfigError(`Configuration: ${problems.join('; ')}`);
}
