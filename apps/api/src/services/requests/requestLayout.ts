import type { DieRequestUpdate } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import { badRequest } from '../../lib/httpError';
import type { DieRequest } from '../../models';

type LayoutFields = Pick<DieRequest, 'dielineShows' | 'upsAcross' | 'upsAlong' | 'ups'>;

/** Fields whose change makes the request's dielines measure differently. */
const MEASURED_BY = ['dielineShows', 'upsAcross', 'upsAlong', 'gutterIn', 'pieceGrain', 'grain', 'pressId'] as const;

/**
 * A one-up dieline needs its ups across and along, and then the request's ups are their
 * product: the two can never disagree. Returns the fields to write (with `ups` set).
 */
export function withUpsOfLayout<T extends Partial<LayoutFields>>(current: Partial<LayoutFields>, patch: T): T {
  const merged = { ...current, ...patch };
  if (merged.dielineShows !== 'one-up') return patch;
  const missing: Record<string, string> = {};
  if (!merged.upsAcross) missing.upsAcross = 'Enter the ups across';
  if (!merged.upsAlong) missing.upsAlong = 'Enter the ups along';
  if (Object.keys(missing).length) {
    throw badRequest('A one-up dieline needs the ups across and along to lay out the whole die.', missing);
  }
  return { ...patch, ups: merged.upsAcross! * merged.upsAlong! };
}

/** Whether the patch changes a field the measuring reads (a form resaving the same values does not). */
export function changesMeasurement(request: DieRequest, patch: DieRequestUpdate): boolean {
  return MEASURED_BY.some((k) => k in patch && (patch[k] ?? null) !== (request[k] ?? null));
}

/** Sets the request's dielines to be measured again; returns each file's id and attempt for the queue. */
export async function remeasureFiles(
  trx: Knex.Transaction,
  requestId: number,
): Promise<Array<{ id: number; attempts: number }>> {
  const rows = await trx('dieline_files')
    .where({ requestId })
    .update({ analysisStatus: 'pending', analysisError: null, analysisAttempts: trx.raw('analysis_attempts + 1') })
    .returning(['id', 'analysisAttempts']);
  return rows.map((r: { id: number; analysisAttempts: number }) => ({ id: r.id, attempts: r.analysisAttempts }));
}
