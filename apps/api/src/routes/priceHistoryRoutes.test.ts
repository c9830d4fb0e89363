import Papa from 'papaparse';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { app, createOpenRequest, createWorld, knex } from '../test/harness';

const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

/** Dies priced by a known rule, 40,000 + 300 × inches + 500 × features cents, with a little seeded spread. */
function syntheticCsv(n: number): string {
  let seed = 7;
  const rand = () => (seed = (seed * 16807) % 2147483647) / 2147483647;
  const rows = ['Date,Supplier,Die price,Rule length (in),Bends,Curves,Joints,Punches'];
  for (let i = 0; i < n; i++) {
    const inches = 40 + Math.round(rand() * 300);
    const bends = Math.round(rand() * 60);
    const cents = 40_000 + 300 * inches + 500 * bends + Math.round((rand() - 0.5) * 4000);
    rows.push(`2026-0${1 + (i % 9)}-15,Shop ${i % 3},${(cents / 100).toFixed(2)},${inches},${bends},0,0,0`);
  }
  return `${rows.join('\n')}\n`;
}
const mapping = {
  pricedOn: 'Date',
  shopName: 'Supplier',
  diePrice: 'Die price',
  ruleLengthIn: 'Rule length (in)',
  bends: 'Bends',
  curves: 'Curves',
  joints: 'Joints',
  punches: 'Punches',
};

async function importCsv(token: string, csv: string) {
  return request(app)
    .post('/api/price-history/import')
    .set(bearer(token))
    .attach('file', Buffer.from(csv), 'history.csv')
    .field('mapping', JSON.stringify(mapping));
}

