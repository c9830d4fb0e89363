// Knex's PostgreSQL dialect, which knex ships without types of its own.
declare module 'knex/lib/dialects/postgres/index.js' {
  import type { Knex } from 'knex';
  export default class PgClient extends Knex.Client {
    _query(connection: unknown, obj: unknown): Promise<unknown>;
  }
}
