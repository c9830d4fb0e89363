import { invoiceStatusLabels, type InvoiceAction, type InvoiceStatus } from '@kerfmark/contracts';
import type { Refusal } from './deadline';
import { isAwardedShop, isOwner, isPurchasing, type Actor, type RequestFacts } from './facts';

const notFound: Refusal = { status: 404, message: 'That invoice was not found.' };
const SHOP_ACTIONS: readonly InvoiceAction[] = ['raise-invoice', 'credit-note'];

/**
 * Who may see and settle the invoices of a request's purchase order: the shop the request was
 * awarded to raises them; the printer's purchasing and admins see, dispute, approve and pay
 * them. Anyone else's shop gets a 404; a print buyer a 403 (the route shows a buyer the status
 * only). Invoices come once the die has shipped.
 */
export function invoiceActionRefusal(actor: Actor, f: RequestFacts, action: InvoiceAction): Refusal | null {
  const shopAction = SHOP_ACTIONS.includes(action);
  if (actor.orgKind === 'die_shop') {
    if (!isAwardedShop(actor, f)) return notFound;
    if (action !== 'see-invoice' && !shopAction)
      return { status: 403, message: 'Only the printer’s purchasing can do this.' };
  } else {
    if (!isOwner(actor, f)) return notFound;
    if (shopAction) return { status: 403, message: 'Only the die shop that made the die invoices it.' };
    if (!isPurchasing(actor)) return { status: 403, message: 'Only purchasing and admins see and settle invoices.' };
    if (f.awardedShopId === null) return { status: 409, message: 'A request has no invoices before its award.' };
  }
  if (action === 'see-invoice') return null;
  return f.status === 'shipped' || f.status === 'received'
    ? null
    : { status: 409, message: 'A die is invoiced once it has shipped.' };
}

/** The steps an existing invoice can take, by the status it is in. */
export type InvoiceStep = 'revise' | 'credit' | 'dispute' | 'approve' | 'pay';

const STEP_FROM: Record<InvoiceStep, { from: InvoiceStatus; doing: string }> = {
  revise: { from: 'disputed', doing: 'revised' },
  credit: { from: 'disputed', doing: 'credited' },
  dispute: { from: 'submitted', doing: 'disputed' },
  approve: { from: 'submitted', doing: 'approved' },
  pay: { from: 'approved', doing: 'paid' },
};

/** Why an invoice in `status` cannot take `step` (409), or null when it can. */
export function invoiceStepRefusal(status: InvoiceStatus, step: InvoiceStep): Refusal | null {
  const { from, doing } = STEP_FROM[step];
  if (status === from) return null;
  const hint =
    step === 'pay'
      ? ' Approve it for payment first.'
      : from === 'disputed'
        ? ' Only a disputed invoice is revised or credited.'
        : '';
  return {
    status: 409,
    message: `An invoice that is ${invoiceStatusLabels[status].toLowerCase()} cannot be ${doing}.${hint}`,
  };
}
