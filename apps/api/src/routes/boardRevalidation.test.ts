import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { app, createOpenRequest, createShop, createWorld, knex, type World } from '../test/harness';

// The board answers a reload that finds nothing new with 304 Not Modified (RFC 9110, 13.1.2
// If-None-Match and 15.4.5), and anything that changes what it shows changes its tag.
const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

let w: World;
let requestId: number;
let title: string;
// Searching for this world's own request keeps other tests' requests off this board.
const board = (token: string, tag?: string) => {
  const r = request(app)
    .get(`/api/open-requests?q=${encodeURIComponent(title)}&canMake=false`)
    .set(bearer(token));
  return tag ? r.set('If-None-Match', tag) : r;
};

beforeAll(async () => {
  w = await createWorld();
  const open = await createOpenRequest(w);
  requestId = open.id;
  title = open.title;
});

describe('the board revalidates', () => {
  it('gives a tag, answers the same tag with 304 and no body, and the tag must be revalidated', async () => {
    const first = await board(w.tokens.estimator);
    expect(first.status).toBe(200);
    expect(first.body.items.map((r: { id: number }) => r.id)).toEqual([requestId]);
    const tag = first.headers.etag as string;
    expect(tag).toMatch(/^W\/".+"$/);
    expect(first.headers['cache-control']).toBe('private, no-cache');
    const again = await board(w.tokens.estimator, tag);
    expect(again.status).toBe(304);
    expect(again.text ?? '').toBe('');
    // Another query of the same board is another page, with another tag.
    const sorted = await request(app)
      .get(`/api/open-requests?q=${encodeURIComponent(title)}&canMake=false&sort=-needByDate`)
      .set(bearer(w.tokens.estimator))
      .set('If-None-Match', tag);
    expect(sorted.status).toBe(200);
  });

  it('changes the tag when the request is edited, measured again, or its printer renamed', async () => {
    const tagNow = async () => (await board(w.tokens.estimator)).headers.etag as string;
    let tag = await tagNow();
    const edits: Array<() => Promise<unknown>> = [
      () => knex('dieRequests').where({ id: requestId }).update({ quantity: 3 }),
      // The measure trigger writes the request row when a file's metrics change.
      () => knex('dielineFiles').where({ requestId }).update({ isPrimary: true }),
      () =>
        knex('organisations')
          .where({ id: w.printer.id })
          .update({ name: `${w.printer.name} Ltd` }),
    ];
    for (const edit of edits) {
      await edit();
      const stale = await board(w.tokens.estimator, tag);
      expect(stale.status).toBe(200);
      expect(stale.headers.etag).not.toBe(tag);
      tag = stale.headers.etag as string;
    }
  });

  it('changes the tag when the shop passes on the request, and gives another shop a tag of its own', async () => {
    // Passed-on requests shown, so that the row stays and only its "declined" changes.
    const all = (token: string, tag?: string) => {
      const r = request(app)
        .get(`/api/open-requests?q=${encodeURIComponent(title)}&canMake=false&hideDeclined=false`)
        .set(bearer(token));
      return tag ? r.set('If-None-Match', tag) : r;
    };
    const before = (await all(w.tokens.estimator)).headers.etag as string;
    expect((await all(w.tokens.estimator, before)).status).toBe(304);
    const other = await createShop();
    const theirs = await all(other.token, before);
    expect(theirs.status).toBe(200);
    expect(theirs.headers.etag).not.toBe(before);
    const declined = await request(app)
      .post(`/api/requests/${requestId}/decline`)
      .set(bearer(w.tokens.estimator))
      .send({ reason: 'Too busy' });
    expect(declined.status).toBe(204);
    const after = await all(w.tokens.estimator, before);
    expect(after.status).toBe(200);
    expect(after.body.items[0].declined).toBe(true);
  });
});

describe('the board shows the dies the shop can make', () => {
  it('reads what the shop has said with each sign-in, so a profile change shows at once, with a new tag', async () => {
    const mine = (token: string) =>
      request(app)
        .get(`/api/open-requests?q=${encodeURIComponent(title)}&hideDeclined=false`)
        .set(bearer(token));
    await knex('dieRequests').where({ id: requestId }).update({ counterWanted: true });
    const profile = (makesCounters: boolean) =>
      request(app)
        .patch('/api/organisation/profile')
        .set(bearer(w.tokens.shopAdmin))
        .send({ makesCounters })
        .expect(200);

    await profile(false);
    const without = await mine(w.tokens.estimator);
    expect(without.status).toBe(200);
    expect(without.body.items.map((r: { id: number }) => r.id)).not.toContain(requestId);

    await profile(true);
    const withIt = await mine(w.tokens.estimator);
    expect(withIt.body.items.map((r: { id: number }) => r.id)).toContain(requestId);
    expect(withIt.headers.etag).not.toBe(without.headers.etag);
    // The old tag is no answer to the new board.
    const revalidated = await mine(w.tokens.estimator).set('If-None-Match', without.headers.etag as string);
    expect(revalidated.status).toBe(200);
  });
});
