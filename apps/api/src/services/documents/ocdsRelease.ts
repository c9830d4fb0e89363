import { requestStatuses, type RequestStatus } from '@kerfmark/contracts';
import { majorUnits } from '@kerfmark/pricing';
import type { OcdsInput } from './types';

// Our request statuses on the closed OCDS 1.1 tender status code list.
const tenderStatus: Record<RequestStatus, string> = {
  draft: 'planning',
  open: 'active',
  bidding_closed: 'complete',
  awarded: 'complete',
  in_production: 'complete',
  shipped: 'complete',
  received: 'complete',
  cancelled: 'cancelled',
};

// Our bid statuses on the closed bid status code list of the OCDS bids extension.
const bidStatus = { submitted: 'valid', withdrawn: 'withdrawn' } as const;

/**
 * The Open Contracting Data Standard 1.1 release (with the bids extension) of one awarded
 * request: the tender, every bid, the award and the purchase order as its contract.
 * Amounts become decimal major units; instants become ISO 8601 in UTC.
 */
export function ocdsRelease(input: OcdsInput): Record<string, unknown> {
  const { request, buyer, bids, award, purchaseOrder } = input;
  if (!(requestStatuses as readonly string[]).includes(request.status)) {
    throw new RangeError(`Unknown request status "${request.status}"`);
  }
  const awardedBid = bids.find((bid) => bid.id === award.bidId);
  if (!awardedBid) throw new RangeError(`The awarded bid ${award.bidId} is not among the request's bids`);
  if (awardedBid.status !== 'submitted') throw new RangeError(`The awarded bid ${award.bidId} was withdrawn`);
  if (awardedBid.shop.id !== award.shop.id)
    throw new RangeError(`The awarded bid ${award.bidId} belongs to another die shop`);

  const ocid = `${input.ocidPrefix}-${request.id}`;
  const ref = (org: { id: number; name: string }) => ({ id: String(org.id), name: org.name });
  // A die shop that bid more than once is one tenderer.
  const shops = [...new Map(bids.map((bid) => [bid.shop.id, bid.shop])).values()];
  const tenderPeriod = {
    ...(request.publishedAt ? { startDate: isoInstant(request.publishedAt, 'publishedAt') } : {}),
    ...(request.bidDeadline ? { endDate: isoInstant(request.bidDeadline, 'bidDeadline') } : {}),
  };
  const awardValue = { amount: majorUnits(award.totalCents, award.currency), currency: award.currency };
  const relatedBids = [String(award.bidId)];

  return {
    ocid,
    id: `${ocid}-award-${award.id}`,
    date: isoInstant(input.releasedAt, 'releasedAt'),
    tag: ['award', 'contract'],
    initiationType: 'tender',
    parties: [
      { ...ref(buyer), roles: ['buyer'] },
      ...shops.map((shop) => ({
        ...ref(shop),
        roles: shop.id === award.shop.id ? ['tenderer', 'supplier'] : ['tenderer'],
      })),
    ],
    buyer: ref(buyer),
    tender: {
      id: String(request.id),
      title: request.title,
      ...(request.description ? { description: request.description } : {}),
      status: tenderStatus[request.status as RequestStatus],
      items: [{ id: '1', description: request.title, quantity: request.quantity, unit: { name: 'die' } }],
      ...(Object.keys(tenderPeriod).length > 0 ? { tenderPeriod } : {}),
      numberOfTenderers: shops.length,
      tenderers: shops.map(ref),
    },
    bids: {
      details: bids.map((bid) => ({
        id: String(bid.id),
        date: isoInstant(bid.submittedAt, `bid ${bid.id} submittedAt`),
        status: bidStatus[bid.status],
        tenderers: [ref(bid.shop)],
        value: { amount: majorUnits(bid.totalCents, bid.currency), currency: bid.currency },
      })),
    },
    awards: [
      {
        id: String(award.id),
        ...(award.reason ? { description: award.reason } : {}),
        status: 'active',
        date: isoInstant(award.awardedAt, 'awardedAt'),
        value: awardValue,
        suppliers: [ref(award.shop)],
        // The bids extension's `relatedBids`; its single `relatedBid` is deprecated.
        relatedBids,
      },
    ],
    contracts: [
      {
        id: purchaseOrder.poNumber,
        awardID: String(award.id),
        title: `Purchase order ${purchaseOrder.poNumber}`,
        status: purchaseOrder.status,
        dateSigned: isoInstant(purchaseOrder.issuedAt, 'purchase order issuedAt'),
        value: awardValue,
        relatedBids,
      },
    ],
  };
}

function isoInstant(instant: Date, what: string): string {
  if (Number.isNaN(instant.getTime())) throw new RangeError(`Not a valid date: ${what}`);
  return instant.toISOString();
}
