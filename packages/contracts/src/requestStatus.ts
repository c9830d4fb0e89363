// The statuses, their names and the moves between them; the schema is in requests.ts, so that the web app's
// first load, which shows these names, carries no zod.
import type { Role } from './roleSchemas';

/** A die request's life, in plain words of our own. */
export const requestStatuses = [
  'draft',
  'open',
  'bidding_closed',
  'awarded',
  'in_production',
  'shipped',
  'received',
  'cancelled',
] as const;
type RequestStatus = (typeof requestStatuses)[number];

export const requestStatusLabels: Record<RequestStatus, string> = {
  draft: 'Draft',
  open: 'Open for bids',
  bidding_closed: 'Bidding closed',
  awarded: 'Awarded',
  in_production: 'In production',
  shipped: 'Shipped',
  received: 'Received',
  cancelled: 'Cancelled',
};

/** Who moves a request from one status to the next: the printer's side or the awarded die shop. */
export type TransitionActor = 'printer' | 'awarded_shop';

/** Changes of status: the moves of the transition table. */
export const statusActions = [
  'publish',
  'cancel',
  'close-bidding',
  'award',
  'start-production',
  'ship',
  'receive',
] as const;
export type StatusAction = (typeof statusActions)[number];
/** What one may do with the invoices of a request's purchase order. */
export const invoiceActions = [
  'see-invoice',
  'raise-invoice',
  'credit-note',
  'dispute-invoice',
  'approve-invoice',
  'record-payment',
] as const;
export type InvoiceAction = (typeof invoiceActions)[number];

/** Everything one may do with a request; the API's answer lists those open to the reader now. */
export const requestActions = [
  ...statusActions,
  'edit',
  'remove-file',
  'move-deadline-later',
  'move-deadline-earlier',
  'answer',
  'bid',
  'revise',
  'withdraw',
  'ask',
  'decline',
  ...invoiceActions,
] as const;
export type RequestAction = (typeof requestActions)[number];

export interface Transition {
  from: RequestStatus;
  to: RequestStatus;
  action: StatusAction;
  actor: TransitionActor;
  roles: readonly Role[];
}

// The only moves a request can make. The API enforces this table in one place.
export const requestTransitions: readonly Transition[] = [
  { from: 'draft', to: 'open', action: 'publish', actor: 'printer', roles: ['buyer', 'purchasing', 'admin'] },
  { from: 'draft', to: 'cancelled', action: 'cancel', actor: 'printer', roles: ['buyer', 'purchasing', 'admin'] },
  { from: 'open', to: 'bidding_closed', action: 'close-bidding', actor: 'printer', roles: ['purchasing', 'admin'] },
  { from: 'open', to: 'cancelled', action: 'cancel', actor: 'printer', roles: ['buyer', 'purchasing', 'admin'] },
  // No way back to open: once the printer has seen the bids, they are never sealed again.
  { from: 'bidding_closed', to: 'awarded', action: 'award', actor: 'printer', roles: ['purchasing', 'admin'] },
  { from: 'bidding_closed', to: 'cancelled', action: 'cancel', actor: 'printer', roles: ['purchasing', 'admin'] },
  {
    from: 'awarded',
    to: 'in_production',
    action: 'start-production',
    actor: 'awarded_shop',
    roles: ['estimator', 'admin'],
  },
  { from: 'awarded', to: 'cancelled', action: 'cancel', actor: 'printer', roles: ['purchasing', 'admin'] },
  { from: 'in_production', to: 'shipped', action: 'ship', actor: 'awarded_shop', roles: ['estimator', 'admin'] },
  { from: 'shipped', to: 'received', action: 'receive', actor: 'printer', roles: ['buyer', 'purchasing', 'admin'] },
];

export function findTransition(from: RequestStatus, action: string): Transition | undefined {
  return requestTransitions.find((t) => t.from === from && t.action === action);
}
