import { Organisation } from '../models';
import type { World } from './harness';
import { todayIn } from '../lib/todayIn';
import { callAs, createRequestAt } from './requestStages';

/** The stages of an invoice after the world's shop ships a die. */
export type InvoiceStage = 'submitted' | 'disputed' | 'approved';
export interface StagedInvoice {
  requestId: number;
  invoiceId: number;
}

/** The world's printer pays on Net 30 terms, so that its shop's invoices fall due. */
export const netThirty = (w: World) =>
  Organisation.query().findById(w.printer.id).whereNull('paymentTerms').patch({ paymentTerms: 'Net 30' });

/** Today for the world's shop: the date its invoices carry. */
export const invoiceToday = (w: World) => todayIn(w.shop.timeZone);

/**
 * A shipped die of the world's shop, invoiced as awarded (800.00 + 35.00 shipping, no tax) and
 * taken through the API to `stage`: purchasing disputes it, or approves it with a reason (the
 * die is not received yet, so the match flags it).
 */
export async function createInvoiceAt(w: World, stage: InvoiceStage): Promise<StagedInvoice> {
  await netThirty(w);
  const { id: requestId } = await createRequestAt(w, 'shipped');
  const path = `/api/requests/${requestId}/invoices`;
  const { id: invoiceId } = await callAs(w, 'estimator', 'post', path, { invoiceDate: invoiceToday(w) }, 201);
  if (stage === 'disputed')
    await callAs(w, 'purchasing', 'post', `/api/invoices/${invoiceId}/dispute`, { reason: 'Wrong PO number' }, 200);
  if (stage === 'approved')
    await callAs(
      w,
      'purchasing',
      'post',
      `/api/invoices/${invoiceId}/approve`,
      { reason: 'Die checked at the dock' },
      200,
    );
  return { requestId, invoiceId };
}
