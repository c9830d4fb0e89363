import { describe, expect, it } from 'vitest';
import { actorOf, createOpenRequest, createShop, createWorld, knex } from '../../test/harness';
import { aBid } from '../../test/aBid';
import { submitBid } from '../bidService';
import { factsFor, findOwned, findVisible } from './requestLookup';

describe('request lookups', () => {
  it('finds a request for its own printer and for any die shop while it is public and open', async () => {
    const w = await createWorld();
    const request = await createOpenRequest(w);
    const buyer = actorOf(w.users.buyer, w.printer);
    const estimator = actorOf(w.users.estimator, w.shop);
    expect((await findOwned(buyer, request.id)).id).toBe(request.id);
    expect((await findVisible(estimator, request.id)).id).toBe(request.id);
    // A die shop never owns a request: the same 404 as a request that does not exist.
    await expect(findOwned(estimator, request.id)).rejects.toMatchObject({ status: 404 });
  });

  it('answers another printer with the 404 a missing request gets', async () => {
    const w = await createWorld();
    const other = await createWorld();
    const request = await createOpenRequest(w);
    const stranger = actorOf(other.users.buyer, other.printer);
    await expect(findOwned(stranger, request.id)).rejects.toMatchObject({ status: 404, code: 'not_found' });
    await expect(findVisible(stranger, request.id)).rejects.toMatchObject({ status: 404, code: 'not_found' });
    await expect(knex.transaction((trx) => factsFor(stranger, request.id, trx))).rejects.toMatchObject({
      status: 404,
    });
    await expect(findOwned(stranger, 2_000_000_000)).rejects.toMatchObject({ status: 404 });
  });

  it('reads the facts the access rules need, bidders included', async () => {
    const w = await createWorld();
    const request = await createOpenRequest(w);
    const { shop, estimator } = await createShop();
    await submitBid(knex, actorOf(estimator, shop), request.id, aBid());
    const { facts } = await knex.transaction((trx) => factsFor(actorOf(w.users.buyer, w.printer), request.id, trx));
    expect(facts).toMatchObject({ status: 'open', organisationId: w.printer.id, bidderShopIds: [shop.id] });
  });
});
