import { describe, expect, it } from 'vitest';
import { DieRequest } from '../../models';
import { aBid } from '../../test/aBid';
import { actorOf, createOpenRequest, createOrg, createPress, createWorld, deps, knex } from '../../test/harness';
import { submitBid } from '../bidService';
import { createRequest, updateRequest } from './requestEdits';

const HOUR = 3_600_000;

describe('request edits', () => {
  it('changes only the fields a patch names', async () => {
    const w = await createWorld();
    const request = await createOpenRequest(w);
    const before = await DieRequest.query().findById(request.id).throwIfNotFound();
    await updateRequest(deps, actorOf(w.users.buyer, w.printer), request.id, { quantity: 3 });
    const after = await DieRequest.query().findById(request.id).throwIfNotFound();
    expect(after.quantity).toBe(3);
    expect({ ...after, quantity: before.quantity, updatedAt: before.updatedAt, changedAt: before.changedAt }).toEqual(
      before,
    );
  });

  it('lets the deadline move later for the buyer, earlier only for purchasing and with a day’s notice', async () => {
    const w = await createWorld();
    const request = await createOpenRequest(w, { deadline: new Date(Date.now() + 72 * HOUR) });
    const buyer = actorOf(w.users.buyer, w.printer);
    const purchasing = actorOf(w.users.purchasing, w.printer);
    const at = (hours: number) => new Date(Date.now() + hours * HOUR).toISOString();
    await updateRequest(deps, buyer, request.id, { bidDeadline: at(96) });
    await expect(updateRequest(deps, buyer, request.id, { bidDeadline: at(48) })).rejects.toMatchObject({
      status: 403,
    });
    await expect(updateRequest(deps, purchasing, request.id, { bidDeadline: at(12) })).rejects.toMatchObject({
      status: 400,
      fields: { bidDeadline: expect.stringContaining('24 hours') },
    });
    await updateRequest(deps, purchasing, request.id, { bidDeadline: at(30) });
    const moved = await DieRequest.query().findById(request.id).throwIfNotFound();
    expect(Math.abs(moved.bidDeadline!.getTime() - (Date.now() + 30 * HOUR))).toBeLessThan(60_000);
  });

  it('tells each bidder when the deadline moves', async () => {
    const w = await createWorld();
    const request = await createOpenRequest(w);
    await submitBid(knex, actorOf(w.users.estimator, w.shop), request.id, aBid());
    const later = new Date(request.bidDeadline!.getTime() + 48 * HOUR).toISOString();
    await updateRequest(deps, actorOf(w.users.buyer, w.printer), request.id, { bidDeadline: later });
    const told = await knex('notifications').whereIn('userId', [w.users.estimator.id, w.users.shopAdmin.id]);
    expect(told.length).toBeGreaterThanOrEqual(1);
    expect(told.every((n: { link: string }) => n.link === `/requests/${request.id}`)).toBe(true);
  });

  it('refuses another printer’s press and an invitation to a printer, saving nothing', async () => {
    const w = await createWorld();
    const other = await createWorld();
    const foreignPress = await createPress(other.printer);
    const buyer = actorOf(w.users.buyer, w.printer);
    const count = () => DieRequest.query().where({ organisationId: w.printer.id }).resultSize();
    const draft = { title: 'Sleeve', quantity: 1, ups: 1, ruleTypes: ['cut' as const] };
    await expect(createRequest(knex, buyer, { ...draft, pressId: foreignPress.id })).rejects.toMatchObject({
      status: 400,
      fields: { pressId: expect.any(String) },
    });
    const printerOrg = await createOrg('printer');
    await expect(createRequest(knex, buyer, { ...draft, invitedShopIds: [printerOrg.id] })).rejects.toMatchObject({
      status: 400,
      fields: { invitedShopIds: expect.any(String) },
    });
    expect(await count()).toBe(0);
  });
});
