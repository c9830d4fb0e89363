import type { Knex } from 'knex';
import type { AuthUser } from '../../auth/passport';

export interface EstimateAidRow {
  currency: string;
  dies: number;
  centsPerInch: number | null;
  centsPerBend: number | null;
}

/**
 * The shop's own past prices, from the dies it made that were received: the middle (median)
 * die price per inch of rule and per bend, per currency. Only its own awards count.
 */
export async function shopEstimateAid(knex: Knex, actor: AuthUser): Promise<EstimateAidRow[]> {
  const rows = await knex('priceRecords')
    .where({ shopId: actor.organisationId })
    .groupBy('currency')
    .select('currency')
    .count('* as dies')
    .select(
      knex.raw('percentile_cont(0.5) within group (order by die_cents / nullif(rule_length_in, 0)) as cents_per_inch'),
    )
    .select(
      knex.raw('percentile_cont(0.5) within group (order by die_cents / nullif(bends, 0)::numeric) as cents_per_bend'),
    );
  // Counts come back as text; the medians are null for a shop with no rule length or bends yet.
  const median = (value: unknown) => (value === null || value === undefined ? null : Math.round(Number(value)));
  return rows.map((r) => ({
    currency: String(r.currency),
    dies: Number(r.dies),
    centsPerInch: median(r.centsPerInch),
    centsPerBend: median(r.centsPerBend),
  }));
}
