import type { NotificationKind } from '@kerfmark/contracts';
import { formatMoney } from '@kerfmark/pricing';
import type { Knex } from 'knex';
import type { ServiceDeps } from '../deps';
import { notifyOrganisation } from '../notificationService';
import type { Invoice } from '../../models';

/**
 * Tells the other side of an invoice's step, in each reader's money format: the printer's
 * purchasing and admins when the shop sends one, the shop when the printer settles it.
 */
export async function tellInvoice(
  trx: Knex.Transaction,
  deps: Pick<ServiceDeps, 'emails' | 'config'>,
  invoice: Invoice,
  kind: NotificationKind,
  text: (money: string, what: string) => { title: string; body: string },
  cents = Math.abs(invoice.totalCents),
): Promise<void> {
  const toPrinter = kind === 'invoice_raised';
  const what = `${invoice.kind === 'credit_note' ? 'credit note' : 'invoice'} ${invoice.number}`;
  const { title } = text(formatMoney({ cents, currency: invoice.currency }), what);
  await notifyOrganisation(
    trx,
    { emails: deps.emails, appUrl: deps.config.appUrl },
    toPrinter ? invoice.printerId : invoice.shopId,
    {
      kind,
      title,
      body: (reader) => text(formatMoney({ cents, currency: invoice.currency }, reader.locale), what).body,
      link: `/requests/${invoice.requestId}`,
    },
    toPrinter ? ['purchasing', 'admin'] : undefined,
  );
}
