import { randomUUID } from 'node:crypto';
import knexFactory from 'knex';
import { afterAll, describe, expect, it, vi } from 'vitest';
import type { Storage } from '@kerfmark/storage';
import { analyseDielineFile } from './analyseDieline';

// A reader that throws something other than a DielineError (a library's plain Error, a bug):
// the file must still settle as failed, not stay "measuring" for every sweep to trip on.
vi.mock('@kerfmark/dieline', async (original) => ({
  ...(await original<typeof import('@kerfmark/dieline')>()),
  analyseDielineAsync: () => Promise.reject(new TypeError("Cannot read properties of undefined (reading 'x')")),
}));

// Against the real PostgreSQL that `npm test` starts.
const knex = knexFactory({ client: 'pg', connection: process.env.DATABASE_URL });
afterAll(() => knex.destroy());

const storage = {
  get: async () => new TextEncoder().encode('<svg xmlns="http://www.w3.org/2000/svg"/>'),
} as unknown as Storage;

async function waitingFile(): Promise<number> {
  const [org] = await knex('organisations')
    .insert({ name: `Printer ${randomUUID()}`, kind: 'printer', time_zone: 'UTC', country: 'US' })
    .returning('id');
  const [request] = await knex('die_requests')
    .insert({ organisation_id: org.id, title: 'Carton', quantity: 1, ups: 1, rule_types: ['cut'] })
    .returning('id');
  const [file] = await knex('dieline_files')
    .insert({
      request_id: request.id,
      file_name: 'carton.svg',
      format: 'svg',
      content_type: 'image/svg+xml',
      byte_size: 40,
      sha256: 'test',
      s3_key: `test/${randomUUID()}.svg`,
    })
    .returning('id');
  return file.id;
}

describe('dieline analysis in the worker', () => {
  it('settles the file as failed, with a reason for the user, whatever the reader throws', async () => {
    const id = await waitingFile();
    expect(await analyseDielineFile(knex, storage, id)).toBe('failed');
    const row = await knex('dieline_files').where({ id }).first();
    expect(row.analysis_status).toBe('failed');
    expect(row.analysis_error).toMatch(/could not measure this file/);
  });
});
