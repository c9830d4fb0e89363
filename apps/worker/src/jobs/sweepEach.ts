/** Where a sweep reports an item that failed: pino's logger fits, as does the console. */
export interface SweepLog {
  warn(details: object, message: string): void;
}

export const consoleLog: SweepLog = { warn: (details, message) => console.warn(message, JSON.stringify(details)) };

export interface Swept<R> {
  results: R[];
  failed: number;
}

/**
 * Runs a sweep's items one at a time, each on its own: an item that throws is logged and counted
 * and the sweep goes on, so one bad record never holds back every record after it.
 */
export async function sweepEach<T, R>(
  sweep: string,
  items: readonly T[],
  handle: (item: T) => Promise<R>,
  log: SweepLog = consoleLog,
): Promise<Swept<R>> {
  const results: R[] = [];
  let failed = 0;
  for (const item of items) {
    try {
      results.push(await handle(item));
    } catch (error) {
      failed += 1;
      log.warn(
        { sweep, item, err: error instanceof Error ? error.message : String(error) },
        'sweep item failed; going on with the next',
      );
    }
  }
  if (failed) log.warn({ sweep, failed, total: items.length }, 'sweep finished with failures');
  return { results, failed };
}
