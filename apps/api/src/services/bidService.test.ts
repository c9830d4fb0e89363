import { describe, expect, it } from 'vitest';
import { BidRevision } from '../models';
import { aBid } from '../test/aBid';
import { actorOf, createOpenRequest, createShop, createWorld, knex } from '../test/harness';
import { declineRequest, reviseBid, shopBid, submitBid, withdrawBid } from './bidService';

async function shopOnOpenRequest() {
  const w = await createWorld();
  const request = await createOpenRequest(w);
  return { w, request, shop: actorOf(w.users.estimator, w.shop) };
}

describe('bids', () => {
  it('totals the lines on the server and keeps every revision', async () => {
    const { request, shop } = await shopOnOpenRequest();
    const bid = await submitBid(
      knex,
      shop,
      request.id,
      aBid({
        lines: [
          { kind: 'die', description: '', amountCents: 48_000 },
          { kind: 'shipping', description: 'Courier', amountCents: 2_550 },
        ],
        notes: 'Rule from stock',
      }),
    );
    expect(bid).toMatchObject({ totalCents: 50_550, dieCents: 48_000, revision: 1, status: 'submitted' });
    const revised = await reviseBid(
      knex,
      shop,
      bid.id,
      aBid({ lines: [{ kind: 'die', description: '', amountCents: 45_000 }] }),
    );
    // A revision that leaves the notes out keeps them.
    expect(revised).toMatchObject({ totalCents: 45_000, revision: 2, notes: 'Rule from stock' });
    const history = await BidRevision.query().where({ bidId: bid.id }).orderBy('id');
    expect(history.map((r) => [r.action, r.totalCents])).toEqual([
      ['submitted', 50_550],
      ['revised', 45_000],
    ]);
  });

  it('takes one bid per shop, however many arrive at once', async () => {
    const { request, shop } = await shopOnOpenRequest();
    const results = await Promise.allSettled([1, 2, 3].map(() => submitBid(knex, shop, request.id, aBid())));
    expect(results.filter((r) => r.status === 'fulfilled')).toHaveLength(1);
    for (const r of results.filter((r) => r.status === 'rejected')) {
      expect((r as PromiseRejectedResult).reason).toMatchObject({ status: 409, code: 'bid_exists' });
    }
  });

  it('never finds another shop’s bid, to change or to read', async () => {
    const { request, shop } = await shopOnOpenRequest();
    const bid = await submitBid(knex, shop, request.id, aBid());
    const other = await createShop();
    const rival = actorOf(other.estimator, other.shop);
    await expect(reviseBid(knex, rival, bid.id, aBid())).rejects.toMatchObject({ status: 404 });
    await expect(withdrawBid(knex, rival, bid.id)).rejects.toMatchObject({ status: 404 });
    expect(await shopBid(rival, request.id)).toBeNull();
    expect((await shopBid(shop, request.id))?.id).toBe(bid.id);
  });

  it('withdraws once; a second withdrawal changes nothing', async () => {
    const { request, shop } = await shopOnOpenRequest();
    const bid = await submitBid(knex, shop, request.id, aBid());
    await withdrawBid(knex, shop, bid.id);
    const again = await withdrawBid(knex, shop, bid.id);
    expect(again.status).toBe('withdrawn');
    expect(await BidRevision.query().where({ bidId: bid.id, action: 'withdrawn' }).resultSize()).toBe(1);
  });

  it('refuses a bid after the deadline, naming the time it closed', async () => {
    const w = await createWorld();
    const request = await createOpenRequest(w, { deadline: new Date(Date.now() - 60_000) });
    await expect(submitBid(knex, actorOf(w.users.estimator, w.shop), request.id, aBid())).rejects.toMatchObject({
      status: 409,
      code: 'bidding_closed',
      message: expect.stringContaining('closed at'),
    });
  });

  it('keeps one decline per shop and request, with the latest reason', async () => {
    const { request, shop } = await shopOnOpenRequest();
    await declineRequest(knex, shop, request.id, 'Too busy');
    await declineRequest(knex, shop, request.id, 'No perforating rule in stock');
    const rows = await knex('requestDeclines').where({ requestId: request.id, shopId: shop.organisationId });
    expect(rows.map((r: { reason: string }) => r.reason)).toEqual(['No perforating rule in stock']);
  });

  it('lets only a die shop decline', async () => {
    const { w, request } = await shopOnOpenRequest();
    await expect(declineRequest(knex, actorOf(w.users.buyer, w.printer), request.id, 'x')).rejects.toMatchObject({
      status: 403,
    });
  });
});
