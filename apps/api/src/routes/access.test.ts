import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { newToken } from '../lib/hashToken';
import type { OrgKind } from '@kerfmark/contracts';
import { actionRefusal, loadFacts, maySee, type Actor as AccessActor, type RequestAction } from '../access';
import { DielineFile, Invitation, Notification, type Organisation, type User } from '../models';
import { bidBody, inDays, rectangleSvg } from '../test/fixtures';
import {
  app,
  createOpenRequest,
  createOrg,
  createPress,
  createWorld,
  knex,
  PASSWORD,
  unique,
  type World,
} from '../test/harness';
import { addDieline, callAs, createReadyDraft, createRequestAt, type StagedRequest } from '../test/requestStages';
import { routeList } from '../test/routeList';
import { aRateCard } from '../test/aRateCard';
import { createInvoiceAt, invoiceToday, netThirty, type StagedInvoice } from '../test/invoiceStages';

type Actor = 'anonymous' | 'buyer' | 'purchasing' | 'printerAdmin' | 'estimator' | 'shopAdmin';
type ForEach<T> = Record<Actor, T>;

const actors: Actor[] = ['anonymous', 'buyer', 'purchasing', 'printerAdmin', 'estimator', 'shopAdmin'];
const printerSide: Actor[] = ['buyer', 'purchasing', 'printerAdmin'];
const shopSide: Actor[] = ['estimator', 'shopAdmin'];

interface RouteCase {
  name: string;
  send: (world: World, actor: Actor) => request.Test;
  expect: ForEach<number>;
  /** The route spends the caller's token, so each actor calls it from a world of its own. */
  ownWorld?: boolean;
}

const everyone = (status: number, anonymous = 401): ForEach<number> => ({
  anonymous,
  buyer: status,
  purchasing: status,
  printerAdmin: status,
  estimator: status,
  shopAdmin: status,
});
/** A printers' route: every printer role gets `status` unless `except` says otherwise; die shops get 403. */
const printers = (status: number, except: Partial<ForEach<number>> = {}): ForEach<number> => ({
  ...everyone(status),
  estimator: 403,
  shopAdmin: 403,
  ...except,
});
/** A die shops' route: both shop roles get `status`; printers get 403. */
const shops = (status: number): ForEach<number> => ({
  ...everyone(status),
  buyer: 403,
  purchasing: 403,
  printerAdmin: 403,
});
/** An admins' route, in either kind of organisation. */
const admins = (status: number): ForEach<number> => ({ ...everyone(403), printerAdmin: status, shopAdmin: status });

/** The world's user behind an actor; where a case needs someone's account or record, anonymous uses the buyer's. */
const member = (actor: Actor) => (actor === 'anonymous' ? 'buyer' : actor);

// Two invented past dies, in the columns `priceMapping` names.
const priceCsv = 'Date,Supplier,Die price,Rule length (in)\n2026-03-16,Shop A,612.50,88\n2026-05-04,Shop B,455.00,61\n';
const priceMapping = {
  pricedOn: 'Date',
  shopName: 'Supplier',
  diePrice: 'Die price',
  ruleLengthIn: 'Rule length (in)',
};

/** What the cases act on, made for each world in `setUp`. */
interface Fixtures {
  press: number;
  /** An open request every die shop may see, with its measured dieline and a question from the world's shop. */
  open: number;
  openFile: number;
  question: number;
  /** A draft of the printer's, with an uploaded SVG dieline: die shops cannot see it. */
  draft: number;
  draftFile: number;
  /** An open request the world's shop bid on. */
  bid: StagedRequest;
  /** An awarded request: bids opened, the purchase order issued. */
  awarded: StagedRequest;
  /** A stock die the world's shop listed (every organisation sees it), and one of the printer's own. */
  stockDie: number;
  printerDie: number;
  /** A closure of the world's shop to come, and one of another shop. */
  holiday: number;
  otherShopHoliday: number;
  /** A live invitation's link token. */
  previewToken: string;
  /** For each actor, one in its own organisation (anonymous: the printer's), or its own. */
  ownDie: ForEach<number>;
  notice: ForEach<number>;
  toResend: ForEach<number>;
  toRevoke: ForEach<number>;
  acceptToken: ForEach<string>;
  /** For routes that change their target, one each: see `oneEach`. */
  toDelete: ForEach<number>;
  toPublish: ForEach<number>;
  toCancel: ForEach<number>;
  toClose: ForEach<number>;
  toBidOn: ForEach<number>;
  toWithdraw: ForEach<number>;
  toAward: ForEach<StagedRequest>;
  toStart: ForEach<number>;
  toShip: ForEach<number>;
  toReceive: ForEach<number>;
  /** A shipped die's invoice awaiting approval, for the reads. */
  invoiced: StagedInvoice;
  toInvoice: ForEach<number>;
  toRevise: ForEach<StagedInvoice>;
  toCredit: ForEach<StagedInvoice>;
  toDispute: ForEach<StagedInvoice>;
  toApprove: ForEach<StagedInvoice>;
  toPay: ForEach<StagedInvoice>;
}
const fixtures = new WeakMap<World, Fixtures>();
const fx = (w: World): Fixtures => {
  const found = fixtures.get(w);
  if (!found) throw new Error('no fixtures for this world');
  return found;
};

