import { z } from 'zod';
import { envInt, envShared, readEnv, requireAppUrlInProduction, storageSettings } from '@kerfmark/contracts';
import type { StorageConfig } from '@kerfmark/storage';

/**
 * The start of every JWT secret the local scripts derive from the checkout: fine on a laptop,
 * known to anyone with the code, so production refuses it.
 */
export const LOCAL_JWT_SECRET_PREFIX = 'kerfmark-local-';
const MIN_PRODUCTION_SECRET = 32;

const schema = z
  .object({
    ...envShared,
    // Loopback locally; a container sets 0.0.0.0 so that its port can be published.
    HOST: z.string().trim().min(1).default('127.0.0.1'),
    PORT: envInt(4100, 0, 65_535),
    JWT_SECRET: z.string({ error: 'is not set' }),
    TOKEN_TTL_SECONDS: envInt(8 * 3600, 60),
    BCRYPT_ROUNDS: envInt(11, 4, 15),
    WEB_DIST: z.string().optional(),
    INVITATION_TTL_HOURS: envInt(72, 1),
    MAX_UPLOAD_BYTES: envInt(25 * 1024 * 1024, 1024),
    LOGIN_MAX_ATTEMPTS: envInt(5, 1),
    LOGIN_WINDOW_SECONDS: envInt(15 * 60, 1),
    // Express's "trust proxy": which hops may set X-Forwarded-For: addresses or subnets (comma
    // separated, or loopback / uniquelocal), a number of hops, or true / false.
    TRUST_PROXY: z
      .string()
      .default('loopback')
      .transform((value) =>
        /^\d+$/.test(value) ? Number(value) : value === 'true' ? true : value === 'false' ? false : value,
      ),
    SHUTDOWN_GRACE_MS: envInt(10_000, 0),
  })
  .superRefine((env, ctx) => {
    if (env.NODE_ENV !== 'production') return;
    if (env.JWT_SECRET.startsWith(LOCAL_JWT_SECRET_PREFIX)) {
      ctx.addIssue({
        code: 'custom',
        path: ['JWT_SECRET'],
        message: 'is the local development secret; set a random one in production',
      });
    } else if (env.JWT_SECRET.length < MIN_PRODUCTION_SECRET) {
      ctx.addIssue({
        code: 'custom',
        path: ['JWT_SECRET'],
        message: `must be at least ${MIN_PRODUCTION_SECRET} characters in production`,
      });
    }
    // Links in e-mails and HSTS follow it: the local default would send users to 127.0.0.1.
    requireAppUrlInProduction(env, ctx);
  });

/** Everything the API reads from its environment, read once at start-up. */
export interface Config {
  production: boolean;
  host: string;
  port: number;
  appUrl: string;
  databaseUrl: string;
  redisUrl: string;
  jwtSecret: string;
  tokenTtlSeconds: number;
  bcryptRounds: number;
  webDist: string | undefined;
  invitationTtlHours: number;
  maxUploadBytes: number;
  login: { maxAttempts: number; windowSeconds: number };
  trustProxy: string | number | boolean;
  shutdownGraceMs: number;
  logLevel: string;
  storage: StorageConfig;
}

/** Reads and checks the environment; throws a ConfigError of one line naming every bad variable. */
export function loadConfig(env: Record<string, string | undefined> = process.env): Config {
  const e = readEnv(schema, env);
  return {
    production: e.NODE_ENV === 'production',
    host: e.HOST,
    port: e.PORT,
    appUrl: e.APP_URL ?? `http://127.0.0.1:${e.PORT}`,
    databaseUrl: e.DATABASE_URL,
    redisUrl: e.REDIS_URL,
    jwtSecret: e.JWT_SECRET,
    tokenTtlSeconds: e.TOKEN_TTL_SECONDS,
    bcryptRounds: e.BCRYPT_ROUNDS,
    webDist: e.WEB_DIST,
    invitationTtlHours: e.INVITATION_TTL_HOURS,
    maxUploadBytes: e.MAX_UPLOAD_BYTES,
    login: { maxAttempts: e.LOGIN_MAX_ATTEMPTS, windowSeconds: e.LOGIN_WINDOW_SECONDS },
    trustProxy: e.TRUST_PROXY,
    shutdownGraceMs: e.SHUTDOWN_GRACE_MS,
    logLevel: e.LOG_LEVEL,
    storage: storageSettings(e),
  };
}
