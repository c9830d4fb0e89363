import type { Knex } from 'knex';
import type { AuthUser } from '../../auth/passport';
import { conflict, notFound } from '../../lib/httpError';
import { todayIn } from '../../lib/todayIn';
import { ShopHoliday } from '../../models';
import { recordAudit } from '../auditService';

/**
 * Takes a day off the shop's calendar: the shop works that day. A day gone by stays, as the record
 * the shop's promised ship dates were counted by. A removed public holiday is kept as removed, so
 * that loading the year's public holidays again leaves it off; a closure of the shop's own goes.
 */
export async function removeHoliday(knex: Knex, actor: AuthUser, id: number): Promise<void> {
  await knex.transaction(async (trx) => {
    const row = await ShopHoliday.query(trx)
      .findOne({ id, shopId: actor.organisationId })
      .whereNull('removedAt')
      .forUpdate();
    if (!row) throw notFound('That holiday');
    if (row.date < todayIn(actor.timeZone)) {
      throw conflict(`${row.date} has passed: it stays on the calendar as a record of the days the shop was closed.`);
    }
    if (row.source === 'public') await row.$query(trx).patch({ removedAt: new Date() });
    else await row.$query(trx).delete();
    await recordAudit(trx, {
      organisationId: actor.organisationId,
      actorUserId: actor.id,
      entity: 'holiday',
      entityId: id,
      action: 'removed',
      detail: { date: row.date, name: row.name, source: row.source },
    });
  });
}
