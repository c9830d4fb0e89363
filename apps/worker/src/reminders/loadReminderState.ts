import type { Knex } from 'knex';
import type { ReminderState } from './planReminders';

/** Reads what the reminder rules need about one request, or null when it is gone. */
export async function loadReminderState(knex: Knex, requestId: number): Promise<ReminderState | null> {
  const request = await knex('die_requests as r')
    .join('organisations as o', 'o.id', 'r.organisation_id')
    .where('r.id', requestId)
    .first(
      'r.id',
      'r.status',
      'o.time_zone',
      'r.published_at',
      'r.bid_deadline',
      'r.bidding_closed_at',
      'r.need_by_date',
      'r.shipped_at',
    );
  if (!request) return null;
  const award = await knex('awards as a')
    .join('organisations as s', 's.id', 'a.shop_id')
    .where('a.request_id', requestId)
    .first('a.awarded_at', 'a.promised_ship_date', 's.time_zone');
  const best = award
    ? undefined
    : await knex('bids')
        .where({ request_id: requestId, status: 'submitted' })
        .orderBy('total_cents')
        .first('valid_until');
  const date = (v: unknown) =>
    v === null || v === undefined ? null : v instanceof Date ? v.toISOString().slice(0, 10) : String(v);
  return {
    request: {
      id: request.id,
      status: request.status,
      timeZone: request.time_zone,
      publishedAt: request.published_at,
      bidDeadline: request.bid_deadline,
      biddingClosedAt: request.bidding_closed_at,
      needByDate: date(request.need_by_date),
      shippedAt: request.shipped_at,
    },
    award: award
      ? {
          awardedAt: award.awarded_at,
          promisedShipDate: date(award.promised_ship_date)!,
          shopTimeZone: award.time_zone,
        }
      : null,
    bestBidValidUntil: best ? date(best.valid_until) : null,
  };
}
