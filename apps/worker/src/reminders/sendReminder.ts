import { formatCalendarDate, formatInZone } from '@kerfmark/contracts';
import { dieSummary, notifyOrganisation, type DieFigures, type Notice, type Reader } from '@kerfmark/notices';
import type { Knex } from 'knex';
import { loadReminderState } from './loadReminderState';
import { isDue, planReminders, type PlannedReminder } from './planReminders';

export type ReminderResult = 'sent' | 'already-sent' | 'no-longer-applies' | 'not-due';

interface RequestRow extends DieFigures {
  id: number;
  title: string;
  organisation_id: number;
  created_by: number | null;
  visibility: string;
  bid_deadline: Date | null;
  need_by_date: string | Date | null;
  time_zone: string;
}

/** Shops to remind before the deadline: invited or asked a question, and neither bid nor declined. */
async function shopsYetToBid(trx: Knex.Transaction, requestId: number): Promise<number[]> {
  const rows = await trx
    .select('shop_id')
    .from(
      trx.raw(
        '(select shop_id from request_invitations where request_id = ? union select shop_id from request_questions where request_id = ?) as interested',
        [requestId, requestId],
      ),
    )
    .whereNotIn('shop_id', trx('bids').where({ request_id: requestId }).select('shop_id'))
    .whereNotIn('shop_id', trx('request_declines').where({ request_id: requestId }).select('shop_id'));
  return rows.map((r: { shop_id: number }) => r.shop_id);
}

/**
 * Sends one reminder if it still applies: the state is read again from PostgreSQL, the key is
 * recorded in the same transaction as the notices, so a job that runs twice sends once.
 */
export async function sendReminder(
  knex: Knex,
  opts: { appUrl: string; now: Date },
  requestId: number,
  key: string,
): Promise<{ result: ReminderResult; outboxIds: number[] }> {
  const state = await loadReminderState(knex, requestId);
  const reminder = state ? planReminders(state).find((r) => r.key === key) : undefined;
  if (!state || !reminder) return { result: 'no-longer-applies', outboxIds: [] };
  if (!isDue(reminder, opts.now)) return { result: 'not-due', outboxIds: [] };

  return knex.transaction(async (trx) => {
    const inserted = await trx('reminders_sent')
      .insert({ key, request_id: requestId, kind: reminder.kind })
      .onConflict('key')
      .ignore()
      .returning('key');
    if (inserted.length === 0) return { result: 'already-sent' as const, outboxIds: [] };
    const request = (await trx('die_requests as r')
      .join('organisations as o', 'o.id', 'r.organisation_id')
      .where('r.id', requestId)
      .first(
        'r.id',
        'r.title',
        'r.organisation_id',
        'r.created_by',
        'r.visibility',
        'r.bid_deadline',
        'r.need_by_date',
        'r.measured_rule_in as ruleIn',
        'r.measured_board_width_in as boardWidthIn',
        'r.measured_board_height_in as boardHeightIn',
        'o.time_zone',
      )) as RequestRow;
    const outboxIds = await deliver(trx, opts.appUrl, reminder, request);
    return { result: 'sent' as const, outboxIds };
  });
}

