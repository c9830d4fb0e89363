// The demo scenario: invented printers, die shops, people and presses. Safe to load twice.
import { createHash } from 'node:crypto';
import type { Knex } from 'knex';
import bcrypt from 'bcryptjs';
import { analyseDieline, complexityOf, featureCount } from '@kerfmark/dieline';

import { addWorkingDays } from '@kerfmark/pricing';
import type { Storage } from '@kerfmark/storage';
import { nextPurchaseOrderNumber } from '../../src/services/purchaseOrderNumber';
import { receivedDiePriceRecord } from '../../src/services/receivedDiePriceRecord';
import { doorHanger, labelSheet, tuckEndCarton } from './demoDielines';

export const DEMO_PASSWORD = 'kerfmark-demo-2026';

interface DemoOrg {
  name: string;
  kind: 'printer' | 'die_shop';
  timeZone: string;
  postcode: string;
  users: Array<{ email: string; name: string; role: string }>;
  presses?: Array<{
    name: string;
    kind: 'platen' | 'flatbed' | 'rotary';
    maxSheetWidthIn: number;
    maxSheetLengthIn: number;
    typicalSpeedSph: number;
    maxSpeedSph: number;
  }>;
}

// Press sizes and speeds follow common practice: a small platen takes about 22 × 30 in,
// die-cutters run about 2,000 to 5,000 sheets an hour, up to about 7,800 on a fast one.
export const demoOrganisations: DemoOrg[] = [
  {
    name: 'Larkspur Press & Carton',
    kind: 'printer',
    timeZone: 'America/Chicago',
    postcode: '60614',
    users: [
      { email: 'maya@larkspur.example', name: 'Maya Lindqvist', role: 'buyer' },
      { email: 'daniel@larkspur.example', name: 'Daniel Osei', role: 'purchasing' },
      { email: 'priya@larkspur.example', name: 'Priya Raman', role: 'admin' },
    ],
    presses: [
      {
        name: 'Platen 1 (22 × 30)',
        kind: 'platen',
        maxSheetWidthIn: 22,
        maxSheetLengthIn: 30,
        typicalSpeedSph: 4000,
        maxSpeedSph: 5500,
      },
      {
        name: 'Flatbed A (28 × 40)',
        kind: 'flatbed',
        maxSheetWidthIn: 28,
        maxSheetLengthIn: 40,
        typicalSpeedSph: 5000,
        maxSpeedSph: 7800,
      },
      {
        name: 'Old platen (20 × 28)',
        kind: 'platen',
        maxSheetWidthIn: 20,
        maxSheetLengthIn: 28,
        typicalSpeedSph: 2000,
        maxSpeedSph: 2800,
      },
    ],
  },
  {
    name: 'Tidewater Print Finishing',
    kind: 'printer',
    timeZone: 'America/New_York',
    postcode: '23510',
    users: [
      { email: 'tomas@tidewater.example', name: 'Tomás Herrera', role: 'buyer' },
      { email: 'june@tidewater.example', name: 'June Park', role: 'purchasing' },
      { email: 'ruth@tidewater.example', name: 'Ruth Adeyemi', role: 'admin' },
    ],
    presses: [
      {
        name: 'Flatbed 1 (23 × 29)',
        kind: 'flatbed',
        maxSheetWidthIn: 23,
        maxSheetLengthIn: 29,
        typicalSpeedSph: 4500,
        maxSpeedSph: 6000,
      },
    ],
  },
  {
    name: 'Brightline Rule & Die',
    kind: 'die_shop',
    timeZone: 'America/Chicago',
    postcode: '60148',
    users: [
      { email: 'grace@brightline.example', name: 'Grace Whitfield', role: 'estimator' },
      { email: 'ken@brightline.example', name: 'Ken Abiodun', role: 'admin' },
    ],
  },
  {
    name: 'Okafor Steel Rule Dies',
    kind: 'die_shop',
    timeZone: 'America/Indiana/Indianapolis',
    postcode: '46204',
    users: [
      { email: 'chidi@okafor.example', name: 'Chidi Okafor', role: 'estimator' },
      { email: 'ada@okafor.example', name: 'Ada Okafor', role: 'admin' },
    ],
  },
  {
    name: 'Cedar Bend Die Works',
    kind: 'die_shop',
    timeZone: 'America/Chicago',
    postcode: '53202',
    users: [
      { email: 'lena@cedarbend.example', name: 'Lena Marsh', role: 'estimator' },
      { email: 'oscar@cedarbend.example', name: 'Oscar Lind', role: 'admin' },
    ],
  },
];

