import type { BidDto, DielineFileDto, DieRequestSummary, Press as PressDto } from '@kerfmark/contracts';
import type { Bid, BidRevision, DielineFile, DieRequest, Press } from '../models';

/** The file whose metrics stand for the request: the one marked primary, else the newest analysed. */
export function primaryFile(files: DielineFile[] = []): DielineFile | undefined {
  return (
    files.find((f) => f.isPrimary && f.analysisStatus === 'done') ??
    [...files].reverse().find((f) => f.analysisStatus === 'done') ??
    files.at(-1)
  );
}

export function toFileDto(file: DielineFile): DielineFileDto {
  return {
    id: file.id,
    fileName: file.fileName,
    format: file.format,
    byteSize: file.byteSize,
    sha256: file.sha256,
    isPrimary: file.isPrimary,
    uploadedAt: file.uploadedAt.toISOString(),
    analysisStatus: file.analysisStatus,
    analysisError: file.analysisError,
    metrics: file.metrics,
    layerMap: file.layerMap ?? {},
    pdfPage: file.pdfPage ?? null,
  };
}

export function toPressDto(press: Press): PressDto {
  return {
    id: press.id,
    name: press.name,
    kind: press.kind,
    maxSheetWidthIn: press.maxSheetWidthIn,
    maxSheetLengthIn: press.maxSheetLengthIn,
    typicalSpeedSph: press.typicalSpeedSph,
    maxSpeedSph: press.maxSpeedSph,
    shiftsPerDay: press.shiftsPerDay,
    shiftHours: press.shiftHours,
    cuttingRuleHeightIn: press.cuttingRuleHeightIn,
    active: press.active,
    createdAt: press.createdAt.toISOString(),
  };
}

/** The request columns toSummary reads, for lists that read no more (with the parts organisation, press and fileSummaries). */
export const SUMMARY_COLUMNS = [
  'id',
  'title',
  'job_reference',
  'status',
  'quantity',
  'ups',
  'rule_types',
  'need_by_date',
  'bid_deadline',
  'delivery_postcode',
  'visibility',
  'created_at',
  'updated_at',
] as const;

export function toSummary(request: DieRequest): DieRequestSummary {
  const file = primaryFile(request.files);
  return {
    id: request.id,
    title: request.title,
    jobReference: request.jobReference,
    status: request.status,
    organisationName: request.organisation?.name ?? '',
    quantity: request.quantity,
    ups: request.ups,
    ruleTypes: request.ruleTypes,
    needByDate: request.needByDate,
    bidDeadline: request.bidDeadline?.toISOString() ?? null,
    pressName: request.press?.name ?? null,
    deliveryPostcode: request.deliveryPostcode,
    visibility: request.visibility,
    metrics: file?.analysisStatus === 'done' ? file.metrics : null,
    analysisStatus: file?.analysisStatus ?? null,
    createdAt: request.createdAt.toISOString(),
    updatedAt: request.updatedAt.toISOString(),
  };
}

export function toBidDto(bid: Bid, revisions: BidRevision[]): BidDto {
  return {
    id: bid.id,
    requestId: bid.requestId,
    status: bid.status,
    revision: bid.revision,
    lines: bid.lines,
    currency: bid.currency,
    totalCents: bid.totalCents,
    leadDays: bid.leadDays,
    promisedShipDate: bid.promisedShipDate,
    validUntil: bid.validUntil,
    notes: bid.notes,
    submittedAt: bid.submittedAt.toISOString(),
    updatedAt: bid.updatedAt.toISOString(),
    revisions: revisions.map((r) => ({
      revision: r.revision,
      action: r.action,
      totalCents: r.totalCents,
      currency: r.currency,
      leadDays: r.leadDays,
      promisedShipDate: r.promisedShipDate,
      validUntil: r.validUntil,
      createdAt: r.createdAt.toISOString(),
    })),
  };
}