// Each role's access to each route: role and organisation kind, enforced by the API.
const cases: RouteCase[] = [
  { name: 'GET /api/health', send: () => request(app).get('/api/health'), expect: everyone(200, 200) },
  { name: 'GET /api/health/live', send: () => request(app).get('/api/health/live'), expect: everyone(200, 200) },
  { name: 'GET /api/health/ready', send: () => request(app).get('/api/health/ready'), expect: everyone(200, 200) },
  {
    name: 'POST /api/auth/login',
    send: (w, actor) =>
      request(app)
        .post('/api/auth/login')
        .send({ email: w.users[member(actor)].email, password: PASSWORD }),
    expect: everyone(200, 200),
  },
  { name: 'GET /api/me', send: () => request(app).get('/api/me'), expect: everyone(200) },
  { name: 'GET /api/users', send: () => request(app).get('/api/users'), expect: everyone(200) },
  {
    name: 'POST /api/users',
    send: (_w, actor) =>
      request(app)
        .post('/api/users')
        .send({
          email: `new-${unique()}@test.example`,
          name: 'New Person',
          role: actor === 'shopAdmin' ? 'estimator' : 'buyer',
        }),
    expect: admins(201),
  },
  {
    name: 'PATCH /api/users/:id',
    send: (w, actor) =>
      request(app)
        .patch(
          `/api/users/${actor === 'shopAdmin' || actor === 'estimator' ? w.users.estimator.id : w.users.purchasing.id}`,
        )
        .send({ role: actor === 'shopAdmin' || actor === 'estimator' ? 'estimator' : 'purchasing' }),
    expect: admins(200),
  },

  // Invitations: the link's token is the invitee's only credential, so preview and accept are public.
  { name: 'GET /api/invitations', send: () => request(app).get('/api/invitations'), expect: admins(200) },
  {
    name: 'GET /api/invitations/preview',
    send: (w) =>
      request(app)
        .get('/api/invitations/preview')
        .query({ token: fx(w).previewToken }),
    expect: everyone(200, 200),
  },
  {
    name: 'POST /api/invitations/accept',
    send: (w, actor) =>
      request(app)
        .post('/api/invitations/accept')
        .send({ token: fx(w).acceptToken[actor], password: 'a long enough password' }),
    expect: everyone(201, 201),
  },
  {
    name: 'POST /api/invitations/:id/resend (an invitation of the caller’s organisation)',
    send: (w, actor) => request(app).post(`/api/invitations/${fx(w).toResend[actor]}/resend`),
    expect: admins(200),
  },
  {
    name: 'POST /api/invitations/:id/revoke (an invitation of the caller’s organisation)',
    send: (w, actor) => request(app).post(`/api/invitations/${fx(w).toRevoke[actor]}/revoke`),
    expect: admins(200),
  },

  { name: 'GET /api/presses', send: () => request(app).get('/api/presses'), expect: printers(200) },
  {
    name: 'POST /api/presses',
    send: () =>
      request(app)
        .post('/api/presses')
        .send({
          name: `Press ${unique()}`,
          kind: 'platen',
          maxSheetWidthIn: 22,
          maxSheetLengthIn: 30,
          typicalSpeedSph: 4000,
          maxSpeedSph: 5000,
        }),
    expect: printers(201, { buyer: 403, purchasing: 403 }),
  },
  {
    name: 'PATCH /api/presses/:id',
    send: (w) =>
      request(app)
        .patch(`/api/presses/${fx(w).press}`)
        .send({ typicalSpeedSph: 3500 }),
    expect: printers(200, { buyer: 403, purchasing: 403 }),
  },

  // The organisation's own profile: every member reads it, its admin keeps it.
  {
    name: 'GET /api/organisation/profile',
    send: () => request(app).get('/api/organisation/profile'),
    expect: everyone(200),
  },
  {
    name: 'PATCH /api/organisation/profile',
    send: () => request(app).patch('/api/organisation/profile').send({ contactEmail: 'office@test.example' }),
    expect: admins(200),
  },

  // The die shop's holidays: its people read the calendar, its admin keeps it.
  { name: 'GET /api/holidays', send: () => request(app).get('/api/holidays?year=2027'), expect: shops(200) },
  {
    name: 'GET /api/holidays/regions',
    send: () => request(app).get('/api/holidays/regions?country=US'),
    expect: shops(200),
  },
  {
    name: 'POST /api/holidays',
    send: () =>
      request(app)
        .post('/api/holidays')
        .send({ date: inDays(45), name: 'Stocktaking day' }),
    expect: { ...shops(403), shopAdmin: 201 },
  },
  {
    name: 'POST /api/holidays/public',
    send: () => request(app).post('/api/holidays/public').send({ country: 'US', region: 'IL', year: 2027 }),
    expect: { ...shops(403), shopAdmin: 200 },
  },
  {
    name: 'DELETE /api/holidays/:id (a holiday of the caller’s shop)',
    send: (w) => request(app).delete(`/api/holidays/${fx(w).holiday}`),
    expect: { ...shops(403), shopAdmin: 204 },
  },
  {
    name: 'DELETE /api/holidays/:id (another shop’s holiday)',
    send: (w) => request(app).delete(`/api/holidays/${fx(w).otherShopHoliday}`),
    expect: { ...shops(403), shopAdmin: 404 },
  },

  { name: 'GET /api/me/dashboard', send: () => request(app).get('/api/me/dashboard'), expect: everyone(200) },
  { name: 'GET /api/me/preferences', send: () => request(app).get('/api/me/preferences'), expect: everyone(200) },
  {
    name: 'PUT /api/me/preferences',
    send: () =>
      request(app)
        .put('/api/me/preferences')
        .send({ email: { bids_ready: false } }),
    expect: everyone(200),
  },
  { name: 'GET /api/notifications', send: () => request(app).get('/api/notifications'), expect: everyone(200) },
  {
    name: 'POST /api/notifications/:id/read (the caller’s own notice)',
    send: (w, actor) => request(app).post(`/api/notifications/${fx(w).notice[actor]}/read`),
    expect: everyone(204),
  },
  {
    name: 'POST /api/notifications/read-all',
    send: () => request(app).post('/api/notifications/read-all'),
    expect: everyone(204),
  },

  // The die library.
  { name: 'GET /api/library', send: () => request(app).get('/api/library'), expect: everyone(200) },
  {
    name: 'GET /api/library/:id (a die shop’s listed stock die)',
    send: (w) => request(app).get(`/api/library/${fx(w).stockDie}`),
    expect: everyone(200),
  },
  {
    name: 'GET /api/library/:id (a printer’s own die: another organisation’s record)',
    send: (w) => request(app).get(`/api/library/${fx(w).printerDie}`),
    expect: printers(200, { estimator: 404, shopAdmin: 404 }),
  },
  {
    name: 'PATCH /api/library/:id (a die of the caller’s organisation)',
    send: (w, actor) =>
      request(app)
        .patch(`/api/library/${fx(w).ownDie[actor]}`)
        .send({ storageLocation: 'Rack B4' }),
    expect: everyone(200),
  },
  {
    name: 'POST /api/library/:id/runs',
    send: (w) =>
      request(app)
        .post(`/api/library/${fx(w).printerDie}/runs`)
        .send({ runOn: inDays(-1), impressions: 1_200 }),
    expect: printers(201),
  },

  // Die requests.
  { name: 'GET /api/requests', send: () => request(app).get('/api/requests'), expect: printers(200) },
  {
    name: 'POST /api/requests',
    send: () =>
      request(app)
        .post('/api/requests')
        .send({ title: `Access ${unique()}`, quantity: 1, ups: 1, ruleTypes: ['cut'] }),
    expect: printers(201),
  },
  {
    name: 'GET /api/requests/:id',
    send: (w) => request(app).get(`/api/requests/${fx(w).open}`),
    expect: everyone(200),
  },
  {
    name: 'PATCH /api/requests/:id',
    send: (w) =>
      request(app)
        .patch(`/api/requests/${fx(w).draft}`)
        .send({ notes: 'Nicks on the long sides only.' }),
    expect: printers(200),
  },
  {
    name: 'POST /api/requests/:id/publish',
    send: (w, actor) => request(app).post(`/api/requests/${fx(w).toPublish[actor]}/publish`),
    expect: printers(200),
  },
  {
    name: 'POST /api/requests/:id/cancel',
    send: (w, actor) =>
      request(app)
        .post(`/api/requests/${fx(w).toCancel[actor]}/cancel`)
        .send({ reason: 'The job moved to next quarter.' }),
    expect: printers(200),
  },
  {
    name: 'POST /api/requests/:id/files',
    send: (w) =>
      request(app)
        .post(`/api/requests/${fx(w).draft}/files`)
        .attach('file', Buffer.from(rectangleSvg), 'label.svg'),
    expect: printers(201),
  },
  {
    name: 'GET /api/requests/:id/fair-price',
    send: (w) => request(app).get(`/api/requests/${fx(w).open}/fair-price`),
    expect: printers(200),
  },
  {
    name: 'GET /api/requests/:id/library-matches',
    send: (w) => request(app).get(`/api/requests/${fx(w).open}/library-matches`),
    expect: printers(200),
  },
  {
    name: 'POST /api/requests/:id/questions',
    send: (w) =>
      request(app)
        .post(`/api/requests/${fx(w).open}/questions`)
        .send({ question: 'Does the grain run across the tuck flap?' }),
    expect: shops(201),
  },
  {
    name: 'POST /api/requests/:id/questions/:questionId/answer',
    send: (w) =>
      request(app)
        .post(`/api/requests/${fx(w).open}/questions/${fx(w).question}/answer`)
        .send({ answer: 'Yes, across the flap.' }),
    expect: printers(200),
  },

  // Dieline files.
  {
    name: 'GET /api/files/:id (on an open request)',
    send: (w) => request(app).get(`/api/files/${fx(w).openFile}`),
    expect: everyone(200),
  },
  {
    name: 'GET /api/files/:id (on a draft: another organisation’s record)',
    send: (w) => request(app).get(`/api/files/${fx(w).draftFile}`),
    expect: printers(200, { estimator: 404, shopAdmin: 404 }),
  },
  {
    name: 'GET /api/files/:id/preview',
    send: (w) => request(app).get(`/api/files/${fx(w).openFile}/preview`),
    expect: everyone(200),
  },
  {
    name: 'GET /api/files/:id/download',
    send: (w) => request(app).get(`/api/files/${fx(w).openFile}/download`),
    expect: everyone(200),
  },
  {
    name: 'POST /api/files/:id/primary',
    send: (w) => request(app).post(`/api/files/${fx(w).draftFile}/primary`),
    expect: printers(200),
  },
  {
    name: 'PUT /api/files/:id/layers',
    send: (w) =>
      request(app)
        .put(`/api/files/${fx(w).draftFile}/layers`)
        .send({ layerMap: { cut: 'cut' } }),
    expect: printers(200),
  },
  {
    // The draft's file is a DXF: the route is reached, and refuses a page choice for it.
    name: 'PUT /api/files/:id/page',
    send: (w) =>
      request(app)
        .put(`/api/files/${fx(w).draftFile}/page`)
        .send({ page: null }),
    expect: printers(400),
  },
  {
    name: 'DELETE /api/files/:id',
    send: (w, actor) => request(app).delete(`/api/files/${fx(w).toDelete[actor]}`),
    expect: printers(204),
  },

  // The die shops' open requests, bids, the award and the die's way back.
  {
    name: 'GET /api/open-requests',
    send: () => request(app).get('/api/open-requests'),
    expect: shops(200),
  },
  { name: 'GET /api/die-shops', send: () => request(app).get('/api/die-shops'), expect: printers(200) },
  { name: 'GET /api/estimate-aid', send: () => request(app).get('/api/estimate-aid'), expect: shops(200) },
  // The rate card: estimating from it, and checking it, say 409 until the shop's admin saves one,
  // which the PUT case below does (cases run in this order).
  {
    name: 'GET /api/requests/:id/estimate',
    send: (w) => request(app).get(`/api/requests/${fx(w).open}/estimate?leadDays=5`),
    expect: shops(409),
  },
  {
    name: 'GET /api/rate-card/calibration',
    send: () => request(app).get('/api/rate-card/calibration'),
    expect: shops(409),
  },
  { name: 'GET /api/rate-card', send: () => request(app).get('/api/rate-card'), expect: shops(200) },
  {
    name: 'PUT /api/rate-card',
    send: () => request(app).put('/api/rate-card').send(aRateCard()),
    expect: { ...everyone(403), shopAdmin: 200 },
  },
  {
    name: 'POST /api/requests/:id/bids',
    send: (w, actor) =>
      request(app)
        .post(`/api/requests/${fx(w).toBidOn[actor]}/bids`)
        .send(bidBody(75_000)),
    expect: shops(201),
  },
  {
    name: 'GET /api/requests/:id/my-bid',
    send: (w) => request(app).get(`/api/requests/${fx(w).bid.id}/my-bid`),
    expect: shops(200),
  },
  {
    name: 'POST /api/requests/:id/decline',
    send: (w) =>
      request(app)
        .post(`/api/requests/${fx(w).open}/decline`)
        .send({ reason: 'No laser time this month.' }),
    expect: shops(204),
  },
  {
    name: 'PATCH /api/bids/:id',
    send: (w) =>
      request(app)
        .patch(`/api/bids/${fx(w).bid.bidId}`)
        .send(bidBody(78_000)),
    expect: shops(200),
  },
  {
    name: 'POST /api/bids/:id/withdraw',
    send: (w, actor) => request(app).post(`/api/bids/${fx(w).toWithdraw[actor]}/withdraw`),
    expect: shops(200),
  },
  {
    name: 'GET /api/requests/:id/bids (sealed until the deadline)',
    send: (w) => request(app).get(`/api/requests/${fx(w).open}/bids`),
    expect: printers(404),
  },
  {
    name: 'GET /api/requests/:id/bids (opened once bidding closed)',
    send: (w) => request(app).get(`/api/requests/${fx(w).awarded.id}/bids`),
    expect: printers(200),
  },
  {
    name: 'POST /api/requests/:id/close-bidding',
    send: (w, actor) => request(app).post(`/api/requests/${fx(w).toClose[actor]}/close-bidding`),
    expect: printers(200, { buyer: 403 }),
  },
  {
    name: 'POST /api/requests/:id/award (bids still sealed)',
    send: (w) =>
      request(app)
        .post(`/api/requests/${fx(w).open}/award`)
        .send({ bidId: 1 }),
    expect: printers(409, { buyer: 403 }),
  },
  {
    name: 'POST /api/requests/:id/award (bidding closed)',
    send: (w, actor) =>
      request(app)
        .post(`/api/requests/${fx(w).toAward[actor].id}/award`)
        .send({ bidId: fx(w).toAward[actor].bidId }),
    expect: printers(200, { buyer: 403 }),
  },
  {
    name: 'GET /api/requests/:id/ocds',
    send: (w) => request(app).get(`/api/requests/${fx(w).awarded.id}/ocds`),
    expect: printers(200),
  },
  {
    name: 'GET /api/purchase-orders/:id/pdf (the issuing printer and the awarded shop)',
    send: (w) => request(app).get(`/api/purchase-orders/${fx(w).awarded.awardId}/pdf`),
    expect: everyone(200),
  },
  {
    name: 'POST /api/requests/:id/start-production',
    send: (w, actor) => request(app).post(`/api/requests/${fx(w).toStart[actor]}/start-production`),
    expect: shops(200),
  },
  {
    name: 'POST /api/requests/:id/ship',
    send: (w, actor) =>
      request(app)
        .post(`/api/requests/${fx(w).toShip[actor]}/ship`)
        .send({ trackingNote: 'Ground parcel, tracking 1Z-TEST-0002' }),
    expect: shops(200),
  },
  {
    name: 'POST /api/requests/:id/receive',
    send: (w, actor) =>
      request(app)
        .post(`/api/requests/${fx(w).toReceive[actor]}/receive`)
        .send({ condition: 'good' }),
    expect: printers(200),
  },

  // Invoices: the awarded shop raises them; the printer's purchasing and admins settle them; a
  // print buyer sees their status only.
  {
    name: 'GET /api/requests/:id/invoices',
    send: (w) => request(app).get(`/api/requests/${fx(w).invoiced.requestId}/invoices`),
    expect: everyone(200),
  },
  {
    name: 'POST /api/requests/:id/invoices',
    send: (w, actor) =>
      request(app)
        .post(`/api/requests/${fx(w).toInvoice[actor]}/invoices`)
        .send({ invoiceDate: invoiceToday(w) }),
    expect: shops(201),
  },
  {
    name: 'GET /api/requests/:id/invoice-match',
    send: (w) => request(app).get(`/api/requests/${fx(w).invoiced.requestId}/invoice-match`),
    expect: { ...everyone(200), buyer: 403 },
  },
  {
    name: 'GET /api/invoices/:id',
    send: (w) => request(app).get(`/api/invoices/${fx(w).invoiced.invoiceId}`),
    expect: everyone(200),
  },
  {
    name: 'POST /api/invoices/:id/revisions',
    send: (w, actor) =>
      request(app)
        .post(`/api/invoices/${fx(w).toRevise[actor].invoiceId}/revisions`)
        .send({ invoiceDate: invoiceToday(w) }),
    expect: shops(201),
  },
  {
    name: 'POST /api/invoices/:id/credit-notes',
    send: (w, actor) =>
      request(app)
        .post(`/api/invoices/${fx(w).toCredit[actor].invoiceId}/credit-notes`)
        .send({ invoiceDate: invoiceToday(w), lines: [{ orderLine: 1, label: 'Shipping', amountCents: -500 }] }),
    expect: shops(201),
  },
  {
    name: 'POST /api/invoices/:id/dispute',
    send: (w, actor) =>
      request(app)
        .post(`/api/invoices/${fx(w).toDispute[actor].invoiceId}/dispute`)
        .send({ reason: 'Our PO number is missing' }),
    expect: printers(200, { buyer: 403 }),
  },
  {
    name: 'POST /api/invoices/:id/approve',
    send: (w, actor) =>
      request(app)
        .post(`/api/invoices/${fx(w).toApprove[actor].invoiceId}/approve`)
        .send({ reason: 'Die checked at the dock' }),
    expect: printers(200, { buyer: 403 }),
  },
  {
    name: 'POST /api/invoices/:id/payments',
    send: (w, actor) =>
      request(app)
        .post(`/api/invoices/${fx(w).toPay[actor].invoiceId}/payments`)
        .send({ paidOn: invoiceToday(w), reference: 'ACH 5521', amountCents: 83_500 }),
    expect: printers(201, { buyer: 403 }),
  },
  {
    name: 'GET /api/invoice-record',
    send: () => request(app).get('/api/invoice-record'),
    expect: { ...everyone(200), buyer: 403 },
  },

  // The printer's price history: every printer role reads it; purchasing and admins import.
  { name: 'GET /api/price-history', send: () => request(app).get('/api/price-history'), expect: printers(200) },
  {
    name: 'GET /api/price-history/export.csv',
    send: () => request(app).get('/api/price-history/export.csv'),
    expect: printers(200),
  },
  { name: 'GET /api/price-history/fit', send: () => request(app).get('/api/price-history/fit'), expect: printers(200) },
  {
    name: 'POST /api/price-history/import/preview',
    send: () =>
      request(app).post('/api/price-history/import/preview').attach('file', Buffer.from(priceCsv), 'history.csv'),
    expect: printers(200, { buyer: 403 }),
  },
  {
    name: 'POST /api/price-history/import',
    send: () =>
      request(app)
        .post('/api/price-history/import')
        .attach('file', Buffer.from(priceCsv), 'history.csv')
        .field('mapping', JSON.stringify(priceMapping)),
    expect: printers(201, { buyer: 403 }),
  },

  {
    name: 'POST /api/auth/logout',
    send: () => request(app).post('/api/auth/logout'),
    expect: everyone(204),
    ownWorld: true,
  },
];

