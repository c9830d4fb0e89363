import type { BidDto } from '@kerfmark/contracts';
import { BidRevision, type Bid } from '../../models';
import { toBidDto } from '../../dto/requestViews';

/** A bid as its shop sees it, with every revision in order. */
export async function bidWithRevisions(bid: Bid): Promise<BidDto> {
  return toBidDto(bid, await BidRevision.query().where({ bidId: bid.id }).orderBy('id'));
}
