import type { Storage } from '@kerfmark/storage';
import type { Knex } from 'knex';
import { analyseDielineFile, waitingAnalyses, type AnalysisResult } from './analyseDieline';
import { consoleLog, sweepEach, type SweepLog, type Swept } from './sweepEach';

/** Measures the files whose analysis job was lost (Redis down or flushed), each on its own. */
export async function sweepAnalyses(
  knex: Knex,
  storage: Storage,
  olderThanMs: number,
  log: SweepLog = consoleLog,
): Promise<Swept<AnalysisResult>> {
  const ids = await waitingAnalyses(knex, olderThanMs);
  return sweepEach('analyses', ids, (fileId) => analyseDielineFile(knex, storage, fileId), log);
}
