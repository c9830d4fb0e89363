import type { Knex } from 'knex';
import { complexityOf, featureCount } from '@kerfmark/dieline';
import { atDays } from './demoRequests';

/** The imported part of the buyer's price history. */
export async function seedImportedPrices(knex: Knex, org: { id: number }): Promise<void> {
  const day = (d: Date) => d.toISOString().slice(0, 10);
  // Two years of earlier dies the buyer kept in a spreadsheet, as if imported: invented prices
  // that grow with rule length and features, a little dearer for complex dies, with some spread.
  let seed = 11;
  const rand = () => (seed = (seed * 16807) % 2147483647) / 2147483647;
  const shops = ['Brightline Rule & Die', 'Okafor Steel Rule Dies', 'Cedar Bend Die Works', 'Lakeside Cutting Dies'];
  const imported = Array.from({ length: 48 }, (_, i) => {
    const ruleLengthIn = Math.round(40 + rand() * 320);
    // One die in three is intricate: many bends per inch of rule, so the analysis calls it complex.
    const bends = Math.round(
      rand() * ruleLengthIn * (i % 3 === 0 ? 0.6 : 0.3) + (i % 3 === 0 ? ruleLengthIn * 0.9 : 0),
    );
    const curves = Math.round(rand() * 20);
    const joints = Math.round(rand() * 30);
    const punches = Math.round(rand() * 6);
    const features = featureCount({ bends, curves, joints, punches });
    const complexity = complexityOf({ bends, curves, joints, punches }, ruleLengthIn);
    const dieCents = Math.round((18_000 + 420 * ruleLengthIn + 650 * features) * (0.9 + rand() * 0.2) * (1 + i / 480));
    const pricedOn = day(atDays(-730 + i * 14));
    return {
      organisationId: org.id,
      shopName: shops[i % shops.length],
      totalCents: dieCents + 3_500,
      dieCents,
      currency: 'USD',
      pricedOn,
      ruleLengthIn,
      bends,
      curves,
      joints,
      punches,
      complexity,
      source: 'import',
    };
  });
  await knex('priceRecords').insert(imported);
}
