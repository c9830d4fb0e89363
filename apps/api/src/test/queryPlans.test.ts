import pg from 'pg';
import request from 'supertest';
import { afterEach, beforeAll, describe, expect, it } from 'vitest';
import { app, createOpenRequest, createWorld, knex, type World } from './harness';

// The hot routes' queries must each be answerable from an index. The test tables are small,
// so the planner would rightly pick sequential scans; with them switched off it still picks one
// only where no index fits the query, which is what this looks for.
// Only sequential scans count: with them off the planner may still walk a whole index to feed a
// hash or merge join on a small table, which is no missing index.
interface PlanNode {
  'Node Type': string;
  'Relation Name'?: string;
  Plans?: PlanNode[];
}
const seqScans = (node: PlanNode): string[] => [
  ...(node['Node Type'] === 'Seq Scan' ? [`Seq Scan on ${node['Relation Name'] ?? '?'}`] : []),
  ...(node.Plans ?? []).flatMap(seqScans),
];

let captured: Array<{ sql: string; bindings: readonly unknown[] }> = [];
const capture = (q: { sql: string; bindings?: readonly unknown[]; method?: string }) => {
  if (q.method === 'select' || /^\s*select/i.test(q.sql)) captured.push({ sql: q.sql, bindings: q.bindings ?? [] });
};
afterEach(() => {
  knex.removeListener('query', capture);
});

/** Runs a route and returns, per select it ran, the tables read by a sequential scan. */
async function scansOf(send: () => Promise<{ status: number }>) {
  captured = [];
  knex.on('query', capture);
  const res = await send();
  knex.removeListener('query', capture);
  expect(res.status).toBe(200);
  expect(captured.length).toBeGreaterThan(0);
  // The captured SQL has PostgreSQL's own $n placeholders: explain it through a bare client.
  const client = new pg.Client({ connectionString: process.env.DATABASE_URL });
  await client.connect();
  try {
    await client.query('begin');
    await client.query('set local enable_seqscan = off');
    const found: Array<{ sql: string; tables: string[] }> = [];
    for (const q of captured) {
      const { rows } = await client.query(`explain (format json) ${q.sql}`, q.bindings as unknown[]);
      const tables = seqScans(rows[0]['QUERY PLAN'][0].Plan);
      // SHOW_PLANS=1 prints each plan, to see which index a query uses.
      if (process.env.SHOW_PLANS)
        console.log(
          q.sql.slice(0, 120),
          JSON.stringify(rows[0]['QUERY PLAN'][0].Plan, [
            'Node Type',
            'Relation Name',
            'Index Name',
            'Index Cond',
            'Plans',
          ]),
        );
      if (tables.length) found.push({ sql: q.sql, tables });
    }
    return found;
  } finally {
    await client.query('rollback');
    await client.end();
  }
}

let w: World;
let closedId: number;
beforeAll(async () => {
  w = await createWorld();
  await createOpenRequest(w);
  const closed = await createOpenRequest(w);
  await knex('dieRequests').where({ id: closed.id }).update({ status: 'bidding_closed', biddingClosedAt: new Date() });
  closedId = closed.id;
});
const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

describe('the hot queries use indexes', () => {
  it('the open requests', async () => {
    expect(await scansOf(() => request(app).get('/api/open-requests').set(bearer(w.tokens.estimator)))).toEqual([]);
  });

  it('a request’s detail, for the printer and for a die shop', async () => {
    expect(await scansOf(() => request(app).get(`/api/requests/${closedId}`).set(bearer(w.tokens.purchasing)))).toEqual(
      [],
    );
    expect(await scansOf(() => request(app).get(`/api/requests/${closedId}`).set(bearer(w.tokens.estimator)))).toEqual(
      [],
    );
  });

  it('the bid comparison and its fair-price band', async () => {
    expect(
      await scansOf(() => request(app).get(`/api/requests/${closedId}/bids`).set(bearer(w.tokens.purchasing))),
    ).toEqual([]);
  });

  it('the printer’s request list and price history', async () => {
    expect(await scansOf(() => request(app).get('/api/requests?sort=-needByDate').set(bearer(w.tokens.buyer)))).toEqual(
      [],
    );
    expect(await scansOf(() => request(app).get('/api/price-history').set(bearer(w.tokens.purchasing)))).toEqual([]);
  });
});
