import type { DieRunInput, LibraryDieDto, LibraryDieUpdate } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { AuthUser } from '../auth/passport';
import { notFound } from '../lib/httpError';
import type { ServiceDeps } from './deps';
import { addDieRun, addReceivedDie, updateLibraryDie } from './library/libraryDieChanges';
import { toLibraryDieDto, visibleDies } from './library/libraryDieRows';
import { libraryMatches } from './library/libraryMatches';

/** One die with its outline and its last 200 runs on the press. */
export async function libraryDie(
  knex: Knex,
  actor: AuthUser,
  id: number,
): Promise<LibraryDieDto & { preview: unknown }> {
  const row = await visibleDies(knex, actor).where('d.id', id).select('d.preview').first();
  if (!row) throw notFound('That die');
  const runs = await knex('dieRuns').where({ dieId: id }).orderBy('runOn', 'desc').limit(200);
  return {
    ...toLibraryDieDto(row, actor),
    preview: row.preview,
    runs: runs.map((r: Record<string, unknown>) => ({
      id: Number(r.id),
      runOn: String(r.runOn),
      impressions: Number(r.impressions),
      jobReference: (r.jobReference as string | null) ?? null,
      notes: (r.notes as string | null) ?? null,
    })),
  };
}

/** The die library: the printer's own dies and the shops' listed stock dies. */
export function createLibraryService({ knex }: ServiceDeps) {
  const get = (actor: AuthUser, id: number) => libraryDie(knex, actor, id);
  return {
    list: async (actor: AuthUser): Promise<LibraryDieDto[]> =>
      (await visibleDies(knex, actor).orderBy('d.name').limit(1000)).map((r) => toLibraryDieDto(r, actor)),
    get,
    update: async (actor: AuthUser, id: number, patch: z.output<typeof LibraryDieUpdate>) => {
      await updateLibraryDie(knex, actor, id, patch);
      return get(actor, id);
    },
    addRun: async (actor: AuthUser, id: number, run: z.output<typeof DieRunInput>) => {
      await addDieRun(knex, actor, id, run);
      return get(actor, id);
    },
    matchesFor: (actor: AuthUser, requestId: number, minScore?: number) =>
      libraryMatches(knex, actor, requestId, minScore),
    addReceived: addReceivedDie,
  };
}
