import { bidLineLabels, type BidLine } from '@kerfmark/contracts';
import type { OrderLine } from '@kerfmark/pricing';
import type { Knex } from 'knex';
import { Bid, BidRevision, type Award } from '../../models';

/** How a bid line reads on the purchase order and the invoice: its kind, and its description when it has one. */
export function orderLineOf(line: BidLine): OrderLine {
  const kind = bidLineLabels[line.kind] ?? line.kind;
  return {
    kind: line.kind,
    label: line.description ? `${kind}: ${line.description}` : kind,
    amountCents: line.amountCents,
  };
}

/** The purchase order's lines: those of the bid as it stood when awarded (its kept revision). */
export async function orderLinesOf(trx: Knex | Knex.Transaction, award: Award): Promise<OrderLine[]> {
  const revision = await BidRevision.query(trx).findOne({ bidId: award.bidId, revision: award.revision });
  const lines = revision?.lines ?? (await Bid.query(trx).findById(award.bidId))?.lines ?? [];
  return lines.map(orderLineOf);
}
