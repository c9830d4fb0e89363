import type { HolidayCreate, PublicHolidaysLoad } from '@kerfmark/contracts';
import type { z } from 'zod';
import type { AuthUser } from '../auth/passport';
import { Organisation } from '../models';
import type { ServiceDeps } from './deps';
import { addClosure } from './holidays/addClosure';
import { holidayPlaces } from './holidays/holidayPlaces';
import { holidayYear } from './holidays/holidayYear';
import { loadPublicHolidays } from './holidays/loadPublicHolidays';
import { removeHoliday } from './holidays/removeHoliday';

/** A die shop's holidays: the days its promised ship dates skip besides weekends. */
export function createHolidayService({ knex }: ServiceDeps) {
  return {
    year: (actor: AuthUser, year?: number) => holidayYear(knex, actor, year),
    add: (actor: AuthUser, input: HolidayCreate) => addClosure(knex, actor, input),
    remove: (actor: AuthUser, id: number) => removeHoliday(knex, actor, id),
    loadPublic: (actor: AuthUser, input: z.output<typeof PublicHolidaysLoad>) => loadPublicHolidays(knex, actor, input),
    /** The picker's countries, and the regions of the one named or else of the shop's own country. */
    places: async (actor: AuthUser, country?: string) =>
      holidayPlaces(
        country ?? (await Organisation.query(knex).findById(actor.organisationId).throwIfNotFound()).country,
      ),
  };
}
