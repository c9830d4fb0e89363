import { createKnex } from '../../apps/api/src/db/knex';
import { migrateLatest } from '../../apps/api/src/db/migrate';
import { seedDemo } from '../../apps/api/db/seeds/demo';
import { createStorage, storageConfigFromEnv } from '@kerfmark/storage';

/** Migrates the database to the latest schema and, if asked, loads the demo scenario. */
export async function prepareDatabase(databaseUrl: string, opts: { seed: boolean }): Promise<string[]> {
  const knex = createKnex(databaseUrl);
  try {
    const applied = await migrateLatest(knex);
    // The demo's dielines go to the S3 fake, which must be up by now.
    if (opts.seed) await seedDemo(knex, { storage: createStorage(storageConfigFromEnv()) });
    return applied;
  } finally {
    await knex.destroy();
  }
}
