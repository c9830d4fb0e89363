import type { RateCardDto, RateCardInput } from '@kerfmark/contracts';
import type { RateCard } from '@kerfmark/pricing';
import type { Knex } from 'knex';

/** The shop's rate card as stored, or null before its admin saves one. */
export async function rateCardOf(
  knex: Knex | Knex.Transaction,
  organisationId: number,
): Promise<(RateCard & { dto: RateCardDto }) | null> {
  const row = await knex('rateCards as c')
    .leftJoin('users as u', 'u.id', 'c.updatedBy')
    .where('c.organisationId', organisationId)
    .first('c.currency', 'c.rates', 'c.updatedAt', 'u.name as updatedByName');
  if (!row) return null;
  const rates = row.rates as Omit<RateCardInput, 'currency'>;
  const currency = row.currency as RateCardInput['currency'];
  const card: RateCard = { currency, ...rates };
  return {
    ...card,
    dto: {
      currency,
      ...rates,
      updatedAt: new Date(row.updatedAt).toISOString(),
      updatedByName: row.updatedByName ?? null,
    },
  };
}
