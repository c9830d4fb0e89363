/** Everything the API reads from its environment; production sets the same names. */
function required(name: string): string {
  const value = process.env[name];
  if (!value) throw new Error(`${name} is not set`);
  return value;
}

export interface Config {
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
}

export function loadConfig(): Config {
  return {
    port: Number(process.env.PORT ?? 4100),
    appUrl: process.env.APP_URL ?? `http://127.0.0.1:${process.env.PORT ?? 4100}`,
    databaseUrl: required('DATABASE_URL'),
    redisUrl: required('REDIS_URL'),
    jwtSecret: required('JWT_SECRET'),
    tokenTtlSeconds: Number(process.env.TOKEN_TTL_SECONDS ?? 8 * 3600),
    bcryptRounds: Number(process.env.BCRYPT_ROUNDS ?? 11),
    webDist: process.env.WEB_DIST,
    invitationTtlHours: Number(process.env.INVITATION_TTL_HOURS ?? 72),
    maxUploadBytes: Number(process.env.MAX_UPLOAD_BYTES ?? 25 * 1024 * 1024),
    login: {
      maxAttempts: Number(process.env.LOGIN_MAX_ATTEMPTS ?? 5),
      windowSeconds: Number(process.env.LOGIN_WINDOW_SECONDS ?? 15 * 60),
    },
  };
}
