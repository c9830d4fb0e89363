import { createHash } from 'node:crypto';
import PgClient from 'knex/lib/dialects/postgres/index.js';

interface QueryObject {
  sql: string;
  options?: Record<string, unknown> & { prepare?: boolean };
}

/** The pg client knex hands over; pg remembers there which statements it has prepared. */
interface PgConnection {
  connection: { parsedStatements: Record<string, string> };
  query(text: string): Promise<unknown>;
}

// Each prepared text's name, remembered: the texts are few, and hashing them on every run showed in profiles.
const names = new Map<string, string>();
const statementName = (sql: string) => {
  let name = names.get(sql);
  if (name === undefined) names.set(sql, (name = `k_${createHash('sha1').update(sql).digest('hex').slice(0, 32)}`));
  return name;
};

/** PostgreSQL's code for a prepared statement whose result columns changed (a migration altered its table). */
const CACHED_PLAN_CHANGED = '0A000';

/**
 * Knex's PostgreSQL client with one addition: a query marked `.options({ prepare: true })` runs
 * as a named prepared statement, named by a hash of its text. Each pooled connection then parses
 * it once, and PostgreSQL may keep its plan, where an unnamed statement is parsed and planned on
 * every run: for the views read most, that was most of the database's time per request.
 *
 * Mark only queries whose text comes from a small fixed set (their values are bound, not
 * written into the text): a connection keeps every statement it has prepared.
 */
export class PreparingPgClient extends PgClient {
  override _query(connection: PgConnection, obj: QueryObject): Promise<unknown> {
    if (!obj.options?.prepare) return super._query(connection, obj);
    const { prepare: _prepare, ...options } = obj.options;
    const name = statementName(obj.sql);
    obj.options = { ...options, name };
    return super._query(connection, obj).catch(async (error: { code?: string }) => {
      // After a migration changes a table's columns, PostgreSQL refuses the old statement once;
      // forget it on this connection, so that the next run prepares it anew.
      const statements = connection.connection.parsedStatements;
      if (error.code === CACHED_PLAN_CHANGED && statements[name] !== undefined) {
        delete statements[name];
        await connection.query(`DEALLOCATE "${name}"`).catch(() => undefined);
      }
      throw error;
    });
  }
}
