import { describe, expect, it } from 'vitest';
import type { RequestStatus } from '@kerfmark/contracts';
import { DieRequest } from '../models';
import { bidBody } from '../test/fixtures';
import { app, createOpenRequest, createShop, createWorld, knex } from '../test/harness';
import request from 'supertest';
import type { Actor } from './facts';
import { loadFacts } from './loadFacts';
import { maySee } from './visibility';
import { visibleTo } from './visibleQuery';

// The SQL form of `maySee` filters lists and lookups in the database; here both answer alike
// for every kind of actor over requests in every state that matters.
describe('visibleTo and maySee', () => {
  it('agree for printers and die shops, invited or not, bidders or not, in every status', async () => {
    const w = await createWorld();
    const other = await createWorld();
    const invited = await createShop();
    const stranger = await createShop();
    const made: number[] = [];
    const make = async (status: RequestStatus, opts: { visibility?: 'public' | 'invited'; bid?: boolean } = {}) => {
      const { id } = await createOpenRequest(w);
      if (opts.bid)
        expect(
          (
            await request(app)
              .post(`/api/requests/${id}/bids`)
              .set('Authorization', `Bearer ${w.tokens.estimator}`)
              .send(bidBody(50_000))
          ).status,
        ).toBe(201);
      await DieRequest.query()
        .patch({ status, visibility: opts.visibility ?? 'public' })
        .findById(id);
      await knex('requestInvitations').insert({ requestId: id, shopId: invited.shop.id });
      made.push(id);
    };
    for (const status of ['draft', 'open', 'bidding_closed', 'awarded', 'cancelled', 'received'] as const) {
      await make(status);
      await make(status, { visibility: 'invited' });
      await make(status, { visibility: 'invited', bid: status !== 'draft' });
    }
    const actors: Array<[string, Actor]> = [
      ['owner', { organisationId: w.printer.id, orgKind: 'printer', role: 'buyer' }],
      ['another printer', { organisationId: other.printer.id, orgKind: 'printer', role: 'admin' }],
      ['bidding shop', { organisationId: w.shop.id, orgKind: 'die_shop', role: 'estimator' }],
      ['invited shop', { organisationId: invited.shop.id, orgKind: 'die_shop', role: 'estimator' }],
      ['any other shop', { organisationId: stranger.shop.id, orgKind: 'die_shop', role: 'admin' }],
    ];
    const answers = { true: 0, false: 0 };
    for (const id of made) {
      const { facts } = (await loadFacts(knex, id))!;
      for (const [who, actor] of actors) {
        const bySql = (await visibleTo(DieRequest.query().findById(id), actor)) !== undefined;
        expect(bySql, `${who}, request ${id} (${facts.status}, ${facts.visibility})`).toBe(maySee(actor, facts));
        answers[String(bySql) as 'true' | 'false'] += 1;
      }
    }
    expect(answers.true).toBeGreaterThan(10);
    expect(answers.false).toBeGreaterThan(10);
  });
});
