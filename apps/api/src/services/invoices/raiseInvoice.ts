import { invoiceStatusLabels, type InvoiceInput } from '@kerfmark/contracts';
import { invoiceStepRefusal, refuse } from '../../access';
import type { AuthUser } from '../../auth/passport';
import { conflict } from '../../lib/httpError';
import type { Invoice } from '../../models';
import { auditInvoice } from './auditInvoice';
import type { ServiceDeps } from '../deps';
import { invoiceContext, lockedInvoice, openInvoice, requestOfInvoice } from './invoiceContext';
import { tellInvoice } from './tellInvoice';
import { writeInvoiceVersion } from './writeVersion';

const tellRaised = (version: number) => (money: string, what: string) => ({
  title: `${version > 1 ? 'Revised' : 'New'} ${what}: ${money}`,
  body: `The die shop sent ${what}${version > 1 ? ` (version ${version})` : ''} for ${money}. Match it against the purchase order and the receipt, then approve or dispute it.`,
});

/** The awarded shop invoices the purchase order once the die has shipped; one open invoice at a time. */
export async function raiseInvoice(deps: ServiceDeps, actor: AuthUser, requestId: number, input: InvoiceInput) {
  return deps.knex.transaction(async (trx) => {
    const ctx = await invoiceContext(trx, actor, requestId, 'raise-invoice', 'update');
    const open = await openInvoice(trx, requestId);
    if (open)
      throw conflict(
        `Invoice ${open.number} on this purchase order is ${invoiceStatusLabels[open.status].toLowerCase()}: ` +
          (open.status === 'disputed'
            ? 'send a revision or a credit note instead.'
            : 'there is one invoice per order.'),
      );
    const invoice = await writeInvoiceVersion(trx, actor, ctx, input, null);
    await tellInvoice(trx, deps, invoice, 'invoice_raised', tellRaised(1));
    return invoice;
  });
}

/** After a dispute the shop sends a revised invoice: a new version, the disputed one kept as superseded. */
export async function reviseInvoice(deps: ServiceDeps, actor: AuthUser, invoiceId: number, input: InvoiceInput) {
  return deps.knex.transaction(async (trx) => {
    const ctx = await invoiceContext(trx, actor, await requestOfInvoice(trx, invoiceId), 'raise-invoice', 'update');
    const disputed: Invoice = await lockedInvoice(trx, invoiceId);
    if (disputed.kind !== 'invoice') throw conflict('A credit note is not revised: send another credit note.');
    const refusal = invoiceStepRefusal(disputed.status, 'revise');
    if (refusal) throw refuse(refusal);
    await disputed.$query(trx).patch({ status: 'superseded' });
    await auditInvoice(trx, actor, disputed.id, 'superseded');
    const invoice = await writeInvoiceVersion(trx, actor, ctx, input, disputed);
    await tellInvoice(trx, deps, invoice, 'invoice_raised', tellRaised(invoice.version));
    return invoice;
  });
}
