// Benchmark: API throughput and latency (autocannon, 50 connections) on the open-requests board,
// a request's detail and the bid comparison, over 2,000 requests, 20,000 bids and 100,000 price
// records; each beside a bare Express + pg route that reads the same rows (ratio).
import path from 'node:path';
import autocannon from 'autocannon';
import express from 'express';
import knexFactory from 'knex';
import pg from 'pg';
import { analyseDieline } from '../packages/dieline/src/index';
import { profile } from './lib/profile';
import { bringUp } from './lib/stack';
import { Supervisor } from './lib/supervisor';

const REQUESTS = 2000;
const BIDS_PER_REQUEST = 10;
const PRICE_RECORDS = 100_000;
const SECONDS = Number(process.env.BENCH_SECONDS ?? 8);
const p = profile('test');
const supervisor = new Supervisor(path.join(p.dataDir, 'logs'), { echo: false });

const dxf = ['0', 'SECTION', '2', 'ENTITIES', '0', 'LWPOLYLINE', '8', 'CUT', '90', '4', '70', '1', '10', '0', '20', '0', '10', '8', '20', '0', '10', '8', '20', '5', '10', '0', '20', '5', '0', 'ENDSEC', '0', 'EOF', ''].join('\n');

async function load(url: string, token: string) {
  const result = await autocannon({ url, connections: 50, duration: SECONDS, headers: { Authorization: `Bearer ${token}` } });
  return { rps: result.requests.average, p50: result.latency.p50, p95: result.latency.p97_5 ?? result.latency.p99, p99: result.latency.p99, errors: result.errors + result.non2xx };
}

