import type { Knex } from 'knex';
import type { BidLine } from '@kerfmark/contracts';
import { sumCents } from '@kerfmark/pricing';

interface SeedBid {
  requestId: number;
  shopId: number;
  /** The estimator who sent it. */
  createdBy: number;
  lines: BidLine[];
  currency: string;
  leadDays: number;
  promisedShipDate: string;
  validUntil: string;
  submittedAt?: Date;
}

/** A submitted bid and its first revision, totalled as the bid service totals them. */
export async function insertSubmittedBid(knex: Knex, bid: SeedBid): Promise<{ id: number; totalCents: number }> {
  const { createdBy, submittedAt = new Date(), ...terms } = bid;
  const totalCents = sumCents(bid.lines.map((l) => l.amountCents));
  const dieCents = sumCents(bid.lines.filter((l) => l.kind === 'die').map((l) => l.amountCents));
  const lines = JSON.stringify(bid.lines);
  const [{ id }] = await knex('bids')
    .insert({ ...terms, lines, status: 'submitted', revision: 1, totalCents, dieCents, submittedAt })
    .returning('id');
  const { requestId: _requestId, shopId: _shopId, ...revision } = terms;
  await knex('bidRevisions').insert({
    ...revision,
    bidId: id,
    revision: 1,
    action: 'submitted',
    lines,
    totalCents,
    createdBy,
    createdAt: submittedAt,
  });
  return { id, totalCents };
}
