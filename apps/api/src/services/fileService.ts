import { createHash, randomUUID } from 'node:crypto';
import { DielineError, decodeInput, detectFormat, type DielineFormat } from '@kerfmark/dieline';
import type { DielineFileDto } from '@kerfmark/contracts';
import type { AuthUser } from '../auth/passport';
import { HttpError, notFound } from '../lib/httpError';
import { safeFileName } from '../lib/safeFileName';
import { DieRequest, DielineFile } from '../models';
import { recordAudit } from './auditService';
import type { ServiceDeps } from './deps';
import { assertMay, loadFacts } from '../access';
import { toFileDto } from './requestViews';
import type { createRequestService } from './requestService';

const CONTENT_TYPES: Record<DielineFormat, string> = {
  dxf: 'application/dxf',
  svg: 'image/svg+xml',
  pdf: 'application/pdf',
};

export interface UploadedFile {
  originalname: string;
  buffer: Buffer;
  size: number;
}

/** What the content says the file is; the extension is never trusted on its own. */
function sniff(file: UploadedFile): DielineFormat {
  try {
    return detectFormat(decodeInput(file.buffer.subarray(0, 65_536), Number.POSITIVE_INFINITY), file.originalname);
  } catch (error) {
    if (error instanceof DielineError) throw new HttpError(415, 'unsupported_file', error.message);
    throw error;
  }
}

const storageDown = () =>
  new HttpError(
    503,
    'storage_unavailable',
    'The file store is not answering, so the file was not saved. Try again in a minute.',
  );

export function createFileService(
  { knex, storage, analyses, logger }: ServiceDeps,
  requests: ReturnType<typeof createRequestService>,
) {
  async function visibleFile(actor: AuthUser, fileId: number): Promise<{ file: DielineFile; request: DieRequest }> {
    const file = await DielineFile.query().findById(fileId);
    if (!file) throw notFound('That file');
    try {
      const request = await requests.findVisible(actor, file.requestId);
      return { file, request };
    } catch {
      throw notFound('That file');
    }
  }

  /** Files change with the request ('edit': a draft, or an open request before its deadline). */
  async function mayDo(actor: AuthUser, requestId: number, action: 'edit' | 'remove-file' = 'edit') {
    const found = await loadFacts(knex, requestId);
    if (!found) throw notFound('That die request');
    assertMay(actor, found.facts, action);
  }

  async function ownedFile(actor: AuthUser, fileId: number) {
    const { file, request } = await visibleFile(actor, fileId);
    if (actor.orgKind !== 'printer') throw notFound('That file');
    return { file, request };
  }

  return {
    async upload(actor: AuthUser, requestId: number, upload: UploadedFile): Promise<DielineFileDto> {
      await mayDo(actor, requestId);
      if (upload.size === 0) throw new HttpError(400, 'empty_file', 'The file is empty.');
      const format = sniff(upload);
      const fileName = safeFileName(upload.originalname);
      const sha256 = createHash('sha256').update(upload.buffer).digest('hex');
      const s3Key = `requests/${requestId}/${randomUUID()}/${fileName}`;

      try {
        await storage.put(s3Key, upload.buffer, CONTENT_TYPES[format]);
      } catch (error) {
        logger.warn({ err: error }, 'upload to the file store failed');
        throw storageDown();
      }
      let file: DielineFile;
      try {
        file = await knex.transaction(async (trx) => {
          await DieRequest.query(trx).findById(requestId).forUpdate();
          const others = await DielineFile.query(trx).where({ requestId }).resultSize();
          const row = await DielineFile.query(trx).insertAndFetch({
            requestId,
            uploadedBy: actor.id,
            fileName,
            format,
            contentType: CONTENT_TYPES[format],
            byteSize: upload.size,
            sha256,
            s3Key,
            isPrimary: others === 0,
            layerMap: {},
          });
          await recordAudit(trx, {
            organisationId: actor.organisationId,
            actorUserId: actor.id,
            entity: 'dieline_file',
            entityId: row.id,
            action: 'uploaded',
            detail: { requestId, fileName, sha256, byteSize: upload.size },
          });
          return row;
        });
      } catch (error) {
        // No row points at the object, so the object goes too.
        await storage.remove(s3Key).catch(() => undefined);
        throw error;
      }
      analyses.analyse(file.id, 0);
      return toFileDto(file);
    },

    async get(actor: AuthUser, fileId: number): Promise<DielineFileDto> {
      return toFileDto((await visibleFile(actor, fileId)).file);
    },

    async preview(actor: AuthUser, fileId: number): Promise<unknown> {
      const { file } = await visibleFile(actor, fileId);
      const row = await DielineFile.query().findById(file.id).select('preview');
      return row?.preview ?? null;
    },

    async downloadUrl(actor: AuthUser, fileId: number): Promise<{ url: string; expiresAt: string }> {
      const { file } = await visibleFile(actor, fileId);
      const seconds = 60;
      try {
        const url = await storage.downloadUrl(file.s3Key, file.fileName, seconds);
        return { url, expiresAt: new Date(Date.now() + seconds * 1000).toISOString() };
      } catch {
        throw storageDown();
      }
    },

    async makePrimary(actor: AuthUser, fileId: number): Promise<DielineFileDto> {
      const { file } = await ownedFile(actor, fileId);
      // After bidding closes the primary file is what the bids, the award and the price record rest on.
      await mayDo(actor, file.requestId);
      await knex.transaction(async (trx) => {
        await DielineFile.query(trx).patch({ isPrimary: false }).where({ requestId: file.requestId });
        await DielineFile.query(trx).patch({ isPrimary: true }).findById(file.id);
      });
      return toFileDto({ ...file, isPrimary: true } as DielineFile);
    },

    /** Sets which rule type each layer is, and measures the file again. */
    async remap(actor: AuthUser, fileId: number, layerMap: Record<string, string>): Promise<DielineFileDto> {
      const { file } = await ownedFile(actor, fileId);
      await mayDo(actor, file.requestId);
      const updated = await file.$query().patchAndFetch({
        layerMap,
        analysisStatus: 'pending',
        analysisError: null,
        analysisAttempts: file.analysisAttempts + 1,
      });
      analyses.analyse(file.id, updated.analysisAttempts);
      return toFileDto(updated);
    },

    async remove(actor: AuthUser, fileId: number): Promise<void> {
      const { file } = await ownedFile(actor, fileId);
      await mayDo(actor, file.requestId, 'remove-file');
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
      await storage
        .remove(file.s3Key)
        .catch((error: unknown) => logger.warn({ err: error }, 'stored file left behind'));
    },
  };
}