/**
 * A target of its own for each actor in `who`, for a route that changes what it acts on, so that
 * one actor's success is not what the next one finds; the other actors, whom the route refuses
 * before it reads the target, share one more.
 */
async function oneEach<T>(who: Actor[], make: () => Promise<T>): Promise<ForEach<T>> {
  const [rest, ...own] = await Promise.all([make(), ...who.map(() => make())]);
  return Object.fromEntries(
    actors.map((actor) => [actor, who.includes(actor) ? own[who.indexOf(actor)] : rest]),
  ) as ForEach<T>;
}

/** One of `make`'s for each actor. */
async function perActor<T>(make: (actor: Actor) => Promise<T>): Promise<ForEach<T>> {
  return Object.fromEntries(await Promise.all(actors.map(async (actor) => [actor, await make(actor)]))) as ForEach<T>;
}

/** The printer's thing for the printer's people (and anonymous), the shop's for the shop's. */
const bySide = <T>(printer: T, shop: T): ForEach<T> =>
  Object.fromEntries(actors.map((actor) => [actor, shopSide.includes(actor) ? shop : printer])) as ForEach<T>;

/** An invitation from the organisation's admin, made in the database so that the test holds its link's token. */
async function invite(org: Organisation, admin: User) {
  const { token, hash } = newToken();
  const row = await Invitation.query().insertAndFetch({
    organisationId: org.id,
    email: `invitee-${unique()}@test.example`,
    name: 'Invited Person',
    role: org.kind === 'printer' ? 'buyer' : 'estimator',
    tokenHash: hash,
    invitedBy: admin.id,
    expiresAt: new Date(Date.now() + 86_400_000),
  });
  return { id: row.id, token };
}

