// The demo buyer's history: dies bought and received, with their purchase orders and prices.
import type { BidLine } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import { insertSubmittedBid } from './seedBid';
import { analyseDieline, PRICED_RULE_TYPES } from '@kerfmark/dieline';
import type { Storage } from '@kerfmark/storage';
import { nextPurchaseOrderNumber } from '../../src/services/purchaseOrderNumber';
import { receivedDiePriceRecord } from '../../src/services/priceHistory/receivedDiePriceRecord';
import { doorHanger, hangTag, labelSheet, pizzaBox, shelfTalker, tuckEndCarton } from './demoDielines';
import { seedImportedPrices } from './demoImportedPrices';
import { seedOpenBids } from './demoOpenBids';
import { atDays, storeDemoDieline } from './demoRequests';

// Past dies that Larkspur bought and received: awarded bids, purchase orders and the price
// history they left. Prices are invented for the demo.
const pastDies = [
  {
    title: 'Pizza box, 1 up',
    ups: 1,
    shop: 'Brightline Rule & Die',
    dieline: { name: 'pizza-box-1up.dxf', content: () => pizzaBox({ sizeIn: 10, depthIn: 1.75 }) },
    dieCents: 118_500,
    extrasCents: 14_000,
    monthsAgo: 11,
    lateDays: 0,
  },
  {
    title: 'Shelf talker with perforation',
    ups: 1,
    shop: 'Okafor Steel Rule Dies',
    dieline: {
      name: 'shelf-talker-perf.dxf',
      content: () => shelfTalker({ widthIn: 4, heightIn: 5, tabHeightIn: 1.25, couponHeightIn: 1.5 }),
    },
    dieCents: 42_000,
    extrasCents: 3_500,
    monthsAgo: 9,
    lateDays: 2,
  },
  {
    title: 'Sample-pack label sheet',
    ups: 12,
    shop: 'Cedar Bend Die Works',
    dieline: {
      name: 'sample-pack-labels.dxf',
      content: () => labelSheet({ across: 4, along: 3, widthIn: 2, heightIn: 3, cornerRadiusIn: 0.25, gapIn: 0.125 }),
    },
    dieCents: 64_500,
    extrasCents: 5_000,
    monthsAgo: 7,
    lateDays: 0,
  },
  {
    title: 'Folding carton for candles',
    ups: 1,
    shop: 'Brightline Rule & Die',
    dieline: {
      name: 'candle-carton-1up.dxf',
      content: () => tuckEndCarton({ widthIn: 3.25, depthIn: 3.25, heightIn: 3.75, ups: 1 }),
    },
    dieCents: 109_000,
    extrasCents: 12_500,
    monthsAgo: 5,
    lateDays: 0,
  },
  {
    title: 'Hang tag, 12 up',
    ups: 12,
    shop: 'Okafor Steel Rule Dies',
    dieline: {
      name: 'hang-tag-12up.dxf',
      content: () =>
        hangTag({
          across: 4,
          along: 3,
          widthIn: 2,
          heightIn: 3.5,
          cornerRadiusIn: 0.25,
          holeDiameterIn: 0.1875,
          gapIn: 0.125,
        }),
    },
    dieCents: 71_000,
    extrasCents: 4_000,
    monthsAgo: 3,
    lateDays: 0,
  },
  {
    title: 'Hotel door hanger',
    ups: 1,
    shop: 'Cedar Bend Die Works',
    dieline: {
      name: 'hotel-door-hanger.dxf',
      content: () => doorHanger({ widthIn: 3.5, heightIn: 9, holeDiameterIn: 1.625 }),
    },
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
    const content = past.dieline.content();
    const { metrics, preview } = analyseDieline(content);
    const ruleTypes = PRICED_RULE_TYPES.filter((t) => metrics.length[t] > 0);
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
        ups: past.ups,
        stockName: '18 pt SBS',
        caliperIn: 0.018,
        ruleTypes,
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
      fileName: past.dieline.name,
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
      ups: past.ups,
      ruleTypes,
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
