// `npm run migrate`: migrates DATABASE_URL (or the local dev database) to the latest schema.
import { prepareDatabase } from './lib/database';
import { profile, serviceEnv } from './lib/profile';

const databaseUrl = process.env.DATABASE_URL ?? serviceEnv(profile('dev')).DATABASE_URL!;
const applied = await prepareDatabase(databaseUrl, { seed: process.argv.includes('--seed') });
console.log(applied.length ? `Applied: ${applied.join(', ')}` : 'The database is up to date.');
