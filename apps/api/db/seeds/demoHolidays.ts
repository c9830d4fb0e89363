// Each demo die shop's holiday calendar: its country's and state's public holidays for this year
// and next, and one invented closure of its own a few working days ahead, so that the demo bids'
// promised ship dates step over it. Safe to load twice: one day per shop and date, and the closure
// only while the shop has none of its own to come.
import type { Knex } from 'knex';
import { addWorkingDays } from '@kerfmark/pricing';
import { todayIn } from '../../src/lib/todayIn';
import { publicHolidaysOf } from '../../src/services/holidays/publicHolidays';

/** The state each demo shop is in (from its postcode) and the name of its own closure. */
const demoCalendars: Record<string, { region: string; closure: string; inWorkingDays: number }> = {
  'Brightline Rule & Die': { region: 'IL', closure: 'Stocktaking day', inWorkingDays: 4 },
  'Okafor Steel Rule Dies': { region: 'IN', closure: 'Laser servicing day', inWorkingDays: 3 },
  'Cedar Bend Die Works': { region: 'WI', closure: 'Shop floor repainting', inWorkingDays: 2 },
};

export async function seedHolidays(knex: Knex): Promise<void> {
  for (const [name, calendar] of Object.entries(demoCalendars)) {
    const shop = await knex('organisations').where({ name }).first();
    if (!shop) continue;
    const admin = await knex('users').where({ organisationId: shop.id, role: 'admin' }).orderBy('id').first();
    const today = todayIn(shop.timeZone);
    const year = Number(today.slice(0, 4));
    const place = { country: shop.country as string, region: calendar.region };
    for (const y of [year, year + 1]) {
      const days = publicHolidaysOf(place, y).map((day) => ({
        shopId: shop.id,
        ...day,
        source: 'public',
        ...place,
        createdBy: admin?.id ?? null,
      }));
      await knex('shopHolidays').insert(days).onConflict(['shopId', 'date']).ignore();
    }
    const hasClosure = await knex('shopHolidays')
      .where({ shopId: shop.id, source: 'own' })
      .where('date', '>=', today)
      .first();
    if (hasClosure) continue;
    const holidays = new Set(
      (await knex('shopHolidays').where({ shopId: shop.id }).select('date')).map((h: { date: string }) => h.date),
    );
    await knex('shopHolidays')
      .insert({
        shopId: shop.id,
        date: addWorkingDays(today, calendar.inWorkingDays, holidays),
        name: calendar.closure,
        source: 'own',
        createdBy: admin?.id ?? null,
      })
      .onConflict(['shopId', 'date'])
      .ignore();
  }
}
