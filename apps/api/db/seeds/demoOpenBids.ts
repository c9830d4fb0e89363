import type { Knex } from 'knex';
import type { BidLine } from '@kerfmark/contracts';
import { insertSubmittedBid } from './seedBid';
import { addWorkingDays } from '@kerfmark/pricing';
import { atDays } from './demoRequests';

/** Open bids from two shops on the demo tuck-end carton, so the open requests and a comparison have content. */
const demoBids = [
  { jobReference: 'LPC-24117', shop: 'Okafor Steel Rule Dies', dieCents: 112_000, leadDays: 6 },
  { jobReference: 'LPC-24117', shop: 'Cedar Bend Die Works', dieCents: 104_500, leadDays: 8 },
];

/** The open bids, sealed until the tuck-end carton's deadline. */
export async function seedOpenBids(knex: Knex): Promise<void> {
  for (const demo of demoBids) {
    const request = await knex('dieRequests').where({ jobReference: demo.jobReference }).first();
    const shop = await knex('organisations').where({ name: demo.shop }).first();
    const estimator = await knex('users').where({ organisationId: shop.id, role: 'estimator' }).first();
    // The promise skips the shop's holidays, as the bid service's does.
    const holidays = new Set<string>(
      (await knex('shopHolidays').where({ shopId: shop.id }).whereNull('removedAt').select('date')).map(
        (h: { date: string }) => h.date,
      ),
    );
    const lines: BidLine[] = [
      { kind: 'die', description: 'Steel-rule die on 5/8 in board', amountCents: demo.dieCents },
      { kind: 'counter', description: 'Phenolic counter', amountCents: 18_000 },
      { kind: 'shipping', description: 'Ground', amountCents: 4_500 },
    ];
    await insertSubmittedBid(knex, {
      requestId: request.id,
      shopId: shop.id,
      createdBy: estimator.id,
      lines,
      currency: 'USD',
      leadDays: demo.leadDays,
      promisedShipDate: addWorkingDays(new Date().toISOString().slice(0, 10), demo.leadDays, holidays),
      validUntil: atDays(45).toISOString().slice(0, 10),
    });
  }
}
