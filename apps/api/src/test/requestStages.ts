import request from 'supertest';
import { DieRequest } from '../models';
import { bidBody, rectangleSvg } from './fixtures';
import { app, createOpenRequest, type World } from './harness';

type Member = keyof World['tokens'];

/** One call through the API as a member of the world, for setting up; any other status stops the run with the answer. */
export async function callAs(
  w: World,
  who: Member,
  method: 'get' | 'post' | 'patch',
  path: string,
  body: object | undefined,
  status: number,
) {
  const req = request(app)[method](path).set('Authorization', `Bearer ${w.tokens[who]}`);
  const res = await (body ? req.send(body) : req);
  if (res.status !== status)
    throw new Error(`${method.toUpperCase()} ${path} as ${who}: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body;
}

/** Uploads the 2 × 1 in test SVG to the printer's request as its buyer; the file's id. */
export async function addDieline(w: World, requestId: number): Promise<number> {
  const res = await request(app)
    .post(`/api/requests/${requestId}/files`)
    .set('Authorization', `Bearer ${w.tokens.buyer}`)
    .attach('file', Buffer.from(rectangleSvg), 'label.svg');
  if (res.status !== 201) throw new Error(`upload to request ${requestId}: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.id;
}

/** A complete draft with a measured dieline, ready to publish: an open request put back to draft. */
export async function createReadyDraft(w: World): Promise<number> {
  const { id } = await createOpenRequest(w);
  await DieRequest.query().patch({ status: 'draft', publishedAt: null }).findById(id);
  return id;
}

/** The stages a request passes through after the world's die shop bids on it, in order. */
const stages = ['bid', 'bidding_closed', 'awarded', 'in_production', 'shipped'] as const;
export type Stage = (typeof stages)[number];
export interface StagedRequest {
  id: number;
  bidId: number;
  /** The award, from the stage 'awarded' on; 0 before it. */
  awardId: number;
}

/**
 * An open request that the world's die shop bid on, taken through the API to `stage` the way
 * each side does it: purchasing closes bidding and awards, the shop's estimator makes and ships.
 */
export async function createRequestAt(w: World, stage: Stage): Promise<StagedRequest> {
  const { id } = await createOpenRequest(w);
  const bid = await callAs(w, 'estimator', 'post', `/api/requests/${id}/bids`, bidBody(80_000), 201);
  const staged: StagedRequest = { id, bidId: bid.id, awardId: 0 };
  const steps = [
    () => callAs(w, 'purchasing', 'post', `/api/requests/${id}/close-bidding`, undefined, 200),
    async () => {
      staged.awardId = (
        await callAs(w, 'purchasing', 'post', `/api/requests/${id}/award`, { bidId: bid.id }, 200)
      ).award.id;
    },
    () => callAs(w, 'estimator', 'post', `/api/requests/${id}/start-production`, undefined, 200),
    () =>
      callAs(
        w,
        'estimator',
        'post',
        `/api/requests/${id}/ship`,
        { trackingNote: 'Ground parcel, tracking 1Z-TEST-0001' },
        200,
      ),
  ];
  for (const step of steps.slice(0, stages.indexOf(stage))) await step();
  return staged;
}
