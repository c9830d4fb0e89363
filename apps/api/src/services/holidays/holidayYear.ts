import type { HolidayYearDto } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { AuthUser } from '../../auth/passport';
import { todayIn } from '../../lib/todayIn';
import { ShopHoliday } from '../../models';
import { toHolidayDto } from './holidayDto';

/** The shop's holidays in a year (its current year unless named), and the public ones it removed. */
export async function holidayYear(knex: Knex, actor: AuthUser, year?: number): Promise<HolidayYearDto> {
  const today = todayIn(actor.timeZone);
  const shown = year ?? Number(today.slice(0, 4));
  const rows = await ShopHoliday.query(knex)
    .where({ shopId: actor.organisationId })
    .whereBetween('date', [`${shown}-01-01`, `${shown}-12-31`])
    .orderBy('date');
  const last = await ShopHoliday.query(knex)
    .where({ shopId: actor.organisationId, source: 'public' })
    .orderBy('id', 'desc')
    .first();
  return {
    year: shown,
    today,
    holidays: rows.filter((r) => !r.removedAt).map((r) => toHolidayDto(r, today)),
    keptOpen: rows.filter((r) => r.removedAt).map((r) => toHolidayDto(r, today)),
    lastLoaded: last ? { country: last.country!, region: last.region } : null,
  };
}
