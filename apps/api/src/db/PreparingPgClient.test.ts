import { randomUUID } from 'node:crypto';
import knexFactory, { type Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PreparingPgClient } from './PreparingPgClient';

// Against the real PostgreSQL that `npm test` starts. One connection, so that every query below
// meets the statements the ones before it prepared.
if (!process.env.DATABASE_URL) throw new Error('DATABASE_URL is not set: run the tests through `npm test`.');
let knex: Knex;
const table = `prepared_${randomUUID().slice(0, 8)}`;
/** The statements this connection holds, as PostgreSQL lists them. */
const prepared = async () =>
  (
    await knex.raw<{ rows: Array<{ name: string; statement: string }> }>(
      'select name, statement from pg_prepared_statements',
    )
  ).rows;

beforeAll(async () => {
  knex = knexFactory({ client: PreparingPgClient, connection: process.env.DATABASE_URL, pool: { min: 1, max: 1 } });
  await knex.schema.createTable(table, (t) => {
    t.increments('id');
    t.text('name');
  });
  await knex(table).insert([{ name: 'platen' }, { name: 'flatbed' }]);
});

afterAll(async () => {
  await knex.schema.dropTableIfExists(table);
  await knex.destroy();
});

describe('prepared statements', () => {
  it('prepares a marked query once per connection and runs it with each value', async () => {
    const byId = (id: number) => knex(table).where({ id }).select('name').options({ prepare: true });
    expect(await byId(1)).toEqual([{ name: 'platen' }]);
    expect(await byId(2)).toEqual([{ name: 'flatbed' }]);
    const mine = (await prepared()).filter((s) => s.statement.includes(table));
    expect(mine).toHaveLength(1);
    expect(mine[0]!.name).toMatch(/^k_[0-9a-f]{32}$/);
  });

  it('leaves unmarked queries unnamed', async () => {
    const before = (await prepared()).length;
    await knex(table).where('name', 'like', 'p%').select('id');
    expect((await prepared()).length).toBe(before);
  });

  it('prepares marked raw SQL too', async () => {
    const { rows } = await knex
      .raw<{ rows: Array<{ count: number }> }>(`select count(*)::int as count from ${table} where name <> ?`, ['none'])
      .options({ prepare: true });
    expect(rows[0]!.count).toBe(2);
    expect((await prepared()).some((s) => s.statement.includes('count(*)::int'))).toBe(true);
  });

  // A migration that adds a column changes what `select *` returns: PostgreSQL then refuses the
  // statement prepared before it ('cached plan must not change result type'). The client
  // forgets it, so the refusal happens once and the next run prepares it anew.
  it('recovers when a migration changes the columns of a prepared select', async () => {
    const all = () => knex(table).select('*').orderBy('id').options({ prepare: true });
    expect(await all()).toHaveLength(2);
    await knex.schema.alterTable(table, (t) => t.integer('impressions'));
    await expect(all()).rejects.toMatchObject({ code: '0A000' });
    expect(await all()).toEqual([
      { id: 1, name: 'platen', impressions: null },
      { id: 2, name: 'flatbed', impressions: null },
    ]);
  });
});