interface DemoRequest {
  org: string;
  jobReference: string;
  title: string;
  status: 'draft' | 'open';
  press: string;
  fields: Record<string, unknown>;
  deadlineDays: number;
  needByDays: number;
  invited?: string[];
  dieline: { name: string; content: () => string };
}

const demoRequests: DemoRequest[] = [
  {
    org: 'Larkspur Press & Carton',
    jobReference: 'LPC-24117',
    title: 'Straight tuck-end carton, 2 up',
    status: 'open',
    press: 'Platen 1 (22 × 30)',
    fields: {
      quantity: 1,
      ups: 2,
      pieceWidthIn: 2.5,
      pieceHeightIn: 6,
      stockName: '18 pt C1S SBS board',
      caliperIn: 0.018,
      stockWeightGsm: 300,
      grain: 'long',
      runSheets: 12000,
      ruleTypes: ['cut', 'crease'],
      counterWanted: true,
      deliveryAddress: '2200 N Clybourn Ave, Chicago IL',
      deliveryPostcode: '60614',
      notes: 'Nicks at the glue flap corners only, please.',
    },
    deadlineDays: 5,
    needByDays: 21,
    dieline: { name: 'tuck-end-carton-2up.dxf', content: tuckEndCarton },
  },
  {
    org: 'Larkspur Press & Carton',
    jobReference: 'LPC-24130',
    title: 'Rounded label sheet, 12 up, kiss cut',
    status: 'open',
    press: 'Platen 1 (22 × 30)',
    fields: {
      quantity: 2,
      ups: 12,
      pieceWidthIn: 3.5,
      pieceHeightIn: 1.5,
      stockName: '60 lb semi-gloss label stock',
      caliperIn: 0.006,
      runSheets: 5000,
      ruleTypes: ['cut', 'kiss'],
      ejectionRubberWanted: false,
      deliveryPostcode: '60614',
    },
    deadlineDays: 2,
    // Tight on purpose: five working days of lead time and the run do not fit in six days.
    needByDays: 6,
    invited: ['Brightline Rule & Die', 'Okafor Steel Rule Dies'],
    dieline: { name: 'label-sheet-12up.dxf', content: labelSheet },
  },
  {
    org: 'Larkspur Press & Carton',
    jobReference: 'LPC-24152',
    title: 'Door hanger with perforated coupon',
    status: 'draft',
    press: 'Old platen (20 × 28)',
    fields: {
      quantity: 1,
      ups: 1,
      pieceWidthIn: 4.25,
      pieceHeightIn: 12,
      stockName: '14 pt C2S cover',
      caliperIn: 0.014,
      runSheets: 20000,
      ruleTypes: ['cut', 'perf'],
      deliveryPostcode: '60614',
    },
    deadlineDays: 6,
    needByDays: 12,
    dieline: { name: 'door-hanger.dxf', content: doorHanger },
  },
  {
    org: 'Tidewater Print Finishing',
    jobReference: 'TPF-0871',
    title: 'Retail carton for tea, 2 up',
    status: 'open',
    press: 'Flatbed 1 (23 × 29)',
    fields: {
      quantity: 1,
      ups: 2,
      stockName: '20 pt SBS',
      caliperIn: 0.02,
      runSheets: 30000,
      ruleTypes: ['cut', 'crease'],
      deliveryPostcode: '23510',
    },
    deadlineDays: 4,
    needByDays: 25,
    dieline: { name: 'tea-carton.dxf', content: tuckEndCarton },
  },
];

