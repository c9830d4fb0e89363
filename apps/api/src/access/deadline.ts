import { isOwner, isPurchasing, type Actor, type RequestFacts } from './facts';
import { biddingOpen } from './sealed';

/** An open request's deadline moves earlier only with at least this much notice from now. */
export const MIN_DEADLINE_NOTICE_MS = 24 * 3_600_000;

export interface Refusal {
  status: 400 | 403 | 404 | 409;
  message: string;
  field?: string;
}

/**
 * May the actor move an open request's bid deadline to `to`? Later: its buyer or purchasing.
 * Earlier: purchasing only, and never to less than the minimum notice from now, so that no
 * move of the deadline opens the bids sooner than a day away (early close is the way to do
 * that, and bidders are told of both). Null when the move may be made.
 */
export function deadlineMoveRefusal(actor: Actor, f: RequestFacts, to: Date | null, now: Date): Refusal | null {
  if (!isOwner(actor, f)) return { status: 404, message: 'That die request was not found.' };
  if (f.status !== 'open') return null; // a draft's deadline is checked when it is published
  if (!biddingOpen(f, now)) return { status: 409, message: 'Bidding has closed: the deadline can no longer move.' };
  if (to === null) return { status: 400, message: 'An open request keeps a bid deadline.', field: 'bidDeadline' };
  const from = f.bidDeadline!.getTime();
  if (to.getTime() >= from) return null;
  if (!isPurchasing(actor)) return { status: 403, message: 'Only purchasing can bring a bid deadline forward.' };
  if (to.getTime() < now.getTime() + MIN_DEADLINE_NOTICE_MS) {
    return {
      status: 400,
      message: 'An earlier deadline must leave the shops at least 24 hours.',
      field: 'bidDeadline',
    };
  }
  return null;
}
