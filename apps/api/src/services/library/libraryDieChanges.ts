import type { DieRunInput, LibraryDieUpdate } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { AuthUser } from '../../auth/passport';
import { notFound } from '../../lib/httpError';
import { recordAudit } from '../auditService';

/** The organisation's own die, locked; another's is a 404. */
async function ownDie(trx: Knex.Transaction, actor: AuthUser, id: number) {
  const die = await trx('libraryDies').where({ id, organisationId: actor.organisationId }).forUpdate().first();
  if (!die) throw notFound('That die');
  return die as { impressions: string | number; lastUsedOn: string | null };
}

/** Changes only the fields the patch names. */
export async function updateLibraryDie(
  knex: Knex,
  actor: AuthUser,
  id: number,
  patch: z.output<typeof LibraryDieUpdate>,
): Promise<void> {
  await knex.transaction(async (trx) => {
    await ownDie(trx, actor, id);
    await trx('libraryDies').where({ id }).update(patch);
    await recordAudit(trx, {
      organisationId: actor.organisationId,
      actorUserId: actor.id,
      entity: 'library_die',
      entityId: id,
      action: 'updated',
      detail: { ...patch },
    });
  });
}

/** Logs a run on the press: impressions add up, and the die's last use moves (never back). */
export async function addDieRun(
  knex: Knex,
  actor: AuthUser,
  id: number,
  run: z.output<typeof DieRunInput>,
): Promise<void> {
  await knex.transaction(async (trx) => {
    const die = await ownDie(trx, actor, id);
    await trx('dieRuns').insert({
      dieId: id,
      runOn: run.runOn,
      impressions: run.impressions,
      jobReference: run.jobReference ?? null,
      notes: run.notes ?? null,
      createdBy: actor.id,
    });
    const lastUsedOn = !die.lastUsedOn || run.runOn > die.lastUsedOn ? run.runOn : die.lastUsedOn;
    await trx('libraryDies')
      .where({ id })
      .update({ impressions: Number(die.impressions) + run.impressions, lastUsedOn });
  });
}

/** A received custom die joins the printer's library, with its dieline. */
export async function addReceivedDie(trx: Knex.Transaction, requestId: number): Promise<void> {
  const request = await trx('dieRequests').where({ id: requestId }).first();
  const file = await trx('dielineFiles')
    .where({ requestId, analysisStatus: 'done' })
    .orderBy([
      { column: 'isPrimary', order: 'desc' },
      { column: 'uploadedAt', order: 'desc' },
    ])
    .first();
  await trx('libraryDies').insert({
    organisationId: request.organisationId,
    name: request.jobReference ? `${request.title} (${request.jobReference})` : request.title,
    requestId,
    pieceWidthIn: request.pieceWidthIn,
    pieceHeightIn: request.pieceHeightIn,
    ups: request.ups,
    ruleTypes: request.ruleTypes,
    pressId: request.pressId,
    condition: request.receivedCondition === 'damaged' ? 'damaged' : 'good',
    metrics: file?.metrics ? JSON.stringify(file.metrics) : null,
    preview: file?.preview ? JSON.stringify(file.preview) : null,
  });
}
