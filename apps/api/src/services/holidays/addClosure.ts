import type { HolidayCreate, HolidayDto } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import { UniqueViolationError } from 'objection';
import type { AuthUser } from '../../auth/passport';
import { badRequest, HttpError } from '../../lib/httpError';
import { todayIn } from '../../lib/todayIn';
import { ShopHoliday } from '../../models';
import { recordAudit } from '../auditService';
import { toHolidayDto } from './holidayDto';

const alreadyOff = (date: string, name: string) =>
  new HttpError(409, 'conflict', `${date} is already a holiday of the shop: ${name}.`, {
    date: 'That day is already on the calendar',
  });

/**
 * Adds a day the shop closes on. Days gone by stay as they were, so a closure is for today or
 * later. On a public holiday the shop had removed, the closure takes its place.
 */
export async function addClosure(knex: Knex, actor: AuthUser, input: HolidayCreate): Promise<HolidayDto> {
  const today = todayIn(actor.timeZone);
  if (input.date < today) {
    throw badRequest('A closure is for today or a later day: days gone by stay as they were.', {
      date: `Choose ${today} or later`,
    });
  }
  try {
    return await knex.transaction(async (trx) => {
      const existing = await ShopHoliday.query(trx)
        .findOne({ shopId: actor.organisationId, date: input.date })
        .forUpdate();
      if (existing && !existing.removedAt) throw alreadyOff(input.date, existing.name);
      const closure = {
        name: input.name,
        source: 'own' as const,
        country: null,
        region: null,
        createdBy: actor.id,
        createdAt: new Date(),
        removedAt: null,
      };
      const row = existing
        ? await existing.$query(trx).patchAndFetch(closure)
        : await ShopHoliday.query(trx).insertAndFetch({ ...closure, shopId: actor.organisationId, date: input.date });
      await recordAudit(trx, {
        organisationId: actor.organisationId,
        actorUserId: actor.id,
        entity: 'holiday',
        entityId: row.id,
        action: 'created',
        detail: { date: input.date, name: input.name },
      });
      return toHolidayDto(row, today);
    });
  } catch (error) {
    // Two closures on one day at once: the unique index keeps one, the other hears why.
    if (error instanceof UniqueViolationError) throw alreadyOff(input.date, 'added a moment ago');
    throw error;
  }
}