async function deliver(
  trx: Knex.Transaction,
  appUrl: string,
  reminder: PlannedReminder,
  request: RequestRow,
): Promise<number[]> {
  const link = `/requests/${request.id}`;
  const ids: number[] = [];
  const tell = async (
    organisationId: number,
    notice: Pick<Notice, 'title' | 'body'>,
    roles?: string[],
    onlyUserIds?: number[],
  ) =>
    ids.push(
      ...(await notifyOrganisation(trx, {
        appUrl,
        organisationId,
        roles,
        onlyUserIds,
        notice: { kind: reminder.kind, link, ...notice },
      })),
    );
  const needBy =
    request.need_by_date instanceof Date ? request.need_by_date.toISOString().slice(0, 10) : request.need_by_date;
  // Dates, times and lengths as each reader chose: their zone, their locale, their units.
  const needByText = (reader: Reader) => (needBy ? formatCalendarDate(needBy, reader.locale) : 'its need-by date');
  const award = await trx('awards').where({ request_id: request.id }).first('shop_id', 'promised_ship_date');
  const buyer = request.created_by ? [request.created_by] : undefined;
  // The date reminders reach each side at its own 09:00, as a reminder each.
  const toShop = reminder.audience !== 'printer';
  const toPrinter = reminder.audience !== 'shop';

  switch (reminder.kind) {
    case 'bid_deadline_48h':
    case 'bid_deadline_24h': {
      const hours = reminder.kind === 'bid_deadline_48h' ? 48 : 24;
      const deadline = request.bid_deadline;
      if (!deadline) break;
      for (const shopId of await shopsYetToBid(trx, request.id)) {
        await tell(shopId, {
          title: `Bids due in ${hours} hours: ${request.title}`,
          body: (reader) =>
            [
              `Bids on "${request.title}" are due by ${formatInZone(deadline, reader.timeZone, reader.locale)}.`,
              dieSummary(request, reader),
              'Your shop has not bid yet.',
            ]
              .filter(Boolean)
              .join(' '),
        });
      }
      break;
    }
    case 'bids_ready': {
      const count = Number(
        (await trx('bids').where({ request_id: request.id, status: 'submitted' }).count('* as n'))[0]!.n,
      );
      await tell(
        request.organisation_id,
        {
          title: `Bids ready to compare: ${request.title}`,
          body: `Bidding on "${request.title}" is over with ${count} bid${count === 1 ? '' : 's'} to compare.`,
        },
        ['purchasing', 'admin'],
      );
      if (buyer)
        await tell(
          request.organisation_id,
          {
            title: `Bids ready to compare: ${request.title}`,
            body: `Bidding on "${request.title}" is over with ${count} bid${count === 1 ? '' : 's'}; purchasing can now compare and award.`,
          },
          ['buyer'],
          buyer,
        );
      break;
    }
    case 'need_by_7d':
    case 'need_by_2d': {
      const days = reminder.kind === 'need_by_7d' ? 7 : 2;
      const body = (reader: Reader) =>
        `The die for "${request.title}" is needed by ${needByText(reader)}, ${days} days from now, and has not shipped yet.`;
      if (award && toShop) await tell(award.shop_id, { title: `Needed in ${days} days: ${request.title}`, body });
      if (buyer && toPrinter)
        await tell(
          request.organisation_id,
          { title: `Needed in ${days} days: ${request.title}`, body },
          undefined,
          buyer,
        );
      break;
    }
    case 'late_shipment': {
      await trx('die_requests')
        .where({ id: request.id })
        .whereNull('late_flagged_at')
        .update({ late_flagged_at: new Date() });
      const shipDate: string | undefined =
        award?.promised_ship_date instanceof Date
          ? award.promised_ship_date.toISOString().slice(0, 10)
          : award?.promised_ship_date;
      const body = (reader: Reader) =>
        `The die for "${request.title}" was promised to ship by ${shipDate ? formatCalendarDate(shipDate, reader.locale) : 'its promised date'} and has not shipped.`;
      if (award && toShop)
        await tell(award.shop_id, {
          title: `Late: ${request.title}`,
          body: (reader) => `${body(reader)} Mark it shipped, or tell the buyer the new date.`,
        });
      if (toPrinter)
        await tell(request.organisation_id, { title: `Late: ${request.title}`, body }, ['buyer', 'purchasing']);
      break;
    }
    case 'validity_ending':
      await tell(
        request.organisation_id,
        {
          title: `Best bid lapses soon: ${request.title}`,
          body: `The lowest bid on "${request.title}" holds its price for two more days and nothing is awarded yet.`,
        },
        ['purchasing', 'admin'],
      );
      break;
  }
  return ids;
}
