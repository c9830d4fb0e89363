import { randomUUID } from 'node:crypto';
import { setTimeout as sleep } from 'node:timers/promises';
import type { Storage } from '@kerfmark/storage';
import { afterAll, describe, expect, it } from 'vitest';
import { rectangleDxf } from '@kerfmark/dieline/testing';
import { createKnex } from '../db';
import { analyseDielineFile, waitingAnalyses } from './analyseDieline';

// Against the real PostgreSQL that `npm test` starts. The rows are new, so the running worker's
// sweep (which waits for files a few seconds old) leaves them alone; the store is a stand-in.
const knex = createKnex(process.env.DATABASE_URL!);
afterAll(() => knex.destroy());

/** A store that hands out the rectangle after `delayMs`, and can run a step while it waits. */
function slowStore(delayMs: number, during?: () => Promise<void>): Storage & { reads: number } {
  const store = {
    reads: 0,
    async get() {
      store.reads += 1;
      await during?.();
      await sleep(delayMs);
      return new TextEncoder().encode(rectangleDxf);
    },
    put: () => Promise.reject(new Error('not used')),
    remove: () => Promise.reject(new Error('not used')),
    downloadUrl: () => Promise.reject(new Error('not used')),
    ping: () => Promise.resolve(),
  };
  return store;
}

async function uploadedFile(over: Record<string, unknown> = {}): Promise<number> {
  const [org] = await knex('organisations')
    .insert({ name: `printer ${randomUUID().slice(0, 8)}`, kind: 'printer', time_zone: 'America/Chicago' })
    .returning('id');
  const [request] = await knex('die_requests')
    .insert({ organisation_id: org.id, title: 'Sleeve', status: 'draft', visibility: 'public' })
    .returning('id');
  const [file] = await knex('dieline_files')
    .insert({
      request_id: request.id,
      file_name: 'sleeve.dxf',
      format: 'dxf',
      content_type: 'application/dxf',
      byte_size: rectangleDxf.length,
      sha256: 'x',
      s3_key: `test/${randomUUID()}`,
      ...over,
    })
    .returning('id');
  return file.id as number;
}
const fileRow = (id: number) => knex('dieline_files').where({ id }).first();

describe('analysing a dieline with more than one worker', () => {
  it('measures a file once when two workers reach it at the same time', async () => {
    const id = await uploadedFile();
    const store = slowStore(200);
    const results = await Promise.all([analyseDielineFile(knex, store, id), analyseDielineFile(knex, store, id)]);
    expect(results.sort()).toEqual(['done', 'skipped']);
    expect(store.reads).toBe(1);
    const row = await fileRow(id);
    expect(row.analysis_runs).toBe(1);
    // Perimeter of a 4 × 3 in rectangle, 2 × (4 + 3) (geometry).
    expect(row.metrics.length.cut).toBeCloseTo(14, 6);
  });

  it('keeps the remap that came during a run: the run is dropped and the next one measures the new layers', async () => {
    const id = await uploadedFile();
    // What the API's remap does: new layers, and the file waits for a run again.
    const remap = () =>
      knex('dieline_files')
        .where({ id })
        .update({ layer_map: JSON.stringify({ CREASE: 'cut' }), analysis_status: 'pending' })
        .then(() => undefined);
    expect(await analyseDielineFile(knex, slowStore(50, remap), id)).toBe('superseded');
    expect((await fileRow(id)).analysis_status).toBe('pending');
    expect(await analyseDielineFile(knex, slowStore(0), id)).toBe('done');
    const row = await fileRow(id);
    expect(row.analysis_runs).toBe(2);
    // The crease now counts as cutting rule: 14 + 4 in.
    expect(row.metrics.length.cut).toBeCloseTo(18, 6);
  });

  it('claims a run again only once it has gone stale, as when its worker died', async () => {
    const fresh = await uploadedFile({
      analysis_status: 'analysing',
      analysis_started_at: new Date(),
      analysis_runs: 1,
    });
    const stale = await uploadedFile({
      analysis_status: 'analysing',
      analysis_started_at: new Date(Date.now() - 3_600_000),
      analysis_runs: 1,
    });
    expect(await analyseDielineFile(knex, slowStore(0), fresh)).toBe('skipped');
    expect(await analyseDielineFile(knex, slowStore(0), stale)).toBe('done');
    expect((await fileRow(stale)).analysis_runs).toBe(2);
    expect(await analyseDielineFile(knex, slowStore(0), stale)).toBe('skipped');
  });

  it('lists waiting files and stale runs for the sweep, not runs under way', async () => {
    // A little older than the sweep's wait below, and newer than the running worker's.
    const old = new Date(Date.now() - 2_000);
    const waiting = await uploadedFile({ uploaded_at: old });
    const running = await uploadedFile({
      uploaded_at: old,
      analysis_status: 'analysing',
      analysis_started_at: new Date(),
    });
    const stale = await uploadedFile({
      uploaded_at: old,
      analysis_status: 'analysing',
      analysis_started_at: new Date(Date.now() - 3_600_000),
    });
    const recent = await uploadedFile();
    const listed = await waitingAnalyses(knex, 1_000, { limit: 10_000 });
    expect(listed).toEqual(expect.arrayContaining([waiting, stale]));
    expect(listed).not.toContain(running);
    expect(listed).not.toContain(recent);
  });
});
