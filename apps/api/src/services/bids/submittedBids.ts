import type { SubmittedBid } from '../../models/SubmittedBid';

/**
 * A request's submitted bids as a JSON array, lowest total first, each with its shop's name and
 * record (awarded jobs, shipped, shipped by the promised date): a part of the request's row.
 */
export const SUBMITTED_BIDS_PART = `(select coalesce(json_agg(json_build_object(
      'id', b.id, 'shopId', b.shop_id, 'shopName', s.name, 'revision', b.revision, 'lines', b.lines, 'currency', b.currency,
      'totalCents', b.total_cents, 'dieCents', b.die_cents, 'leadDays', b.lead_days, 'promisedShipDate', b.promised_ship_date,
      'validUntil', b.valid_until, 'jobs', record.jobs, 'shipped', record.shipped, 'onTime', record.on_time
    ) order by b.total_cents, b.id), '[]')
  from bids b
  join organisations s on s.id = b.shop_id
  left join lateral (select count(*) as jobs, count(r.shipped_at) as shipped,
      count(*) filter (where r.shipped_at::date <= a.promised_ship_date) as on_time
    from awards a join die_requests r on r.id = a.request_id where a.shop_id = b.shop_id) as record on true
  where b.request_id = die_requests.id and b.status = 'submitted')`;

type SubmittedBidRow = Omit<SubmittedBid, 'pastJobs' | 'onTimeRate'> & {
  jobs: number;
  shipped: number;
  onTime: number;
};

/** A bid of the part above, with its shop's on-time rate worked out. */
export function toSubmittedBid({ jobs, shipped, onTime, ...bid }: SubmittedBidRow): SubmittedBid {
  return { ...bid, pastJobs: jobs, onTimeRate: shipped ? onTime / shipped : null };
}
