import fc from 'fast-check';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import {
  AnswerCreate,
  ApproveInput,
  AwardInput,
  CreditNoteInput,
  DisputeInput,
  InvoiceInput,
  PaymentInput,
  BidInput,
  DeclineInput,
  DieRequestCreate,
  DieRequestUpdate,
  DieRunInput,
  importFields,
  InvitationAccept,
  InvitationCreate,
  InvitationPreviewQuery,
  LayerMapUpdate,
  PdfPageUpdate,
  RateCardInput,
  EstimateQuery,
  LibraryDieUpdate,
  LoginInput,
  OpenRequestsQuery,
  DieShopsQuery,
  OrganisationProfileUpdate,
  PreferencesUpdate,
  PressCreate,
  PressUpdate,
  HolidayCreate,
  HolidayRegionsQuery,
  HolidayYearQuery,
  PublicHolidaysLoad,
  PriceHistoryQuery,
  QuestionCreate,
  ReceiveInput,
  RequestListQuery,
  ShipInput,
  UserUpdate,
} from '@kerfmark/contracts';
import { DieRequest, DielineFile } from '../models';
import { bidBody, inDays, rectangleDxf } from './fixtures';
import { csvText, edgeBodies, extremeDates, jsonBody, junkText, pathJunk, queryEdges, queryString } from './fuzzInputs';
import {
  app,
  createOpenRequest,
  createPress,
  createUser,
  createWorld,
  knex,
  PASSWORD,
  signIn,
  unique,
  type World,
} from './harness';
import { routeList, routesReadingQuery } from './routeList';
import { aRateCard } from './aRateCard';
import { createInvoiceAt, invoiceToday, netThirty } from './invoiceStages';
import { createRequestAt } from './requestStages';

// Property-based bad input (fast-check) at every route that takes input: JSON bodies, query-string
// filters and path parameters. Whatever arrives, no route answers 500, and every refusal says why.

let w: World;
let tokens: Record<Actor, string>;
/** Record ids the routes are pointed at, each made for the routes that change it. */
const f: Record<string, number> = {};

type Actor = keyof World['tokens'] | 'spare';

interface Case {
  /** Who may use the route, so that the input reaches validation and the service, not the 403. */
  as: Actor | null;
  /** The path's parameters: records the actor may reach. */
  params?: () => Record<string, number>;
  /** A well-formed JSON body, and the schema whose fields (optional ones too) are broken in turn. */
  body?: { example: () => object; schema?: { shape: object } };
  /** A multipart CSV upload with a column mapping. */
  csv?: true;
  /** The filters the route reads from the query string. */
  query?: { shape: object };
}

const id = (key: string) => () => ({ id: f[key]! });
const none = { example: () => ({}) };

const pressExample = {
  name: 'Flatbed 2',
  kind: 'flatbed',
  maxSheetWidthIn: 40,
  maxSheetLengthIn: 28,
  typicalSpeedSph: 5000,
  maxSpeedSph: 7500,
  active: true,
};
const requestExample = () => ({
  title: 'Tuck-end carton, 4 up',
  jobReference: 'J-2291',
  quantity: 1,
  ups: 4,
  pieceWidthIn: 4,
  pieceHeightIn: 3,
  stockName: '18 pt SBS',
  caliperIn: 0.018,
  stockWeightGsm: 300,
  grain: 'long',
  stockKind: 'paperboard',
  stockWeightEntry: '80 lb cover',
  foldAcrossGrain: true,
  heavyInkOnFold: false,
  colourBreakOnFold: false,
  pressId: f.press,
  runSheets: 10_000,
  plannedLeadDays: 5,
  ruleTypes: ['cut', 'crease'],
  counterWanted: false,
  ejectionRubberWanted: true,
  needByDate: inDays(30),
  bidDeadline: new Date(Date.now() + 7 * 86_400_000).toISOString(),
  deliveryAddress: '1 Test Street',
  deliveryPostcode: '60614',
  notes: 'Nicks on the long sides only',
  visibility: 'invited',
  invitedShopIds: [w.shop.id],
});
const libraryDieExample = {
  name: 'Sleeve die',
  storageLocation: 'Rack B3',
  condition: 'good',
  impressionLimit: 100_000,
  listed: false,
};

