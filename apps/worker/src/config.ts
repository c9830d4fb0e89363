import { z } from 'zod';
import { envInt, envShared, envUrl, readEnv, requireAppUrlInProduction, storageSettings } from '@kerfmark/contracts';

const schema = z
  .object({
    ...envShared,
    SMTP_URL: envUrl(['smtp:', 'smtps:']),
    MAIL_FROM: z.string().default('Kerfmark <no-reply@kerfmark.test>'),
    OUTBOX_SWEEP_MS: envInt(30_000, 100),
    REMINDER_SWEEP_MS: envInt(300_000, 100),
    ANALYSIS_SWEEP_MS: envInt(30_000, 100),
    // How often the worker checks that its sweeps are still scheduled in Redis.
    SCHEDULE_CHECK_MS: envInt(30_000, 100),
  })
  .superRefine(requireAppUrlInProduction);

/** Everything the worker reads from its environment, read once at start-up; throws a ConfigError of one line. */
export function loadConfig(env: Record<string, string | undefined> = process.env) {
  const e = readEnv(schema, env);
  return {
    databaseUrl: e.DATABASE_URL,
    redisUrl: e.REDIS_URL,
    smtpUrl: e.SMTP_URL,
    mailFrom: e.MAIL_FROM,
    outboxSweepMs: e.OUTBOX_SWEEP_MS,
    reminderSweepMs: e.REMINDER_SWEEP_MS,
    appUrl: e.APP_URL ?? 'http://127.0.0.1:4100',
    analysisSweepMs: e.ANALYSIS_SWEEP_MS,
    scheduleCheckMs: e.SCHEDULE_CHECK_MS,
    logLevel: e.LOG_LEVEL,
    storage: storageSettings(e),
  };
}
export type WorkerConfig = ReturnType<typeof loadConfig>;
