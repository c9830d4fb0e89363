import { readdir } from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Knex } from 'knex';

export const migrationsDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../db/migrations');

export async function migrateLatest(knex: Knex): Promise<string[]> {
  const [, applied] = (await knex.migrate.latest({ directory: migrationsDir, loadExtensions: ['.ts'] })) as [
    number,
    string[],
  ];
  return applied;
}

/**
 * The migration files not yet applied to the database, compared by name with knex's own record
 * (knex_migrations); none when the schema is current. Reads, never migrates.
 */
export async function pendingMigrations(knex: Knex, directory = migrationsDir): Promise<string[]> {
  const files = (await readdir(directory)).filter((name) => name.endsWith('.ts')).sort();
  const hasTable = await knex.schema.hasTable('knex_migrations');
  const applied = new Set(
    hasTable ? (await knex('knex_migrations').select('name')).map((row: { name: string }) => row.name) : [],
  );
  return files.filter((name) => !applied.has(name));
}