/** Every route that takes input, by the name routeList gives it. */
const cases: Record<string, Case> = {
  'POST /api/auth/login': {
    as: null,
    body: { example: () => ({ email: `spare-${unique()}@test.example`, password: PASSWORD }), schema: LoginInput },
  },
  'POST /api/auth/logout': { as: 'spare', body: none },
  'PUT /api/me/preferences': {
    as: 'buyer',
    body: { example: () => ({ email: { bids_ready: false, shipped: true } }), schema: PreferencesUpdate },
  },
  'POST /api/users': {
    as: 'printerAdmin',
    body: {
      example: () => ({ email: `new-${unique()}@test.example`, name: 'New Person', role: 'buyer' }),
      schema: InvitationCreate,
    },
  },
  'PATCH /api/users/:id': {
    as: 'printerAdmin',
    params: id('user'),
    body: { example: () => ({ role: 'purchasing', status: 'active' }), schema: UserUpdate },
  },
  'GET /api/invitations/preview': { as: null, query: InvitationPreviewQuery },
  'POST /api/invitations/accept': {
    as: null,
    body: { example: () => ({ token: 't'.repeat(32), password: PASSWORD }), schema: InvitationAccept },
  },
  'POST /api/invitations/:id/resend': { as: 'printerAdmin', params: id('invitation'), body: none },
  'POST /api/invitations/:id/revoke': { as: 'printerAdmin', params: id('revocable'), body: none },
  'POST /api/presses': { as: 'printerAdmin', body: { example: () => pressExample, schema: PressCreate } },
  'GET /api/holidays': { as: 'estimator', query: HolidayYearQuery },
  'GET /api/holidays/regions': { as: 'estimator', query: HolidayRegionsQuery },
  'POST /api/holidays': {
    as: 'shopAdmin',
    body: { example: () => ({ date: inDays(50), name: 'Stocktaking day' }), schema: HolidayCreate },
  },
  'POST /api/holidays/public': {
    as: 'shopAdmin',
    body: { example: () => ({ country: 'US', region: 'IL', year: 2027 }), schema: PublicHolidaysLoad },
  },
  'DELETE /api/holidays/:id': { as: 'shopAdmin', params: id('holiday'), body: none },
  'PATCH /api/presses/:id': {
    as: 'printerAdmin',
    params: id('press'),
    body: { example: () => pressExample, schema: PressUpdate },
  },
  'PATCH /api/organisation/profile': {
    as: 'printerAdmin',
    body: {
      example: () => ({
        legalName: 'Fuzz Folding Cartons LLC',
        officeAddress: '1 Test Street\nSpringfield',
        postcode: '60614',
        contactEmail: 'office@test.example',
        paymentTerms: 'Net 30',
        deliveryPoints: [{ name: 'Dock 1', address: '1 Test Street', postcode: '60614' }],
      }),
      schema: OrganisationProfileUpdate,
    },
  },
  'GET /api/requests': { as: 'buyer', query: RequestListQuery },
  'POST /api/requests': { as: 'buyer', body: { example: requestExample, schema: DieRequestCreate } },
  'GET /api/requests/:id': { as: 'buyer', params: id('open') },
  'GET /api/requests/:id/fair-price': { as: 'buyer', params: id('open') },
  'PATCH /api/requests/:id': {
    as: 'buyer',
    params: id('draft'),
    body: { example: requestExample, schema: DieRequestUpdate },
  },
  'POST /api/requests/:id/publish': { as: 'buyer', params: id('draft'), body: none },
  'POST /api/requests/:id/cancel': {
    as: 'buyer',
    params: id('cancellable'),
    body: { example: () => ({ reason: 'The carton was dropped from the range' }) },
  },
  // Path junk only: see `excluded`.
  'POST /api/requests/:id/files': { as: 'buyer', params: id('draft') },
  'POST /api/requests/:id/questions': {
    as: 'estimator',
    params: id('open'),
    body: { example: () => ({ question: 'Are the nicks marked?' }), schema: QuestionCreate },
  },
  'POST /api/requests/:id/questions/:questionId/answer': {
    as: 'buyer',
    params: () => ({ id: f.open!, questionId: f.question! }),
    body: { example: () => ({ answer: 'Yes, on layer NICKS.' }), schema: AnswerCreate },
  },
  'GET /api/files/:id': { as: 'buyer', params: id('file') },
  'GET /api/files/:id/preview': { as: 'buyer', params: id('file') },
  'GET /api/files/:id/download': { as: 'buyer', params: id('file') },
  'POST /api/files/:id/primary': { as: 'buyer', params: id('file'), body: none },
  'PUT /api/files/:id/layers': {
    as: 'buyer',
    params: id('file'),
    body: { example: () => ({ layerMap: { CUT: 'cut', CREASE: 'crease' } }), schema: LayerMapUpdate },
  },
  'PUT /api/rate-card': { as: 'shopAdmin', body: { example: () => aRateCard(), schema: RateCardInput } },
  'GET /api/requests/:id/estimate': { as: 'estimator', params: id('open'), query: EstimateQuery },
  'PUT /api/files/:id/page': {
    as: 'buyer',
    params: id('file'),
    body: { example: () => ({ page: null }), schema: PdfPageUpdate },
  },
  'DELETE /api/files/:id': { as: 'buyer', params: id('draftFile'), body: none },
  'POST /api/notifications/:id/read': { as: 'buyer', params: id('notification'), body: none },
  'POST /api/notifications/read-all': { as: 'buyer', body: none },
  'GET /api/price-history': { as: 'buyer', query: PriceHistoryQuery },
  'GET /api/price-history/export.csv': { as: 'buyer', query: PriceHistoryQuery },
  'GET /api/price-history/fit': { as: 'buyer', query: PriceHistoryQuery },
  'POST /api/price-history/import/preview': { as: 'purchasing', csv: true },
  'POST /api/price-history/import': { as: 'purchasing', csv: true },
  'POST /api/requests/:id/bids': {
    as: 'estimator',
    params: id('biddable'),
    body: { example: () => bidBody(50_000, { notes: 'Ejection rubber included' }), schema: BidInput },
  },
  'GET /api/requests/:id/my-bid': { as: 'estimator', params: id('revisable') },
  'POST /api/requests/:id/decline': {
    as: 'estimator',
    params: id('declinable'),
    body: { example: () => ({ reason: 'Too large for our laser' }), schema: DeclineInput },
  },
  'PATCH /api/bids/:id': {
    as: 'estimator',
    params: id('revisableBid'),
    body: { example: () => bidBody(48_000), schema: BidInput },
  },
  'POST /api/bids/:id/withdraw': { as: 'estimator', params: id('withdrawableBid'), body: none },
  'GET /api/requests/:id/bids': { as: 'purchasing', params: id('awarded') },
  'POST /api/requests/:id/close-bidding': { as: 'purchasing', params: id('closable'), body: none },
  'POST /api/requests/:id/award': {
    as: 'purchasing',
    params: id('awardable'),
    body: { example: () => ({ bidId: f.awardableBid, reason: 'Ships sooner' }), schema: AwardInput },
  },
  'POST /api/requests/:id/receive': {
    as: 'buyer',
    params: id('shipped'),
    body: { example: () => ({ condition: 'good', notes: 'Well packed' }), schema: ReceiveInput },
  },
  'GET /api/requests/:id/ocds': { as: 'purchasing', params: id('awarded') },
  'POST /api/requests/:id/start-production': { as: 'estimator', params: id('awarded'), body: none },
  'POST /api/requests/:id/ship': {
    as: 'estimator',
    params: id('inProduction'),
    body: { example: () => ({ trackingNote: 'Parcel, tracking 1Z999' }), schema: ShipInput },
  },
  'GET /api/purchase-orders/:id/pdf': { as: 'purchasing', params: id('purchaseOrder') },
  'GET /api/requests/:id/invoices': { as: 'purchasing', params: id('invoicedRequest') },
  'GET /api/requests/:id/invoice-match': { as: 'purchasing', params: id('invoicedRequest') },
  'GET /api/invoices/:id': { as: 'estimator', params: id('invoice') },
  'POST /api/requests/:id/invoices': {
    as: 'estimator',
    params: id('toInvoice'),
    body: {
      example: () => ({
        invoiceDate: invoiceToday(w),
        taxRateBp: 825,
        dies: 1,
        lines: [
          { orderLine: 0, label: 'Die', amountCents: 80_000 },
          { orderLine: null, label: 'Rush', amountCents: 2_500, reason: 'Approved change' },
        ],
      }),
      schema: InvoiceInput,
    },
  },
  'POST /api/invoices/:id/revisions': {
    as: 'estimator',
    params: id('disputedInvoice'),
    body: { example: () => ({ invoiceDate: invoiceToday(w), taxRateBp: 0 }), schema: InvoiceInput },
  },
  'POST /api/invoices/:id/credit-notes': {
    as: 'estimator',
    params: id('creditableInvoice'),
    body: {
      example: () => ({
        invoiceDate: invoiceToday(w),
        lines: [{ orderLine: 1, label: 'Shipping', amountCents: -100, reason: 'Overbilled' }],
      }),
      schema: CreditNoteInput,
    },
  },
  'POST /api/invoices/:id/dispute': {
    as: 'purchasing',
    params: id('invoice'),
    body: { example: () => ({ reason: 'Wrong PO number' }), schema: DisputeInput },
  },
  'POST /api/invoices/:id/approve': {
    as: 'purchasing',
    params: id('approvableInvoice'),
    body: { example: () => ({ reason: 'Checked' }), schema: ApproveInput },
  },
  'POST /api/invoices/:id/payments': {
    as: 'purchasing',
    params: id('payableInvoice'),
    body: {
      example: () => ({ paidOn: invoiceToday(w), reference: 'ACH 9', amountCents: 83_500 }),
      schema: PaymentInput,
    },
  },
  'GET /api/library/:id': { as: 'buyer', params: id('libraryDie') },
  'PATCH /api/library/:id': {
    as: 'buyer',
    params: id('libraryDie'),
    body: { example: () => libraryDieExample, schema: LibraryDieUpdate },
  },
  'POST /api/library/:id/runs': {
    as: 'buyer',
    params: id('libraryDie'),
    body: {
      example: () => ({ runOn: '2026-11-30', impressions: 6_000, jobReference: 'J-1', notes: 'Clean run' }),
      schema: DieRunInput,
    },
  },
  'GET /api/requests/:id/library-matches': { as: 'buyer', params: id('open') },
  'GET /api/open-requests': { as: 'estimator', query: OpenRequestsQuery },
  'GET /api/die-shops': { as: 'buyer', query: DieShopsQuery },
};