const atDays = (days: number) => new Date(Date.now() + days * 86_400_000);

/** A demo dieline stored in S3 and recorded as the request's measured primary file. */
async function storeDemoDieline(
  knex: Knex,
  storage: Storage,
  file: {
    requestId: number;
    uploadedBy: number;
    fileName: string;
    content: string;
    metrics: unknown;
    preview: unknown;
    uploadedAt?: Date;
  },
): Promise<void> {
  const s3Key = `requests/${file.requestId}/demo/${file.fileName}`;
  await storage.put(s3Key, new TextEncoder().encode(file.content), 'application/dxf');
  await knex('dielineFiles').insert({
    requestId: file.requestId,
    uploadedBy: file.uploadedBy,
    fileName: file.fileName,
    format: 'dxf',
    contentType: 'application/dxf',
    byteSize: Buffer.byteLength(file.content),
    sha256: createHash('sha256').update(file.content).digest('hex'),
    s3Key,
    isPrimary: true,
    analysisStatus: 'done',
    metrics: JSON.stringify(file.metrics),
    preview: JSON.stringify(file.preview),
    analysedAt: file.uploadedAt ?? new Date(),
    uploadedAt: file.uploadedAt ?? new Date(),
  });
}

/** Demo requests with their dielines stored in S3 and measured, unless they are there already. */
async function seedRequests(knex: Knex, storage: Storage): Promise<void> {
  for (const demo of demoRequests) {
    const org = await knex('organisations').where({ name: demo.org }).first();
    if (await knex('dieRequests').where({ organisationId: org.id, jobReference: demo.jobReference }).first()) continue;
    const buyer = await knex('users').where({ organisationId: org.id, role: 'buyer' }).first();
    const press = await knex('presses').where({ organisationId: org.id, name: demo.press }).first();
    const content = demo.dieline.content();
    const { metrics, preview } = analyseDieline(content, {
      fileName: demo.dieline.name,
      press: { widthIn: Number(press.maxSheetWidthIn), lengthIn: Number(press.maxSheetLengthIn) },
    });
    const [{ id }] = await knex('dieRequests')
      .insert({
        ...demo.fields,
        organisationId: org.id,
        createdBy: buyer.id,
        title: demo.title,
        jobReference: demo.jobReference,
        status: demo.status,
        pressId: press.id,
        needByDate: atDays(demo.needByDays).toISOString().slice(0, 10),
        bidDeadline: atDays(demo.deadlineDays),
        visibility: demo.invited ? 'invited' : 'public',
        publishedAt: demo.status === 'open' ? new Date() : null,
      })
      .returning('id');
    for (const shopName of demo.invited ?? []) {
      const shop = await knex('organisations').where({ name: shopName }).first();
      await knex('requestInvitations').insert({ requestId: id, shopId: shop.id });
    }
    await storeDemoDieline(knex, storage, {
      requestId: id,
      uploadedBy: buyer.id,
      fileName: demo.dieline.name,
      content,
      metrics,
      preview,
    });
    await knex('auditLog').insert({
      organisationId: org.id,
      actorUserId: buyer.id,
      entity: 'die_request',
      entityId: id,
      action: 'created',
      detail: JSON.stringify({ demo: true }),
    });
  }
}

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

/** Open bids from two shops on the demo tuck-end carton, so a board and a comparison have content. */
const demoBids = [
  { jobReference: 'LPC-24117', shop: 'Okafor Steel Rule Dies', dieCents: 112_000, leadDays: 6 },
  { jobReference: 'LPC-24117', shop: 'Cedar Bend Die Works', dieCents: 104_500, leadDays: 8 },
];

