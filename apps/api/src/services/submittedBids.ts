import type { BidLine } from '@kerfmark/contracts';
import type { Knex } from 'knex';

export interface SubmittedBid {
  id: number;
  shopId: number;
  shopName: string;
  revision: number;
  lines: BidLine[];
  currency: string;
  totalCents: number;
  dieCents: number;
  leadDays: number;
  promisedShipDate: string;
  validUntil: string;
  /** The shop's record: its awarded jobs, and of those shipped the share shipped by the promised date. */
  pastJobs: number;
  onTimeRate: number | null;
}

/** A request's submitted bids, lowest total first, each with its shop's name and record: one query. */
export async function submittedBids(knex: Knex, requestId: number): Promise<SubmittedBid[]> {
  const rows = await knex('bids as b')
    .join('organisations as s', 's.id', 'b.shopId')
    .joinRaw(
      `left join lateral (select count(*) as jobs, count(r.shipped_at) as shipped,
         count(*) filter (where r.shipped_at::date <= a.promised_ship_date) as on_time
       from awards a join die_requests r on r.id = a.request_id where a.shop_id = b.shop_id) as record on true`,
    )
    .where({ 'b.requestId': requestId, 'b.status': 'submitted' })
    .orderBy([{ column: 'b.totalCents' }, { column: 'b.id' }])
    .select('b.id', 'b.shopId', 's.name as shopName', 'b.revision', 'b.lines', 'b.currency', 'b.totalCents', 'b.dieCents', 'b.leadDays', 'b.promisedShipDate', 'b.validUntil', 'record.jobs', 'record.shipped', 'record.onTime')
    .options({ prepare: true });
  return (rows as Array<Omit<SubmittedBid, 'pastJobs' | 'onTimeRate'> & { jobs: number; shipped: number; onTime: number }>).map(({ jobs, shipped, onTime, ...bid }) => ({
    ...bid,
    pastJobs: Number(jobs),
    onTimeRate: Number(shipped) ? Number(onTime) / Number(shipped) : null,
  }));
}