/** Write routes not fuzzed with JSON, and why. */
const excluded: Record<string, string> = {
  'POST /api/requests/:id/files':
    'a multipart dieline upload; wrong type, empty, missing and oversized files are tested in requestRoutes.test.ts',
};

const bearer = (actor: Actor | null) => (actor ? { Authorization: `Bearer ${tokens[actor]}` } : {});

/** The route's request, with `:params` filled in (one of them, at times, with junk). */
function send(route: string, params: Record<string, string | number> = {}): request.Test {
  const [method, template] = route.split(' ') as [string, string];
  const path = template.replace(/:(\w+)/g, (_, name: string) => String(params[name]));
  return (request(app) as unknown as Record<string, (p: string) => request.Test>)[method.toLowerCase()]!(path).set(
    bearer(cases[route]!.as),
  );
}

const sendJson = (route: string, params: Record<string, string | number> | undefined, body: unknown) =>
  send(route, params).set('Content-Type', 'application/json').send(JSON.stringify(body));

/** No 500, and a refusal that says what was wrong. */
function expectClearAnswer(res: request.Response, input: unknown) {
  const said = `${JSON.stringify(input)} → ${res.status} ${JSON.stringify(res.body)}`;
  expect(res.status, said).toBeLessThan(500);
  if (res.status >= 400) expect(res.body.error?.message, said).toBeTruthy();
}