try {
  const env = await bringUp(p, supervisor, { fresh: true });
  const knex = knexFactory({ client: 'pg', connection: env.DATABASE_URL });
  const printer = await knex('organisations').where({ name: 'Larkspur Press & Carton' }).first();
  const buyer = await knex('users').where({ organisation_id: printer.id, role: 'buyer' }).first();
  console.log('· generating 2,000 requests, 20,000 bids, 100,000 price records');
  const shops: number[] = [];
  for (let i = 0; i < BIDS_PER_REQUEST; i++) {
    const [s] = await knex('organisations').insert({ name: `Bench shop ${i}`, kind: 'die_shop', time_zone: 'America/Chicago', postcode: '60148' }).returning('id');
    shops.push(s.id);
  }
  const { metrics, preview } = analyseDieline(dxf);
  const deadline = new Date(Date.now() + 5 * 86_400_000);
  for (let done = 0; done < REQUESTS; done += 500) {
    const ids = await knex('die_requests')
      .insert(Array.from({ length: 500 }, (_, i) => ({ organisation_id: printer.id, created_by: buyer.id, title: `Bench carton ${done + i}`, status: 'open', quantity: 1, ups: 2, rule_types: '{cut,crease}', need_by_date: '2027-03-01', bid_deadline: deadline, delivery_postcode: '60614', published_at: new Date() })))
      .returning('id');
    await knex('dieline_files').insert(ids.map(({ id }: { id: number }) => ({ request_id: id, file_name: 'bench.dxf', format: 'dxf', content_type: 'application/dxf', byte_size: dxf.length, sha256: 'bench', s3_key: `bench/${id}.dxf`, is_primary: true, analysis_status: 'done', metrics: JSON.stringify(metrics), preview: JSON.stringify(preview) })));
    await knex('bids').insert(
      ids.flatMap(({ id }: { id: number }) =>
        shops.map((shopId, k) => ({ request_id: id, shop_id: shopId, lines: JSON.stringify([{ kind: 'die', description: '', amountCents: 50_000 + k * 1000 }]), currency: 'USD', total_cents: 50_000 + k * 1000, die_cents: 50_000 + k * 1000, lead_days: 5 + k, promised_ship_date: '2027-02-01', valid_until: '2027-02-15' })),
      ),
    );
  }
  for (let done = 0; done < PRICE_RECORDS; done += 5000) {
    await knex('price_records').insert(Array.from({ length: 5000 }, (_, i) => ({ organisation_id: printer.id, shop_name: `Bench shop ${i % 10}`, total_cents: 60_000 + (i % 500) * 100, die_cents: 55_000 + (i % 500) * 100, currency: 'USD', priced_on: '2026-06-01', rule_length_in: 50 + (i % 300), bends: i % 40, complexity: 'simple', source: 'import' })));
  }
  await knex.raw('ANALYZE');
  const sampleRequest = (await knex('die_requests').where({ title: 'Bench carton 1000' }).first()).id;
  await knex('die_requests').where({ id: sampleRequest }).update({ status: 'bidding_closed', bidding_closed_at: new Date() });

  const login = async (email: string) =>
    ((await (await fetch(`${env.APP_URL}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password: 'kerfmark-demo-2026' }) })).json()) as { token: string }).token;
  const estimatorToken = await login('grace@brightline.example');
  const purchasingToken = await login('daniel@larkspur.example');

  // The baseline: the same rows through bare pg, no auth, no validation, no shaping.
  const pool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 10 });
  const base = express();
  base.get('/board', async (_req, res) => {
    const rows = await pool.query("SELECT r.*, o.name AS org, f.metrics FROM die_requests r JOIN organisations o ON o.id = r.organisation_id LEFT JOIN dieline_files f ON f.request_id = r.id AND f.is_primary WHERE r.status = 'open' AND r.bid_deadline > now() AND r.visibility = 'public' ORDER BY r.bid_deadline LIMIT 500");
    res.json(rows.rows);
  });
  base.get('/detail', async (_req, res) => {
    const r = await pool.query('SELECT r.*, o.name AS org FROM die_requests r JOIN organisations o ON o.id = r.organisation_id WHERE r.id = $1', [sampleRequest]);
    const f = await pool.query('SELECT id, file_name, metrics FROM dieline_files WHERE request_id = $1', [sampleRequest]);
    res.json({ ...r.rows[0], files: f.rows });
  });
  base.get('/bids', async (_req, res) => {
    const b = await pool.query("SELECT b.*, o.name AS shop FROM bids b JOIN organisations o ON o.id = b.shop_id WHERE b.request_id = $1 AND b.status = 'submitted' ORDER BY b.total_cents", [sampleRequest]);
    res.json(b.rows);
  });
  const server = base.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  const baseUrl = `http://127.0.0.1:${(server.address() as { port: number }).port}`;

  const cases = [
    { name: 'open-requests board', api: [`${env.APP_URL}/api/marketplace/requests`, estimatorToken], base: `${baseUrl}/board` },
    { name: 'request detail', api: [`${env.APP_URL}/api/requests/${sampleRequest}`, purchasingToken], base: `${baseUrl}/detail` },
    { name: 'bid comparison', api: [`${env.APP_URL}/api/requests/${sampleRequest}/bids`, purchasingToken], base: `${baseUrl}/bids` },
  ] as const;
  const rows: string[] = [];
  for (const c of cases) {
    const api = await load(c.api[0], c.api[1]);
    const bare = await load(c.base, '');
    rows.push(
      `| ${c.name.padEnd(20)} | ${api.rps.toFixed(0).padStart(6)} | ${String(api.p50).padStart(4)} | ${String(api.p95).padStart(4)} | ${String(api.p99).padStart(4)} | ${bare.rps.toFixed(0).padStart(6)} | ${(api.rps / bare.rps).toFixed(2).padStart(5)} | ${api.errors} |`,
    );
  }
  console.log(`\nAPI under load: autocannon, 50 connections, ${SECONDS} s each; ${REQUESTS.toLocaleString('en-US')} requests, ${(REQUESTS * BIDS_PER_REQUEST).toLocaleString('en-US')} bids, ${PRICE_RECORDS.toLocaleString('en-US')} price records`);
  console.log('| route                | req/s  | p50  | p97.5| p99  | bare pg req/s | ratio | errors |');
  console.log('|----------------------|--------|------|------|------|--------|-------|--------|');
  for (const row of rows) console.log(row);
  server.close();
  await pool.end();
  await knex.destroy();
  await supervisor.stopAll(0);
} catch (error) {
  console.error(`benchmark failed: ${(error as Error).stack}`);
  await supervisor.stopAll(1);
}
