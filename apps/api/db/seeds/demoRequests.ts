// The demo's die requests, each with its own dieline, measured as an upload would be.
import { createHash } from 'node:crypto';
import type { Knex } from 'knex';
import { analyseDielineAsync, type UpsLayout } from '@kerfmark/dieline';
import type { Storage } from '@kerfmark/storage';
import { doorHanger, labelSheet, tuckEndCarton } from './demoDielines';
import { soapSleevePdf } from './demoPdfDielines';
import { dielineContentTypes } from '../../src/services/files/uploadDieline';

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
  /** A DXF drawn as text, or a PDF written as bytes. */
  dieline: { name: string; content: () => string | Promise<Uint8Array> };
}

export const demoRequests: DemoRequest[] = [
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
      // An invented street; the postcode is a real area, as postcodes may be.
      deliveryAddress: '418 Fenwick Yard Lane, Chicago IL',
      deliveryPostcode: '60614',
      notes: 'Nicks at the glue flap corners only, please.',
    },
    deadlineDays: 5,
    needByDays: 21,
    dieline: {
      name: 'tuck-end-carton-2up.dxf',
      content: () => tuckEndCarton({ widthIn: 2.5, depthIn: 1.5, heightIn: 6, ups: 2 }),
    },
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
    dieline: {
      name: 'label-sheet-12up.dxf',
      content: () =>
        labelSheet({ across: 2, along: 6, widthIn: 3.5, heightIn: 1.5, cornerRadiusIn: 0.125, gapIn: 0.25 }),
    },
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
    dieline: {
      name: 'door-hanger-coupon.dxf',
      content: () => doorHanger({ widthIn: 4.25, heightIn: 12, holeDiameterIn: 2, couponHeightIn: 3 }),
    },
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
    dieline: {
      name: 'tea-carton-2up.dxf',
      content: () => tuckEndCarton({ widthIn: 3, depthIn: 2.5, heightIn: 5.25, ups: 2 }),
    },
  },
  {
    org: 'Larkspur Press & Carton',
    jobReference: 'LPC-24168',
    title: 'Soap sleeve, one-up PDF stepped 2 × 5',
    status: 'open',
    press: 'Platen 1 (22 × 30)',
    fields: {
      quantity: 1,
      ups: 10,
      dielineShows: 'one-up',
      upsAcross: 2,
      upsAlong: 5,
      gutterIn: 0,
      pieceGrain: 'with-height',
      pieceWidthIn: 3.5,
      pieceHeightIn: 2.5,
      stockName: '16 pt C1S SBS board',
      caliperIn: 0.016,
      grain: 'long',
      runSheets: 8000,
      ruleTypes: ['cut', 'crease'],
      deliveryPostcode: '60614',
      notes: 'The PDF is one sleeve from our artwork file; lay it out 2 across, 5 along, common-line cut.',
    },
    deadlineDays: 7,
    needByDays: 24,
    dieline: {
      name: 'soap-sleeve-1up.pdf',
      content: () => soapSleevePdf({ widthIn: 3.5, depthIn: 1.25, heightIn: 2.5 }),
    },
  },
];

/** A one-up demo dieline's layout, as the worker reads it from the request. */
function demoLayout(f: Record<string, unknown>): UpsLayout | null {
  if (f.dielineShows !== 'one-up') return null;
  return {
    across: Number(f.upsAcross),
    along: Number(f.upsAlong),
    gutterIn: Number(f.gutterIn ?? 0),
    pieceGrain: f.pieceGrain as UpsLayout['pieceGrain'],
    sheetGrain: (f.grain as UpsLayout['sheetGrain']) ?? null,
  };
}

export const atDays = (days: number) => new Date(Date.now() + days * 86_400_000);

/** A demo dieline stored in S3 and recorded as the request's measured primary file. */
export async function storeDemoDieline(
  knex: Knex,
  storage: Storage,
  file: {
    requestId: number;
    uploadedBy: number;
    fileName: string;
    content: string | Uint8Array;
    format?: 'dxf' | 'svg' | 'pdf';
    metrics: unknown;
    preview: unknown;
    uploadedAt?: Date;
  },
): Promise<void> {
  const s3Key = `requests/${file.requestId}/demo/${file.fileName}`;
  const bytes = typeof file.content === 'string' ? new TextEncoder().encode(file.content) : file.content;
  const format = file.format ?? 'dxf';
  await storage.put(s3Key, bytes, dielineContentTypes[format]);
  await knex('dielineFiles').insert({
    requestId: file.requestId,
    uploadedBy: file.uploadedBy,
    fileName: file.fileName,
    format,
    contentType: dielineContentTypes[format],
    byteSize: bytes.length,
    sha256: createHash('sha256').update(bytes).digest('hex'),
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
export async function seedRequests(knex: Knex, storage: Storage): Promise<void> {
  for (const demo of demoRequests) {
    const org = await knex('organisations').where({ name: demo.org }).first();
    if (await knex('dieRequests').where({ organisationId: org.id, jobReference: demo.jobReference }).first()) continue;
    const buyer = await knex('users').where({ organisationId: org.id, role: 'buyer' }).first();
    const press = await knex('presses').where({ organisationId: org.id, name: demo.press }).first();
    const content = await demo.dieline.content();
    const { metrics, preview, format } = await analyseDielineAsync(content, {
      fileName: demo.dieline.name,
      press: { widthIn: Number(press.maxSheetWidthIn), lengthIn: Number(press.maxSheetLengthIn) },
      layout: demoLayout(demo.fields),
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
      format,
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
