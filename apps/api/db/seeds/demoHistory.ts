// The demo buyer's history: dies bought and received, with their purchase orders and prices.
import type { BidLine } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import { insertSubmittedBid } from './seedBid';
import { analyseDieline } from '@kerfmark/dieline';
import type { Storage } from '@kerfmark/storage';
import { nextPurchaseOrderNumber } from '../../src/services/purchaseOrderNumber';
import { receivedDiePriceRecord } from '../../src/services/priceHistory/receivedDiePriceRecord';
import { doorHanger, labelSheet, tuckEndCarton } from './demoDielines';
import { seedImportedPrices } from './demoImportedPrices';
import { seedOpenBids } from './demoOpenBids';
import { atDays, storeDemoDieline } from './demoRequests';

// Past dies that Larkspur bought and received: awarded bids, purchase orders and the price
// history they left. Prices are invented for the demo.
const pastDies = [
  {
    title: 'Pizza box, 1 up',
    shop: 'Brightline Rule & Die',
    dieline: tuckEndCarton,
    dieCents: 118_500,
    extrasCents: 14_000,
    monthsAgo: 11,
    lateDays: 0,
  },
  {
    title: 'Shelf talker with perforation',
    shop: 'Okafor Steel Rule Dies',
    dieline: doorHanger,
    dieCents: 42_000,
    extrasCents: 3_500,
    monthsAgo: 9,
    lateDays: 2,
  },
  {
    title: 'Sample-pack label sheet',
    shop: 'Cedar Bend Die Works',
    dieline: labelSheet,
    dieCents: 64_500,
    extrasCents: 5_000,
    monthsAgo: 7,
    lateDays: 0,
  },
  {
    title: 'Folding carton for candles',
    shop: 'Brightline Rule & Die',
    dieline: tuckEndCarton,
    dieCents: 109_000,
    extrasCents: 12_500,
    monthsAgo: 5,
    lateDays: 0,
  },
  {
    title: 'Hang tag, 12 up',
    shop: 'Okafor Steel Rule Dies',
    dieline: labelSheet,
    dieCents: 71_000,
    extrasCents: 4_000,
    monthsAgo: 3,
    lateDays: 0,
  },
  {
    title: 'Hotel door hanger',
    shop: 'Cedar Bend Die Works',
    dieline: doorHanger,
    dieCents: 39_500,
    extrasCents: 3_500,
    monthsAgo: 2,
    lateDays: 1,
  },
];

export async function seedHistory(knex: Knex, storage: Storage): Promise<void> {
  const org = await knex('organisations').where({ name: 'Larkspur Press & Carton' }).first();
  if (await knex('priceRecords').where({ organisationId: org.id }).first()) return;
  const purchasing = await knex('users').where({ organisationId: org.id, role: 'purchasing' }).first();
  const press = await knex('presses').where({ organisationId: org.id }).orderBy('id').first();
  const day = (d: Date) => d.toISOString().slice(0, 10);
  for (const [i, past] of pastDies.entries()) {
    const shop = await knex('organisations').where({ name: past.shop }).first();
    const estimator = await knex('users').where({ organisationId: shop.id, role: 'estimator' }).first();
    const content = past.dieline();
    const { metrics, preview } = analyseDieline(content);
    const awardedAt = atDays(-past.monthsAgo * 30);
    const promised = atDays(-past.monthsAgo * 30 + 7);
    const [{ id: requestId }] = await knex('dieRequests')
      .insert({
        organisationId: org.id,
        createdBy: purchasing.id,
        title: past.title,
        jobReference: `LPC-2${3100 + i}`,
        status: 'received',
        quantity: 1,
        ups: 1,
        stockName: '18 pt SBS',
        caliperIn: 0.018,
        ruleTypes: ['cut', 'crease'],
        pressId: press.id,
        needByDate: day(atDays(-past.monthsAgo * 30 + 14)),
        bidDeadline: atDays(-past.monthsAgo * 30 - 3),
        deliveryPostcode: '60614',
        publishedAt: atDays(-past.monthsAgo * 30 - 10),
        biddingClosedAt: atDays(-past.monthsAgo * 30 - 3),
        shippedAt: atDays(-past.monthsAgo * 30 + 7 + past.lateDays),
        receivedAt: atDays(-past.monthsAgo * 30 + 9 + past.lateDays),
        receivedCondition: 'good',
        createdAt: atDays(-past.monthsAgo * 30 - 12),
      })
      .returning('id');
    const uploadedAt = atDays(-past.monthsAgo * 30 - 12);
    await storeDemoDieline(knex, storage, {
      requestId,
      uploadedBy: purchasing.id,
      fileName: `${past.dieline.name.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`)}.dxf`,
      content,
      metrics,
      preview,
      uploadedAt,
    });
    const lines: BidLine[] = [
      { kind: 'die', description: 'Steel-rule die', amountCents: past.dieCents },
      { kind: 'shipping', description: 'Ground', amountCents: past.extrasCents },
    ];
    const { id: bidId, totalCents: total } = await insertSubmittedBid(knex, {
      requestId,
      shopId: shop.id,
      createdBy: estimator.id,
      lines,
      currency: 'USD',
      leadDays: 5,
      promisedShipDate: day(promised),
      validUntil: day(atDays(-past.monthsAgo * 30 + 30)),
      submittedAt: atDays(-past.monthsAgo * 30 - 5),
    });
    const [{ id: awardId }] = await knex('awards')
      .insert({
        requestId,
        bidId,
        shopId: shop.id,
        revision: 1,
        totalCents: total,
        dieCents: past.dieCents,
        currency: 'USD',
        leadDays: 5,
        promisedShipDate: day(promised),
        awardedBy: purchasing.id,
        awardedAt,
        poNumber: await nextPurchaseOrderNumber(knex, awardedAt),
      })
      .returning('id');
    // The received die went into storage: rack, impressions run since, a life the buyer set.
    await knex('libraryDies').insert({
      organisationId: org.id,
      name: `${past.title} (LPC-2${3100 + i})`,
      requestId,
      ups: 1,
      ruleTypes: ['cut', 'crease'],
      pressId: press.id,
      storageLocation: `Rack ${String.fromCharCode(65 + (i % 3))}-${10 + i}`,
      impressions: [182_000, 64_500, 12_000, 240_000, 31_000, 8_000][i] ?? 0,
      impressionLimit: 250_000,
      lastUsedOn: day(atDays(-past.monthsAgo * 10)),
      metrics: JSON.stringify(metrics),
      preview: JSON.stringify(preview),
    });
    await knex('priceRecords').insert(
      receivedDiePriceRecord({
        organisationId: org.id,
        requestId,
        awardId,
        shopId: shop.id,
        shopName: shop.name,
        totalCents: total,
        dieCents: past.dieCents,
        currency: 'USD',
        pricedOn: day(awardedAt),
        metrics,
      }),
    );
  }
  await seedImportedPrices(knex, org);
  await seedOpenBids(knex);
}