async function seedHistory(knex: Knex, storage: Storage): Promise<void> {
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
    const total = past.dieCents + past.extrasCents;
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
    const lines = [
      { kind: 'die', description: 'Steel-rule die', amountCents: past.dieCents },
      { kind: 'shipping', description: 'Ground', amountCents: past.extrasCents },
    ];
    const [{ id: bidId }] = await knex('bids')
      .insert({
        requestId,
        shopId: shop.id,
        status: 'submitted',
        revision: 1,
        lines: JSON.stringify(lines),
        currency: 'USD',
        totalCents: total,
        dieCents: past.dieCents,
        leadDays: 5,
        promisedShipDate: day(promised),
        validUntil: day(atDays(-past.monthsAgo * 30 + 30)),
        submittedAt: atDays(-past.monthsAgo * 30 - 5),
      })
      .returning('id');
    await knex('bidRevisions').insert({
      bidId,
      revision: 1,
      action: 'submitted',
      lines: JSON.stringify(lines),
      currency: 'USD',
      totalCents: total,
      leadDays: 5,
      promisedShipDate: day(promised),
      validUntil: day(atDays(-past.monthsAgo * 30 + 30)),
      createdBy: estimator.id,
      createdAt: atDays(-past.monthsAgo * 30 - 5),
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

  for (const demo of demoBids) {
    const request = await knex('dieRequests').where({ jobReference: demo.jobReference }).first();
    const shop = await knex('organisations').where({ name: demo.shop }).first();
    const estimator = await knex('users').where({ organisationId: shop.id, role: 'estimator' }).first();
    const lines = [
      { kind: 'die', description: 'Steel-rule die on 5/8 in board', amountCents: demo.dieCents },
      { kind: 'counter', description: 'Phenolic counter', amountCents: 18_000 },
      { kind: 'shipping', description: 'Ground', amountCents: 4_500 },
    ];
    const total = demo.dieCents + 22_500;
    const shipDate = addWorkingDays(new Date().toISOString().slice(0, 10), demo.leadDays);
    const validUntil = atDays(45).toISOString().slice(0, 10);
    const [{ id: bidId }] = await knex('bids')
      .insert({
        requestId: request.id,
        shopId: shop.id,
        status: 'submitted',
        revision: 1,
        lines: JSON.stringify(lines),
        currency: 'USD',
        totalCents: total,
        dieCents: demo.dieCents,
        leadDays: demo.leadDays,
        promisedShipDate: shipDate,
        validUntil,
      })
      .returning('id');
    await knex('bidRevisions').insert({
      bidId,
      revision: 1,
      action: 'submitted',
      lines: JSON.stringify(lines),
      currency: 'USD',
      totalCents: total,
      leadDays: demo.leadDays,
      promisedShipDate: shipDate,
      validUntil,
      createdBy: estimator.id,
    });
  }
}

export async function seedDemo(knex: Knex, opts: { storage?: Storage; bcryptRounds?: number } = {}): Promise<void> {
  const bcryptRounds = opts.bcryptRounds ?? 10;
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, bcryptRounds);
  await knex.transaction(async (trx) => {
    for (const org of demoOrganisations) {
      const [row] = await trx('organisations')
        .insert({ name: org.name, kind: org.kind, timeZone: org.timeZone, postcode: org.postcode })
        .onConflict('name')
        .merge(['kind', 'timeZone', 'postcode'])
        .returning('id');
      const organisationId = (row as { id: number }).id;
      for (const user of org.users) {
        await trx('users')
          .insert({ ...user, organisationId, passwordHash, status: 'active' })
          .onConflict('email')
          .ignore();
      }
      for (const press of org.presses ?? []) {
        await trx('presses')
          .insert({ ...press, organisationId })
          .onConflict(['organisationId', 'name'])
          .ignore();
      }
    }
  });
  if (opts.storage) {
    await seedRequests(knex, opts.storage);
    await seedHistory(knex, opts.storage);
  }
}