async function libraryDie(org: Organisation, listed = false): Promise<number> {
  const [row] = await knex('libraryDies')
    .insert({ organisationId: org.id, name: `Die ${unique()}`, ups: 1, ruleTypes: ['cut'], listed })
    .returning('id');
  return row.id;
}

async function notice(user: User): Promise<number> {
  return (
    await Notification.query().insertAndFetch({
      userId: user.id,
      kind: 'bids_ready',
      title: 'Bids ready to compare',
      body: 'A test notice.',
      link: null,
    })
  ).id;
}

/** A closure of a die shop's, two months ahead. */
async function shopHoliday(shopId: number): Promise<number> {
  const [row] = await knex('shopHolidays')
    .insert({ shopId, date: inDays(60), name: 'Stocktaking day' })
    .returning('id');
  return row.id;
}

async function setUp(w: World): Promise<Fixtures> {
  const { printer, shop, users } = w;
  const open = (await createOpenRequest(w)).id;
  const openFile = (await DielineFile.query().findOne({ requestId: open }).throwIfNotFound()).id;
  const question = (
    await callAs(w, 'estimator', 'post', `/api/requests/${open}/questions`, { question: 'Are the nicks marked?' }, 201)
  ).id;
  const draft = (
    await callAs(
      w,
      'buyer',
      'post',
      '/api/requests',
      { title: `Draft ${unique()}`, quantity: 1, ups: 1, ruleTypes: ['cut'] },
      201,
    )
  ).id;
  const draftFile = await addDieline(w, draft);
  const printerDie = await libraryDie(printer);
  const shopDie = await libraryDie(shop, true);
  const preview = await invite(printer, users.printerAdmin);
  const invitationEachSide = async () =>
    bySide((await invite(printer, users.printerAdmin)).id, (await invite(shop, users.shopAdmin)).id);
  return {
    press: (await createPress(printer)).id,
    holiday: await shopHoliday(shop.id),
    otherShopHoliday: await shopHoliday((await createOrg('die_shop')).id),
    open,
    openFile,
    question,
    draft,
    draftFile,
    bid: await createRequestAt(w, 'bid'),
    awarded: await createRequestAt(w, 'awarded'),
    stockDie: shopDie,
    printerDie,
    ownDie: bySide(printerDie, shopDie),
    notice: await perActor((actor) => notice(users[member(actor)])),
    toResend: await invitationEachSide(),
    toRevoke: await invitationEachSide(),
    previewToken: preview.token,
    acceptToken: await perActor(async () => (await invite(printer, users.printerAdmin)).token),
    toDelete: await oneEach(printerSide, () => addDieline(w, draft)),
    toPublish: await oneEach(printerSide, () => createReadyDraft(w)),
    toCancel: await oneEach(printerSide, async () => (await createOpenRequest(w)).id),
    toClose: await oneEach(printerSide, async () => (await createOpenRequest(w)).id),
    toBidOn: await oneEach(shopSide, async () => (await createOpenRequest(w)).id),
    toWithdraw: await oneEach(shopSide, async () => (await createRequestAt(w, 'bid')).bidId),
    toAward: await oneEach(printerSide, () => createRequestAt(w, 'bidding_closed')),
    toStart: await oneEach(shopSide, async () => (await createRequestAt(w, 'awarded')).id),
    toShip: await oneEach(shopSide, async () => (await createRequestAt(w, 'in_production')).id),
    toReceive: await oneEach(printerSide, async () => (await createRequestAt(w, 'shipped')).id),
    ...(await invoiceFixtures(w)),
  };
}

