import { DieRunInput, LibraryDieUpdate, type DielineMetrics, type LibraryDieDto } from '@kerfmark/contracts';
import { matchDies, type DieShape } from '@kerfmark/dieline';
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { AuthUser } from '../auth/passport';
import { notFound } from '../lib/httpError';
import { recordAudit } from './auditService';
import type { ServiceDeps } from './deps';
import type { createRequestService } from './requestService';
import { primaryFile } from './requestViews';

/** Dies at or past 90 % of their impression limit are flagged for replacement. */
export const END_OF_LIFE_SHARE = 0.9;

type Row = Record<string, unknown>;

function toDto(row: Row, actor: AuthUser): LibraryDieDto {
  const impressions = Number(row.impressions);
  const limit = row.impressionLimit === null ? null : Number(row.impressionLimit);
  return {
    id: Number(row.id),
    name: String(row.name),
    ownerName: String(row.ownerName ?? ''),
    mine: Number(row.organisationId) === actor.organisationId,
    requestId: (row.requestId as number | null) ?? null,
    pieceWidthIn: row.pieceWidthIn === null ? null : Number(row.pieceWidthIn),
    pieceHeightIn: row.pieceHeightIn === null ? null : Number(row.pieceHeightIn),
    ups: Number(row.ups),
    ruleTypes: row.ruleTypes as string[],
    pressName: (row.pressName as string | null) ?? null,
    storageLocation: (row.storageLocation as string | null) ?? null,
    condition: row.condition as LibraryDieDto['condition'],
    impressions,
    impressionLimit: limit,
    nearEndOfLife: limit !== null && impressions >= limit * END_OF_LIFE_SHARE,
    lastUsedOn: (row.lastUsedOn as string | null) ?? null,
    listed: Boolean(row.listed),
    metrics: (row.metrics as DielineMetrics | null) ?? null,
  };
}

export function createLibraryService({ knex }: ServiceDeps, requests: ReturnType<typeof createRequestService>) {
  /** The printer's own dies, and every die shop's listed stock dies. */
  const visible = (actor: AuthUser) =>
    knex('libraryDies as d')
      .join('organisations as o', 'o.id', 'd.organisationId')
      .leftJoin('presses as p', 'p.id', 'd.pressId')
      .where((q) =>
        q
          .where('d.organisationId', actor.organisationId)
          .orWhere((l) => l.where('d.listed', true).where('o.kind', 'die_shop')),
      )
      .select(
        'd.id',
        'd.name',
        'd.organisationId',
        'o.name as ownerName',
        'd.requestId',
        'd.pieceWidthIn',
        'd.pieceHeightIn',
        'd.ups',
        'd.ruleTypes',
        'p.name as pressName',
        'd.storageLocation',
        'd.condition',
        'd.impressions',
        'd.impressionLimit',
        'd.lastUsedOn',
        'd.listed',
        'd.metrics',
      );

  async function own(trx: Knex | Knex.Transaction, actor: AuthUser, id: number) {
    const die = await trx('libraryDies').where({ id, organisationId: actor.organisationId }).forUpdate().first();
    if (!die) throw notFound('That die');
    return die;
  }

  return {
    async list(actor: AuthUser): Promise<LibraryDieDto[]> {
      return ((await visible(actor).orderBy('d.name').limit(1000)) as Row[]).map((r) => toDto(r, actor));
    },

    async get(actor: AuthUser, id: number): Promise<LibraryDieDto & { preview: unknown }> {
      const row = (await visible(actor).where('d.id', id).select('d.preview').first()) as Row | undefined;
      if (!row) throw notFound('That die');
      const runs = await knex('dieRuns').where({ dieId: id }).orderBy('runOn', 'desc').limit(200);
      return {
        ...toDto(row, actor),
        preview: row.preview,
        runs: runs.map((r: Row) => ({
          id: Number(r.id),
          runOn: String(r.runOn),
          impressions: Number(r.impressions),
          jobReference: (r.jobReference as string | null) ?? null,
          notes: (r.notes as string | null) ?? null,
        })),
      };
    },

    async update(actor: AuthUser, id: number, patch: z.output<typeof LibraryDieUpdate>): Promise<LibraryDieDto> {
      await knex.transaction(async (trx) => {
        await own(trx, actor, id);
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
      return this.get(actor, id);
    },

    /** Logs a run on the press: impressions add up, and the die's last use moves. */
    async addRun(actor: AuthUser, id: number, run: z.output<typeof DieRunInput>): Promise<LibraryDieDto> {
      await knex.transaction(async (trx) => {
        const die = await own(trx, actor, id);
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
      return this.get(actor, id);
    },

    /** Library dies that could do the job of this request, best first. */
    async matchesFor(actor: AuthUser, requestId: number, minScore = 0.5): Promise<LibraryDieDto[]> {
      const request = await requests.findOwned(actor, requestId);
      await request.$fetchGraph('files(byUpload)');
      const wanted: DieShape = {
        pieceWidthIn: request.pieceWidthIn,
        pieceHeightIn: request.pieceHeightIn,
        ups: request.ups,
        metrics: primaryFile(request.files)?.metrics ?? null,
      };
      const candidates = ((await visible(actor).whereNot('d.condition', 'retired').limit(2000)) as Row[])
        .map((r) => toDto(r, actor))
        .filter((d) => d.requestId !== requestId);
      return candidates
        .map((d) => ({
          ...d,
          match: matchDies(wanted, {
            pieceWidthIn: d.pieceWidthIn,
            pieceHeightIn: d.pieceHeightIn,
            ups: d.ups,
            metrics: d.metrics,
          }),
        }))
        .filter((d) => d.match.score >= minScore)
        .sort((a, b) => b.match.score - a.match.score)
        .slice(0, 10);
    },

    /** A received custom die joins the printer's library, with its dieline. */
    async addReceived(trx: Knex.Transaction, requestId: number): Promise<void> {
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
    },
  };
}
