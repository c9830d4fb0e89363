import type { DielineFileDto } from '@kerfmark/contracts';
import type { AuthUser } from '../auth/passport';
import { DielineFile } from '../models';
import type { ServiceDeps } from './deps';
import { storageDown, visibleFile } from './files/fileAccess';
import { choosePdfPage, makePrimaryFile, remapLayers, removeFile } from './files/fileChanges';
import { uploadDieline, type UploadedFile } from './files/uploadDieline';
import { toFileDto } from '../dto/requestViews';

export type { UploadedFile };

/** The measured outline a browser draws, stored apart from the metrics as it can be large. */
export async function filePreview(actor: AuthUser, fileId: number): Promise<unknown> {
  const { file } = await visibleFile(actor, fileId);
  const row = await DielineFile.query().findById(file.id).select('preview');
  return row?.preview ?? null;
}

/** A link to the original file that works for a minute. */
export async function fileDownloadUrl(
  { storage }: Pick<ServiceDeps, 'storage'>,
  actor: AuthUser,
  fileId: number,
): Promise<{ url: string; expiresAt: string }> {
  const { file } = await visibleFile(actor, fileId);
  const seconds = 60;
  try {
    const url = await storage.downloadUrl(file.s3Key, file.fileName, seconds);
    return { url, expiresAt: new Date(Date.now() + seconds * 1000).toISOString() };
  } catch {
    throw storageDown();
  }
}

/** A request's dieline files: upload, read, mark primary, map layers, remove. */
export function createFileService(deps: ServiceDeps) {
  return {
    upload: (actor: AuthUser, requestId: number, upload: UploadedFile) => uploadDieline(deps, actor, requestId, upload),
    get: async (actor: AuthUser, fileId: number): Promise<DielineFileDto> =>
      toFileDto((await visibleFile(actor, fileId)).file),
    preview: filePreview,
    downloadUrl: (actor: AuthUser, fileId: number) => fileDownloadUrl(deps, actor, fileId),
    makePrimary: (actor: AuthUser, fileId: number) => makePrimaryFile(deps, actor, fileId),
    remap: (actor: AuthUser, fileId: number, layerMap: Record<string, string>) =>
      remapLayers(deps, actor, fileId, layerMap),
    choosePage: (actor: AuthUser, fileId: number, page: number | null) => choosePdfPage(deps, actor, fileId, page),
    remove: (actor: AuthUser, fileId: number) => removeFile(deps, actor, fileId),
  };
}
