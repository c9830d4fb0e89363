import { randomUUID } from 'node:crypto';
import { analyseDieline } from '@kerfmark/dieline';
import { DieRequest, DielineFile } from '../models';
import { rectangleDxf } from './fixtures';

/**
 * Inserts an open, public request with a measured dieline (the fixture's 4 × 3 in rectangle), as
 * the printer's buyer would have posted it, through whatever knex the models are bound to.
 */
export async function insertOpenRequest(
  printerId: number,
  buyerId: number,
  opts: { deadline?: Date; needByDate?: string } = {},
): Promise<DieRequest> {
  const { metrics, preview } = analyseDieline(rectangleDxf);
  const request = await DieRequest.query().insertAndFetch({
    organisationId: printerId,
    createdBy: buyerId,
    title: `Carton ${randomUUID().slice(0, 8)}`,
    status: 'open',
    quantity: 1,
    ups: 2,
    stockName: '18 pt SBS',
    caliperIn: 0.018,
    ruleTypes: ['cut', 'crease'],
    needByDate: opts.needByDate ?? new Date(Date.now() + 40 * 86_400_000).toISOString().slice(0, 10),
    bidDeadline: opts.deadline ?? new Date(Date.now() + 7 * 86_400_000),
    deliveryAddress: '1 Test Street',
    deliveryPostcode: '60614',
    visibility: 'public',
    publishedAt: new Date(),
  } as Partial<DieRequest>);
  await DielineFile.query().insert({
    requestId: request.id,
    fileName: 'carton.dxf',
    format: 'dxf',
    contentType: 'application/dxf',
    byteSize: rectangleDxf.length,
    sha256: 'test',
    s3Key: `test/${randomUUID()}.dxf`,
    isPrimary: true,
    analysisStatus: 'done',
    metrics,
    preview,
    layerMap: {},
  });
  return request;
}
