import type { RuleType } from '@kerfmark/contracts';
import type { Knex } from 'knex';

export interface BoardCandidate {
  id: number;
  bidDeadline: Date;
  needByDate: string | null;
  deliveryPostcode: string | null;
  ruleTypes: RuleType[];
  /** Priced rule (all rule but 'other') of the measured dieline, in inches; null before analysis. */
  ruleLengthIn: number | null;
  complexity: 'simple' | 'complex' | null;
  declined: boolean;
  hasBid: boolean;
}

/**
 * Every request open to this die shop for bids, with only the columns the board filters and
 * sorts on: one query, whatever the number of open requests. The measured dieline is the one
 * marked primary, else the newest analysed, as everywhere else.
 */
export async function boardCandidates(knex: Knex, shopId: number, search?: string): Promise<BoardCandidate[]> {
  const query = knex('dieRequests as r')
    .leftJoin(
      knex.raw(
        `lateral (select f.metrics from dieline_files f where f.request_id = r.id and f.analysis_status = 'done'
          order by f.is_primary desc, f.uploaded_at desc limit 1) as m on true`,
      ),
    )
    .where('r.status', 'open')
    .where('r.bidDeadline', '>', knex.fn.now())
    .where((visible) =>
      visible.where('r.visibility', 'public').orWhereExists(knex('requestInvitations as i').where('i.requestId', knex.ref('r.id')).where('i.shopId', shopId)),
    )
    .select('r.id', 'r.bidDeadline', 'r.needByDate', 'r.deliveryPostcode', 'r.ruleTypes')
    .select(knex.raw(`(m.metrics->'length'->>'total')::float8 - coalesce((m.metrics->'length'->>'other')::float8, 0) as rule_length_in`))
    .select(knex.raw(`m.metrics->>'complexity' as complexity`))
    .select(knex.raw('exists (select 1 from request_declines d where d.request_id = r.id and d.shop_id = ?) as declined', [shopId]))
    .select(knex.raw('exists (select 1 from bids b where b.request_id = r.id and b.shop_id = ?) as has_bid', [shopId]));
  if (search) {
    const like = `%${search.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    query
      .join('organisations as o', 'o.id', 'r.organisationId')
      .where((b) => b.whereILike('r.title', like).orWhereILike('r.jobReference', like).orWhereILike('o.name', like));
  }
  return (await query) as BoardCandidate[];
}
