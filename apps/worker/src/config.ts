function required(name: string): string {
  const value = process.env[name];
  if (!value) throw new Error(`${name} is not set`);
  return value;
}

export function loadConfig() {
  return {
    databaseUrl: required('DATABASE_URL'),
    redisUrl: required('REDIS_URL'),
    smtpUrl: required('SMTP_URL'),
    mailFrom: process.env.MAIL_FROM ?? 'Kerfmark <no-reply@kerfmark.test>',
    outboxSweepMs: Number(process.env.OUTBOX_SWEEP_MS ?? 30_000),
    reminderSweepMs: Number(process.env.REMINDER_SWEEP_MS ?? 300_000),
    appUrl: process.env.APP_URL ?? 'http://127.0.0.1:4100',
    analysisSweepMs: Number(process.env.ANALYSIS_SWEEP_MS ?? 30_000),
    // How often the worker checks that its sweeps are still scheduled in Redis.
    scheduleCheckMs: Number(process.env.SCHEDULE_CHECK_MS ?? 30_000),
  };
}
export type WorkerConfig = ReturnType<typeof loadConfig>;
