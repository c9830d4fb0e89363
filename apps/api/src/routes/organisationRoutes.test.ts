import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { AuditEntry, DieRequest } from '../models';
import { app, createWorld, knex } from '../test/harness';
import { callAs, createRequestAt } from '../test/requestStages';

const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
const profile = (token: string) => request(app).get('/api/organisation/profile').set(bearer(token));
const edit = (token: string, body: object) =>
  request(app).patch('/api/organisation/profile').set(bearer(token)).send(body);

describe('the organisation profile', () => {
  it('a printer admin keeps it and every member reads it, with an audit entry for the change', async () => {
    const w = await createWorld();
    const before = await profile(w.tokens.buyer);
    expect(before.status).toBe(200);
    expect(before.body).toMatchObject({
      organisationId: w.printer.id,
      kind: 'printer',
      name: w.printer.name,
      legalName: null,
      paymentTerms: null,
      deliveryPoints: [],
      editable: false,
    });
    expect(before.body).not.toHaveProperty('dieKinds');

    const changes = {
      legalName: 'Łódź Kartonaż Sp. z o.o.',
      officeAddress: 'ul. Wymyślona 12\nŁódź',
      contactEmail: 'Biuro@Lodz.example',
      paymentTerms: 'Net 30',
      paymentNetDays: 45,
      deliveryPoints: [
        { name: 'Dock 1', address: '1 Mill Road', postcode: '60614' },
        { name: 'Finishing hall', address: '3 Mill Road\nGate B' },
      ],
    };
    const edited = await edit(w.tokens.printerAdmin, changes);
    expect(edited.status, JSON.stringify(edited.body)).toBe(200);
    expect(edited.body).toMatchObject({
      ...changes,
      // E-mail addresses are kept in lower case, as sign-in compares them.
      contactEmail: 'biuro@lodz.example',
      deliveryPoints: [changes.deliveryPoints[0], { ...changes.deliveryPoints[1], postcode: null }],
      editable: true,
    });
    const read = await profile(w.tokens.purchasing);
    expect(read.body).toMatchObject({ legalName: changes.legalName, paymentTerms: 'Net 30', editable: false });

    const audit = await AuditEntry.query().where({ entity: 'organisation', entityId: w.printer.id });
    expect(audit.map((a) => [a.action, a.actorUserId])).toEqual([['profile_updated', w.users.printerAdmin.id]]);
  });

  it('a die shop admin states its capabilities; die shops and printers read only their own', async () => {
    const w = await createWorld();
    const edited = await edit(w.tokens.shopAdmin, {
      legalName: '東京抜型製作所',
      dieKinds: ['flat', 'rotary'],
      maxBoardWidthIn: 48,
      maxBoardLengthIn: 72.5,
      // The two cutting rule heights of the trade (common practice: 0.937 in and 0.918 in).
      ruleHeightsIn: [0.937, 0.918],
      makesCounters: true,
      fitsEjectionRubber: true,
      laserCutBoards: false,
    });
    expect(edited.status, JSON.stringify(edited.body)).toBe(200);
    const read = await profile(w.tokens.estimator);
    expect(read.body).toMatchObject({
      kind: 'die_shop',
      legalName: '東京抜型製作所',
      dieKinds: ['flat', 'rotary'],
      maxBoardWidthIn: 48,
      maxBoardLengthIn: 72.5,
      ruleHeightsIn: [0.937, 0.918],
      makesCounters: true,
      fitsEjectionRubber: true,
      laserCutBoards: false,
      editable: false,
    });
    expect(read.body).not.toHaveProperty('paymentTerms');
    // The printer of the same world reads its own profile, not the shop's.
    expect((await profile(w.tokens.buyer)).body).toMatchObject({ organisationId: w.printer.id, legalName: null });
  });

  it('refuses the other kind’s fields, half a board size and wrong roles, and changes nothing', async () => {
    const w = await createWorld();
    await edit(w.tokens.shopAdmin, { legalName: 'Kept Dies Inc.' });

    const printerField = await edit(w.tokens.shopAdmin, { legalName: 'Lost', paymentTerms: 'Net 30' });
    expect(printerField.status).toBe(400);
    expect(printerField.body.error.fields).toEqual({ paymentTerms: 'A die shop’s profile has no such field' });
    const shopField = await edit(w.tokens.printerAdmin, { makesCounters: true });
    expect(shopField.status).toBe(400);
    expect(shopField.body.error.fields).toHaveProperty('makesCounters');

    const halfBoard = await edit(w.tokens.shopAdmin, { legalName: 'Lost', maxBoardWidthIn: 40 });
    expect(halfBoard.status).toBe(400);
    expect(halfBoard.body.error.fields).toEqual({ maxBoardLengthIn: 'Enter the length too' });

    const estimator = await edit(w.tokens.estimator, { legalName: 'Lost' });
    expect(estimator.status).toBe(403);
    expect((await edit(w.tokens.buyer, { paymentTerms: 'Net 10' })).status).toBe(403);
    expect((await edit(w.tokens.purchasing, { paymentTerms: 'Net 10' })).status).toBe(403);

    const bad = await edit(w.tokens.shopAdmin, { ruleHeightsIn: [0.95], contactEmail: 'nobody' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['contactEmail', 'ruleHeightsIn.0']);
    expect((await edit(w.tokens.shopAdmin, {})).body.error.message).toBe('Nothing to change');

    expect((await profile(w.tokens.estimator)).body).toMatchObject({ legalName: 'Kept Dies Inc.', ruleHeightsIn: [] });
    expect((await profile(w.tokens.buyer)).body).toMatchObject({ paymentTerms: null });
  });

  it('the database itself refuses a profile field of the other kind and a rule height the trade does not make', async () => {
    const w = await createWorld();
    const set = (id: number, values: object) => knex('organisations').where({ id }).update(values);
    // Each check of migration 20261204000200 names its constraint.
    await expect(set(w.printer.id, { dieKinds: ['flat'] })).rejects.toThrow(/organisations_die_kinds_check/);
    await expect(set(w.shop.id, { paymentTerms: 'Net 30' })).rejects.toThrow(/organisations_payment_terms_check/);
    await expect(set(w.shop.id, { ruleHeightsIn: [0.95] })).rejects.toThrow(/organisations_rule_heights_check/);
    await expect(set(w.shop.id, { maxBoardWidthIn: 40 })).rejects.toThrow(/organisations_board_check/);
    await expect(set(w.printer.id, { deliveryPoints: JSON.stringify({ name: 'x' }) })).rejects.toThrow(
      /organisations_delivery_points_check/,
    );
  });
});

describe('the purchase order of an award', () => {
  /** The PDF's text, read back with pdfjs-dist (a general-purpose PDF library, not the writer). */
  async function textOf(pdf: Buffer): Promise<string> {
    const doc = await getDocument({ data: new Uint8Array(pdf), useSystemFonts: false, disableFontFace: true }).promise;
    const pieces: string[] = [];
    for (let n = 1; n <= doc.numPages; n++) {
      const content = await (await doc.getPage(n)).getTextContent();
      for (const item of content.items) if ('str' in item) pieces.push(item.str);
    }
    await doc.destroy();
    return pieces.join(' ');
  }

  it('prints both profiles and the delivery address in any script, where the standard fonts gave a 422', async () => {
    const w = await createWorld();
    expect(
      (
        await edit(w.tokens.printerAdmin, {
          legalName: 'Łódź Kartonaż Sp. z o.o.',
          officeAddress: 'ul. Wymyślona 12\nŁódź',
          postcode: '90-001',
          paymentTerms: 'Przelew 30 dni',
        })
      ).status,
    ).toBe(200);
    expect(
      (
        await edit(w.tokens.shopAdmin, {
          legalName: '東京抜型製作所',
          officeAddress: '東京都架空区見本町1-2-3',
          postcode: '100-0001',
        })
      ).status,
    ).toBe(200);
    // The delivery address is set before the award: the PDF is made and kept as the award is made.
    const closed = await createRequestAt(w, 'bidding_closed');
    await DieRequest.query()
      .patch({ deliveryAddress: 'Magazyn 3\nul. Zmyślona 7', deliveryPostcode: '90-002' })
      .findById(closed.id);
    const awarded = {
      awardId: (await callAs(w, 'purchasing', 'post', `/api/requests/${closed.id}/award`, { bidId: closed.bidId }, 200))
        .award.id as number,
    };

    const pdf = await request(app)
      .get(`/api/purchase-orders/${awarded.awardId}/pdf`)
      .set(bearer(w.tokens.purchasing))
      .buffer(true);
    expect(pdf.status, pdf.body.toString()).toBe(200);
    const text = await textOf(pdf.body as Buffer);
    for (const expected of [
      'Łódź Kartonaż Sp. z o.o.',
      'ul. Wymyślona 12',
      '90-001',
      '東京抜型製作所',
      '東京都架空区見本町1-2-3',
      '100-0001',
      'Magazyn 3',
      'ul. Zmyślona 7',
      '90-002',
    ])
      expect(text).toContain(expected);
    expect(text).toMatch(/Payment terms:\s+Przelew 30 dni/);
    // The awarded shop gets the same document.
    expect(
      (await request(app).get(`/api/purchase-orders/${awarded.awardId}/pdf`).set(bearer(w.tokens.estimator))).status,
    ).toBe(200);
  });
});
