import type { LibraryDieDto } from '@kerfmark/contracts';
import { matchDies, type DieShape } from '@kerfmark/dieline';
import type { Knex } from 'knex';
import type { AuthUser } from '../../auth/passport';
import { findOwned } from '../requests/requestLookup';
import { primaryFile } from '../../dto/requestViews';
import { toLibraryDieDto, visibleDies } from './libraryDieRows';

/** Library dies that could do the job of this request, best first: at most ten, none retired. */
export async function libraryMatches(
  knex: Knex,
  actor: AuthUser,
  requestId: number,
  minScore = 0.5,
): Promise<LibraryDieDto[]> {
  const request = await findOwned(actor, requestId);
  await request.$fetchGraph('files(byUpload)');
  const wanted: DieShape = {
    pieceWidthIn: request.pieceWidthIn,
    pieceHeightIn: request.pieceHeightIn,
    ups: request.ups,
    metrics: primaryFile(request.files)?.metrics ?? null,
  };
  const candidates = (await visibleDies(knex, actor).whereNot('d.condition', 'retired').limit(2000))
    .map((r) => toLibraryDieDto(r, actor))
    .filter((d) => d.requestId !== requestId);
  return candidates
    .map((d) => ({ ...d, match: matchDies(wanted, d) }))
    .filter((d) => d.match.score >= minScore)
    .sort((a, b) => b.match.score - a.match.score)
    .slice(0, 10);
}
