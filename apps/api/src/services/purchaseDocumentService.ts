import { pricedLength } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import { loadFacts, visibleParts } from '../access';
import type { AuthUser } from '../auth/passport';
import { HttpError, notFound } from '../lib/httpError';
import { Award, Bid, Organisation, User } from '../models';
import type { ServiceDeps } from './deps';
import { ocdsRelease } from './documents/ocdsRelease';
import { purchaseOrderPdf } from './documents/purchaseOrderPdf';
import { findOwned } from './requests/requestLookup';
import { primaryFile } from '../dto/requestViews';

/** The purchase order PDF: for the printer that issued it and the shop it was issued to. Kept once made. */
export async function purchaseOrderDocument(
  { knex, storage, logger }: Pick<ServiceDeps, 'knex' | 'storage' | 'logger'>,
  actor: AuthUser,
  awardId: number,
): Promise<{ fileName: string; pdf: Buffer }> {
  const award = await Award.query().findById(awardId).withGraphFetched('shop');
  if (!award) throw notFound('That purchase order');
  const found = await loadFacts(knex, award.requestId);
  if (!found || !visibleParts(actor, found.facts, new Date()).purchaseOrder) throw notFound('That purchase order');
  const request = await found.request.$fetchGraph('[organisation, files(byUpload)]');
  const fileName = `${award.poNumber}.pdf`;
  if (award.poS3Key) {
    try {
      return { fileName, pdf: Buffer.from(await storage.get(award.poS3Key)) };
    } catch {
      // made again below
    }
  }
  const bid = await Bid.query().findById(award.bidId);
  const buyer = await User.query().findById(award.awardedBy ?? 0);
  const file = primaryFile(request.files);
  const metrics = file?.metrics;
  const shop = award.shop as Organisation;
  const printer = request.organisation!;
  const pdf = await purchaseOrderPdf({
    poNumber: award.poNumber,
    issuedAt: award.awardedAt,
    timeZone: printer.timeZone,
    units: buyer?.lengthUnits ?? printer.lengthUnits,
    locale: buyer?.locale ?? printer.locale,
    paper: ['US', 'CA', 'MX'].includes(printer.country ?? 'US') ? 'LETTER' : 'A4',
    buyer: {
      organisation: printer.legalName ?? printer.name,
      officeAddress: printer.officeAddress,
      postcode: printer.postcode,
      paymentTerms: printer.paymentTerms,
      contact: buyer?.name ?? '',
      email: buyer?.email ?? '',
      deliveryAddress: request.deliveryAddress,
      deliveryPostcode: request.deliveryPostcode,
    },
    supplier: {
      organisation: shop.legalName ?? shop.name,
      officeAddress: shop.officeAddress,
      postcode: shop.postcode,
      email: shop.contactEmail,
    },
    request: {
      id: request.id,
      title: request.title,
      jobReference: request.jobReference,
      needByDate: request.needByDate,
      quantity: request.quantity,
      ups: request.ups,
    },
    dieline:
      file && metrics
        ? {
            fileName: file.fileName,
            totalRuleIn: pricedLength(metrics.length),
            board: metrics.board.width > 0 ? metrics.board : null,
            complexity: metrics.complexity,
          }
        : null,
    lines: (bid?.lines ?? []).map((l) => ({
      kind: l.kind,
      description: l.description,
      amountCents: l.amountCents,
    })),
    totalCents: award.totalCents,
    currency: award.currency,
    leadDays: award.leadDays,
    promisedShipDate: award.promisedShipDate,
    bidRevision: award.revision,
    awardReason: award.reason,
    notes: request.notes,
  }).catch((error: unknown) => {
    if (error instanceof RangeError)
      throw new HttpError(422, 'document_unprintable', `The purchase order cannot be printed: ${error.message}`);
    throw error;
  });
  const key = `purchase-orders/${award.requestId}/${award.poNumber}.pdf`;
  try {
    await storage.put(key, pdf, 'application/pdf');
    await award.$query().patch({ poS3Key: key });
  } catch (error) {
    logger.warn({ err: error }, 'purchase order PDF not stored');
  }
  return { fileName, pdf };
}

/** The request, its bids and the award as one Open Contracting Data Standard 1.1 release. */
export async function awardRelease(knex: Knex, actor: AuthUser, requestId: number): Promise<Record<string, unknown>> {
  const request = await findOwned(actor, requestId);
  const award = await Award.query(knex).findOne({ requestId });
  const found = await loadFacts(knex, requestId);
  // Every bid and its shop are in it: only once bids are opened and awarded.
  if (!award || !found || !visibleParts(actor, found.facts, new Date()).ocdsRelease) {
    throw new HttpError(409, 'not_awarded', 'The export is available once the request has been awarded.');
  }
  await request.$fetchGraph('organisation');
  const bids = await Bid.query().where({ requestId }).withGraphFetched('shop').orderBy('submittedAt');
  const shopOf = (bid: Bid) => ({ id: bid.shopId, name: bid.shop?.name ?? '' });
  const awarded = bids.find((b) => b.id === award.bidId)!;
  return ocdsRelease({
    ocidPrefix: 'ocds-kerfmark',
    request: {
      id: request.id,
      title: request.title,
      description: request.notes,
      status: request.status,
      publishedAt: request.publishedAt,
      bidDeadline: request.bidDeadline,
      needByDate: request.needByDate,
      quantity: request.quantity,
    },
    buyer: { id: request.organisationId, name: request.organisation?.name ?? '' },
    bids: bids.map((b) => ({
      id: b.id,
      shop: shopOf(b),
      status: b.status,
      submittedAt: b.submittedAt,
      totalCents: b.totalCents,
      currency: b.currency,
    })),
    award: {
      id: award.id,
      bidId: award.bidId,
      shop: shopOf(awarded),
      awardedAt: award.awardedAt,
      totalCents: award.totalCents,
      currency: award.currency,
      reason: award.reason,
    },
    purchaseOrder: {
      poNumber: award.poNumber,
      issuedAt: award.awardedAt,
      status: request.status === 'cancelled' ? 'terminated' : 'active',
    },
    releasedAt: new Date(),
  });
}

/** The purchase documents of an award: the purchase order PDF and the Open Contracting release. */
export function createPurchaseDocumentService(deps: ServiceDeps) {
  return {
    purchaseOrder: (actor: AuthUser, awardId: number) => purchaseOrderDocument(deps, actor, awardId),
    ocds: (actor: AuthUser, requestId: number) => awardRelease(deps.knex, actor, requestId),
  };
}
