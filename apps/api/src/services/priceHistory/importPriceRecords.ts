import type { ImportRowError } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { AuthUser } from '../../auth/passport';
import { HttpError } from '../../lib/httpError';
import { recordAudit } from '../auditService';
import { readImport } from './priceImport';

/** Imports every row or none: a single bad row stops the whole file, with each error listed. */
export async function importPriceRecords(
  knex: Knex,
  actor: AuthUser,
  text: string,
  mapping: Record<string, string>,
): Promise<{ imported: number }> {
  const { records, errors } = readImport(text, mapping, 'USD');
  if (errors.length) {
    throw new HttpError(
      400,
      'import_rejected',
      `${errors.length} problem${errors.length === 1 ? '' : 's'} found; nothing was imported. Fix the rows and try again.`,
      undefined,
      undefined,
      { rows: errors.slice(0, 500) satisfies ImportRowError[] },
    );
  }
  await knex.transaction(async (trx) => {
    for (let i = 0; i < records.length; i += 1000) {
      await trx('priceRecords').insert(
        records.slice(i, i + 1000).map((r) => ({ organisationId: actor.organisationId, ...r, source: 'import' })),
      );
    }
    await recordAudit(trx, {
      organisationId: actor.organisationId,
      actorUserId: actor.id,
      entity: 'price_history',
      entityId: actor.organisationId,
      action: 'imported',
      detail: { rows: records.length },
    });
  });
  return { imported: records.length };
}
