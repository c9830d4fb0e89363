import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Knex } from 'knex';

const migrationsDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../db/migrations');

export async function migrateLatest(knex: Knex): Promise<string[]> {
  const [, applied] = (await knex.migrate.latest({ directory: migrationsDir, loadExtensions: ['.ts'] })) as [
    number,
    string[],
  ];
  return applied;
}
