import { describe, expect, it } from 'vitest';
import { actorOf, createOrg, createWorld, knex } from '../../test/harness';
import { shopEstimateAid } from './shopEstimateAid';

async function priceRecord(
  organisationId: number,
  shopId: number,
  dieCents: number,
  ruleLengthIn: number,
  bends: number,
) {
  await knex('priceRecords').insert({
    organisationId,
    shopId,
    shopName: 'A shop',
    totalCents: dieCents,
    dieCents,
    currency: 'USD',
    pricedOn: '2026-10-01',
    ruleLengthIn,
    bends,
    complexity: 'simple',
  });
}

describe('shopEstimateAid', () => {
  it('gives the middle die price per inch and per bend of the shop’s own dies only', async () => {
    const w = await createWorld();
    // Per inch: 100, 200 and 600 cents; the median of three is the middle one, 200.
    await priceRecord(w.printer.id, w.shop.id, 10_000, 100, 10);
    await priceRecord(w.printer.id, w.shop.id, 20_000, 100, 40);
    await priceRecord(w.printer.id, w.shop.id, 60_000, 100, 0);
    const rival = await createOrg('die_shop');
    await priceRecord(w.printer.id, rival.id, 1_000_000, 1, 1);
    const [usd] = await shopEstimateAid(knex, actorOf(w.users.estimator, w.shop));
    // Per bend: 1000 and 500 cents (a die with no bends has no price per bend); the median of two is their mean.
    expect(usd).toEqual({ currency: 'USD', dies: 3, centsPerInch: 200, centsPerBend: 750 });
  });

  it('is empty for a shop with no received dies', async () => {
    const shop = await createOrg('die_shop');
    const w = await createWorld();
    expect(await shopEstimateAid(knex, { ...actorOf(w.users.estimator, w.shop), organisationId: shop.id })).toEqual([]);
  });
});
