import type { Queue } from 'bullmq';

export interface Sweep {
  queue: Queue;
  /** The job scheduler's id, and the name of the job it adds. */
  id: string;
  name: string;
  every: number;
}

/**
 * Schedules the worker's repeating sweeps, then checks every `checkMs` that they are still
 * scheduled and schedules any that are missing again. A schedule lives only in Redis, which
 * keeps nothing across a restart: without this check, after Redis comes back empty no sweep
 * would run until the worker restarted, so the reminders, e-mails and analyses lost with Redis
 * would never catch up. A restored sweep runs at once. Returns a function that stops checking.
 */
export async function keepJobSchedulers(
  sweeps: Sweep[],
  opts: { checkMs: number; onRestored?: (id: string) => void },
): Promise<() => void> {
  const schedule = (s: Sweep) => s.queue.upsertJobScheduler(s.id, { every: s.every }, { name: s.name });
  for (const sweep of sweeps) await schedule(sweep);

  let stopped = false;
  let timer: NodeJS.Timeout | undefined;
  const check = async () => {
    for (const sweep of sweeps) {
      // Only when missing: scheduling again would also run the sweep at once, every check.
      if (await sweep.queue.getJobScheduler(sweep.id)) continue;
      await schedule(sweep);
      opts.onRestored?.(sweep.id);
    }
  };
  const next = () => {
    if (stopped) return;
    // One check at a time: while Redis is down a check waits for it, and the next starts after.
    timer = setTimeout(
      () =>
        void check()
          .catch(() => undefined)
          .finally(next),
      opts.checkMs,
    );
  };
  next();
  return () => {
    stopped = true;
    clearTimeout(timer);
  };
}
