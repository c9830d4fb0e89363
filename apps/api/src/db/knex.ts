import knexFactory, { type Knex } from 'knex';
import { knexSnakeCaseMappers, Model } from 'objection';
import pg from 'pg';
import { PreparingPgClient } from './PreparingPgClient';

// Return BIGINT counts and NUMERIC as JavaScript numbers: ids and counts stay far below 2^53,
// and money is integer cents in BIGINT columns.
pg.types.setTypeParser(pg.types.builtins.INT8, (v) => Number(v));
pg.types.setTypeParser(pg.types.builtins.NUMERIC, (v) => Number(v));
// Dates (no time) stay plain 'YYYY-MM-DD' strings: a need-by date is a date, not an instant.
pg.types.setTypeParser(pg.types.builtins.DATE, (v) => v);

export function createKnex(databaseUrl: string): Knex {
  return knexFactory({
    client: PreparingPgClient,
    connection: databaseUrl,
    pool: { min: 0, max: 10 },
    acquireConnectionTimeout: 5000,
    ...knexSnakeCaseMappers(),
  });
}

/** Binds the Objection models to a knex instance. */
export function bindModels(knex: Knex): void {
  Model.knex(knex);
}