/** The invoices the matrix acts on; the world's printer pays on Net 30. */
async function invoiceFixtures(w: World) {
  await netThirty(w);
  return {
    invoiced: await createInvoiceAt(w, 'submitted'),
    toInvoice: await oneEach(shopSide, async () => (await createRequestAt(w, 'shipped')).id),
    toRevise: await oneEach(shopSide, () => createInvoiceAt(w, 'disputed')),
    toCredit: await oneEach(shopSide, () => createInvoiceAt(w, 'disputed')),
    toDispute: await oneEach(printerSide, () => createInvoiceAt(w, 'submitted')),
    toApprove: await oneEach(printerSide, () => createInvoiceAt(w, 'submitted')),
    toPay: await oneEach(printerSide, () => createInvoiceAt(w, 'approved')),
  };
}

let world: World;

beforeAll(async () => {
  world = await createWorld();
  fixtures.set(world, await setUp(world));
}, 180_000);

/**
 * The request routes whose answer the access module gives: the action asked, the request it is
 * asked of, the route's own gate on the kind of organisation, and the status of a success.
 */
interface ModuleCase {
  action: RequestAction | 'see';
  target: (f: Fixtures, actor: Actor) => number;
  kind?: OrgKind;
  ok: number;
}
const printerKind = 'printer' as const;
const shopKind = 'die_shop' as const;
const byModule: Record<string, ModuleCase> = {
  'GET /api/requests/:id': { action: 'see', target: (f) => f.open, ok: 200 },
  'PATCH /api/requests/:id': { action: 'edit', target: (f) => f.draft, kind: printerKind, ok: 200 },
  'POST /api/requests/:id/publish': { action: 'publish', target: (f, a) => f.toPublish[a], kind: printerKind, ok: 200 },
  'POST /api/requests/:id/cancel': { action: 'cancel', target: (f, a) => f.toCancel[a], kind: printerKind, ok: 200 },
  'POST /api/requests/:id/files': { action: 'edit', target: (f) => f.draft, kind: printerKind, ok: 201 },
  'POST /api/requests/:id/questions': { action: 'ask', target: (f) => f.open, kind: shopKind, ok: 201 },
  'POST /api/requests/:id/questions/:questionId/answer': {
    action: 'answer',
    target: (f) => f.open,
    kind: printerKind,
    ok: 200,
  },
  'POST /api/requests/:id/bids': { action: 'bid', target: (f, a) => f.toBidOn[a], kind: shopKind, ok: 201 },
  'POST /api/requests/:id/decline': { action: 'decline', target: (f) => f.open, kind: shopKind, ok: 204 },
  'PATCH /api/bids/:id': { action: 'revise', target: (f) => f.bid.id, kind: shopKind, ok: 200 },
  'POST /api/requests/:id/close-bidding': {
    action: 'close-bidding',
    target: (f, a) => f.toClose[a],
    kind: printerKind,
    ok: 200,
  },
  'POST /api/requests/:id/award (bids still sealed)': {
    action: 'award',
    target: (f) => f.open,
    kind: printerKind,
    ok: 200,
  },
  'POST /api/requests/:id/award (bidding closed)': {
    action: 'award',
    target: (f, a) => f.toAward[a].id,
    kind: printerKind,
    ok: 200,
  },
  'POST /api/requests/:id/start-production': {
    action: 'start-production',
    target: (f, a) => f.toStart[a],
    kind: shopKind,
    ok: 200,
  },
  'POST /api/requests/:id/ship': { action: 'ship', target: (f, a) => f.toShip[a], kind: shopKind, ok: 200 },
  'POST /api/requests/:id/receive': { action: 'receive', target: (f, a) => f.toReceive[a], kind: printerKind, ok: 200 },
  'POST /api/requests/:id/invoices': {
    action: 'raise-invoice',
    target: (f, a) => f.toInvoice[a],
    kind: shopKind,
    ok: 201,
  },
  'POST /api/invoices/:id/revisions': {
    action: 'raise-invoice',
    target: (f, a) => f.toRevise[a].requestId,
    kind: shopKind,
    ok: 201,
  },
  'POST /api/invoices/:id/credit-notes': {
    action: 'credit-note',
    target: (f, a) => f.toCredit[a].requestId,
    kind: shopKind,
    ok: 201,
  },
  'POST /api/invoices/:id/dispute': {
    action: 'dispute-invoice',
    target: (f, a) => f.toDispute[a].requestId,
    kind: printerKind,
    ok: 200,
  },
  'POST /api/invoices/:id/approve': {
    action: 'approve-invoice',
    target: (f, a) => f.toApprove[a].requestId,
    kind: printerKind,
    ok: 200,
  },
  'POST /api/invoices/:id/payments': {
    action: 'record-payment',
    target: (f, a) => f.toPay[a].requestId,
    kind: printerKind,
    ok: 201,
  },
};

