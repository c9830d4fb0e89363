import knexFactory, { type Knex } from 'knex';
import pg from 'pg';

// As in the API: counts as numbers, dates (no time) as 'YYYY-MM-DD' strings, never shifted by a zone.
pg.types.setTypeParser(pg.types.builtins.INT8, (v) => Number(v));
pg.types.setTypeParser(pg.types.builtins.DATE, (v) => v);

export function createKnex(databaseUrl: string, poolMax = 4): Knex {
  return knexFactory({ client: 'pg', connection: databaseUrl, pool: { min: 0, max: poolMax } });
}
