// The demo scenario: invented printers, die shops, people and presses. Safe to load twice.
import { createHash } from 'node:crypto';
import type { Knex } from 'knex';
import bcrypt from 'bcryptjs';
import { analyseDieline } from '@kerfmark/dieline';
import type { Storage } from '@kerfmark/storage';
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
      { name: 'Platen 1 (22 × 30)', kind: 'platen', maxSheetWidthIn: 22, maxSheetLengthIn: 30, typicalSpeedSph: 4000, maxSpeedSph: 5500 },
      { name: 'Flatbed A (28 × 40)', kind: 'flatbed', maxSheetWidthIn: 28, maxSheetLengthIn: 40, typicalSpeedSph: 5000, maxSpeedSph: 7800 },
      { name: 'Old platen (20 × 28)', kind: 'platen', maxSheetWidthIn: 20, maxSheetLengthIn: 28, typicalSpeedSph: 2000, maxSpeedSph: 2800 },
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
      { name: 'Flatbed 1 (23 × 29)', kind: 'flatbed', maxSheetWidthIn: 23, maxSheetLengthIn: 29, typicalSpeedSph: 4500, maxSpeedSph: 6000 },
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
    fields: { quantity: 1, ups: 2, pieceWidthIn: 2.5, pieceHeightIn: 6, stockName: '18 pt C1S SBS board', caliperIn: 0.018, stockWeightGsm: 300, grain: 'long', runSheets: 12000, ruleTypes: ['cut', 'crease'], counterWanted: true, deliveryAddress: '2200 N Clybourn Ave, Chicago IL', deliveryPostcode: '60614', notes: 'Nicks at the glue flap corners only, please.' },
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
    fields: { quantity: 2, ups: 12, pieceWidthIn: 3.5, pieceHeightIn: 1.5, stockName: '60 lb semi-gloss label stock', caliperIn: 0.006, runSheets: 5000, ruleTypes: ['cut', 'kiss'], ejectionRubberWanted: false, deliveryPostcode: '60614' },
    deadlineDays: 2,
    needByDays: 9,
    invited: ['Brightline Rule & Die', 'Okafor Steel Rule Dies'],
    dieline: { name: 'label-sheet-12up.dxf', content: labelSheet },
  },
  {
    org: 'Larkspur Press & Carton',
    jobReference: 'LPC-24152',
    title: 'Door hanger with perforated coupon',
    status: 'draft',
    press: 'Old platen (20 × 28)',
    fields: { quantity: 1, ups: 1, pieceWidthIn: 4.25, pieceHeightIn: 12, stockName: '14 pt C2S cover', caliperIn: 0.014, runSheets: 20000, ruleTypes: ['cut', 'perf'], deliveryPostcode: '60614' },
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
    fields: { quantity: 1, ups: 2, stockName: '20 pt SBS', caliperIn: 0.02, runSheets: 30000, ruleTypes: ['cut', 'crease'], deliveryPostcode: '23510' },
    deadlineDays: 4,
    needByDays: 25,
    dieline: { name: 'tea-carton.dxf', content: tuckEndCarton },
  },
];

const atDays = (days: number) => new Date(Date.now() + days * 86_400_000);

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
    const s3Key = `requests/${id}/demo/${demo.dieline.name}`;
    await storage.put(s3Key, new TextEncoder().encode(content), 'application/dxf');
    await knex('dielineFiles').insert({
      requestId: id,
      uploadedBy: buyer.id,
      fileName: demo.dieline.name,
      format: 'dxf',
      contentType: 'application/dxf',
      byteSize: Buffer.byteLength(content),
      sha256: createHash('sha256').update(content).digest('hex'),
      s3Key,
      isPrimary: true,
      analysisStatus: 'done',
      metrics: JSON.stringify(metrics),
      preview: JSON.stringify(preview),
      analysedAt: new Date(),
    });
    await knex('auditLog').insert({ organisationId: org.id, actorUserId: buyer.id, entity: 'die_request', entityId: id, action: 'created', detail: JSON.stringify({ demo: true }) });
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
  if (opts.storage) await seedRequests(knex, opts.storage);
}
