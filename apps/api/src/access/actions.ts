import {
  findTransition,
  requestActions,
  requestStatusLabels,
  type RequestAction,
  type StatusAction,
  type Transition,
} from '@kerfmark/contracts';
import type { Refusal } from './deadline';
import { isAwardedShop, isBidder, isOwner, isPurchasing, type Actor, type RequestFacts } from './facts';
import { biddingOpen } from './sealed';
import { invoiceActionRefusal } from './invoiceRules';
import { maySee } from './visibility';

export type { RequestAction, StatusAction };

const notFound: Refusal = { status: 404, message: 'That die request was not found.' };

/** The transition-table rule: the move exists from this status, and the right side and role make it. */
export function transitionRefusal(
  actor: Actor,
  f: RequestFacts,
  action: string,
): { transition?: Transition; refusal?: Refusal } {
  const transition = findTransition(f.status, action);
  if (!transition)
    return {
      refusal: {
        status: 409,
        message: `A request that is ${requestStatusLabels[f.status].toLowerCase()} cannot be moved that way.`,
      },
    };
  const side = transition.actor === 'printer' ? isOwner(actor, f) : isAwardedShop(actor, f);
  // Another shop's job is none of a shop's business: the same 404 as a record it cannot see.
  if (!side && transition.actor === 'awarded_shop' && actor.orgKind === 'die_shop') return { refusal: notFound };
  if (!side) return { refusal: { status: 403, message: 'Your organisation cannot make this change.' } };
  if (!transition.roles.includes(actor.role))
    return { refusal: { status: 403, message: `Only ${transition.roles.join(', ')} users can do this.` } };
  return { transition };
}

/**
 * Why the actor may not take the action now, or null if it may. The order matters: a request the
 * actor may not see is a 404 whatever it asks; then the side and the role (403); then the time (409).
 */
export function actionRefusal(actor: Actor, f: RequestFacts, action: RequestAction, now: Date): Refusal | null {
  if (!maySee(actor, f)) return notFound;
  const owner = isOwner(actor, f);
  const open = biddingOpen(f, now);
  const printerOnly = (ok: boolean, message: string): Refusal | null =>
    !owner
      ? { status: 403, message: 'Only the printer that posted the request can do this.' }
      : ok
        ? null
        : { status: 409, message };
  const shopOnly = (ok: boolean, message: string): Refusal | null =>
    actor.orgKind !== 'die_shop'
      ? { status: 403, message: 'Only die shops can do this.' }
      : ok
        ? null
        : { status: 409, message };
  switch (action) {
    case 'edit':
      // After the deadline the bids rest on the request as it was.
      return printerOnly(
        f.status === 'draft' || open,
        'Only a draft, or an open request before its deadline, can be changed.',
      );
    case 'remove-file':
      return printerOnly(
        f.status === 'draft',
        'Files can be removed from a draft only; an open request keeps what shops have seen.',
      );
    case 'move-deadline-later':
      return printerOnly(open, 'Bidding has closed: the deadline can no longer move.');
    case 'move-deadline-earlier':
      if (owner && !isPurchasing(actor))
        return { status: 403, message: 'Only purchasing can bring a bid deadline forward.' };
      return printerOnly(open, 'Bidding has closed: the deadline can no longer move.');
    case 'answer':
      return printerOnly(true, '');
    case 'bid':
      return shopOnly(
        open && !isBidder(actor, f),
        open
          ? 'Your shop has already bid on this request: revise that bid instead.'
          : 'This request is not open for bids.',
      );
    case 'revise':
    case 'withdraw':
      if (actor.orgKind === 'die_shop' && !isBidder(actor, f))
        return { status: 404, message: 'That bid was not found.' };
      return shopOnly(open, 'Bidding on this request has closed.');
    case 'ask':
      return shopOnly(open, 'Questions close with bidding.');
    case 'decline':
      return shopOnly(open, 'Bidding on this request has closed.');
    case 'award': {
      // Who may award comes before whether now is the time.
      const who = transitionRefusal(actor, { ...f, status: 'bidding_closed' }, 'award');
      if (who.refusal) return who.refusal;
      if (open) return { status: 409, message: 'Close bidding before awarding: bids are still sealed.' };
      // The table awards from "bidding closed"; an open request whose deadline passed is closed on the way.
      if (f.status === 'open' || f.status === 'bidding_closed') return null;
      if (f.awardedShopId !== null) return { status: 409, message: 'This request has already been awarded.' };
      return transitionRefusal(actor, f, 'award').refusal ?? null;
    }
    case 'see-invoice':
    case 'raise-invoice':
    case 'credit-note':
    case 'dispute-invoice':
    case 'approve-invoice':
    case 'record-payment':
      return invoiceActionRefusal(actor, f, action);
    default: {
      return transitionRefusal(actor, f, action).refusal ?? null;
    }
  }
}

/** The actions open to the actor on the request now: the web app's buttons. */
export function openActions(actor: Actor, f: RequestFacts, now: Date): RequestAction[] {
  return requestActions.filter((action) => actionRefusal(actor, f, action, now) === null);
}
