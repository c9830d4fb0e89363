import type { RequestFacts } from './facts';

type Timing = Pick<RequestFacts, 'status' | 'bidDeadline' | 'biddingClosedAt'>;

/**
 * The sealed-bid rule: before the bid deadline no one but the bidding shop sees anything of a
 * bid (amounts, lines, dates, the shop's name, the count of bids), by any route. The deadline
 * passes only by the clock or by purchasing's early close (which moves the status on); a request
 * cancelled while its bids were sealed keeps them sealed for good.
 */
export function bidsOpened(f: Timing, now: Date): boolean {
  switch (f.status) {
    case 'draft':
      return false;
    case 'open':
      return f.bidDeadline !== null && f.bidDeadline.getTime() <= now.getTime();
    case 'cancelled':
      // Stamped when it was cancelled, only if its bids were open by then.
      return f.biddingClosedAt !== null;
    default:
      return true;
  }
}

/** Bids may be sent, revised or withdrawn: the request is open and its bids still sealed. */
export function biddingOpen(f: Timing, now: Date): boolean {
  return f.status === 'open' && !bidsOpened(f, now);
}

/**
 * What cancelling records so that the rule above holds for good: bids already open stay open
 * (to the printer that saw them), sealed ones are never opened. Cancelling does not open bids.
 */
export function sealOnCancel(f: Timing, now: Date): { biddingClosedAt: Date | null } {
  if (!bidsOpened(f, now)) return { biddingClosedAt: null };
  return { biddingClosedAt: f.biddingClosedAt ?? f.bidDeadline ?? now };
}