/** A fixture's step; anything but success stops the run. */
async function succeeded(req: request.Test) {
  const res = await req;
  if (res.status >= 300) throw new Error(`fixture: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body;
}

/** A fixture's step through a route, as its case's actor. */
const ok = (route: string, params: Record<string, number>, body: object = {}) =>
  succeeded(sendJson(route, params, body));

const bidOn = async (requestId: number) =>
  (await ok('POST /api/requests/:id/bids', { id: requestId }, bidBody(50_000))).id as number;
const pastDeadline = (requestId: number) =>
  DieRequest.query()
    .patch({ bidDeadline: new Date(Date.now() - 60_000) })
    .findById(requestId);

/** An open request with our shop's bid, past its deadline, awarded, and moved on as far as `to`. */
async function awarded(to: 'awarded' | 'in_production' | 'shipped' = 'awarded') {
  const id = (await createOpenRequest(w)).id;
  const bidId = await bidOn(id);
  await pastDeadline(id);
  const { award } = await ok('POST /api/requests/:id/award', { id }, { bidId });
  if (to !== 'awarded') await ok('POST /api/requests/:id/start-production', { id });
  if (to === 'shipped') await ok('POST /api/requests/:id/ship', { id }, { trackingNote: 'Parcel 1Z1' });
  return { id, purchaseOrder: award.id as number };
}

const inserted = async (table: string, row: object) => Number((await knex(table).insert(row).returning('id'))[0].id);

beforeAll(async () => {
  w = await createWorld();
  tokens = { ...w.tokens, spare: await signIn(await createUser(w.printer, 'buyer')) };
  f.user = (await createUser(w.printer, 'buyer')).id;
  f.press = (await createPress(w.printer)).id;
  f.holiday = await inserted('shopHolidays', { shopId: w.shop.id, date: inDays(70), name: 'Stocktaking day' });
  const invite = async () =>
    (await ok('POST /api/users', {}, { email: `invitee-${unique()}@test.example`, name: 'Invitee', role: 'buyer' }))
      .id as number;
  f.invitation = await invite();
  f.revocable = await invite();

  f.draft = (await ok('POST /api/requests', {}, { title: 'Draft', quantity: 1, ups: 1, ruleTypes: ['cut'] })).id;
  f.draftFile = (
    await succeeded(
      send('POST /api/requests/:id/files', { id: f.draft! }).attach('file', Buffer.from(rectangleDxf), 'c.dxf'),
    )
  ).id;
  for (const key of [
    'open',
    'cancellable',
    'declinable',
    'closable',
    'biddable',
    'revisable',
    'withdrawable',
    'awardable',
  ])
    f[key] = (await createOpenRequest(w)).id;
  f.file = (await DielineFile.query().findOne({ requestId: f.open! }))!.id;
  f.question = (
    await ok('POST /api/requests/:id/questions', { id: f.open! }, { question: 'Which layer has the nicks?' })
  ).id;
  f.revisableBid = await bidOn(f.revisable!);
  f.withdrawableBid = await bidOn(f.withdrawable!);
  f.awardableBid = await bidOn(f.awardable!);
  await pastDeadline(f.awardable!);
  ({ id: f.awarded, purchaseOrder: f.purchaseOrder } = await awarded());
  f.inProduction = (await awarded('in_production')).id;
  f.shipped = (await awarded('shipped')).id;
  f.notification = await inserted('notifications', {
    userId: w.users.buyer.id,
    kind: 'bids_ready',
    title: 'Bids ready',
    body: 'Two bids',
  });
  await netThirty(w);
  const invoiced = await createInvoiceAt(w, 'submitted');
  f.invoicedRequest = invoiced.requestId;
  f.invoice = invoiced.invoiceId;
  f.toInvoice = (await createRequestAt(w, 'shipped')).id;
  f.disputedInvoice = (await createInvoiceAt(w, 'disputed')).invoiceId;
  f.creditableInvoice = (await createInvoiceAt(w, 'disputed')).invoiceId;
  f.approvableInvoice = (await createInvoiceAt(w, 'submitted')).invoiceId;
  f.payableInvoice = (await createInvoiceAt(w, 'approved')).invoiceId;
  f.libraryDie = await inserted('libraryDies', {
    organisationId: w.printer.id,
    name: 'Sleeve die',
    ups: 1,
    ruleTypes: ['cut'],
    impressionLimit: 100_000,
  });
}, 180_000);

const shapeKeys = (schema?: { shape: object }) => Object.keys(schema?.shape ?? {});

describe('fuzzing every route that takes input', () => {
  it('has a case for every route that takes a body, a filter or a path parameter', () => {
    const routes = routeList(app);
    // The handlers' source is searched for req.query: a known filtered list shows the search works.
    expect(routesReadingQuery(app)).toContain('GET /api/requests');
    const missing = {
      body: routes.filter((r) => !r.startsWith('GET ') && !cases[r]?.body && !cases[r]?.csv && !excluded[r]),
      query: routesReadingQuery(app).filter((r) => !cases[r]?.query),
      params: routes.filter((r) => /\/:\w+/.test(r) && !cases[r]),
      gone: Object.keys(cases).filter((r) => !routes.includes(r)),
    };
    expect(missing).toEqual({ body: [], query: [], params: [], gone: [] });
  });

  for (const [route, c] of Object.entries(cases)) {
    if (c.body) {
      const { example, schema } = c.body;
      it(`${route}: JSON bodies never answer 500`, async () => {
        for (const body of edgeBodies(example())) expectClearAnswer(await sendJson(route, c.params?.(), body), body);
        await fc.assert(
          fc.asyncProperty(jsonBody(example(), shapeKeys(schema)), async (body) => {
            expectClearAnswer(await sendJson(route, c.params?.(), body), body);
          }),
          { numRuns: 40, seed: 20261202 },
        );
      });
    }

    if (c.csv) {
      it(`${route}: multipart CSV uploads never answer 500`, async () => {
        const headers = Object.values(importFields).map((field) => field.label);
        const mapping = fc.oneof(
          fc
            .dictionary(fc.constantFrom(...Object.keys(importFields)), fc.oneof(fc.constantFrom(...headers), junkText))
            .map((m) => JSON.stringify(m)),
          junkText,
        );
        const upload = fc.record({
          csv: fc.oneof(csvText(headers), junkText),
          field: fc.constantFrom('file', 'other'),
          mapping: fc.option(mapping),
        });
        await fc.assert(
          fc.asyncProperty(upload, async ({ csv, field, mapping }) => {
            let req = send(route).attach(field, Buffer.from(csv), 'history.csv');
            if (mapping !== null) req = req.field('mapping', mapping);
            expectClearAnswer(await req, { csv, field, mapping });
          }),
          { numRuns: 30, seed: 20261203 },
        );
      });
    }

    if (c.query) {
      const keys = shapeKeys(c.query);
      it(`${route}: injection-shaped and random values in each of ${keys.join(', ')} never answer 500`, async () => {
        for (const key of keys) {
          for (const value of queryEdges)
            expectClearAnswer(await send(route).query({ [key]: value }), { [key]: value });
        }
        await fc.assert(
          fc.asyncProperty(queryString(keys), async (query) => {
            expectClearAnswer(await send(route).query(query), query);
          }),
          { numRuns: 30, seed: 20261204 },
        );
      });
    }

    for (const name of route.match(/:\w+/g)?.map((p) => p.slice(1)) ?? []) {
      it(`${route}: junk in :${name} is a 4xx`, async () => {
        await fc.assert(
          fc.asyncProperty(pathJunk, async (value) => {
            const res = await send(route, { ...c.params?.(), [name]: value }).send(c.body?.example());
            expectClearAnswer(res, value);
            expect(res.status, `${value} → ${res.status}`).toBeGreaterThanOrEqual(400);
          }),
          { numRuns: 20, seed: 20261205 },
        );
      });
    }
  }
});

/** The date and instant fields of a body or a filter, by name. */
const dateKey = /date|deadline|until|^runOn$|^(from|to)$|needBy/i;

describe('extreme dates in every date field', () => {
  for (const [route, c] of Object.entries(cases)) {
    const bodyKeys = shapeKeys(c.body?.schema).filter((k) => dateKey.test(k));
    const queryKeys = shapeKeys(c.query).filter((k) => dateKey.test(k));
    if (!bodyKeys.length && !queryKeys.length) continue;
    it(`${route}: ${[...bodyKeys, ...queryKeys].join(', ')} at and past the edges never answer 500`, async () => {
      for (const value of extremeDates) {
        for (const key of bodyKeys) {
          const body = { ...c.body!.example(), [key]: value };
          expectClearAnswer(await sendJson(route, c.params?.(), body), body);
        }
        for (const key of queryKeys)
          expectClearAnswer(await send(route, c.params?.()).query({ [key]: value }), { [key]: value });
      }
    });
  }
});

// Inputs the fuzz run found answered 500, each now a clear 400 naming what is wrong.
describe('inputs that once answered 500', () => {
  const refused = async (res: request.Test, field: string) => {
    const done = await res;
    expect(done.status, JSON.stringify(done.body)).toBe(400);
    expect(done.body.error.fields).toHaveProperty([field]);
  };

  it('a broken %-escape in a path parameter', async () => {
    await refused(send('GET /api/requests/:id', { id: '%E0%A4%A' }), 'path');
  });

  it('a NUL character or half a character pair in text', async () => {
    await refused(
      sendJson(
        'POST /api/library/:id/runs',
        { id: f.libraryDie! },
        { runOn: '2026-11-30', impressions: 1, jobReference: '\u0000' },
      ),
      'jobReference',
    );
    const line = { kind: 'die', amountCents: 1_000, description: 'a\ud800b' };
    await refused(
      sendJson('PATCH /api/bids/:id', { id: f.revisableBid! }, bidBody(1_000, { lines: [line] })),
      'lines.0.description',
    );
    await refused(
      sendJson('PUT /api/files/:id/layers', { id: f.file! }, { layerMap: { 'CUT\u0000': 'cut' } }),
      'layerMap.CUT\u0000',
    );
    await refused(send('GET /api/requests').query({ q: '\u0000' }), 'q');
    await refused(send('GET /api/price-history').query({ shop: '\u0000' }), 'shop');
  });

  it('an id past the 4-byte id column', async () => {
    await refused(sendJson('POST /api/requests', {}, { ...requestExample(), pressId: 2_147_483_648 }), 'pressId');
    await refused(
      sendJson('POST /api/requests', {}, { ...requestExample(), invitedShopIds: [9_999_999_999_999] }),
      'invitedShopIds.0',
    );
    await refused(sendJson('POST /api/requests/:id/award', { id: f.awardable! }, { bidId: 2_147_483_648 }), 'bidId');
    await refused(send('GET /api/requests').query({ pressId: '2147483648' }), 'pressId');
  });

  it('a library die changed with nothing to change', async () => {
    await refused(sendJson('PATCH /api/library/:id', { id: f.libraryDie! }, {}), '_');
  });
});
