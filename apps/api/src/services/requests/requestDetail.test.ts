import { describe, expect, it } from 'vitest';
import { DieRequest, DielineFile } from '../../models';
import { actorOf, createOpenRequest, createPress, createWorld, knex } from '../../test/harness';
import { requestDetail } from './requestDetail';

describe('requestDetail', () => {
  it('fits a board of exactly the press’s sheet, whatever the floating-point sum left over', async () => {
    const w = await createWorld();
    const press = await createPress(w.printer); // 22 × 30 in
    const request = await createOpenRequest(w);
    await DieRequest.query().patch({ pressId: press.id }).findById(request.id);
    const file = await DielineFile.query().findOne({ requestId: request.id }).throwIfNotFound();
    // 22 in plus one unit in the last place, as a sum of segment ends in floating point leaves it.
    const width = 22.000000000000004;
    expect(width).toBeGreaterThan(22);
    await file.$query().patch({ metrics: { ...file.metrics!, board: { width, height: 30 } } });
    const buyer = actorOf(w.users.buyer, w.printer);
    expect((await requestDetail(knex, buyer, request.id)).boardFitsPress).toBe(true);
    // A real sixteenth of an inch over does not fit, turned either way.
    await file.$query().patch({ metrics: { ...file.metrics!, board: { width: 22.0625, height: 30 } } });
    expect((await requestDetail(knex, buyer, request.id)).boardFitsPress).toBe(false);
  });
});

describe('requestDetail need-by check', () => {
  it('plans the die-cutting run in the press’s shifts', async () => {
    const w = await createWorld();
    const press = await createPress(w.printer); // 4,000 sheets an hour
    const request = await createOpenRequest(w);
    // 64,000 sheets at 4,000 an hour: 16 hours, two days of one 8-hour shift, one day of two.
    await DieRequest.query().patch({ pressId: press.id, runSheets: 64_000 }).findById(request.id);
    const buyer = actorOf(w.users.buyer, w.printer);
    expect((await requestDetail(knex, buyer, request.id)).needBy?.runDays).toBe(2);
    await press.$query().patch({ shiftsPerDay: 2 });
    expect((await requestDetail(knex, buyer, request.id)).needBy?.runDays).toBe(1);
  });
});
