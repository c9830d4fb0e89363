import type { BidInput } from '@kerfmark/contracts';
import { addWorkingDays, sumCents } from '@kerfmark/pricing';
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { AuthUser } from '../../auth/passport';
import { badRequest } from '../../lib/httpError';
import { todayIn } from '../../lib/todayIn';
import type { DieRequest } from '../../models';

export type ParsedBid = z.output<typeof BidInput>;

/**
 * The terms of a bid as the server computes them: totals from the lines, the ship date from the
 * lead time in the shop's working days. The price must hold until the bid deadline at least.
 */
export async function bidTerms(trx: Knex.Transaction, actor: AuthUser, request: DieRequest, input: ParsedBid) {
  const today = todayIn(actor.timeZone);
  if (input.validUntil < today)
    throw badRequest('The price must hold until today at least.', { validUntil: 'Choose today or later' });
  const deadlineDay = request.bidDeadline ? todayIn(actor.timeZone, request.bidDeadline) : today;
  if (input.validUntil < deadlineDay) {
    throw badRequest('The price must hold at least until the bid deadline.', {
      validUntil: `Choose ${deadlineDay} or later`,
    });
  }
  const holidays = new Set<string>(
    // knex's pluck() misses columns under the snake-case mappers, so select and map instead.
    (await trx('shopHolidays').where({ shopId: actor.organisationId }).whereNull('removedAt').select('date')).map(
      (h: { date: string }) => String(h.date),
    ),
  );
  return {
    lines: input.lines,
    currency: input.currency,
    totalCents: sumCents(input.lines.map((l) => l.amountCents)),
    dieCents: sumCents(input.lines.filter((l) => l.kind === 'die').map((l) => l.amountCents)),
    leadDays: input.leadDays,
    promisedShipDate: addWorkingDays(today, input.leadDays, holidays),
    validUntil: input.validUntil,
    notes: input.notes ?? null,
  };
}
