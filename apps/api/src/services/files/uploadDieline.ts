import { createHash, randomUUID } from 'node:crypto';
import { DielineError, decodeInput, detectFormat, type DielineFormat } from '@kerfmark/dieline';
import type { DielineFileDto } from '@kerfmark/contracts';
import type { AuthUser } from '../../auth/passport';
import { HttpError } from '../../lib/httpError';
import { safeFileName } from '../../lib/safeFileName';
import { DieRequest, DielineFile } from '../../models';
import { recordAudit } from '../auditService';
import type { ServiceDeps } from '../deps';
import { toFileDto } from '../../dto/requestViews';
import { assertMayChangeFiles, storageDown } from './fileAccess';

export const dielineContentTypes: Record<DielineFormat, string> = {
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

/**
 * Stores a dieline on the request and queues its analysis. The object is stored first; should
 * the row not be written, the object is removed again, so nothing points nowhere.
 */
export async function uploadDieline(
  { knex, storage, analyses, logger }: Pick<ServiceDeps, 'knex' | 'storage' | 'analyses' | 'logger'>,
  actor: AuthUser,
  requestId: number,
  upload: UploadedFile,
): Promise<DielineFileDto> {
  await assertMayChangeFiles(knex, actor, requestId);
  if (upload.size === 0) throw new HttpError(400, 'empty_file', 'The file is empty.');
  const format = sniff(upload);
  const fileName = safeFileName(upload.originalname);
  const sha256 = createHash('sha256').update(upload.buffer).digest('hex');
  const s3Key = `requests/${requestId}/${randomUUID()}/${fileName}`;
  try {
    await storage.put(s3Key, upload.buffer, dielineContentTypes[format]);
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
        contentType: dielineContentTypes[format],
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
    await storage.remove(s3Key).catch(() => undefined);
    throw error;
  }
  analyses.analyse(file.id, 0);
  return toFileDto(file);
}
