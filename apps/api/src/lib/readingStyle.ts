import type { DisplayLocale, LengthUnits } from '@kerfmark/contracts';
import type { Knex } from 'knex';

/** How a user reads lengths, dates and numbers: their own choice, else their organisation's. */
export async function readingStyle(
  knex: Knex,
  userId: number,
): Promise<{ lengthUnits: LengthUnits; locale: DisplayLocale }> {
  const row = (await knex('users as u')
    .join('organisations as o', 'o.id', 'u.organisationId')
    .where('u.id', userId)
    .first(
      knex.raw('coalesce(u.length_units, o.length_units) as length_units'),
      knex.raw('coalesce(u.locale, o.locale) as locale'),
    )) as { lengthUnits: LengthUnits; locale: DisplayLocale } | undefined;
  return row ?? { lengthUnits: 'in', locale: 'en-US' };
}
