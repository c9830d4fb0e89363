import type { DielineFileDto } from '@kerfmark/contracts';
import type { AuthUser } from '../../auth/passport';
import { HttpError } from '../../lib/httpError';
import { DielineFile } from '../../models';
import { recordAudit } from '../auditService';
import type { ServiceDeps } from '../deps';
import { toFileDto } from '../../dto/requestViews';
import { assertMayChangeFiles, ownedFile } from './fileAccess';

/** The file the request's metrics come from; after bidding closes, what the bids and award rest on. */
export async function makePrimaryFile(
  { knex }: Pick<ServiceDeps, 'knex'>,
  actor: AuthUser,
  fileId: number,
): Promise<DielineFileDto> {
  const { file } = await ownedFile(actor, fileId);
  await assertMayChangeFiles(knex, actor, file.requestId);
  await knex.transaction(async (trx) => {
    await DielineFile.query(trx).patch({ isPrimary: false }).where({ requestId: file.requestId });
    await DielineFile.query(trx).patch({ isPrimary: true }).findById(file.id);
  });
  return toFileDto({ ...file, isPrimary: true } as DielineFile);
}

/** Sets which rule type each layer is, and measures the file again. */
export async function remapLayers(
  deps: Pick<ServiceDeps, 'knex' | 'analyses'>,
  actor: AuthUser,
  fileId: number,
  layerMap: Record<string, string>,
): Promise<DielineFileDto> {
  return measureAgain(deps, actor, fileId, { layerMap });
}

/** Picks the page of a PDF to measure (null: the first with stroked lines), and measures it again. */
export async function choosePdfPage(
  deps: Pick<ServiceDeps, 'knex' | 'analyses'>,
  actor: AuthUser,
  fileId: number,
  page: number | null,
): Promise<DielineFileDto> {
  return measureAgain(deps, actor, fileId, { pdfPage: page }, (file) => {
    if (file.format !== 'pdf') throw new HttpError(400, 'not_pdf', 'Only a PDF dieline has pages to choose from.');
    const count = file.metrics?.page?.count;
    if (page !== null && count && page > count) {
      throw new HttpError(
        400,
        'no_such_page',
        `The PDF has ${count} page${count === 1 ? '' : 's'}; choose one of them.`,
      );
    }
  });
}

async function measureAgain(
  { knex, analyses }: Pick<ServiceDeps, 'knex' | 'analyses'>,
  actor: AuthUser,
  fileId: number,
  change: Partial<Pick<DielineFile, 'layerMap' | 'pdfPage'>>,
  check?: (file: DielineFile) => void,
): Promise<DielineFileDto> {
  const { file } = await ownedFile(actor, fileId);
  await assertMayChangeFiles(knex, actor, file.requestId);
  check?.(file);
  const updated = await file.$query().patchAndFetch({
    ...change,
    analysisStatus: 'pending',
    analysisError: null,
    analysisAttempts: file.analysisAttempts + 1,
  });
  analyses.analyse(file.id, updated.analysisAttempts);
  return toFileDto(updated);
}

/** Removes the file; the next oldest becomes primary. A stored object the store will not drop is logged. */
export async function removeFile(
  { knex, storage, logger }: Pick<ServiceDeps, 'knex' | 'storage' | 'logger'>,
  actor: AuthUser,
  fileId: number,
): Promise<void> {
  const { file } = await ownedFile(actor, fileId);
  await assertMayChangeFiles(knex, actor, file.requestId, 'remove-file');
  await knex.transaction(async (trx) => {
    await DielineFile.query(trx).deleteById(file.id);
    if (file.isPrimary) {
      const next = await DielineFile.query(trx).where({ requestId: file.requestId }).orderBy('uploadedAt').first();
      if (next) await next.$query(trx).patch({ isPrimary: true });
    }
    await recordAudit(trx, {
      organisationId: actor.organisationId,
      actorUserId: actor.id,
      entity: 'dieline_file',
      entityId: file.id,
      action: 'removed',
      detail: { requestId: file.requestId, fileName: file.fileName },
    });
  });
  await storage.remove(file.s3Key).catch((error: unknown) => logger.warn({ err: error }, 'stored file left behind'));
}
