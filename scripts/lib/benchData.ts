import { analyseDieline } from '@kerfmark/dieline';
import { rectangleDxf } from '@kerfmark/dieline/testing';
import type { Knex } from 'knex';

/**
 * The API benchmark's data set, on the demo printer: open requests with a measured dieline each,
 * a bid from every bench shop on each, and an imported price history. Invented, for load only.
 */
export async function generateBenchData(
  knex: Knex,
  opts: { requests: number; bidsPerRequest: number; priceRecords: number },
): Promise<void> {
  const printer = await knex('organisations').where({ name: 'Larkspur Press & Carton' }).first();
  const buyer = await knex('users').where({ organisation_id: printer.id, role: 'buyer' }).first();
  const shops: number[] = [];
  for (let i = 0; i < opts.bidsPerRequest; i++) {
    const [s] = await knex('organisations')
      .insert({ name: `Bench shop ${i}`, kind: 'die_shop', time_zone: 'America/Chicago', postcode: '60148' })
      .returning('id');
    shops.push(s.id);
  }
  const { metrics, preview } = analyseDieline(rectangleDxf);
  const deadline = new Date(Date.now() + 5 * 86_400_000);
  for (let done = 0; done < opts.requests; done += 500) {
    const ids = await knex('die_requests')
      .insert(
        Array.from({ length: 500 }, (_, i) => ({
          organisation_id: printer.id,
          created_by: buyer.id,
          title: `Bench carton ${done + i}`,
          status: 'open',
          quantity: 1,
          ups: 2,
          rule_types: '{cut,crease}',
          need_by_date: '2027-03-01',
          bid_deadline: deadline,
          delivery_postcode: '60614',
          published_at: new Date(),
        })),
      )
      .returning('id');
    await knex('dieline_files').insert(
      ids.map(({ id }: { id: number }) => ({
        request_id: id,
        file_name: 'bench.dxf',
        format: 'dxf',
        content_type: 'application/dxf',
        byte_size: rectangleDxf.length,
        sha256: 'bench',
        s3_key: `bench/${id}.dxf`,
        is_primary: true,
        analysis_status: 'done',
        metrics: JSON.stringify(metrics),
        preview: JSON.stringify(preview),
      })),
    );
    await knex('bids').insert(
      ids.flatMap(({ id }: { id: number }) =>
        shops.map((shopId, k) => ({
          request_id: id,
          shop_id: shopId,
          lines: JSON.stringify([{ kind: 'die', description: '', amountCents: 50_000 + k * 1000 }]),
          currency: 'USD',
          total_cents: 50_000 + k * 1000,
          die_cents: 50_000 + k * 1000,
          lead_days: 5 + k,
          promised_ship_date: '2027-02-01',
          valid_until: '2027-02-15',
        })),
      ),
    );
  }
  for (let done = 0; done < opts.priceRecords; done += 5000) {
    await knex('price_records').insert(
      Array.from({ length: 5000 }, (_, i) => ({
        organisation_id: printer.id,
        shop_name: `Bench shop ${i % 10}`,
        total_cents: 60_000 + (i % 500) * 100,
        die_cents: 55_000 + (i % 500) * 100,
        currency: 'USD',
        priced_on: '2026-06-01',
        rule_length_in: 50 + (i % 300),
        bends: i % 40,
        complexity: 'simple',
        source: 'import',
      })),
    );
  }
}