describe('price history', () => {
  it('exports an imported shop name that starts a formula as text (OWASP, CSV Injection), its amount still a number', async () => {
    const w = await createWorld();
    const evil = '=HYPERLINK("http://evil.example","Open")';
    const csv = `Date,Supplier,Die price,Rule length (in),Bends,Curves,Joints,Punches\n2026-03-15,"${evil.replaceAll('"', '""')}",412.50,120,10,0,0,0\n2026-03-16,@Plain Shop,99.00,50,2,0,0,0\n`;
    expect((await importCsv(w.tokens.purchasing, csv)).status).toBe(201);
    const exported = await request(app).get('/api/price-history/export.csv').set(bearer(w.tokens.purchasing));
    const rows = Papa.parse<string[]>(exported.text.trim()).data;
    const byShop = new Map(rows.slice(1).map((r) => [r[1], r]));
    expect(byShop.get(`'${evil}`)?.[2]).toBe('412.50');
    expect(byShop.has(`'@Plain Shop`)).toBe(true);
    expect(rows.slice(1).some((r) => /^[=+\-@]/.test(r[1]!))).toBe(false);
  });

  it('reads a rule-length column headed in millimetres as millimetres, and exports in each reader’s units', async () => {
    const w = await createWorld();
    // 2,540 mm is 100 in exactly (1 in = 25.4 mm, ISO 80000-3).
    const csv = 'Date,Supplier,Die price,Rule length (mm)\n2026-03-15,Metric Dies,500.00,2540\n';
    const imported = await request(app)
      .post('/api/price-history/import')
      .set(bearer(w.tokens.purchasing))
      .attach('file', Buffer.from(csv), 'history.csv')
      .field(
        'mapping',
        JSON.stringify({
          pricedOn: 'Date',
          shopName: 'Supplier',
          diePrice: 'Die price',
          ruleLengthIn: 'Rule length (mm)',
        }),
      );
    expect(imported.status, JSON.stringify(imported.body)).toBe(201);
    const listed = await request(app).get('/api/price-history').set(bearer(w.tokens.purchasing));
    expect(listed.body.items[0].ruleLengthIn).toBeCloseTo(100, 6);

    const column = async (heading: string) => {
      const text = (await request(app).get('/api/price-history/export.csv').set(bearer(w.tokens.purchasing))).text;
      const [head = [], row = []] = Papa.parse<string[]>(text.trim()).data;
      return [head.includes(heading), row[head.indexOf(heading)]];
    };
    expect(await column('Rule length (in)')).toEqual([true, '100']);
    const chosen = await request(app)
      .put('/api/me/preferences')
      .set(bearer(w.tokens.purchasing))
      .send({ lengthUnits: 'mm' });
    expect(chosen.status).toBe(200);
    expect(await column('Rule length (mm)')).toEqual([true, '2540']);
  });

  it('imports a CSV whole, lists it with filters, exports it, and fits it', async () => {
    const w = await createWorld();
    const preview = await request(app)
      .post('/api/price-history/import/preview')
      .set(bearer(w.tokens.purchasing))
      .attach('file', Buffer.from(syntheticCsv(40)), 'history.csv');
    expect(preview.status).toBe(200);
    expect(preview.body.totalRows).toBe(40);
    expect(preview.body.suggested).toMatchObject({ pricedOn: 'Date', shopName: 'Supplier', diePrice: 'Die price' });

    const imported = await importCsv(w.tokens.purchasing, syntheticCsv(40));
    expect(imported.status, JSON.stringify(imported.body)).toBe(201);
    expect(imported.body.imported).toBe(40);

    const page = await request(app).get('/api/price-history?pageSize=10&minIn=100').set(bearer(w.tokens.buyer));
    expect(page.body.items).toHaveLength(10);
    expect(page.body.items.every((r: { ruleLengthIn: number }) => r.ruleLengthIn >= 100)).toBe(true);

    const csv = await request(app).get('/api/price-history/export.csv').set(bearer(w.tokens.buyer));
    expect(csv.headers['content-type']).toContain('text/csv');
    expect(csv.text.split('\n')[0]).toContain('Die price');
    expect(csv.text.trim().split('\n')).toHaveLength(41);

    const fit = await request(app).get('/api/price-history/fit').set(bearer(w.tokens.purchasing));
    expect(fit.status).toBe(200);
    expect(fit.body.fit.enough).toBe(true);
    expect(fit.body.fit.n).toBe(40);
    // The known rule: 300 cents an inch (within the spread), when the linear model is chosen.
    if (fit.body.fit.model === 'linear') expect(fit.body.fit.coefficients.perInch).toBeGreaterThan(250);
    expect(fit.body.curve.length).toBeGreaterThan(2);

    // The fair-price band for a request with the 4 × 3 in test rectangle (18 in of rule, 6 features).
    const open = await createOpenRequest(w);
    const fair = await request(app).get(`/api/requests/${open.id}/fair-price`).set(bearer(w.tokens.purchasing));
    expect(fair.body.enough).toBe(true);
    expect(fair.body.band.lowCents).toBeLessThanOrEqual(fair.body.band.typicalCents);
    expect(fair.body.band.typicalCents).toBeLessThanOrEqual(fair.body.band.highCents);
    expect(fair.body.band.extrapolated).toBe(true); // 18 in is shorter than every imported die
  });

  it('imports nothing when any row is wrong, and lists every problem', async () => {
    const w = await createWorld();
    const bad = `${syntheticCsv(5)}2026-13-40,Shop X,abc,12,1,0,0,0\n`;
    const res = await importCsv(w.tokens.purchasing, bad);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('import_rejected');
    expect(res.body.error.details.rows.map((r: { row: number; field: string }) => [r.row, r.field])).toEqual([
      [7, 'Date'],
      [7, 'Die price'],
    ]);
    expect(await knex('priceRecords').where({ organisationId: w.printer.id })).toHaveLength(0);
  });

  it('says so when there is too little history to fit', async () => {
    const w = await createWorld();
    await importCsv(w.tokens.purchasing, syntheticCsv(3));
    const fit = await request(app).get('/api/price-history/fit').set(bearer(w.tokens.purchasing));
    expect(fit.body.fit.enough).toBe(false);
    expect(fit.body.fit.reason).toBeTruthy();
  });

  it('keeps each printer’s history to itself, and refuses shops, buyers importing, and odd filters', async () => {
    const w = await createWorld();
    const other = await createWorld();
    await importCsv(w.tokens.purchasing, syntheticCsv(4));
    const theirs = await request(app).get('/api/price-history').set(bearer(other.tokens.purchasing));
    expect(theirs.body.total).toBe(0);
    expect((await request(app).get('/api/price-history').set(bearer(w.tokens.estimator))).status).toBe(403);
    expect((await importCsv(w.tokens.buyer, syntheticCsv(2))).status).toBe(403);
    for (const q of ['minIn=1;DROP TABLE price_records', "complexity=' OR 1=1 --", 'from=2026-01-01%27']) {
      expect((await request(app).get(`/api/price-history?${q}`).set(bearer(w.tokens.buyer))).status).toBe(400);
    }
    expect(await knex('priceRecords').where({ organisationId: w.printer.id })).toHaveLength(4);
  });
});
