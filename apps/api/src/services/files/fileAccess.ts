import type { Knex } from 'knex';
import { assertMay, loadFacts } from '../../access';
import type { AuthUser } from '../../auth/passport';
import { HttpError, notFound } from '../../lib/httpError';
import { DielineFile, type DieRequest } from '../../models';
import { findVisible } from '../requests/requestLookup';

/** A file of a request this user may see; any other is the same 404. */
export async function visibleFile(
  actor: AuthUser,
  fileId: number,
): Promise<{ file: DielineFile; request: DieRequest }> {
  const file = await DielineFile.query().findById(fileId);
  if (!file) throw notFound('That file');
  try {
    return { file, request: await findVisible(actor, file.requestId) };
  } catch {
    throw notFound('That file');
  }
}

/** A file of the printer's own request. */
export async function ownedFile(actor: AuthUser, fileId: number) {
  const found = await visibleFile(actor, fileId);
  if (actor.orgKind !== 'printer') throw notFound('That file');
  return found;
}

/** Files change with the request ('edit': a draft, or an open request before its deadline). */
export async function assertMayChangeFiles(
  knex: Knex,
  actor: AuthUser,
  requestId: number,
  action: 'edit' | 'remove-file' = 'edit',
) {
  const found = await loadFacts(knex, requestId);
  if (!found) throw notFound('That die request');
  assertMay(actor, found.facts, action);
}

export const storageDown = () =>
  new HttpError(
    503,
    'storage_unavailable',
    'The file store is not answering, so the file was not saved. Try again in a minute.',
  );