/** What the access module answers for a signed-in actor, before the route is called. */
async function moduleAnswer(w: World, actor: Exclude<Actor, 'anonymous'>, rule: ModuleCase): Promise<number> {
  const user = w.users[actor];
  const who: AccessActor = {
    organisationId: user.organisationId,
    orgKind: shopSide.includes(actor) ? 'die_shop' : 'printer',
    role: user.role,
  };
  // The route's gate on the kind of organisation answers first.
  if (rule.kind && who.orgKind !== rule.kind) return 403;
  const { facts } = (await loadFacts(knex, rule.target(fx(w), actor)))!;
  if (rule.action === 'see') return maySee(who, facts) ? rule.ok : 404;
  return actionRefusal(who, facts, rule.action, new Date())?.status ?? rule.ok;
}

// Runs before the matrix below changes its targets.
describe('the matrix and the access module', () => {
  it('names only cases of the matrix', () => {
    expect(Object.keys(byModule).filter((name) => !cases.some((c) => c.name === name))).toEqual([]);
  });
  for (const [name, rule] of Object.entries(byModule)) {
    it(`${name}: the module gives each actor the matrix's answer`, async () => {
      const expected = cases.find((c) => c.name === name)!.expect;
      for (const actor of actors) {
        if (actor === 'anonymous') continue;
        expect(await moduleAnswer(world, actor, rule), actor).toBe(expected[actor]);
      }
    });
  }
});

describe('role-by-route access', () => {
  for (const route of cases) {
    for (const actor of actors) {
      it(`${route.name} as ${actor} → ${route.expect[actor]}`, async () => {
        const w = route.ownWorld ? await createWorld() : world;
        let req = route.send(w, actor);
        if (actor !== 'anonymous') req = req.set('Authorization', `Bearer ${w.tokens[actor]}`);
        const res = await req;
        expect(res.status, JSON.stringify(res.body)).toBe(route.expect[actor]);
        if (res.status >= 400) expect(res.body.error.code).toBeTruthy();
      });
    }
  }
});

describe('the matrix itself', () => {
  // A case covers a route when its name is the route, alone or followed by a space and a note.
  const covers = (name: string, route: string) => name === route || name.startsWith(`${route} `);

  it('has a case for every route the app answers', () => {
    const uncovered = routeList(app).filter((route) => !cases.some((c) => covers(c.name, route)));
    expect(uncovered, 'routes without a case').toEqual([]);
  });

  it('names only routes the app answers', () => {
    const routes = routeList(app);
    expect(
      cases.map((c) => c.name).filter((name) => !routes.some((route) => covers(name, route))),
      'cases naming no route',
    ).toEqual([]);
  });
});
