import { describe, expect, it } from 'vitest';
import { aBid } from '../../test/aBid';
import { actorOf, createOpenRequest, createWorld, knex } from '../../test/harness';
import { todayIn } from '../../lib/todayIn';
import { bidTerms } from './bidTerms';

const isWeekend = (day: string) => [0, 6].includes(new Date(`${day}T12:00:00Z`).getUTCDay());

describe('bidTerms', () => {
  it('refuses a price that stops holding before the bid deadline', async () => {
    const w = await createWorld();
    const request = await createOpenRequest(w, { deadline: new Date(Date.now() + 10 * 86_400_000) });
    const shop = actorOf(w.users.estimator, w.shop);
    const tomorrow = todayIn(shop.timeZone, new Date(Date.now() + 86_400_000));
    await expect(
      knex.transaction((trx) => bidTerms(trx, shop, request, aBid({ validUntil: tomorrow }))),
    ).rejects.toMatchObject({
      status: 400,
      fields: { validUntil: expect.stringMatching(/^Choose \d{4}-\d\d-\d\d or later$/) },
    });
  });

  it('promises a ship date on a working day, past the shop’s own holidays', async () => {
    const w = await createWorld();
    const request = await createOpenRequest(w);
    const shop = actorOf(w.users.estimator, w.shop);
    const plain = await knex.transaction((trx) => bidTerms(trx, shop, request, aBid({ leadDays: 3 })));
    expect(isWeekend(plain.promisedShipDate)).toBe(false);
    // The shop closes on the day it would have shipped: the promise moves to a later working day.
    await knex('shopHolidays').insert({ shopId: w.shop.id, date: plain.promisedShipDate, name: 'Stocktake' });
    const withHoliday = await knex.transaction((trx) => bidTerms(trx, shop, request, aBid({ leadDays: 3 })));
    expect(withHoliday.promisedShipDate > plain.promisedShipDate).toBe(true);
    expect(isWeekend(withHoliday.promisedShipDate)).toBe(false);
  });

  it('totals in whole cents, the die line apart', async () => {
    const w = await createWorld();
    const request = await createOpenRequest(w);
    const shop = actorOf(w.users.estimator, w.shop);
    const terms = await knex.transaction((trx) =>
      bidTerms(
        trx,
        shop,
        request,
        aBid({
          lines: [
            { kind: 'die', description: '', amountCents: 61_999 },
            { kind: 'counter', description: '', amountCents: 8_001 },
            { kind: 'die', description: 'Second die', amountCents: 1 },
          ],
        }),
      ),
    );
    expect(terms).toMatchObject({ totalCents: 70_001, dieCents: 62_000 });
  });
});
