import { dueDateOf, netDaysOf } from '@kerfmark/pricing';
import { HttpError } from '../../lib/httpError';
import type { Organisation } from '../../models';

/**
 * When an invoice to the printer falls due: its own net days, else those its payment terms
 * name ("Net 30"); with neither, no due date can be worked out and the invoice waits.
 */
export function dueDateFor(printer: Organisation, invoiceDate: string): string {
  const netDays = printer.paymentNetDays ?? netDaysOf(printer.paymentTerms);
  if (netDays === null)
    throw new HttpError(
      409,
      'payment_days_missing',
      `${printer.name} has not set how many days it takes to pay` +
        (printer.paymentTerms ? ` (its terms read "${printer.paymentTerms}")` : '') +
        ': ask them to set their days to pay, or terms in days such as "Net 30", in their organisation’s profile, then send the invoice.',
    );
  return dueDateOf(invoiceDate, netDays);
}
