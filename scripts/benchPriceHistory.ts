// Benchmark: the price history view and its fit over 100,000 price records, against a bare SQL
// count over the same table (ratio). Brings up the test stack on its own ports.
import path from 'node:path';
import { performance } from 'node:perf_hooks';
import { complexityOf } from '@kerfmark/dieline';
import knexFactory from 'knex';
import { recordResults } from './lib/benchResults';
import { profile } from './lib/profile';
import { bringUp } from './lib/stack';
import { Supervisor } from './lib/supervisor';

const RECORDS = Number(process.env.BENCH_PRICE_RECORDS ?? 100_000);
const RUNS = 7;
const p = profile('test');
const supervisor = new Supervisor(path.join(p.dataDir, 'logs'), { echo: false });
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

async function time(fn: () => Promise<unknown>): Promise<number> {
  const samples: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const start = performance.now();
    await fn();
    samples.push(performance.now() - start);
  }
  return median(samples);
}

try {
  const env = await bringUp(p, supervisor, { fresh: true });
  const knex = knexFactory({ client: 'pg', connection: env.DATABASE_URL });
  const org = await knex('organisations').where({ name: 'Larkspur Press & Carton' }).first();
  let seed = 3;
  const rand = () => (seed = (seed * 16807) % 2147483647) / 2147483647;
  for (let done = 0; done < RECORDS; done += 5000) {
    const rows = Array.from({ length: Math.min(5000, RECORDS - done) }, (_, i) => {
      const length = 30 + rand() * 400;
      const bends = Math.round(rand() * length * 0.8);
      return {
        organisation_id: org.id,
        shop_name: `Shop ${(done + i) % 40}`,
        currency: 'USD',
        source: 'import',
        die_cents: Math.round(20_000 + 400 * length + 600 * bends),
        total_cents: Math.round(24_000 + 400 * length + 600 * bends),
        priced_on: new Date(Date.now() - rand() * 3 * 365 * 86_400_000).toISOString().slice(0, 10),
        rule_length_in: length.toFixed(3),
        bends,
        complexity: complexityOf({ bends, curves: 0, joints: 0, punches: 0 }, length),
      };
    });
    await knex('price_records').insert(rows);
  }
  await knex.raw('ANALYZE price_records');
  const login = await fetch(`${env.APP_URL}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: 'daniel@larkspur.example', password: 'kerfmark-demo-2026' }),
  });
  const { token } = (await login.json()) as { token: string };
  const get = (url: string) =>
    fetch(`${env.APP_URL}${url}`, { headers: { Authorization: `Bearer ${token}` } }).then((r) => r.json());

  const bare = await time(() => knex('price_records').where({ organisation_id: org.id }).count('* as n'));
  const list = await time(() => get('/api/price-history?pageSize=50'));
  const filtered = await time(() => get('/api/price-history?pageSize=50&complexity=complex&minIn=100&maxIn=300'));
  const fit = await time(() => get('/api/price-history/fit'));
  console.log(`price history over ${RECORDS.toLocaleString('en-US')} records, median of ${RUNS} runs`);
  console.log(`  bare SQL count            ${bare.toFixed(1)} ms`);
  console.log(`  GET /api/price-history    ${list.toFixed(1)} ms   (ratio ${(list / bare).toFixed(1)})`);
  console.log(`  … with filters            ${filtered.toFixed(1)} ms   (ratio ${(filtered / bare).toFixed(1)})`);
  console.log(
    `  GET /api/price-history/fit ${fit.toFixed(1)} ms   (ratio ${(fit / bare).toFixed(1)}; the fit runs on a 5,000-record sample)`,
  );
  recordResults([
    {
      figure: 'GET /api/price-history (50 of 100,000)',
      value: `${list.toFixed(1)} ms`,
      baseline: `count ${bare.toFixed(1)} ms`,
      ratio: list / bare,
    },
    {
      figure: 'GET /api/price-history/fit',
      value: `${fit.toFixed(1)} ms`,
      baseline: `count ${bare.toFixed(1)} ms`,
      ratio: fit / bare,
    },
  ]);
  await knex.destroy();
  await supervisor.stopAll(0);
} catch (error) {
  console.error(`benchmark failed: ${(error as Error).message}`);
  await supervisor.stopAll(1);
}
