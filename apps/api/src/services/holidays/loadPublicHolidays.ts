import type { PublicHolidaysLoad, PublicHolidaysLoadedDto } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { AuthUser } from '../../auth/passport';
import { todayIn } from '../../lib/todayIn';
import type { ShopHoliday } from '../../models';
import { recordAudit } from '../auditService';
import { toHolidayDto } from './holidayDto';
import { publicHolidaysOf } from './publicHolidays';

/**
 * Adds a year's public holidays of a country or region to the shop's calendar, the past days of
 * the year too (they are facts of the calendar). A date already on it (a closure of the shop's
 * own, an earlier load, or a public holiday the shop removed) is left as it is, so loading twice
 * adds nothing.
 */
export async function loadPublicHolidays(
  knex: Knex,
  actor: AuthUser,
  input: z.output<typeof PublicHolidaysLoad>,
): Promise<PublicHolidaysLoadedDto> {
  const days = publicHolidaysOf(input, input.year);
  const today = todayIn(actor.timeZone);
  return knex.transaction(async (trx) => {
    const rows: ShopHoliday[] = days.length
      ? await trx('shopHolidays')
          .insert(
            days.map((day) => ({
              shopId: actor.organisationId,
              date: day.date,
              name: day.name,
              source: 'public',
              country: input.country,
              region: input.region,
              createdBy: actor.id,
            })),
          )
          .onConflict(['shopId', 'date'])
          .ignore()
          .returning(['id', 'date', 'name', 'source', 'country', 'region'])
      : [];
    await recordAudit(trx, {
      organisationId: actor.organisationId,
      actorUserId: actor.id,
      entity: 'holiday_calendar',
      entityId: actor.organisationId,
      action: 'public_holidays_loaded',
      detail: { country: input.country, region: input.region, year: input.year, added: rows.length },
    });
    return {
      added: rows.map((row) => toHolidayDto(row, today)).sort((a, b) => (a.date < b.date ? -1 : 1)),
      alreadyThere: days.length - rows.length,
    };
  });
}
